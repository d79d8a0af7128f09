// evaluateDesign: one design, one R-value, a list of challenges → the Evaluation that reports
// serialise, plus every realization's curve for paired comparison (pairing.ts).
// Pure, synchronous and deterministic: the same graph and spec give byte-identical JSON, and
// evaluateDesignParallel (src/parallel/) runs the very same tasks on worker threads.
//
// Work budget. The unit is the budget's (policy/budget.ts: about 1/5e7 s of engine time on one
// core of the machine the rates were measured on); cost.ts says what one evaluation of R costs
// on a given survivor (rCost) and what one plain pass over the design costs (passCost).
// Estimated work per challenge:
//   band         M · (order + 1 pass on the union–find path | Σ over the distinct grid steps of
//                R on the survivors of the plan's first removal orders + order), where order,
//                the seeded removal order, costs log2(units)/2 passes (one pass for regional)
//   attack       ranking (passes: degree 1, adaptive 2 + 5 log2 N, eigenvector 200; searches from every node:
//                betweenness/closeness N, adaptive K·N; worst-first groups G(G+1)/2 · R) + curve
//                (1 pass | R along the attack's own sequence for degree attacks, else along the
//                design's degree order, sampled at ATTACK_SAMPLES steps)
//   contingency  cases · R (intact)
//   worst case   exact: C(E, k) (+E for k = 2) · R; greedy/beam: k · E · width · R (intact)
// plus STRUCTURE_PASSES passes for the structure summary (fixed, not reduced).
// When the estimate exceeds maxWork (default DEFAULT_MAX_WORK): first, exact worst-case
// searches switch to greedy; if that is not enough, every band's realizations and every
// contingency's cases are scaled by the same factor s = (maxWork − fixed work) / reducible
// work, keeping at least MIN_REALIZATIONS realizations (or all, if fewer) and one case. Each
// reduction is stated in `degraded` (per challenge and for the evaluation).

import { linksByLine, nodesByLine, type CompactGraph } from '../graph/compact.js';
import { reportElement } from '../graph/element.js';
import { findComponents, findCutElements } from '../graph/structure.js';
import type { Evaluation, StructureSummary } from './types.js';
import { getChallenge, resolveParams } from '../challenges/registry.js';
import { sitesWithCoordinates } from '../challenges/regional.js';
import {
  countAt,
  countOnes,
  eligibleUnits,
  removeUnit,
  unitCount,
  unitIds,
  valueAtCount,
} from '../challenges/units.js';
import type {
  AttackCurve,
  Contingency,
  Envelope,
  RValueSpec,
  RemovalSequence,
  SourceSampling,
  WorstCase,
} from './types.js';
import type { ChallengeName, ChallengeParams } from '../challenges/types.js';
import {
  rSourceErrors,
  samplesSources,
  unionFindR,
  unsupportedMetric,
  UnsupportedMetricError,
  validateRSpec,
} from './r-value.js';
import {
  attackEvaluationSteps,
  attackPieces,
  attackSteps,
  attackStride,
  bandPlan,
  fillAttackCurve,
  challengeKind,
  historyFree,
  planTasks,
  runTask,
  StepEvaluator,
  type EvaluationPlan,
  type PlannedChallenge,
  type Task,
  type TaskResult,
} from './engine.js';
import { contingencyTotal } from './contingency.js';
import { needsBands, orderCost, passCost, rCost, STRUCTURE_PASSES, survivorShape } from './cost.js';
import { createMask, type Mask } from '../graph/mask.js';
import type { ElementKind } from '../graph/element.js';
import { subsets } from './worst-case.js';
import { area, attackArea, attackGap, gridMean, gridStats, quantileKey, spread } from './summary.js';

export interface EvaluationSpec {
  r: RValueSpec;
  challenges: ChallengeParams[];
  seed: number;
  budget?: { maxWork?: number };
}

