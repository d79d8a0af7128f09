// `netbrace explain` on the demo base design, checked against networkx 2.8.8 (Debian
// python3-networkx): every single loss's R (mean of pair connectivity and efficiency, N0
// denominators) as computed by test/shell/explain-reference.py; the command that made the
// values and the library versions are in explain-reference.json. CI needs no Python.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import {
  explainDesign,
  formatExplanation,
  rankSingleLosses,
  type Explanation,
} from '../../src/shell/commands/explain.js';
import type { RValueSpec } from '../../src/envelope/types.js';
import { sampledVariants } from '../cases/sampled-design.js';
import { compileTopology, graphFromEdges } from '../../src/graph/compact.js';
import { createRValue } from '../../src/envelope/r-value.js';
import { evaluateContingency } from '../../src/envelope/contingency.js';
import { parseDesign } from '../../src/topology/parse.js';
import { CAUTION } from '../../src/report/report.js';
import { repoRoot } from '../topology/helpers.js';
import { recordIO } from './helpers-io.js';

const BASE = path.join(repoRoot, 'fixtures', 'demo', 'base');
const FILE = 'designs/lunmere-backbone.net.yaml';
const ref = JSON.parse(readFileSync(path.join(repoRoot, 'test', 'shell', 'explain-reference.json'), 'utf8')) as {
  library: string;
  rows: { kind: 'intact' | 'node' | 'link' | 'group'; id: string; r: number }[];
};
const R_ARGS = ['--metric', 'pair_connectivity', '--metric', 'efficiency'];

async function explainJson(args: string[]): Promise<Explanation> {
  const io = recordIO(BASE);
  const code = await main(['explain', FILE, ...R_ARGS, '--json', ...args], io);
  expect(io.err.join('')).toBe('');
  expect(code).toBe(0);
  return JSON.parse(io.out.join('')) as Explanation;
}

