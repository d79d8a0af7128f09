// What a gate run is asked (GateRequest) and given (GateDeps), and the engine runs of one side
// of one design: shared by runGate (run-gate.ts) and the map-and-mend step, which judges
// mended designs with the same specs and the same engine.

import {
  assembleEvaluation,
  evaluateDesign,
  pendingTasks,
  planEvaluation,
  snapshotEvaluation,
  stageEvaluation,
  stagedMaximum,
  type DesignEvaluation,
  type EvaluationSpec,
  type StagedEvaluation,
} from './envelope/evaluate.js';
import {
  attackOrder,
  BATCH,
  pieceSteps,
  runTask,
  type EvaluationPlan,
  type Task,
  type TaskResult,
} from './envelope/engine.js';
import type { RValueSpec } from './envelope/types.js';
import { decide, isOpen } from './gate/decide.js';
import { measure } from './gate/measure.js';
import type { ChallengeParams } from './challenges/types.js';
import type { CompactGraph } from './graph/compact.js';
import { notePairedCuts, type BudgetedSpecs, type PairedCut } from './gate/budget.js';
import type { DesignSide } from './gate/compare.js';
import type { FilePolicy } from './policy/types.js';
import type { Report } from './report/report.js';
import type { Topology } from './topology/model.js';
import { UsageError } from './errors.js';
import { batchOwner, decodeValues, encodeValues, pieceOwner, sampleKey, type JoinInput } from './gate/split.js';
import type { SplitDesign } from './report/report.js';

/** A revision as git names it, or "worktree" for the files on disk. */
export type Revision = string;

export interface ChangedFile {
  status: 'added' | 'modified' | 'deleted' | 'renamed';
  path: string;
  /** For renames: the path at base. */
  previousPath?: string;
}

export type MaybePromise<T> = T | Promise<T>;

export interface GateDeps {
  /** Files changed between two revisions (head may be "worktree"), with rename detection. */
  listChanged(base: Revision, head: Revision): MaybePromise<ChangedFile[]>;
  /** A file's text at a revision; null when it does not exist there. */
  readAt(rev: Revision, path: string): MaybePromise<string | null>;
  /** Every file at a revision (for scheduled runs over all designs). */
  listAll(rev: Revision): MaybePromise<string[]>;
  /** A file of the organisation policy's folder (request.orgPolicyPath), outside the history. */
  readOrgPolicy?: (path: string) => MaybePromise<string | null>;
  /**
   * A whole evaluation in one go, replacing the engine (tests that alter results). When set, the
   * gate runs every realization the budget allows, without the sequential stopping rule.
   */
  evaluate?: (g: CompactGraph, spec: EvaluationSpec, threads?: number) => MaybePromise<DesignEvaluation>;
  /** Runs engine tasks (worker threads: parallel/pool.ts threadedGate); defaults to this thread. */
  runTasks?: (g: CompactGraph, plan: EvaluationPlan, tasks: Task[], threads?: number) => MaybePromise<TaskResult[]>;
}

export interface GateRequest {
  /** Base revision; absent: no comparison, thresholds only. */
  base?: Revision;
  /** Head revision; ignored when `worktree` is set. */
  head?: Revision;
  /** Judge the files on disk instead of a head commit. */
  worktree?: boolean;
  /** Judge these repository paths instead of the changed files. */
  paths?: string[];
  /** Repository path of the policy file (default .netbrace.yaml; missing then means the built-in policy). */
  policyPath?: string;
  /** Where the policy is read: the base (trusted, the default) or the head. */
  policySource: 'base' | 'head';
  /**
   * The organisation's policy, which the repository's policy must inherit (and may only
   * tighten): its path as the repository's policy names it in `inherits`. Its files are read
   * with `GateDeps.readOrgPolicy` (a second checkout), never from the change under review.
   */
  orgPolicyPath?: string;
  mode: 'block' | 'inform';
  /** Overrides the policy's seed. */
  seed?: number;
  threads?: number;
  /** Evaluate part `index` (1-based) of `total`: a deterministic slice by path hash. */
  part?: { index: number; total: number };
  /** Scheduled runs judge every design against thresholds only. */
  eventKind?: 'pull-request' | 'push' | 'schedule' | 'local';
  /**
   * Run random bands in batches under the sequential stopping rule (true), or every realization
   * at once (false); left out: by the design's size (SEQUENTIAL_MIN_WORK).
   */
  sequential?: boolean;
  /**
   * Join part reports instead of evaluating every design (gate/split.ts): files the parts
   * judged whole are taken as they are; designs split across the parts are judged here from
   * the parts' samples, with the same code a single run uses. Excludes `part`.
   */
  join?: JoinInput;
  /** Draw each design's map (default true), and search what would mend a design: when it fails (default), always, or never. */
  map?: boolean;
  mend?: 'failing' | 'always' | 'never';
}