export interface DesignEvaluation {
  evaluation: Evaluation;
  /** Per band challenge, per realization: R at each grid point. Kept for pairing, not serialised. */
  samples: Map<ChallengeName, Float64Array[]>;
  /** What each realization stands for when it is not its index (regional: epicentre ids). */
  labels: Map<ChallengeName, string[]>;
  /**
   * Set by a sequential run (the gate's stopping rule): its random requirements are judged by
   * confidence sequences, and `needed` holds, by requirement id, the realizations after which
   * each decision stayed settled.
   */
  sequential?: { needed: Map<string, number> };
}

/** Work budget when a spec sets none (see above): 200 s at the budget's rate (policy/budget.ts). */
export const DEFAULT_MAX_WORK = 1e10;
/** Fewest realizations a budget may leave a band with. */
export const MIN_REALIZATIONS = 10;
/** Largest exact worst-case enumeration (subsets) before the search goes greedy. */
export const EXACT_LIMIT = 1_000_000;
/** How many of the weakest realizations an envelope keeps. */
export const WEAKEST_KEPT = 3;

/** Ranking work of an attack, in plain passes (`n`: searches from every node; `k`: steps). */
const RANKING_PASSES: Partial<Record<ChallengeName, (n: number, k: number) => number>> = {
  degree: () => 1,
  // Bucket peeling with a heap per degree: O((N + L) log N), with a constant fitted to time.
  'degree-adaptive': (n) => 2 + 5 * Math.log2(Math.max(2, n)),
  betweenness: (n) => n,
  'betweenness-adaptive': (n, k) => n * Math.max(1, k),
  eigenvector: () => 200,
  closeness: (n) => n,
  'link-betweenness': (n) => n,
  'link-betweenness-adaptive': (n, k) => n * Math.max(1, k),
};

/** Steps of an attack curve at which R's cost is taken (the rest interpolated). */
export const ATTACK_SAMPLES = 9;
/** Removal orders of a band whose survivors are costed (their mean stands for every realization). */
export const BAND_SAMPLES = 2;

/** Resolves parameters, skips challenges the design cannot support, and applies the budget. */
export function planEvaluation(g: CompactGraph, spec: EvaluationSpec): EvaluationPlan {
  validateRSpec(spec.r);
  const unsupported = unsupportedMetric(g, spec.r);
  if (unsupported) throw new UnsupportedMetricError(unsupported);
  const degraded: string[] = [];
  // A challenge the design lacks the data for does not apply: not a reduction of the work.
  const notApplicable: { challenge: ChallengeName; reason: string }[] = [];
  const items: PlannedChallenge[] = [];
  const seen = new Set<string>();
  for (const p of spec.challenges) {
    if (seen.has(p.challenge)) throw new RangeError(`challenge ${p.challenge} is listed twice`);
    seen.add(p.challenge);
    const params = resolveParams(g, p, spec.seed);
    const c = getChallenge(p.challenge);
    if (p.challenge === 'regional' && sitesWithCoordinates(g).length === 0) {
      notApplicable.push({ challenge: 'regional', reason: 'no site has coordinates (lat/lon)' });
      continue;
    }
    if (
      (p.challenge === 'risk-groups' || p.challenge === 'risk-groups-worst') &&
      countOnes(eligibleUnits(g, 'group')) === 0
    ) {
      notApplicable.push({ challenge: p.challenge, reason: 'the design has no shared-risk group that can fail' });
      continue;
    }
    if (c.type === 'contingency') params.worstCase = 0;
    items.push({ params, type: c.type, maxCases: Infinity, exactLimit: EXACT_LIMIT, beam: params.beam });
  }
  const maxWork = spec.budget?.maxWork ?? DEFAULT_MAX_WORK;
  if (!(maxWork > 0)) throw new RangeError(`budget.maxWork must be > 0, got ${maxWork}`);
  const costs = costModel(g, spec.r);
  const est = items.map((it) => estimate(g, it, costs));
  const total = () => est.reduce((s, e) => s + e.band + e.cases + e.fixed + e.worst, 0);

  if (total() > maxWork) {
    items.forEach((it, i) => {
      if (est[i].worstExact && est[i].worst > maxWork / 4) {
        it.exactLimit = 0;
        est[i] = estimate(g, it, costs);
        note(it, `worst-case search greedy instead of exact (work budget ${maxWork})`);
      }
    });
  }
  if (total() > maxWork) {
    const fixed = est.reduce((s, e) => s + e.fixed + e.worst, 0);
    const reducible = est.reduce((s, e) => s + e.band + e.cases, 0);
    const scale = Math.max(0, maxWork - fixed) / reducible;
    items.forEach((it, i) => {
      if (it.type === 'band' && est[i].band > 0) {
        const m = est[i].realizations;
        const reduced = Math.max(Math.min(m, MIN_REALIZATIONS), Math.floor(m * scale));
        if (reduced < m) {
          if (it.params.challenge === 'regional') it.params.epicentres = reduced;
          else it.params.realizations = reduced;
          note(it, `realizations reduced from ${m} to ${reduced} by the work budget (${maxWork} element visits)`);
        }
      } else if (it.type === 'contingency') {
        const cases = est[i].totalCases;
        const reduced = Math.max(1, Math.floor(cases * scale));
        if (reduced < cases) {
          it.maxCases = reduced;
          note(it, `${reduced} of ${cases} cases evaluated within the work budget (${maxWork} element visits)`);
        }
      }
    });
  }
  for (const it of items) if (it.degraded) degraded.push(`${it.params.challenge}: ${it.degraded}`);
  const work = items.reduce((s, it) => {
    const e = estimate(g, it, costs);
    return s + e.band + e.cases + e.fixed + e.worst;
  }, 0);
  // The structure summary every evaluation reports (components, bridges, cut nodes).
  const structure = STRUCTURE_PASSES * costs.pass;
  return { r: spec.r, items, degraded, ...(notApplicable.length ? { notApplicable } : {}), work: work + structure };
}

