// Parts of one design, through `netbrace check`: the fixture case parts-split-design holds a
// 400-site grid whose unreduced work estimate puts it in batches (docs/METHODS.md §7.6), so
// `--part K/N` splits its realizations across the N parts (batch b < N to part b + 1; the join
// runs any later batch its decisions still need), and a
// five-site ring that stays whole in the part its path hashes to. Joining the part reports
// (`--join`) must give the report of one run byte for byte, whatever the number of parts and
// the thread counts; the one run stops before the most realizations the budget allows, so the
// join must stop at that same batch. The reference is the one run itself (common practice for
// a determinism check: the same program, undivided).
import { copyFileSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Ajv } from 'ajv';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Report } from '../../src/report/report.js';
import { serializeReport } from '../../src/report/report.js';
import { runGate, type GateRequest } from '../../src/run-gate.js';
import { joinInput } from '../../src/gate/split.js';
import { memoryDeps } from '../gate/memory-repo.js';
import { casesRoot, cleanupCases, runCase, type CaseRun } from './harness.js';
import { partsVariants } from './parts-design.js';

const CASE = 'parts-split-design';
const GRID = 'networks/grid.csv';
const RING = 'networks/ring.csv';
const keep = mkdtempSync(path.join(os.tmpdir(), 'netbrace-parts-'));
afterAll(() => {
  cleanupCases();
  rmSync(keep, { recursive: true, force: true });
});

const reportText = (run: CaseRun) => readFileSync(path.join(run.dir, '.out', 'report.json'), 'utf8');

/** Run part k/n and keep its report (the case's folder is removed after the test). */
async function part(
  k: number,
  n: number,
  extra: string[] = [],
): Promise<{ file: string; report: Report; summary: string }> {
  const run = await runCase(CASE, ['--part', `${k}/${n}`, '--summary', '.out/summary.md', ...extra]);
  expect(run.code, run.out + run.err).toBe(0);
  const file = path.join(keep, `part-${k}-of-${n}.json`);
  copyFileSync(path.join(run.dir, '.out', 'report.json'), file);
  return { file, report: run.report!, summary: readFileSync(path.join(run.dir, '.out', 'summary.md'), 'utf8') };
}

const joinArgs = (files: string[]) => files.flatMap((f) => ['--join', f]);

