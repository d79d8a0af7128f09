// The design map: the projection fitted to a design's extent, the seeded ForceAtlas2 layout
// for designs without coordinates, base and head together, and shared-risk groups that strand
// sites. The SVG it is drawn as: a <title> on every element, no script, nothing loaded.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { SaxesParser } from 'saxes';
import { describe, expect, it } from 'vitest';
import { compileTopology, graphFromEdges } from '../../src/graph/compact.js';
import { buildDesignMap, MAP_MAX_NODES } from '../../src/map/build.js';
import { forceLayout } from '../../src/map/force.js';
import { fitToBox, MAP_MARGIN, MAP_WIDTH, projectGeographic, unwrapLongitudes } from '../../src/map/project.js';
import { strandingGroups } from '../../src/map/stranding.js';
import type { DesignMap } from '../../src/map/types.js';
import { mapHighlights, renderMapSvg } from '../../src/report/map-svg.js';
import type { FileReport } from '../../src/report/report.js';
import { parseDesign } from '../../src/topology/parse.js';
import { repoRoot } from '../topology/helpers.js';

const DEMO = readFileSync(
  path.join(repoRoot, 'fixtures', 'demo', 'base', 'designs', 'lunmere-backbone.net.yaml'),
  'utf8',
);
const demoTopology = () => parseDesign(DEMO, 'designs/lunmere-backbone.net.yaml');
/** The demo's first change: the two links it retires, cut out. */
function change1(): string {
  const patch = readFileSync(path.join(repoRoot, 'fixtures', 'demo', 'changes', '1-retire-east-chord.patch'), 'utf8');
  const blocks: string[] = [];
  let cur: string[] | undefined;
  for (const line of patch.split('\n')) {
    if (line.startsWith('-') && !line.startsWith('---')) (cur ??= []).push(line.slice(1));
    else if (cur) {
      blocks.push(`${cur.join('\n')}\n`);
      cur = undefined;
    }
  }
  let out = DEMO;
  for (const b of blocks) out = out.replace(b, '');
  return out;
}

const dist = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y);

describe('the projection', () => {
  it('fits the extent into the drawing with the aspect kept (equirectangular, x = λ·cos φ₀)', () => {
    // A square of 1° × 1° at 60° N is half as wide as it is tall (cos 60° = 0.5).
    const p = projectGeographic([60.5, 60.5, 59.5, 59.5], [10, 11, 10, 11]);
    const w = p.x[1] - p.x[0];
    const h = p.y[2] - p.y[0];
    expect(w / h).toBeCloseTo(Math.cos((60 * Math.PI) / 180), 2);
    for (let i = 0; i < 4; i++) {
      expect(p.x[i]).toBeGreaterThanOrEqual(MAP_MARGIN - 0.05);
      expect(p.x[i]).toBeLessThanOrEqual(MAP_WIDTH - MAP_MARGIN + 0.05);
      expect(p.y[i]).toBeGreaterThanOrEqual(MAP_MARGIN - 0.05);
      expect(p.y[i]).toBeLessThanOrEqual(p.height - MAP_MARGIN + 0.05);
    }
    // North is up.
    expect(p.y[0]).toBeLessThan(p.y[2]);
  });

  it('keeps a design that straddles the antimeridian in one piece', () => {
    expect(unwrapLongitudes([179.5, -179.5, 178])).toEqual([179.5, 180.5, 178]);
    const p = projectGeographic([0, 0, 0], [179.5, -179.5, 178]);
    // −179.5 lies 1° east of 179.5, not 359° west.
    expect(p.x[1]).toBeGreaterThan(p.x[0]);
    expect(p.x[1] - p.x[0]).toBeLessThan((p.x[0] - p.x[2]) * 0.7);
  });

  it('rounds to 0.1 drawing units and centres a single point', () => {
    const p = fitToBox([3.14159], [2.71828]);
    expect(p.x[0]).toBe(MAP_WIDTH / 2);
    for (const v of fitToBox([0, 1, 2.333333], [0, 5, 1]).x) expect(Math.round(v * 10) / 10).toBe(v);
  });
});