function note(it: PlannedChallenge, reason: string): void {
  it.degraded = it.degraded ? `${it.degraded}; ${reason}` : reason;
}

interface Estimate {
  band: number;
  cases: number;
  fixed: number;
  worst: number;
  worstExact: boolean;
  realizations: number;
  totalCases: number;
}

/** The costs an estimate is made of, for one graph and R (see cost.ts). */
interface CostModel {
  g: CompactGraph;
  r: RValueSpec;
  /** True when R follows from union–find curves (every step free). */
  free: boolean;
  /** One plain pass over the design. */
  pass: number;
  /** R on the intact design. */
  intact: number;
  /** R after the first k units of `order` are removed. */
  along(kind: ElementKind, order: ArrayLike<number>, k: number): number;
}

/** Costs of R along removal orders, by graph and key; plans are asked for again and again. */
const costCache = new WeakMap<CompactGraph, Map<string, number>>();

function costModel(g: CompactGraph, r: RValueSpec): CostModel {
  const mask = createMask(g);
  const bands = needsBands(r);
  return {
    g,
    r,
    free: unionFindR(g, r) !== null,
    pass: passCost(g),
    intact: rCost(g, r, survivorShape(g, undefined, bands)),
    along(kind, order, k) {
      mask.node.fill(0);
      mask.link.fill(0);
      for (let i = 0; i < k; i++) removeUnit(g, mask, kind, order[i]);
      return rCost(g, r, survivorShape(g, mask, bands));
    },
  };
}

function cached(g: CompactGraph, key: string, compute: () => number): number {
  let byKey = costCache.get(g);
  if (!byKey) costCache.set(g, (byKey = new Map()));
  const hit = byKey.get(key);
  if (hit !== undefined) return hit;
  const value = compute();
  if (byKey.size > 256) byKey.clear();
  byKey.set(key, value);
  return value;
}

/**
 * Work of a band's realizations: R at each distinct whole count its grid needs, on the survivors
 * of the first orders (`each`, per realization), except count 0 — the intact design, the same for
 * every realization, which the engine evaluates once (`once`) when R allows (engine.ts).
 */
