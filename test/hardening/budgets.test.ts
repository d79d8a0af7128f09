// Budgets: when a design is too large for the work a policy asks for, the engine reduces it in
// the way src/envelope/evaluate.ts documents (exact worst-case searches go greedy; then band
// realizations and contingency cases are scaled by one factor, never below 10 realizations or
// one case), says so in `degraded`, and the report marks the file; and a requirement that the
// reduced work cannot settle is reported as uncertain — never as met.
//
// The expected counts below come from the documented estimate (evaluate.ts header): with a
// union–find R, a band costs 2 graph passes per realization, an N−1 case one R pass, and a
// pass visits N + L elements.

import { describe, expect, it } from 'vitest';
import { evaluateDesign, MIN_REALIZATIONS, planEvaluation, type EvaluationSpec } from '../../src/envelope/evaluate.js';
import { compileTopology } from '../../src/graph/compact.js';
import { planAnnotations } from '../../src/report/annotations.js';
import { renderSummary } from '../../src/report/markdown.js';
import type { FileReport, Report } from '../../src/report/report.js';
import { renderTerminal } from '../../src/report/terminal.js';
import { runGate, type GateDeps } from '../../src/run-gate.js';
import { parseDesign } from '../../src/topology/parse.js';
import { gateFixture, memoryDeps } from '../gate/memory-repo.js';
import { reportCount } from './support.js';

const MESH = gateFixture('removed-node/base.net.yaml'); // 11 sites, 17 links
const g = compileTopology(parseDesign(MESH, 'mesh.net.yaml'));
const VISITS = g.n + g.m;
const R = { metrics: [{ id: 'largest_component' as const, weight: 1 }], combine: 'mean' as const };

function spec(challenges: EvaluationSpec['challenges'], maxWork?: number): EvaluationSpec {
  return { r: R, challenges, seed: 3, ...(maxWork !== undefined ? { budget: { maxWork } } : {}) };
}

describe('the engine reduces work the documented way', () => {
  it('band realizations scale to the budget: 500 requested, work for 37 → 37, with the reason', () => {
    const s = spec([{ challenge: 'random-nodes', realizations: 500, until: 0.5, points: 6 }], 2 * VISITS * 37);
    const plan = planEvaluation(g, s);
    expect(plan.items[0].params.realizations).toBe(37);
    const ev = evaluateDesign(g, s).evaluation;
    expect(ev.envelopes[0].realizations).toBe(37);
    const reason = `realizations reduced from 500 to 37 by the work budget (${2 * VISITS * 37} element visits)`;
    expect(ev.envelopes[0].degraded).toBe(reason);
    expect(ev.degraded).toEqual([`random-nodes: ${reason}`]);
  });

  it(`never below ${MIN_REALIZATIONS} realizations, however small the budget`, () => {
    const ev = evaluateDesign(g, spec([{ challenge: 'random-links', realizations: 300, until: 0.5, points: 6 }], 1)).evaluation;
    expect(ev.envelopes[0].realizations).toBe(MIN_REALIZATIONS);
    expect(ev.degraded[0]).toMatch(/^random-links: realizations reduced from 300 to 10/);
  });

  it('N−1 cases scale the same way: work for 5 cases → 5 of 17 link losses, and it says so', () => {
    const ev = evaluateDesign(g, spec([{ challenge: 'n-1', element: 'link' }], VISITS * 5)).evaluation;
    expect(ev.contingencies[0]).toMatchObject({ evaluated: 5, total: 17 });
    expect(ev.degraded).toEqual([`n-1: 5 of 17 cases evaluated within the work budget (${VISITS * 5} element visits)`]);
  });

  it('an exact worst-case search goes greedy first, and says so', () => {
    const full = evaluateDesign(g, spec([{ challenge: 'random-nodes', realizations: 50, until: 0.5, points: 6, worstCase: 2 }])).evaluation;
    expect(full.envelopes[0].worstCase?.method).toBe('exact');
    expect(full.degraded).toEqual([]);
    const cut = evaluateDesign(g, spec([{ challenge: 'random-nodes', realizations: 50, until: 0.5, points: 6, worstCase: 2 }], 2 * VISITS * 50 + 1)).evaluation;
    expect(cut.envelopes[0].worstCase?.method).toBe('greedy');
    expect(cut.degraded[0]).toMatch(/^random-nodes: worst-case search greedy instead of exact \(work budget \d+\)/);
  });
});

// ---------------------------------------------------------------------------------------------
// Through the gate: the policy has no budget key yet, so the engine is given one here.

const FILE = 'networks/mesh.net.yaml';

function policy(requirements: string, challenge = '  failures:\n    remove: nodes\n    until: 0.5\n    points: 6\n    realizations: 400\n'): string {
  return `seed: 3\nr-value:\n  metrics:\n    largest_component: 1\nchallenges:\n${challenge}requirements:\n${requirements}`;
}