export interface GateResult {
  report: Report;
  exitCode: 0 | 1;
}

/** The policy's R as the engine takes it: a source sample is keyed by the seed, as every other random choice. */
export function policyR(fp: FilePolicy, seed: number): RValueSpec {
  return fp.rValue.sources !== undefined ? { ...fp.rValue, sourceSeed: seed } : fp.rValue;
}

/**
 * The engine request for one file: its challenges, every threshold's x on the grid, N−1 where
 * required, and the policy's work budget (runGate shares it out between the requests of a
 * design and pairs it across base and head: gate/budget.ts).
 */
export function evaluationSpecs(fp: FilePolicy, seed: number): EvaluationSpec[] {
  const challenges: ChallengeParams[] = fp.challenges.map((c) => {
    const at = fp.requirements
      .filter((r) => r.kind === 'r-threshold' && r.challenge === c.name && r.at !== undefined)
      .map((r) => (r.kind === 'r-threshold' ? r.at! : 0));
    const params: ChallengeParams = { ...c.params };
    if (c.random && at.length > 0) params.at = [...new Set(at)].sort((a, b) => a - b);
    return params;
  });
  const elements = [...new Set(fp.requirements.flatMap((r) => (r.kind === 'n-1' ? [r.element] : [])))].sort();
  // The engine runs each challenge once per evaluation: N−1 of a second element kind gets its own.
  const budget = { maxWork: fp.budget.maxWork };
  const r = policyR(fp, seed);
  const specs: EvaluationSpec[] = [{ r, challenges, seed, budget }];
  elements.forEach((element, i) => {
    const n1: ChallengeParams = { challenge: 'n-1', element };
    if (i === 0) specs[0].challenges.push(n1);
    else specs.push({ r, challenges: [n1], seed, budget });
  });
  return specs;
}

/** Join the evaluations of several specs on the same graph. */
function joinEvaluations(parts: DesignEvaluation[]): DesignEvaluation {
  if (parts.length === 1) return parts[0];
  const [first, ...rest] = parts;
  const evaluation = { ...first.evaluation };
  evaluation.envelopes = [...first.evaluation.envelopes];
  evaluation.attacks = [...first.evaluation.attacks];
  evaluation.contingencies = [...first.evaluation.contingencies];
  evaluation.degraded = [...first.evaluation.degraded];
  const notApplicable = [...(first.evaluation.notApplicable ?? [])];
  const samples = new Map(first.samples);
  const labels = new Map(first.labels);
  for (const p of rest) {
    evaluation.envelopes.push(...p.evaluation.envelopes);
    evaluation.attacks.push(...p.evaluation.attacks);
    evaluation.contingencies.push(...p.evaluation.contingencies);
    evaluation.degraded.push(...p.evaluation.degraded);
    notApplicable.push(...(p.evaluation.notApplicable ?? []));
    for (const [k, v] of p.samples) samples.set(k, v);
    for (const [k, v] of p.labels) labels.set(k, v);
  }
  if (notApplicable.length) evaluation.notApplicable = notApplicable;
  else delete evaluation.notApplicable;
  return { evaluation, samples, labels };
}