function bandRealizationCost(c: CostModel, p: PlannedChallenge['params']): { each: number; once: number } {
  const shared = historyFree(c.r);
  const each = cached(c.g, JSON.stringify(['band', c.r, p.challenge, p.until, p.points, p.at, p.seed]), () => {
    const bp = bandPlan(c.g, p);
    const order = new Int32Array(bp.maxUnits);
    const steps = new Float64Array(bp.x.length);
    const m = p.challenge === 'regional' ? (p.epicentres ?? sitesWithCoordinates(c.g).length) : p.realizations;
    const samples = Math.max(1, Math.min(BAND_SAMPLES, m));
    let sum = 0;
    for (let r = 0; r < samples; r++) {
      const len = bp.realize(r, order, steps);
      // A real count x·N costs R at both neighbouring whole counts.
      const counts = new Set(
        Array.from(steps).flatMap((v) => [Math.floor(v), Math.ceil(v)].map((k) => Math.min(k, len))),
      );
      for (const k of counts) if (k > 0 || !shared) sum += c.along(bp.kind, order, k);
    }
    return sum / samples;
  });
  return { each, once: shared ? c.intact : 0 };
}

/** Work of an attack curve: R after every step 0..K along its sequence (sampled, interpolated). */
function attackCurveCost(c: CostModel, p: PlannedChallenge['params'], kind: ElementKind, k: number): number {
  return cached(c.g, JSON.stringify(['attack', c.r, p.challenge, k]), () => {
    let order: ArrayLike<number> | undefined;
    const ch = getChallenge(p.challenge);
    if ((p.challenge === 'degree' || p.challenge === 'degree-adaptive') && ch.type === 'attack') {
      order = ch.sequence(c.g, k, { rvalue: () => 0 });
    } else if (kind === 'node') {
      // Other node attacks: highest degree first stands in for their order.
      const deg = (v: number) => c.g.offsets[v + 1] - c.g.offsets[v];
      order = Array.from({ length: c.g.n }, (_, v) => v).sort((a, b) => deg(b) - deg(a) || a - b);
    }
    // Past ATTACK_EVALUATIONS steps the engine computes R every `every`-th step only.
    if (!order) return attackEvaluationSteps(k, attackStride(k, false)).length * c.intact;
    const len = Math.min(k, order.length);
    const every = attackStride(len, false);
    // Evenly spaced samples, and the first steps at doubling counts: a targeted attack often
    // cuts the design within a few removals, and R on the pieces (μ₂, the resistance: no
    // solve at all) is far cheaper than on the whole, a drop the even samples alone smear out.
    const even = Array.from({ length: ATTACK_SAMPLES }, (_, i) => Math.round((i * len) / (ATTACK_SAMPLES - 1)));
    const early: number[] = [];
    for (let s = 1; s < len / (ATTACK_SAMPLES - 1); s *= 2) early.push(s);
    const at = [...new Set([...even, ...early])].sort((x, y) => x - y);
    const cost = at.map((s) => c.along(kind, order, s));
    // Trapezoids between the sampled steps: every evaluated step 0..len is one evaluation.
    let sum = cost[0];
    for (let i = 1; i < at.length; i++) sum += ((cost[i - 1] + cost[i]) / 2) * ((at[i] - at[i - 1]) / every);
    return sum + ((k - len) * cost[cost.length - 1]) / every;
  });
}