async function judge(policyText: string, maxWork?: number): Promise<FileReport & { report: Report }> {
  const deps: Partial<GateDeps> = maxWork === undefined ? {} : { evaluate: (graph, s) => evaluateDesign(graph, { ...s, budget: { maxWork } }) };
  const { report } = await runGate(
    { head: 'head', policySource: 'head', mode: 'enforce', paths: [FILE] },
    memoryDeps({ base: {}, head: { '.netbrace.yaml': policyText, [FILE]: MESH } }, deps),
  );
  return { ...report.files[0], report };
}

let uncertain = 0;

describe('the report marks a reduced evaluation, in every view', () => {
  it('a degraded finding with the reason; the summary, annotations and terminal say it too', async () => {
    const f = await judge(policy('  - kind: area-floor\n    challenge: failures\n'), 2 * VISITS * 40);
    expect(f.head!.degraded).toEqual([expect.stringMatching(/^random-nodes: realizations reduced from 400 to \d+ by the work budget/)]);
    const d = f.findings.find((x) => x.rule === 'degraded')!;
    expect(d.severity).toBe('notice');
    expect(d.message).toMatch(/^head evaluation reduced: random-nodes: realizations reduced from 400 to/);
    expect(renderSummary(f.report)).toMatch(/realizations reduced from 400 to/);
    expect(planAnnotations(f.report).annotations.some((a) => a.rule === 'degraded' && /reduced/.test(a.message))).toBe(true);
    expect(renderTerminal(f.report, { color: false, width: 120 })).toMatch(/realizations reduced from 400/);
  });
});

describe('what the reduced work cannot settle is uncertain, never met', () => {
  it('an N−1 floor that the evaluated cases meet, with cases left out by the budget', async () => {
    const req = '  - kind: n-1\n    element: link\n    min: 0.5\n';
    const full = await judge(policy(req));
    expect(full.requirements[0]).toMatchObject({ status: 'met' });
    const cut = await judge(policy(req), VISITS * 368);
    expect(cut.head!.contingencies[0].evaluated).toBeLessThan(cut.head!.contingencies[0].total);
    expect(cut.requirements[0].status).toBe('uncertain');
    uncertain++;
    const why = cut.findings.find((x) => x.rule === 'n-1')!;
    expect(why.severity).toBe('warn');
    expect(why.message).toMatch(/only \d+ of 17 single link losses were evaluated/);
    expect(renderSummary(cut.report)).toMatch(/uncertain/);
  });

  it('an N−1 floor that an evaluated case already breaks is missed, budget or not', async () => {
    const cut = await judge(policy('  - kind: n-1\n    element: node\n    min: 0.95\n'), VISITS * 368);
    expect(cut.head!.contingencies[0].evaluated).toBeLessThan(cut.head!.contingencies[0].total);
    expect(cut.requirements[0].status).toBe('missed');
    expect(cut.status).toBe('below-threshold');
  });

  it('a worst-case floor met by a greedy search that the budget put in place of the exact one', async () => {
    const challenge = '  failures:\n    remove: nodes\n    until: 0.5\n    points: 6\n    realizations: 50\n    worst-case: 2\n';
    const req = '  - kind: r-threshold\n    challenge: failures\n    statistic: worst-case\n    removals: 2\n    min: 0.5\n';
    const full = await judge(policy(req, challenge));
    expect(full.head!.envelopes[0].worstCase?.method).toBe('exact');
    expect(full.requirements[0].status).toBe('met');
    // Band 50 × 2 passes + exact pairs C(11, 2) + 11 = 166 passes is over 150; the greedy search (22) fits.
    const cut = await judge(policy(req, challenge), 150 * VISITS);
    expect(cut.head!.envelopes[0].worstCase?.method).toBe('greedy');
    expect(cut.requirements[0].status).toBe('uncertain');
    uncertain++;
    expect(cut.findings.find((x) => x.rule === 'r-threshold')!.message).toMatch(/searched greedily/);
  });

  it('a quantile floor whose confidence interval, wide with the few realizations left, reaches below it', async () => {
    const at = (min: number) => `  - kind: r-threshold\n    challenge: failures\n    at: 0.2\n    statistic: quantile\n    q: 0.1\n    min: ${min}\n`;
    const probe = await judge(policy(at(0.01)), 2 * VISITS * 12);
    const env = probe.head!.envelopes[0];
    expect(env.realizations).toBe(12);
    const j = env.x.indexOf(0.2);
    const band = env.quantiles['0.1'];
    expect(band.lo[j]).toBeLessThan(band.value[j]);
    const cut = await judge(policy(at(band.value[j])), 2 * VISITS * 12);
    expect(cut.requirements[0]).toMatchObject({ status: 'uncertain', head: band.value[j] });
    uncertain++;
    expect(cut.requirements[0].status).not.toBe('met');
  });

  it('a requirement whose challenge the design cannot run is uncertain with a warning, not met', async () => {
    const f = await judge(policy('  - kind: area-floor\n    challenge: quakes\n    min: 0.1\n', '  quakes:\n    remove: region\n    until: 50\n    points: 6\n'));
    expect(f.requirements[0].status).toBe('uncertain');
    uncertain++;
    expect(f.findings.some((x) => x.severity === 'warn' && /could not be judged/.test(x.message))).toBe(true);
    reportCount('budgets', 'uncertain requirements shown', uncertain);
  });
});