describe('netbrace explain', () => {
  it(`matches networkx on every single loss of the demo design (${ref.library})`, async () => {
    const x = await explainJson([]);
    const intact = ref.rows.find((r) => r.kind === 'intact')!;
    expect(x.intact).toBeCloseTo(intact.r, 12);
    const rows = ref.rows.filter((r) => r.kind !== 'intact');
    expect(x.elements).toHaveLength(rows.length);
    const mine = new Map(x.elements.map((e) => [`${e.kind}:${e.id}`, e]));
    for (const r of rows) {
      const e = mine.get(`${r.kind}:${r.id}`);
      expect(e, `${r.kind} ${r.id}`).toBeDefined();
      expect(Math.abs(e!.r - r.r), `${r.kind} ${r.id}`).toBeLessThan(1e-12);
      expect(e!.drop).toBeCloseTo(intact.r - r.r, 12);
    }
    // ranked worst first
    for (let i = 1; i < x.elements.length; i++) expect(x.elements[i].r).toBeGreaterThanOrEqual(x.elements[i - 1].r);
    expect(x.elements.map((e) => e.rank)).toEqual(x.elements.map((_, i) => i + 1));
    // the hardened capital is never removed
    expect(x.hardened).toEqual({ node: 1, link: 0, group: 0 });
    expect(mine.has('node:lunmere')).toBe(false);
  });

  it('names the west chain first, with lines, and the sites each loss cuts off', async () => {
    const x = await explainJson([]);
    const [first] = x.elements;
    expect(first).toMatchObject({
      kind: 'node',
      id: 'yarlsquay',
      label: 'Yarlsquay',
      cutsOff: ['wendlequist', 'mirrowath', 'culvenbrae'],
      singlePointOfFailure: true,
    });
    const text = readFileSync(path.join(BASE, FILE), 'utf8').split('\n');
    for (const e of x.elements) {
      // sites, links and groups alike: the line is the one their list entry starts on
      expect(text[e.line - 1], `${e.kind} ${e.id}`).toBe(`  - id: ${e.id}`);
    }
    const bridge = x.elements.find((e) => e.id === 'yarlsquay-wendlequist')!;
    expect(bridge).toMatchObject({
      kind: 'link',
      singlePointOfFailure: true,
      cutsOff: ['wendlequist', 'mirrowath', 'culvenbrae'],
    });
  });

  it('agrees with the envelope engine\u2019s N\u22121 contingency on the worst cases', () => {
    const t = parseDesign(readFileSync(path.join(BASE, FILE), 'utf8'), FILE);
    const g = compileTopology(t);
    const spec = {
      metrics: [
        { id: 'pair_connectivity' as const, weight: 1 },
        { id: 'efficiency' as const, weight: 1 },
      ],
      combine: 'mean' as const,
    };
    const rfn = createRValue(g, spec);
    for (const kind of ['node', 'link'] as const) {
      const c = evaluateContingency(g, kind, 1, rfn, Number.MAX_SAFE_INTEGER);
      const mine = rankSingleLosses(g, rfn, [kind]).ranked;
      expect(mine[0].r).toBe(c.min);
      expect(mine.slice(0, c.worst.length).map((e) => [e.id, e.r])).toEqual(
        c.worst.map((w) => [w.elements[0], w.value]),
      );
    }
  });

  it('ranks a path by hand: the middle node of P5 hurts most under largest_component', () => {
    // P5, remove node 2: components {0,1} and {3,4}, LCC/N0 = 2/5 (hand check)
    const g = graphFromEdges(5, [
      [0, 1],
      [1, 2],
      [2, 3],
      [3, 4],
    ]);
    const rfn = createRValue(g, { metrics: [{ id: 'largest_component', weight: 1 }], combine: 'mean' });
    const res = rankSingleLosses(g, rfn, ['node']);
    expect(res.intact).toBe(1);
    // on a tie the largest part is the one met first in file order, so {3, 4} is the part cut off
    expect(res.ranked[0]).toMatchObject({ id: '2', r: 0.4, cutsOff: ['3', '4'], singlePointOfFailure: true });
    expect(res.ranked.map((e) => e.id)).toEqual(['2', '1', '3', '0', '4']);
    expect(res.ranked.map((e) => e.r)).toEqual([0.4, 0.6, 0.6, 0.8, 0.8]);
  });

  it('prints a ranked table with lines, --top rows and the caution', async () => {
    const io = recordIO(BASE, { COLUMNS: '110' });
    expect(await main(['explain', FILE, ...R_ARGS, '--top', '3', '--kind', 'link'], io)).toBe(0);
    const text = io.out.join('');
    const lines = text.split('\n');
    const header = lines.findIndex((l) => l.includes('R left'));
    expect(lines[header + 1]).toMatch(
      /^\s+1\s+link\s+yarlsquay-wendlequist\s+538\s+0\.6042\s+\u22120\.0717\s+3 sites: wendlequist, mirrowath, culvenbrae$/,
    );
    expect(lines[header + 4]).toMatch(/\u2026 79 more \(--top N shows more\)/);
    expect(text.replace(/\n/g, ' ')).toContain(`Caution: ${CAUTION}`);
    expect(text).toContain('R = weighted mean of pair_connectivity 1, efficiency 1 (from --metric (equal weights))');
    expect(text).not.toMatch(/\u001b\[/);
    expect(lines.every((l) => l.length <= 110)).toBe(true);
  });

  it('uses the policy r-value when no --metric is given', async () => {
    const io = recordIO(BASE);
    expect(await main(['explain', FILE, '--json', '--top', '1'], io)).toBe(0);
    const x = JSON.parse(io.out.join('')) as Explanation;
    expect(x.rSource).toBe('the built-in policy');
    expect(x.r.metrics.length).toBeGreaterThan(0);
  });

  it('reports usage errors with exit code 2 and unreadable files with exit code 1', async () => {
    const cases: [string[], number, RegExp][] = [
      [['explain'], 2, /explain needs a design FILE/],
      [['explain', FILE, '--top', '0'], 2, /--top must be a whole number ≥ 1/],
      [['explain', FILE, '--kind', 'duct'], 2, /--kind must be node, link, group or all/],
      [['explain', FILE, '--metric', 'speed'], 2, /unknown metric "speed"/],
      [['explain', FILE, '--policy', 'nope.yaml'], 2, /policy file nope\.yaml not found/],
      [['explain', 'designs/missing.net.yaml'], 1, /designs\/missing\.net\.yaml:1:1: no such file/],
    ];
    for (const [args, code, message] of cases) {
      const io = recordIO(BASE);
      expect(await main(args, io), args.join(' ')).toBe(code);
      expect(io.err.join('')).toMatch(message);
    }
  });

  it('has help with examples and exit codes', async () => {
    const io = recordIO(BASE);
    expect(await main(['explain', '--help'], io)).toBe(0);
    const help = io.out.join('');
    expect(help).toMatch(/^Usage: netbrace explain FILE/);
    expect(help).toContain('Examples:');
    expect(help).toContain('Exit codes:');
  });

  it('carries labels for sites only when they differ from the id', () => {
    const t = parseDesign(
      'nodes:\n  - {id: a, label: Alpha}\n  - {id: b}\nlinks:\n  - {between: [a, b]}\n',
      'x.net.yaml',
    );
    const x = explainDesign(t, { metrics: [{ id: 'largest_component', weight: 1 }], combine: 'mean' }, 'test', [
      'node',
    ]);
    expect(x.elements.map((e) => [e.id, e.label])).toEqual([
      ['a', 'Alpha'],
      ['b', undefined],
    ]);
  });
});

describe('explain on an R estimated from sampled sources', () => {
  const t = parseDesign(sampledVariants().base, 'torus.csv');
  const spec = (sources?: number): RValueSpec => ({
    metrics: [
      { id: 'pair_connectivity', weight: 1 },
      { id: 'efficiency', weight: 1 },
    ],
    combine: 'mean',
    ...(sources !== undefined ? { sources, sourceSeed: 5 } : {}),
  });

  it('says the estimate and its error above the ranking; an exact R says nothing of it', () => {
    const x = explainDesign(t, spec(64), 'test', ['link']);
    expect(x.sampling).toMatchObject({ metric: 'efficiency', sources: 64, nodes: 400 });
    expect(x.sampling!.se).toBeGreaterThan(0);
    const text = formatExplanation(x, 5, false, 200);
    expect(text).toContain('estimated: efficiency searched from 64 of 400 sites as seeded sources');
    const exact = explainDesign(t, spec(), 'test', ['link']);
    expect(exact.sampling).toBeUndefined();
    expect(formatExplanation(exact, 5, false, 200)).not.toContain('estimated:');
    // The estimate's intact R lies within 3 of its standard errors of the exact one.
    expect(Math.abs(x.intact - exact.intact)).toBeLessThan(3 * x.sampling!.se);
  });
});