export async function evaluateGraph(
  g: CompactGraph,
  topology: Topology | undefined,
  specs: EvaluationSpec[],
  cuts: readonly PairedCut[],
  request: GateRequest,
  deps: GateDeps,
): Promise<DesignSide> {
  const runTasks = deps.runTasks;
  const evaluate =
    deps.evaluate ??
    (runTasks
      ? async (graph: CompactGraph, spec: EvaluationSpec, threads?: number) => {
          const st = stageEvaluation(graph, spec);
          const results = await runTasks(graph, st.plan, st.tasks, threads);
          return assembleEvaluation(graph, st.plan, st.tasks, results);
        }
      : (graph: CompactGraph, spec: EvaluationSpec) => evaluateDesign(graph, spec));
  const parts: DesignEvaluation[] = [];
  for (const [i, spec] of specs.entries()) {
    const part = await evaluate(g, spec, request.threads);
    notePairedCuts(part, cuts, i);
    parts.push(part);
  }
  return { graph: g, result: joinEvaluations(parts), topology };
}

/**
 * Estimated work (element visits, unreduced) above which a design runs sequentially: about 10 s
 * at the budget's fixed rate (policy/budget.ts). Below it every realization the policy asks
 * for is cheap, so all of them run and are judged as one fixed sample (§7.3–7.4); above it,
 * batches with confidence sequences (§7.6), so that large designs stop as soon as they are
 * decided instead of running into the budget.
 */
export const SEQUENTIAL_MIN_WORK = 5e8;

/** The larger side's work estimate, unreduced by the budget. */
function unreducedWork(specs: readonly EvaluationSpec[], head: CompactGraph, base: CompactGraph | undefined): number {
  const work = (g: CompactGraph) =>
    specs.reduce((s, spec) => s + planEvaluation(g, { ...spec, budget: { maxWork: Infinity } }).work, 0);
  return Math.max(work(head), base ? work(base) : 0);
}

/**
 * Whether a design runs in batches under the sequential stopping rule (request.sequential
 * overrides). `specs`: the requests as the policy asks them (budget.ts askedSpecs).
 */
export function sequentialRun(
  request: GateRequest,
  specs: readonly EvaluationSpec[],
  head: CompactGraph,
  base: CompactGraph | undefined,
): boolean {
  if (request.sequential !== undefined) return request.sequential;
  return unreducedWork(specs, head, base) > SEQUENTIAL_MIN_WORK;
}

/**
 * Whether a design's realizations are split across the parts of a run: with more than one
 * part, when its unreduced work estimate exceeds SEQUENTIAL_MIN_WORK (the designs that run in
 * batches: a minute-scale evaluation, where a part's time matters) and its bands run more than
 * one batch. Smaller designs stay whole, in the part their path hashes to: splitting costs
 * every part a parse, and parts cannot stop early (none sees the others' samples). `specs`: the
 * requests as run; `asked`: as the policy asks them (budget.ts askedSpecs), for the size.
 */
export function splitAcrossParts(
  total: number,
  specs: readonly EvaluationSpec[],
  head: CompactGraph,
  base: CompactGraph | undefined,
  asked: readonly EvaluationSpec[] = specs,
): boolean {
  if (total < 2) return false;
  const most = Math.max(
    0,
    ...[head, ...(base ? [base] : [])].flatMap((g) => specs.map((spec) => stagedMaximum(stageEvaluation(g, spec)))),
  );
  return most > BATCH && unreducedWork(asked, head, base) > SEQUENTIAL_MIN_WORK;
}

type RunTasks = NonNullable<GateDeps['runTasks']>;

function localTasks(g: CompactGraph, plan: EvaluationPlan, tasks: Task[]): TaskResult[] {
  return tasks.map((t) => runTask(g, plan, t));
}