describe('the force layout (no coordinates)', () => {
  const t = parseDesign(DEMO.replace(/\n\s+site: \{[^}]*\}/g, ''), 'x.net.yaml');
  const g = compileTopology(t);
  const edges = Array.from({ length: g.m }, (_, e) => [g.linkSource[e], g.linkTarget[e]] as const);

  it('is the same, byte for byte, every time', () => {
    const a = forceLayout(g.nodeIds, edges);
    const b = forceLayout(g.nodeIds, edges);
    expect(Array.from(b.x)).toEqual(Array.from(a.x));
    expect(Array.from(b.y)).toEqual(Array.from(a.y));
    for (const v of a.x) expect(Math.round(v * 10) / 10).toBe(v);
  });

  it('draws linked sites near each other and no two sites on top of each other', () => {
    const p = forceLayout(g.nodeIds, edges);
    const pt = (i: number) => ({ x: p.x[i], y: p.y[i] });
    const linked = edges.reduce((s, [a, b]) => s + dist(pt(a), pt(b)), 0) / edges.length;
    let all = 0;
    let pairs = 0;
    let closest = Infinity;
    for (let i = 0; i < g.n; i++) {
      for (let j = i + 1; j < g.n; j++) {
        const d = dist(pt(i), pt(j));
        all += d;
        pairs++;
        closest = Math.min(closest, d);
      }
    }
    expect(linked).toBeLessThan(0.5 * (all / pairs));
    expect(closest).toBeGreaterThan(4);
  });
});

describe('the map of a change', () => {
  const base = compileTopology(demoTopology());
  const head = compileTopology(parseDesign(change1(), 'designs/lunmere-backbone.net.yaml'));

  it('holds every site and link of base and head, with the side each is on', () => {
    const m = buildDesignMap({ graph: head }, { graph: base }) as DesignMap;
    expect(m.layout).toBe('geographic');
    expect(m.nodes).toHaveLength(50);
    expect(m.links).toHaveLength(82);
    expect(
      m.links
        .filter((l) => l.side === 'base')
        .map((l) => l.id)
        .sort(),
    ).toEqual(['ibberlin-tarnquist', 'kaskeld-fenwhistle']);
    expect(m.links.filter((l) => l.side === 'head')).toEqual([]);
    for (const n of m.nodes) expect(n.line).toBeGreaterThan(0);
  });

  it('finds the shared-risk groups whose loss strands sites', () => {
    // A ring of four whose two links out of site 0 share one duct: losing it strands site 0.
    const t = parseDesign(
      'nodes: [{id: a}, {id: b}, {id: c}, {id: d}]\nlinks:\n  - {between: [a, b], risk_groups: [duct]}\n  - {between: [b, c]}\n  - {between: [c, d]}\n  - {between: [d, a], risk_groups: [duct]}\n  - {between: [b, d], risk_groups: [other]}\n',
      'g.net.yaml',
    );
    expect([...strandingGroups(compileTopology(t))]).toEqual([['duct', 1]]);
  });

  it('says why there is no map of a design too large to draw', () => {
    const n = MAP_MAX_NODES + 1;
    const big = graphFromEdges(
      n,
      Array.from({ length: n - 1 }, (_, i) => [i, i + 1] as [number, number]),
    );
    const m = buildDesignMap({ graph: big });
    expect('omitted' in m && m.omitted).toContain('more than a map shows legibly');
  });
});

interface Element {
  name: string;
  attrs: Record<string, string>;
  children: Element[];
  text: string;
}

/** Parse SVG as XML (well-formedness is part of the check) into a small tree. */
function parseSvg(svg: string): Element {
  const parser = new SaxesParser({ xmlns: false });
  const root: Element = { name: '#root', attrs: {}, children: [], text: '' };
  const stack = [root];
  parser.on('opentag', (tag) => {
    const el: Element = { name: tag.name, attrs: tag.attributes as Record<string, string>, children: [], text: '' };
    stack[stack.length - 1].children.push(el);
    stack.push(el);
  });
  parser.on('text', (t) => (stack[stack.length - 1].text += t));
  parser.on('closetag', () => void stack.pop());
  parser.write(svg).close();
  return root.children[0];
}

function walk(el: Element, out: Element[] = []): Element[] {
  out.push(el);
  for (const c of el.children) walk(c, out);
  return out;
}