/** Work estimate of one challenge in units (see the header and cost.ts). */
function estimate(g: CompactGraph, it: PlannedChallenge, c: CostModel): Estimate {
  const p = it.params;
  const e: Estimate = { band: 0, cases: 0, fixed: 0, worst: 0, worstExact: false, realizations: 0, totalCases: 0 };
  const kind = challengeKind(g, p);
  const free = c.free;
  if (it.type === 'band') {
    const m = p.challenge === 'regional' ? (p.epicentres ?? sitesWithCoordinates(g).length) : p.realizations;
    e.realizations = m;
    // Each realization draws its order, then takes R (one union–find pass on the free path).
    const order = p.challenge === 'regional' ? c.pass : orderCost(g, unitCount(g, kind));
    const r = free ? { each: c.pass, once: 0 } : bandRealizationCost(c, p);
    e.band = m * (r.each + order) + r.once;
  } else if (it.type === 'attack') {
    const k = attackSteps(g, kind, p.until);
    const groups = g.groupIds.length;
    const ranking =
      p.challenge === 'risk-groups-worst'
        ? ((groups * (groups + 1)) / 2) * c.intact
        : RANKING_PASSES[p.challenge]!(g.n, k) * c.pass;
    // A long attack shared out to pieces ranks its order once per piece.
    e.fixed = ranking * (free ? 1 : attackPieces(g, p)) + (free ? c.pass : attackCurveCost(c, p, kind, k));
  } else {
    const order = p.challenge === 'n-2' ? 2 : 1;
    e.totalCases = contingencyTotal(g, p.element, order);
    e.cases = Math.min(e.totalCases, it.maxCases) * c.intact;
  }
  if (p.worstCase > 0) {
    const units = countOnes(eligibleUnits(g, kind));
    const k = Math.min(p.worstCase, units);
    const exactCases = subsets(units, k);
    e.worstExact = k <= 2 && exactCases <= it.exactLimit;
    e.worst = (e.worstExact ? exactCases + (k === 2 ? units : 0) : k * units * Math.max(1, it.beam)) * c.intact;
  }
  return e;
}

export function evaluateDesign(g: CompactGraph, spec: EvaluationSpec): DesignEvaluation {
  const plan = planEvaluation(g, spec);
  const tasks = planTasks(plan, g);
  return assembleEvaluation(
    g,
    plan,
    tasks,
    tasks.map((t) => runTask(g, plan, t)),
  );
}

/**
 * An evaluation run in stages: the first stage runs every task but the random bands beyond the
 * first batch; later stages add band realizations by index range (engine.ts BATCH), so the
 * realizations a snapshot holds are exactly those of a full run with the same plan. Regional
 * bands (one realization per epicentre) run whole in the first stage.
 */
export interface StagedEvaluation {
  g: CompactGraph;
  plan: EvaluationPlan;
  tasks: Task[];
  results: (TaskResult | undefined)[];
}

export function stageEvaluation(g: CompactGraph, spec: EvaluationSpec): StagedEvaluation {
  const plan = planEvaluation(g, spec);
  const tasks = planTasks(plan, g);
  return { g, plan, tasks, results: new Array(tasks.length).fill(undefined) };
}

function staged(it: PlannedChallenge): boolean {
  return it.type === 'band' && it.params.challenge !== 'regional';
}

/** Most realizations a staged band of this evaluation runs (0 when it has none). */
export function stagedMaximum(st: StagedEvaluation): number {
  return Math.max(0, ...st.plan.items.filter(staged).map((it) => it.params.realizations));
}

/** Indices of the tasks not yet run that realizations below `upto` need (and every other task). */
export function pendingTasks(st: StagedEvaluation, upto: number): number[] {
  const out: number[] = [];
  st.tasks.forEach((t, i) => {
    if (st.results[i] !== undefined) return;
    if (t.type === 'band' && staged(st.plan.items[t.item]) && t.from >= upto) return;
    out.push(i);
  });
  return out;
}

/**
 * The evaluation of the realizations below `upto` (all tasks it needs must have run). A band
 * stopped before the count its plan allows records that count as `maxRealizations`, and loses
 * the note that the budget reduced it: the budget did not decide where it stopped.
 */
