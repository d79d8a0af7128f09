// The library API as a script would use it: read, convert to graphology and back, evaluate,
// and gate a change built in code.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { MultiUndirectedGraph } from 'graphology';
import { describe, expect, it } from 'vitest';
import { check, evaluate, fromGraph, readDesign, toGraph, type Topology } from '../../src/api/index.js';

const root = path.resolve(import.meta.dirname, '..', '..');
const fixture = (p: string) => readFileSync(path.join(root, p), 'utf8');

function essentials(t: Topology) {
  return {
    name: t.name,
    nodes: t.nodes.map((n) => [n.id, n.label, n.kind, n.lat, n.lon, n.hardened]),
    links: t.links.map((l) => [
      l.key,
      l.id,
      l.source,
      l.target,
      l.length,
      l.latency,
      l.capacity,
      l.weight,
      l.riskGroups,
      l.hardened,
    ]),
    groups: t.riskGroups.map((r) => r.id),
    demands: t.demands.map((d) => [d.source, d.target, d.volume]),
  };
}

describe('readDesign, toGraph, fromGraph', () => {
  it('gives a graphology multigraph with every element and attribute, parallel links kept', () => {
    const t = readDesign(fixture('fixtures/designs/ring.net.yaml'), 'ring.net.yaml');
    const g = toGraph(t);
    expect(g.type).toBe('undirected');
    expect(g.multi).toBe(true);
    expect([g.order, g.size]).toEqual([t.nodes.length, t.links.length]);
    for (const l of t.links) {
      expect(g.hasEdge(l.key)).toBe(true);
      expect(g.extremities(l.key).sort()).toEqual([l.source, l.target].sort());
      expect(g.getEdgeAttribute(l.key, 'line')).toBe(l.pos.line);
    }
    // graphology's own degree counts parallel links, as netbrace's structure does.
    for (const n of t.nodes)
      expect(g.degree(n.id)).toBe(t.links.filter((l) => l.source === n.id || l.target === n.id).length);
  });

  it('fromGraph(toGraph(t)) keeps ids, labels, coordinates, lengths, groups and demands', () => {
    const t = readDesign(fixture('fixtures/demo/base/designs/lunmere-backbone.net.yaml'), 'lunmere-backbone.net.yaml');
    const back = fromGraph(toGraph(t));
    expect(essentials(back)).toEqual(essentials(t));
    expect(back.nodes.map((n) => n.pos.line)).toEqual(t.nodes.map((n) => n.pos.line));
  });

  it('reads a graph built with graphology alone (no file); elements are numbered in graph order', () => {
    const g = new MultiUndirectedGraph();
    for (const id of ['a', 'b', 'c']) g.addNode(id, { label: id.toUpperCase() });
    g.addEdge('a', 'b', { length_km: 3 });
    g.addEdge('b', 'c');
    const t = fromGraph(g, { file: 'scripted' });
    expect(t.nodes.map((n) => n.label)).toEqual(['A', 'B', 'C']);
    expect(t.links.map((l) => [l.source, l.target, l.length])).toEqual([
      ['a', 'b', 3],
      ['b', 'c', undefined],
    ]);
    expect([...t.nodes, ...t.links].map((e) => e.pos.line)).toEqual([1, 2, 3, 4, 5]);
  });
});

function ringGraph(n: number): MultiUndirectedGraph {
  const g = new MultiUndirectedGraph();
  for (let i = 0; i < n; i++)
    g.addNode(`s${i}`, { lat: 10 + Math.cos((2 * Math.PI * i) / n), lon: 20 + Math.sin((2 * Math.PI * i) / n) });
  for (let i = 0; i < n; i++) g.addEdge(`s${i}`, `s${(i + 1) % n}`, { length_km: 10 });
  return g;
}

describe('check and evaluate', () => {
  it('a ring built in code that loses a span fails with its new bridges; the same ring holds', async () => {
    const base = fromGraph(ringGraph(8), { file: 'ring' });
    const chain = ringGraph(8);
    chain.dropEdge(chain.edges('s0', 's7')[0]);
    const failing = await check({
      base: { 'nets/ring.net.json': base },
      head: { 'nets/ring.net.json': fromGraph(chain) },
    });
    expect(failing.exitCode).toBe(1);
    expect(failing.report.verdict).toBe('fail');
    const f = failing.report.files[0];
    expect(f.path).toBe('nets/ring.net.json');
    expect(f.findings.filter((x) => x.rule === 'new-bridge').length).toBeGreaterThan(0);
    const same = await check({
      base: { 'nets/ring.net.json': base },
      head: { 'nets/ring.net.json': fromGraph(ringGraph(8)) },
    });
    expect(same.exitCode).toBe(0);
    expect(same.report.files).toEqual([]); // identical text: nothing changed, nothing to judge
  });

  it('evaluate judges one design against the policy\u2019s floors', async () => {
    const policy = fixture('fixtures/gate/policy.yaml');
    const f = await evaluate(fixture('fixtures/gate/ring-to-chain/base.net.yaml'), { path: 'metro.net.yaml', policy });
    expect(f.path).toBe('metro.net.yaml');
    expect(f.head?.structure.bridges).toEqual([]);
    expect(f.requirements.length).toBeGreaterThan(0);
    expect(f.requirements.every((r) => r.head !== null && Number.isFinite(r.head))).toBe(true);
  });
});