describe('one design split across parts', () => {
  let whole: string;
  let wholeReport: Report;

  // The one run every join is compared with; it stops by the rule, before the most
  // realizations the budget allows, so a join that ran every sample would differ.
  beforeAll(async () => {
    const run = await runCase(CASE);
    expect(run.code, run.out + run.err).toBe(0);
    whole = reportText(run);
    wholeReport = run.report!;
  }, 120_000);

  it('2 parts: each runs its batches of the grid, the summary says so, and the join is the one run byte for byte', async () => {
    const v = partsVariants();
    const read = (side: string, file: string) => readFileSync(path.join(casesRoot, CASE, side, file), 'utf8');
    expect([read('base', GRID), read('head', GRID), read('base', RING), read('head', RING)]).toEqual([
      v.gridBase,
      v.gridHead,
      v.ringBase,
      v.ringHead,
    ]);
    const env = wholeReport.files.find((f) => f.path === GRID)!.head!.envelopes[0];
    expect(env.maxRealizations).toBeGreaterThan(env.realizations);
    // R is estimated from sampled sources: the join must reproduce the sample's error too.
    expect(wholeReport.files.find((f) => f.path === GRID)!.head!.sampling).toMatchObject({ sources: 200, nodes: 400 });
    expect(wholeReport.split).toBeUndefined();
    const [p1, p2] = [await part(1, 2), await part(2, 2)];
    for (const [k, p] of [p1, p2].entries()) {
      expect(p.report.files.map((f) => f.path)).not.toContain(GRID);
      const share = p.report.split!.find((d) => d.path === GRID)!;
      // Batch b < 2 (realizations 32b … 32b + 31) belongs to part b + 1; later ones to the join.
      for (const s of share.samples) if (s.piece === undefined) expect(Math.floor(s.from / 32)).toBe(k);
      // The long degree attack's pieces too: piece i belongs to part i mod 2 + 1, on both sides.
      const pieces = share.samples.filter((s) => s.piece !== undefined);
      expect(pieces.length).toBeGreaterThan(0);
      for (const s of pieces) expect(s.piece! % 2).toBe(k);
      expect(new Set(pieces.map((s) => s.side))).toEqual(new Set(['head', 'base']));
      expect(new Set(share.samples.map((s) => s.side))).toEqual(new Set(['head', 'base']));
      expect(p.summary).toMatch(
        /`networks\/grid\.csv` is split across the parts: this part ran realizations [0-9–, ]+ of \d+, and the join judges it/,
      );
    }
    // The part reports, `split` included, are reports of the published schema.
    const validate = new Ajv({ allErrors: true, strict: false }).compile(
      JSON.parse(
        readFileSync(path.join(import.meta.dirname, '..', '..', 'src', 'report', 'report.schema.json'), 'utf8'),
      ),
    );
    for (const p of [p1, p2]) expect(validate(p.report), JSON.stringify(validate.errors)).toBe(true);
    // The ring is judged whole, by exactly one part.
    expect([p1, p2].filter((p) => p.report.files.some((f) => f.path === RING))).toHaveLength(1);
    const joined = await runCase(CASE, joinArgs([p1.file, p2.file]));
    expect(joined.code, joined.out + joined.err).toBe(0);
    expect(reportText(joined)).toBe(whole);
  }, 120_000);

  it('3 parts on 2 threads, joined on 1 (and in another order): the one run byte for byte', async () => {
    const parts = [
      await part(1, 3, ['--threads', '2']),
      await part(2, 3, ['--threads', '2']),
      await part(3, 3, ['--threads', '2']),
    ];
    const joined = await runCase(CASE, ['--threads', '1', ...joinArgs([parts[2].file, parts[0].file, parts[1].file])]);
    expect(joined.code, joined.out + joined.err).toBe(0);
    expect(reportText(joined)).toBe(whole);
    const joined2 = await runCase(CASE, ['--threads', '2', ...joinArgs(parts.map((p) => p.file))]);
    expect(reportText(joined2)).toBe(whole);
  }, 180_000);

  it('a missing part is an error of the join that names it, and nothing is judged', async () => {
    const run = await runCase(
      CASE,
      joinArgs([path.join(keep, 'part-1-of-3.json'), path.join(keep, 'part-3-of-3.json')]),
    );
    expect(run.code).toBe(2);
    expect(run.err).toContain('part 2/3 is missing');
    expect(run.report).toBeNull();
  }, 60_000);
});

// The fixed-sample path (every realization the budget allows, no stopping rule): the command
// line has no switch for it, so through runGate with `sequential: false`.
describe('one design split across parts, fixed sample', () => {
  it('2 parts joined give the one run byte for byte: the parts hold the first two batches, the join runs the rest', async () => {
    const v = partsVariants();
    const policy = readFileSync(path.join(casesRoot, CASE, 'base', '.netbrace.yaml'), 'utf8');
    const deps = memoryDeps({
      base: { '.netbrace.yaml': policy, [GRID]: v.gridBase },
      head: { '.netbrace.yaml': policy, [GRID]: v.gridHead },
    });
    const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block', sequential: false };
    const one = await runGate(request, deps);
    const env = one.report.files[0].head!.envelopes[0];
    expect(env.maxRealizations).toBeUndefined();
    const parts = [
      await runGate({ ...request, part: { index: 1, total: 2 } }, deps),
      await runGate({ ...request, part: { index: 2, total: 2 } }, deps),
    ];
    const held = parts.flatMap((p) =>
      p.report.split![0].samples.filter((s) => s.side === 'head' && s.piece === undefined).map((s) => s.to - s.from),
    );
    // The parts hold the first two batches; the join ran the rest itself.
    expect(env.realizations).toBeGreaterThan(64);
    expect(held.reduce((a, b) => a + b, 0)).toBe(64);
    // Through JSON, as the reports travel.
    const reports = parts.map((p) => JSON.parse(serializeReport(p.report)) as Report);
    const joined = await runGate({ ...request, join: joinInput(reports) }, deps);
    expect(serializeReport(joined.report)).toBe(serializeReport(one.report));
    expect(joined.exitCode).toBe(one.exitCode);
  }, 120_000);
});