export function snapshotEvaluation(st: StagedEvaluation, upto: number): DesignEvaluation {
  const items = st.plan.items.map((it) => {
    if (!staged(it) || it.params.realizations <= upto) return it;
    const degraded = (it.degraded ?? '')
      .split('; ')
      .filter((d) => d !== '' && !d.startsWith('realizations reduced from'))
      .join('; ');
    const out: PlannedChallenge = { ...it, params: { ...it.params, realizations: upto } };
    if (degraded) out.degraded = degraded;
    else delete out.degraded;
    return out;
  });
  const plan: EvaluationPlan = {
    ...st.plan,
    items,
    degraded: items.flatMap((it) => (it.degraded ? [`${it.params.challenge}: ${it.degraded}`] : [])),
  };
  const keep = st.tasks
    .map((_t, i) => i)
    .filter((i) => {
      const t = st.tasks[i];
      return !(t.type === 'band' && staged(st.plan.items[t.item]) && t.from >= upto);
    });
  const results = keep.map((i) => {
    const r = st.results[i];
    if (r === undefined) throw new Error(`task ${i} has not run`);
    return r;
  });
  const out = assembleEvaluation(
    st.g,
    plan,
    keep.map((i) => st.tasks[i]),
    results,
  );
  st.plan.items.forEach((it, i) => {
    if (items[i] === it) return;
    const env = out.evaluation.envelopes.find((e) => e.challenge === it.params.challenge);
    if (env) env.maxRealizations = it.params.realizations;
  });
  return out;
}

export function structureSummary(g: CompactGraph): StructureSummary {
  const comps = findComponents(g);
  const cuts = findCutElements(g);
  return {
    nodes: g.n,
    links: g.m,
    components: comps.sizes.length,
    // Listed as the file lists them.
    bridges: linksByLine(g, cuts.bridges).map((e) => reportElement(g, 'link', e)),
    cutNodes: nodesByLine(g, cuts.cutNodes).map((v) => reportElement(g, 'node', v)),
  };
}

/** Merges task results (in task order) into the evaluation. */
export function assembleEvaluation(
  g: CompactGraph,
  plan: EvaluationPlan,
  tasks: Task[],
  results: TaskResult[],
): DesignEvaluation {
  const samples = new Map<ChallengeName, Float64Array[]>();
  const labels = new Map<ChallengeName, string[]>();
  const evaluation: Evaluation = {
    r: plan.r,
    structure: structureSummary(g),
    envelopes: [],
    attacks: [],
    contingencies: [],
    degraded: [...plan.degraded],
    ...(plan.notApplicable ? { notApplicable: plan.notApplicable.map((x) => ({ ...x })) } : {}),
  };
  const envelopeOf = new Map<number, Envelope>();
  const attackOf = new Map<number, AttackCurve>();
  const ev = new StepEvaluator(g, plan.r);

  plan.items.forEach((it, item) => {
    const p = it.params;
    const mine = tasks.map((t, i) => ({ t, res: results[i] })).filter(({ t }) => t.item === item);
    if (it.type === 'band') {
      const values = mine.flatMap(({ res }) => (res.type === 'band' ? res.values : []));
      // Whole-count values, when every task kept them (samples joined from parts do not).
      const bands = mine.flatMap(({ res }) => (res.type === 'band' ? [res] : []));
      const whole = bands.every((res) => res.whole) ? bands.flatMap((res) => res.whole!) : undefined;
      const bp = bandPlan(g, p);
      const env = buildEnvelope(g, it, bp, values, ev, whole);
      samples.set(p.challenge, values);
      if (bp.label)
        labels.set(
          p.challenge,
          values.map((_, r) => bp.label!(r)),
        );
      envelopeOf.set(item, env);
      evaluation.envelopes.push(env);
    } else if (it.type === 'attack') {
      // The attack's pieces, in task order, hold R at its evaluated steps in order.
      const pieces = mine.flatMap(({ res }) => (res.type === 'attack' ? [res] : []));
      const first = pieces[0];
      const at = attackEvaluationSteps(first.sequence.length, first.every);
      const computed = pieces.flatMap((x) => Array.from(x.values));
      if (computed.length !== at.length)
        throw new Error(`attack ${p.challenge}: ${computed.length} of ${at.length} steps`);
      const res = {
        sequence: first.sequence,
        values: fillAttackCurve(at, computed, first.sequence.length),
        every: first.every > 1 ? first.every : undefined,
      };
      const c = getChallenge(p.challenge);
      const kind = c.type === 'attack' ? c.kind : 'node';
      const count = unitCount(g, kind);
      const ids = unitIds(g, kind);
      const values = Array.from(res.values);
      const until = Math.min(countAt(p.until, count, countOnes(eligibleUnits(g, kind))), res.sequence.length);
      const curve: AttackCurve = {
        challenge: p.challenge,
        kind,
        x: values.map((_, k) => (count > 0 ? k / count : 0)),
        values,
        sequence: Array.from(res.sequence, (u) => ids[u]),
        count,
        area: attackArea(values, until),
      };
      if (res.every !== undefined) curve.every = res.every;
      attackOf.set(item, curve);
      evaluation.attacks.push(curve);
    } else {
      const res = mine.find(({ res }) => res.type === 'contingency')!.res as Extract<
        TaskResult,
        { type: 'contingency' }
      >;
      evaluation.contingencies.push(res.result as Contingency);
    }
    const worst = mine.find(({ res }) => res.type === 'worst')?.res as
      Extract<TaskResult, { type: 'worst' }> | undefined;
    if (worst) {
      const target = envelopeOf.get(item) ?? attackOf.get(item);
      if (target) target.worstCase = worst.result as WorstCase;
    }
  });

  const sampling = sourceSampling(g, plan, tasks, results, envelopeOf);
  if (sampling) evaluation.sampling = sampling;

  // Attack gap: each fraction envelope against the most harmful attack of its element kind.
  for (const env of evaluation.envelopes) {
    if (env.xUnit !== 'fraction') continue;
    const candidates = evaluation.attacks.filter((a) => a.kind === env.kind);
    if (candidates.length === 0) continue;
    let worst = candidates[0];
    for (const a of candidates) if (a.area < worst.area) worst = a;
    const count = unitCount(g, env.kind);
    const eligible = countOnes(eligibleUnits(g, env.kind));
    const atGrid = env.x.map((x) => {
      const r = valueAtCount(worst.values, countAt(x, count, eligible));
      return Number.isNaN(r) ? null : r;
    });
    const lo = env.quantiles[quantileKey(env.band[0])].value;
    const gap = attackGap(lo, atGrid);
    if (gap !== null) env.attackGap = { value: gap, attack: worst.challenge };
  }
  return { evaluation, samples, labels };
}