describe('the SVG map', () => {
  const base = compileTopology(demoTopology());
  const headT = parseDesign(change1(), 'designs/lunmere-backbone.net.yaml');
  const head = compileTopology(headT);
  const map = buildDesignMap(
    { graph: head, labels: new Map(headT.nodes.map((n) => [n.id, n.label ?? n.id])) },
    { graph: base },
  ) as DesignMap;
  const report: FileReport = {
    path: 'designs/lunmere-backbone.net.yaml',
    status: 'weakened',
    requirements: [],
    findings: [
      {
        rule: 'new-bridge',
        severity: 'fail',
        message: 'x',
        elements: [{ id: 'kaskeld-ibberlin', kind: 'link', line: 303 }],
        line: 303,
      },
      {
        rule: 'new-cut-node',
        severity: 'warn',
        message: 'x',
        elements: [{ id: 'kaskeld', kind: 'node', line: 58 }],
        line: 58,
      },
      {
        rule: 'weakest-sequence',
        severity: 'notice',
        message: 'weakest',
        elements: [
          { id: 'yarlsquay', kind: 'node', line: 38 },
          { id: 'orrowin', kind: 'node', line: 22 },
        ],
        line: 38,
      },
    ],
    map,
  };
  const svg = renderMapSvg(map, mapHighlights(report), { idPrefix: 't' });
  const tree = parseSvg(svg);
  const all = walk(tree);

  it('gives every element a title with its name, id and line', () => {
    const marked = all.filter((e) => e.attrs['data-el'] !== undefined);
    const byKind = (k: string) => marked.filter((e) => e.attrs['data-el'] === k);
    expect(byKind('site')).toHaveLength(map.nodes.length);
    expect(byKind('link')).toHaveLength(map.links.length);
    expect(byKind('step')).toHaveLength(2);
    expect(byKind('legend').length).toBeGreaterThan(5);
    for (const e of marked) {
      const title = e.children.find((c) => c.name === 'title');
      expect(title, `${e.attrs['data-el']} ${e.attrs['data-id']}`).toBeDefined();
      expect(title!.text.length).toBeGreaterThan(5);
    }
    // Every shape is inside an element that has its own title (the root's does not count).
    const shapes = new Set(['circle', 'path', 'rect', 'text', 'line', 'polygon']);
    const check = (el: Element, titled: boolean) => {
      const own = el !== tree && el.children.some((c) => c.name === 'title');
      if (shapes.has(el.name)) expect(titled || own, `${el.name} without a title`).toBe(true);
      for (const c of el.children) check(c, titled || own);
    };
    check(tree, false);
    const kaskeld = byKind('site').find((e) => e.attrs['data-id'] === 'kaskeld')!;
    expect(kaskeld.children.find((c) => c.name === 'title')!.text).toBe(
      'Site Kaskeld (kaskeld) \u2014 line 58 \u2014 new cut site: its loss alone splits the design',
    );
    const removed = byKind('link').find((e) => e.attrs['data-id'] === 'ibberlin-tarnquist')!;
    expect(removed.attrs['data-side']).toBe('base');
    expect(removed.children.find((c) => c.name === 'title')!.text).toContain('removed by the change');
    expect(removed.children.find((c) => c.name === 'path')!.attrs['stroke-dasharray']).toBe('6 4');
  });

  it('has no script, no event handler, no link and loads nothing', () => {
    expect(svg).not.toMatch(/<script|javascript:|\son[a-z]+=|href=|url\(|<image|<foreignObject|@import/i);
    expect(svg.match(/https?:\/\/[^"]+/g)).toEqual(['http://www.w3.org/2000/svg']);
    expect(tree.attrs.role).toBe('img');
    expect(tree.children[0].name).toBe('title');
  });

  it('escapes hostile ids', () => {
    const t = parseDesign(
      'nodes: [{id: "<script>x</script>"}, {id: "a&b\\"c"}]\nlinks: [{between: ["<script>x</script>", "a&b\\"c"], id: "</title><g onload=1>"}]\n',
      'h.net.yaml',
    );
    const m = buildDesignMap({ graph: compileTopology(t) }) as DesignMap;
    const out = renderMapSvg(m, mapHighlights({ path: 'h', status: 'holds', findings: [], requirements: [] }));
    expect(out).not.toContain('<script>');
    expect(out).not.toContain('<g onload');
    const titles = walk(parseSvg(out))
      .filter((e) => e.name === 'title')
      .map((e) => e.text);
    expect(titles.some((x) => x.includes('</title><g onload=1>'))).toBe(true);
  });
});
