// The step after a design is judged: its map (FileReport.map) and, when it fails, what would
// mend it (FileReport.mend). Called by runGate for each judged file; pure apart from the
// injected readers and engine. A mended design is judged exactly as runGate judges the head:
// the same policy, seed and budget shared with the base (gate/budget.ts), the same engine and
// thread count, compared with the same base evaluation — so a suggestion said to hold is one
// `check` passes once it is applied (a test applies one and runs check).

import { isNetbraceError } from './errors.js';
import { planEvaluation } from './envelope/evaluate.js';
import { budgetSpecs } from './gate/budget.js';
import { compareDesign, type CompareInput, type DesignSide } from './gate/compare.js';
import { compileTopology, type CompactGraph } from './graph/compact.js';
import { buildDesignMap } from './map/build.js';
import { applyToTopology, type Change } from './mend/apply.js';
import { generateCandidates, parseCandidateFile, type CandidateSet } from './mend/candidates.js';
import { mendDesign } from './mend/search.js';
import type { FileReport } from './report/report.js';
import { evaluateGraph, evaluationSpecs, type GateDeps, type GateRequest, type Revision } from './gate-request.js';
import { parseDesign } from './topology/parse.js';
import type { Topology } from './topology/model.js';

/** Default most evaluations of mended designs, and the share of the design's budget they may use together. */
export const MEND_MAX_EVALUATIONS = 10;
export const MEND_BUDGET_FACTOR = 1;
export const MEND_MIN_EVALUATIONS = 2;

export interface StepContext {
  request: GateRequest;
  deps: GateDeps;
  head: Revision;
  base?: Revision;
  seed: number;
}

function parsed(text: string | null, path: string, format: CompareInput['policy']['format']): Topology | null {
  if (text === null) return null;
  try {
    return parseDesign(text, path, format ? { format } : {});
  } catch (e) {
    if (isNetbraceError(e)) return null;
    throw e;
  }
}

function labels(t: Topology | null): Map<string, string> | undefined {
  if (!t) return undefined;
  return new Map(t.nodes.filter((n) => n.label !== undefined).map((n) => [n.id, n.label as string]));
}

/** Fill `report.map` and, for a failing design (or always, when asked), `report.mend`. */
export async function addMapAndMend(report: FileReport, input: CompareInput, ctx: StepContext): Promise<void> {
  if (!input.head || input.headError) return;
  const comparing = !input.thresholdsOnly && input.base !== undefined && !input.baseError;
  const headTopo = parsed(await ctx.deps.readAt(ctx.head, input.path), input.path, input.policy.format);
  if (!headTopo) return;
  if (ctx.request.map !== false) {
    let baseTopo: Topology | null = null;
    if (comparing && input.base!.graph !== input.head.graph) {
      const basePath = input.previousPath ?? input.path;
      baseTopo = parsed(await ctx.deps.readAt(ctx.base!, basePath), basePath, input.policy.format);
    }
    report.map = buildDesignMap(
      { graph: input.head.graph, labels: labels(headTopo) },
      comparing ? { graph: input.base!.graph, labels: labels(baseTopo) ?? labels(headTopo) } : undefined,
    );
  }
  const when = ctx.request.mend ?? 'failing';
  const failing = report.status === 'unreadable' || report.findings.some((f) => f.severity === 'fail');
  if (when === 'never' || (when === 'failing' && !failing)) return;
  const settings = input.policy.mend ?? {};
  if (settings.evaluations === 0) return;

  const fp = input.policy;
  const g = input.head.graph;
  const notes: string[] = [];
  let candidates: CandidateSet;
  if (settings.candidates !== undefined) {
    const text = await ctx.deps.readAt(ctx.head, settings.candidates);
    if (text === null) {
      notes.push(
        `the candidate list ${settings.candidates} named by the policy does not exist${ctx.head === 'worktree' ? '' : ` at ${ctx.head}`}`,
      );
      candidates = { list: [], unit: 'link', source: 'list', notes: [] };
    } else {
      try {
        candidates = parseCandidateFile(text, settings.candidates, g);
      } catch (e) {
        if (!isNetbraceError(e)) throw e;
        notes.push(`the candidate list could not be read: ${e.format().split('\n')[0]}`);
        candidates = { list: [], unit: 'link', source: 'list', notes: [] };
      }
    }
  } else {
    candidates = generateCandidates(g, {
      ...(settings.routeFactor !== undefined ? { routeFactor: settings.routeFactor } : {}),
      ...(settings.maxKm !== undefined ? { maxKm: settings.maxKm } : {}),
    });
  }

  const baseSide: DesignSide | undefined = comparing ? input.base : undefined;
  // A design judged in batches stopped where its decisions settled: each mended design runs as
  // many realizations as the head's decisions needed, the same indices, so it pairs with the
  // base already evaluated, which is reused as it is.
  const batched = input.head.result.sequential !== undefined;
  const ran = new Map(input.head.result.evaluation.envelopes.map((e) => [e.challenge, e]));
  const specs = evaluationSpecs(fp, ctx.seed).map((spec) =>
    batched
      ? {
          ...spec,
          challenges: spec.challenges.map((c) =>
            ran.has(c.challenge) && c.challenge !== 'regional'
              ? { ...c, realizations: ran.get(c.challenge)!.realizations }
              : c,
          ),
        }
      : spec,
  );
  const original = budgetSpecs(specs, fp.budget.maxWork, g, baseSide?.graph);
  const work = original.head.reduce((s, spec) => s + planEvaluation(g, spec).work, 0);
  const affordable = work > 0 ? Math.floor((MEND_BUDGET_FACTOR * fp.budget.maxWork) / work) : MEND_MAX_EVALUATIONS;
  const maxEvaluations =
    settings.evaluations ?? Math.max(MEND_MIN_EVALUATIONS, Math.min(MEND_MAX_EVALUATIONS, affordable));

  const judge = async (change: Change): Promise<FileReport> => {
    const mended: CompactGraph = compileTopology(applyToTopology(headTopo, change));
    const budgeted = budgetSpecs(specs, fp.budget.maxWork, mended, baseSide?.graph);
    const head = await evaluateGraph(mended, undefined, budgeted.head, budgeted.cuts, ctx.request, ctx.deps);
    if (batched)
      // Stopped where the gate's decisions stopped, not cut by the budget: the count the policy allows.
      for (const env of head.result.evaluation.envelopes) {
        const gate = ran.get(env.challenge);
        if (gate?.maxRealizations !== undefined && env.realizations === gate.realizations)
          env.maxRealizations = gate.maxRealizations;
      }
    let base = baseSide;
    if (!batched && baseSide && JSON.stringify(budgeted.base) !== JSON.stringify(original.base)) {
      base = await evaluateGraph(
        baseSide.graph,
        baseSide.topology,
        budgeted.base!,
        budgeted.cuts,
        ctx.request,
        ctx.deps,
      );
    }
    return compareDesign({ ...input, head, ...(base ? { base } : {}) });
  };

  report.mend = await mendDesign({
    topology: headTopo,
    graph: g,
    report,
    candidates,
    ...(settings.maxLinks !== undefined ? { maxLinks: settings.maxLinks } : {}),
    maxEvaluations,
    judge,
    ...(settings.candidates !== undefined ? { candidatePath: settings.candidates } : {}),
    notes,
  });
}