/**
 * The error R carries when its efficiency searched from sampled sources: the largest source
 * standard error over a few states that stand for the run — the intact design, the weakest
 * realization of every band (its lowest mean R) at each grid point, and the end of every attack
 * — which are where the sample loses the most sources and the spread of the per-source terms is
 * widest. A pure function of the plan and the results, so every run and every join agrees.
 */
function sourceSampling(
  g: CompactGraph,
  plan: EvaluationPlan,
  tasks: Task[],
  results: TaskResult[],
  envelopeOf: ReadonlyMap<number, Envelope>,
): SourceSampling | undefined {
  if (!samplesSources(g, plan.r)) return undefined;
  // The states are named by (parameters, weakest realization) per challenge and built only when
  // their error is not known yet: a batched run assembles after every batch, and the weakest
  // realization rarely changes between them.
  const named: unknown[] = ['source-error', plan.r];
  const builders: (() => Mask[])[] = [() => [createMask(g)]];
  plan.items.forEach((it, item) => {
    if (it.type === 'band') {
      const weakest = envelopeOf.get(item)?.weakest[0]?.realization;
      if (weakest === undefined) return;
      named.push(it.params, weakest);
      builders.push(() => {
        const bp = bandPlan(g, it.params);
        const order = new Int32Array(bp.maxUnits);
        const steps = new Float64Array(bp.x.length);
        const len = bp.realize(weakest, order, steps);
        return Array.from(steps)
          .filter((c) => c > 0)
          .map((c) => {
            const mask = createMask(g);
            for (let i = 0; i < Math.min(len, Math.ceil(c)); i++) removeUnit(g, mask, bp.kind, order[i]);
            return mask;
          });
      });
    } else if (it.type === 'attack') {
      const res = results.find((r, i) => tasks[i].item === item && r.type === 'attack') as
        Extract<TaskResult, { type: 'attack' }> | undefined;
      const c = getChallenge(it.params.challenge);
      if (!res || c.type !== 'attack' || res.sequence.length === 0) return;
      named.push(it.params);
      builders.push(() => {
        const mask = createMask(g);
        for (const u of res.sequence) removeUnit(g, mask, c.kind, u);
        return [mask];
      });
    }
  });
  const se = cached(g, JSON.stringify(named), () =>
    Math.max(
      ...rSourceErrors(
        g,
        plan.r,
        builders.flatMap((b) => b()),
      ),
    ),
  );
  return { metric: 'efficiency', sources: plan.r.sources!, nodes: g.n, se };
}

