// Every network of the Internet Topology Zoo (S. Knight, H. X. Nguyen, N. Falkner, R. Bowden,
// M. Roughan, "The Internet Topology Zoo", IEEE JSAC 29(9):1765–1775, 2011; CC BY 4.0) must
// parse, in both of the formats the zoo publishes, and the two copies must describe the same
// network. The files were written by several tools over the years, which is why they are a
// good test of readers meant for files from anywhere.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../src/topology/parse.js';
import type { Topology } from '../../src/topology/model.js';
import { repoRoot } from './helpers.js';

const ZOO = path.resolve(repoRoot, 'fixtures', 'topology-zoo');

/**
 * Networks whose GML and GraphML copies differ in node or link count, with the reason.
 * Empty: in the copy of the dataset we test against, all 276 networks agree. A new
 * difference fails the test below and must be added here with the reason found.
 */
const COUNT_EXCEPTIONS: Readonly<Record<string, string>> = {};

function names(format: 'gml' | 'graphml'): string[] {
  return readdirSync(path.join(ZOO, format))
    .filter((f) => f.endsWith(`.${format}`))
    .sort();
}

function load(format: 'gml' | 'graphml', file: string): { t: Topology; text: string } {
  const text = readFileSync(path.join(ZOO, format, file), 'utf8');
  return { t: parseDesign(text, `topology-zoo/${format}/${file}`), text };
}

describe('Internet Topology Zoo', () => {
  it('the dataset is where the tests expect it (fixtures/topology-zoo, copied with its licence and attribution)', () => {
    expect(existsSync(path.join(ZOO, 'gml')), ZOO).toBe(true);
    expect(existsSync(path.join(ZOO, 'graphml')), ZOO).toBe(true);
  });

  const gml = existsSync(ZOO) ? names('gml') : [];
  const graphml = existsSync(ZOO) ? names('graphml') : [];
  // Both copies of every network, parsed once for the comparisons below.
  let both: Map<string, { gml?: Topology; graphml?: Topology }> | undefined;
  const parsed = () => {
    both ??= new Map(gml.map((f) => [f.replace(/\.gml$/, ''), { gml: load('gml', f).t }]));
    for (const f of graphml) {
      const base = f.replace(/\.graphml$/, '');
      if (!both.get(base)?.graphml) both.set(base, { ...both.get(base), graphml: load('graphml', f).t });
    }
    return both;
  };

  it('every GML file parses, and no edge is lost (links + dropped self-loops = edges in the file)', () => {
    expect(gml.length).toBeGreaterThanOrEqual(250);
    for (const f of gml) {
      const { t, text } = load('gml', f);
      const edges = (text.match(/^\s*edge\s*\[/gm) ?? []).length;
      const loops = t.warnings.filter((w) => w.message.startsWith('self-loop')).length;
      expect(t.links.length + loops, f).toBe(edges);
      expect(t.nodes.length, f).toBe((text.match(/^\s*node\s*\[/gm) ?? []).length);
    }
  });

  it('every GraphML file parses, and no edge is lost', () => {
    expect(graphml.length).toBeGreaterThanOrEqual(250);
    for (const f of graphml) {
      const { t, text } = load('graphml', f);
      const loops = t.warnings.filter((w) => w.message.startsWith('self-loop')).length;
      expect(t.links.length + loops, f).toBe((text.match(/<edge[\s>]/g) ?? []).length);
      expect(t.nodes.length, f).toBe((text.match(/<node[\s>]/g) ?? []).length);
    }
  });

  it('the GML and GraphML copies of each network have the same nodes and links', () => {
    expect(gml.map((f) => f.replace(/\.gml$/, ''))).toEqual(graphml.map((f) => f.replace(/\.graphml$/, '')));
    const differing: string[] = [];
    for (const [name, { gml: a, graphml: b }] of parsed()) {
      if (!a || !b) continue;
      const same =
        a.nodes.length === b.nodes.length &&
        a.links.length === b.links.length &&
        // Beyond counts: the same node ids and the same multiset of link keys.
        a.nodes.every((n, i) => n.id === b.nodes[i].id) &&
        JSON.stringify(a.links.map((l) => l.key).sort()) === JSON.stringify(b.links.map((l) => l.key).sort());
      if (!same) differing.push(name);
    }
    expect(differing.sort()).toEqual(Object.keys(COUNT_EXCEPTIONS).sort());
  });

  it('coordinates and labels come through: both copies agree node by node', () => {
    let withSite = 0;
    for (const [name, { gml: a, graphml: b }] of parsed()) {
      if (!a || !b) continue;
      a.nodes.forEach((n, i) => {
        const m = b.nodes[i];
        expect([m.label, m.lat, m.lon], `${name} node ${n.id}`).toEqual([n.label, n.lat, n.lon]);
        if (n.lat !== undefined) withSite++;
      });
    }
    // 8,815 node blocks in the GML copies carry a Latitude (counted with grep); all must arrive.
    expect(withSite).toBe(8815);
  });
});
