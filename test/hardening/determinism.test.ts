// Determinism under load: the same inputs and seed give byte-identical results whatever the
// number of worker threads (1, 2, 4) and however many runs share the machine at once. First
// the engine on the demo backbone (invented, 50 sites, 82 links) under the demo policy, then
// the whole gate: the demo's first proposed change judged with 1, 2 and 4 threads, and ten
// runs of a small fixture pair started together, all compared byte for byte as JSON reports.

import { afterAll, describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../src/envelope/evaluate.js';
import { compileTopology } from '../../src/graph/compact.js';
import { closeWorkers, evaluateDesignParallel, runTasksParallel } from '../../src/parallel/pool.js';
import { loadPolicy, policyForFile } from '../../src/policy/resolve.js';
import { serializeReport } from '../../src/report/report.js';
import { evaluationSpecs } from '../../src/gate-request.js';
import { runGate, type GateDeps, type GateRequest } from '../../src/run-gate.js';
import { parseDesign } from '../../src/topology/parse.js';
import { memoryDeps, pairRepo } from '../gate/memory-repo.js';
import { fixtureText, reportCount } from './support.js';

afterAll(() => closeWorkers());

const DESIGN = 'designs/lunmere-backbone.net.yaml';
const base = fixtureText('demo', 'base', 'designs', 'lunmere-backbone.net.yaml');
const policyText = fixtureText('demo', 'policy.yaml');

/** The demo's first change (a patch that only removes lines): each removed block cut out of the base. */
function applyRemovals(text: string, patch: string): string {
  const blocks: string[][] = [];
  let current: string[] | undefined;
  for (const line of patch.split('\n')) {
    if (line.startsWith('-') && !line.startsWith('---')) (current ??= []).push(line.slice(1));
    else if (current) {
      blocks.push(current);
      current = undefined;
    }
    if (line.startsWith('+') && !line.startsWith('+++'))
      throw new Error('the patch adds lines; this helper only removes');
  }
  if (current) blocks.push(current);
  let out = text;
  for (const b of blocks) {
    const block = `${b.join('\n')}\n`;
    expect(out.includes(block), block).toBe(true);
    out = out.replace(block, '');
  }
  return out;
}

/** The engine on worker threads, always (no inline shortcut for small work). */
// The gate's batches of a sequential run, on worker threads even when the work is small.
const threaded: GateDeps['runTasks'] = (g, plan, tasks, n) => runTasksParallel(g, plan, tasks, n ?? 1, { minWork: 0 });

let compared = 0;

describe('the engine', () => {
  it('the demo backbone under the demo policy: byte-identical with 1, 2 and 4 threads, and inline', async () => {
    const g = compileTopology(parseDesign(base, DESIGN));
    const fp = policyForFile(
      loadPolicy('.netbrace.yaml', () => policyText),
      DESIGN,
    );
    const specs = evaluationSpecs(fp, fp.seed);
    for (const spec of specs) {
      const inline = JSON.stringify(evaluateDesign(g, spec).evaluation);
      for (const threads of [1, 2, 4]) {
        const result = await evaluateDesignParallel(g, spec, threads, { minWork: 0 });
        expect(JSON.stringify(result.evaluation), `${threads} threads`).toBe(inline);
        compared++;
      }
    }
    // Envelopes, attacks and a worst case were all compared, not an empty evaluation.
    const ev = evaluateDesign(g, specs[0]).evaluation;
    expect(ev.envelopes.length).toBeGreaterThanOrEqual(3);
    expect(ev.attacks.length).toBeGreaterThanOrEqual(3);
    expect(ev.envelopes[0].worstCase).toBeDefined();
  }, 60_000);
});

describe('the gate', () => {
  it('the demo change judged with 1, 2 and 4 threads gives the same JSON report, byte for byte', async () => {
    const head = applyRemovals(base, fixtureText('demo', 'changes', '1-retire-east-chord.patch'));
    const repo = {
      base: { '.netbrace.yaml': policyText, [DESIGN]: base },
      head: { '.netbrace.yaml': policyText, [DESIGN]: head },
    };
    const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block' };
    const reports: string[] = [];
    for (const threads of [1, 2, 4]) {
      const { report } = await runGate({ ...request, threads }, memoryDeps(repo, { runTasks: threaded }));
      reports.push(serializeReport(report));
      compared++;
    }
    expect(reports[1]).toBe(reports[0]);
    expect(reports[2]).toBe(reports[0]);
    const report = JSON.parse(reports[0]);
    expect(report.files[0].requirements.length).toBeGreaterThan(0); // a real comparison, not an empty report
    expect(report.files[0].base).toBeDefined();
  }, 60_000);

  it('ten runs started together (threads 1, 2 and 4 mixed) give ten identical reports', async () => {
    const repo = pairRepo('removed-node');
    const request: GateRequest = { base: 'base', head: 'head', policySource: 'base', mode: 'block' };
    const threads = [1, 2, 4, 1, 2, 4, 1, 2, 4, 2];
    const runs = await Promise.all(
      threads.map((n) => runGate({ ...request, threads: n }, memoryDeps(repo, { runTasks: threaded }))),
    );
    const bytes = runs.map((r) => serializeReport(r.report));
    for (const b of bytes) expect(b).toBe(bytes[0]);
    compared += bytes.length;
    // And the same as a run without threads at all.
    expect(serializeReport((await runGate(request, memoryDeps(repo))).report)).toBe(bytes[0]);
    reportCount('determinism', 'byte-for-byte comparisons', compared + 1);
  }, 60_000);
});