function buildEnvelope(
  g: CompactGraph,
  it: PlannedChallenge,
  bp: ReturnType<typeof bandPlan>,
  values: Float64Array[],
  ev: StepEvaluator,
  whole: Float64Array[] | undefined,
): Envelope {
  const p = it.params;
  const stats = gridStats(values, bp.x.length, p.band);
  const lo = stats.quantiles[quantileKey(p.band[0])].value;
  const hi = stats.quantiles[quantileKey(p.band[1])].value;
  const env: Envelope = {
    challenge: p.challenge,
    kind: bp.kind,
    xUnit: bp.xUnit,
    x: bp.x,
    realizations: values.length,
    seed: p.seed,
    band: p.band,
    min: stats.min,
    max: stats.max,
    mean: stats.mean,
    median: stats.median,
    quantiles: stats.quantiles,
    area: area(stats.median),
    spread: spread(lo, hi),
    weakest: weakestSequences(g, bp, values, ev, whole),
  };
  if (it.degraded) env.degraded = it.degraded;
  return env;
}

/** The realizations with the lowest mean R over the grid (ties: lower index), with their sequences. */
function weakestSequences(
  g: CompactGraph,
  bp: ReturnType<typeof bandPlan>,
  values: Float64Array[],
  ev: StepEvaluator,
  whole: Float64Array[] | undefined,
): RemovalSequence[] {
  const score = values.map((v) => gridMean(v));
  const picks = values
    .map((_, r) => r)
    .sort((a, b) => score[a] - score[b] || a - b)
    .slice(0, WEAKEST_KEPT);
  const ids = unitIds(g, bp.kind);
  const order = new Int32Array(bp.maxUnits);
  const steps = new Float64Array(bp.x.length);
  return picks.map((r) => {
    const len = bp.realize(r, order, steps);
    const seq: RemovalSequence = {
      kind: bp.kind,
      elements: Array.from(order.subarray(0, len), (u) => ids[u]),
      values: [],
      realization: r,
    };
    if (bp.label) seq.label = bp.label(r);
    if (ev.stepsAreFree) {
      seq.values = Array.from(ev.everyStep(bp.kind, order, len).subarray(1));
    } else if (steps.every((c) => Number.isInteger(c))) {
      // The grid's own values, at the counts they were taken.
      const at: number[] = [];
      const vals: number[] = [];
      for (let j = 0; j < steps.length; j++) {
        if (steps[j] === 0 || (at.length > 0 && at[at.length - 1] === steps[j])) continue;
        at.push(steps[j]);
        vals.push(values[r][j]);
      }
      seq.values = vals;
      seq.steps = at;
    } else {
      // Some grid values lie between two whole counts (x·N is not whole): R at those whole
      // counts, so the steps stay removal counts — as the band task kept them when R allows,
      // else recomputed for these few sequences.
      const byCount = new Map<number, number>();
      for (let j = 0; j < steps.length; j++) {
        const lo = Math.floor(steps[j]);
        const hi = Math.ceil(steps[j]);
        if (lo > 0) byCount.set(lo, whole ? whole[r][2 * j] : NaN);
        if (hi > 0) byCount.set(hi, whole ? whole[r][2 * j + 1] : NaN);
      }
      const at = [...byCount.keys()].sort((a, b) => a - b);
      seq.values = whole
        ? at.map((k) => byCount.get(k)!)
        : Array.from(ev.at(bp.kind, order, len, at, new Float64Array(at.length)));
      seq.steps = at;
    }
    return seq;
  });
}