/** A part's share of a split design: the band tasks of the batches it owns, on each side evaluated. */
export async function splitShare(
  path: string,
  part: { index: number; total: number },
  sides: { side: 'head' | 'base'; graph: CompactGraph; specs: EvaluationSpec[] }[],
  request: GateRequest,
  deps: GateDeps,
): Promise<SplitDesign> {
  const run: RunTasks = deps.runTasks ?? localTasks;
  const out: SplitDesign = { path, realizations: 0, samples: [] };
  for (const { side, graph, specs } of sides) {
    for (const spec of specs) {
      const st = stageEvaluation(graph, spec);
      out.realizations = Math.max(out.realizations, stagedMaximum(st));
      const mine = st.tasks.filter(
        (t) =>
          (t.type === 'band' && batchOwner(t.from, part.total) === part.index) ||
          (t.type === 'attack' && t.piece !== undefined && pieceOwner(t.piece.index, part.total) === part.index),
      );
      if (mine.length === 0) continue;
      const results = await run(graph, st.plan, mine, request.threads);
      mine.forEach((t, k) => {
        const res = results[k];
        const challenge = st.plan.items[t.item].params.challenge;
        if (t.type === 'band' && res.type === 'band') {
          const points = res.values.length ? res.values[0].length : 0;
          out.samples.push({ side, challenge, from: t.from, to: t.to, points, values: encodeValues(res.values) });
        } else if (t.type === 'attack' && t.piece !== undefined && res.type === 'attack') {
          const { from, to } = pieceSteps(res.sequence.length, res.every, t.piece);
          out.samples.push({
            side,
            challenge,
            from,
            to,
            points: to - from,
            values: encodeValues([res.values]),
            piece: t.piece.index,
          });
        } else throw new TypeError(`a ${t.type} task returned a ${res.type} result`);
      });
    }
  }
  return out;
}

/**
 * The engine of a join for one split design: its band tasks on head and base are answered from
 * the parts' samples (a task no part holds names the part that should have run it); every other
 * task, and every other graph (mended designs), runs as in a single run.
 */
export function servedTasks(
  join: JoinInput,
  path: string,
  head: CompactGraph,
  base: CompactGraph | undefined,
  deps: GateDeps,
): RunTasks {
  const run: RunTasks = deps.runTasks ?? localTasks;
  return async (g, plan, tasks, threads) => {
    const side = g === head ? 'head' : base !== undefined && g === base ? 'base' : undefined;
    if (side === undefined) return run(g, plan, tasks, threads);
    const out: (TaskResult | undefined)[] = tasks.map((t) => {
      if (t.type === 'attack' && t.piece !== undefined) {
        const challenge = plan.items[t.item].params.challenge;
        const { sequence, every } = attackOrder(g, plan, t.item);
        const { from, to } = pieceSteps(sequence.length, every, t.piece);
        const found = join.samples.get(sampleKey(path, side, challenge, from, to));
        if (!found)
          throw new UsageError(
            `part ${pieceOwner(t.piece.index, join.total)}/${join.total} holds no piece ${t.piece.index + 1} of the ${challenge} attack of ${path} (${side})`,
            'join the part reports of one run: the same revisions, policy and seed',
          );
        const [values] = decodeValues(found.values, 1, to - from, `part ${found.part}/${join.total}`);
        return { type: 'attack', sequence, values, every };
      }
      if (t.type !== 'band') return undefined;
      const owner = batchOwner(t.from, join.total);
      // Batches past the parts' are the join's own (a decision still open after the parts).
      if (owner === undefined) return undefined;
      const found = join.samples.get(sampleKey(path, side, plan.items[t.item].params.challenge, t.from, t.to));
      if (!found) {
        throw new UsageError(
          `part ${owner}/${join.total} holds no realizations ${t.from + 1}–${t.to} of ${path} (${side})`,
          'join the part reports of one run: the same revisions, policy and seed',
        );
      }
      return {
        type: 'band',
        values: decodeValues(found.values, t.to - t.from, found.points, `part ${found.part}/${join.total}`),
      };
    });
    const rest = tasks.filter((_t, i) => out[i] === undefined);
    const computed = rest.length ? await run(g, plan, rest, threads) : [];
    let k = 0;
    return out.map((r) => r ?? computed[k++]);
  };
}

