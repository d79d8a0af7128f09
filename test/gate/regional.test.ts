// Regional challenges through the gate: the policy fixes the radius (50 km unless it says
// otherwise), so a change that widens the design's extent leaves base and head on one grid and
// their areas, spreads and thresholds pair. Left to the engine, the radius would follow each
// design's extent (a quarter of its widest site distance) and the grids would differ.
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../src/envelope/evaluate.js';
import { pairedStatistic } from '../../src/envelope/pairing.js';
import { compileTopology } from '../../src/graph/compact.js';
import { runGate } from '../../src/run-gate.js';
import { parseDesign } from '../../src/topology/parse.js';
import { memoryDeps } from './memory-repo.js';

const FILE = 'networks/lakes.net.yaml';

// An invented metro ring of six sites about 10 km apart, and the same ring with a spur to a
// site some 300 km away (which widens the extent twentyfold).
const SITES = [
  ['pier', 46.0, 7.0],
  ['mill', 46.09, 7.05],
  ['kiln', 46.12, 7.16],
  ['forge', 46.05, 7.25],
  ['dock', 45.97, 7.21],
  ['weir', 45.95, 7.1],
] as const;
const ring = [...SITES.map(([id], i) => [id, SITES[(i + 1) % SITES.length][0]]), ['pier', 'kiln']];

function designText(withSpur: boolean): string {
  const nodes = SITES.map(([id, lat, lon]) => `  - id: ${id}\n    site: {lat: ${lat}, lon: ${lon}}`);
  const links = ring.map(([a, b]) => `  - between: [${a}, ${b}]`);
  if (withSpur) {
    nodes.push('  - id: outpost\n    site: {lat: 48.6, lon: 7.9}');
    links.push('  - between: [forge, outpost]', '  - between: [dock, outpost]');
  }
  return `network:\n  name: Lake ring\nnodes:\n${nodes.join('\n')}\nlinks:\n${links.join('\n')}\n`;
}

const POLICY = [
  'seed: 4',
  'r-value:',
  '  metrics:',
  '    pair_connectivity: 1',
  'challenges:',
  '  quakes:',
  '    remove: region',
  '    points: 6',
  'requirements:',
  '  - kind: area-floor',
  '    challenge: quakes',
  '  - kind: spread-ceiling',
  '    challenge: quakes',
  '    max: 1',
  '  - kind: r-threshold',
  '    challenge: quakes',
  '    at: 20',
  '    statistic: quantile',
  '    q: 0.5',
  '    min: 0',
  '',
].join('\n');

describe('regional challenges on base and head', () => {
  it('left to the engine, the radius follows the extent, and the two grids (and their areas) do not compare', () => {
    const spec = {
      r: { metrics: [{ id: 'pair_connectivity' as const, weight: 1 }], combine: 'mean' as const },
      seed: 4,
      challenges: [{ challenge: 'regional' as const, points: 6 }],
    };
    const base = evaluateDesign(compileTopology(parseDesign(designText(false), FILE)), spec);
    const head = evaluateDesign(compileTopology(parseDesign(designText(true), FILE)), spec);
    const xb = base.evaluation.envelopes[0].x;
    const xh = head.evaluation.envelopes[0].x;
    expect(xb.at(-1)).toBeLessThan(10);
    expect(xh.at(-1)).toBeGreaterThan(50);
    expect(() => pairedStatistic(base, head, 'regional', { kind: 'area' })).toThrow(/grids differ/);
  });

  it('under the policy both sides run to 50 km on the same grid, and every requirement is paired', async () => {
    const repo = {
      base: { '.netbrace.yaml': POLICY, [FILE]: designText(false) },
      head: { '.netbrace.yaml': POLICY, [FILE]: designText(true) },
    };
    const { report } = await runGate(
      { base: 'base', head: 'head', policySource: 'base', mode: 'block' },
      memoryDeps(repo),
    );
    const f = report.files[0];
    const [eb, eh] = [f.base!.envelopes[0], f.head!.envelopes[0]];
    expect(eb.x).toEqual([0, 10, 20, 30, 40, 50]);
    expect(eh.x).toEqual(eb.x);
    // One realization per epicentre: six on the base, seven with the outpost.
    expect([eb.realizations, eh.realizations]).toEqual([6, 7]);
    for (const r of f.requirements) {
      expect(r.base, r.id).not.toBeNull();
      expect(r.delta, r.id).not.toBeNull();
      expect(Number.isFinite(r.se!), r.id).toBe(true);
    }
    expect(f.findings.filter((x) => /could not be judged/.test(x.message))).toEqual([]);
  });
});