/**
 * The sequential stopping rule (docs/METHODS.md §7.6): head and base run their random bands in
 * batches of BATCH realizations (by index, the same on both sides and for any thread count),
 * and after each batch every requirement on a random challenge is decided by confidence
 * sequences (gate/decide.ts); the run stops when none is open, or at the most realizations the
 * policy and the budget allow. Attacks, N−1 and worst cases run once, in the first batch.
 */
export async function evaluateSequentially(
  fp: FilePolicy,
  head: { graph: CompactGraph; topology: Topology },
  base: { graph: CompactGraph; topology: Topology } | undefined,
  specs: BudgetedSpecs,
  comparing: boolean,
  request: GateRequest,
  deps: GateDeps,
): Promise<{ head: DesignSide; base?: DesignSide }> {
  const run =
    deps.runTasks ?? ((g: CompactGraph, plan: EvaluationPlan, tasks: Task[]) => tasks.map((t) => runTask(g, plan, t)));
  const stagesOf = (g: CompactGraph, list: EvaluationSpec[]) => list.map((spec) => stageEvaluation(g, spec));
  const headStages = stagesOf(head.graph, specs.head);
  const baseStages = base ? stagesOf(base.graph, specs.base!) : [];
  const most = Math.max(0, ...[...headStages, ...baseStages].map(stagedMaximum));
  const needed = new Map<string, number>();
  const snapshot = (stages: StagedEvaluation[], upto: number): DesignEvaluation => {
    const joined = joinEvaluations(
      stages.map((st, i) => {
        const e = snapshotEvaluation(st, upto);
        notePairedCuts(e, specs.cuts, i);
        return e;
      }),
    );
    return { ...joined, sequential: { needed } };
  };
  for (let upto = Math.min(BATCH, most); ; upto = Math.min(upto + BATCH, most)) {
    for (const st of [...headStages, ...baseStages]) {
      const pending = pendingTasks(st, upto);
      if (pending.length === 0) continue;
      const results = await run(
        st.g,
        st.plan,
        pending.map((i) => st.tasks[i]),
        request.threads,
      );
      pending.forEach((i, k) => (st.results[i] = results[k]));
    }
    const headSide: DesignSide = { graph: head.graph, result: snapshot(headStages, upto), topology: head.topology };
    const baseSide: DesignSide | undefined = base
      ? { graph: base.graph, result: snapshot(baseStages, upto), topology: base.topology }
      : comparing
        ? headSide
        : undefined;
    let open = false;
    for (const r of fp.requirements) {
      if (r.kind === 'no-new-spof' || r.kind === 'n-1') continue;
      const c = fp.challenges.find((x) => x.name === r.challenge);
      if (!c?.random || c.engine === 'regional') continue;
      const m = measure(r, fp.challenges, headSide, comparing ? baseSide : undefined);
      if (m.missing !== undefined || m.head === null) continue;
      const threshold = r.kind === 'spread-ceiling' ? r.max : (r.min ?? null);
      const withBase = comparing && baseSide !== undefined && m.base !== null && m.unpaired === undefined;
      const d = decide({
        requirement: r,
        challenge: c,
        head: headSide.result,
        ...(withBase ? { base: baseSide.result } : {}),
        weakening: fp.weakening,
        baseValue: withBase ? m.base : null,
        threshold,
        higherIsBetter: m.higherIsBetter,
      });
      if (!d) continue;
      // A minimum waits for every realization unless the head is already below its floor.
      const waiting = isOpen(d) || (d.needsAll === true && !(d.floor === 'below' && d.weakening === undefined));
      if (waiting) {
        open = true;
        needed.delete(r.id);
      } else if (!needed.has(r.id)) needed.set(r.id, upto);
    }
    if (!open || upto >= most) {
      for (const r of fp.requirements)
        if (!needed.has(r.id) && 'challenge' in r && fp.challenges.find((x) => x.name === r.challenge)?.random)
          needed.set(r.id, upto);
      return { head: headSide, ...(base ? { base: baseSide } : {}) };
    }
  }
}
