// The envelope engine's unit of work: a task is a pure function of (graph, plan, task) and
// returns plain data, so tasks can run in any thread and in any order; results are merged in
// task order (evaluate.ts), which is what makes the output independent of the thread count.
// Band challenges are cut into fixed chunks (chunkSize, from M alone); every task creates its own
// metric evaluators, so even evaluators that keep warm-start state between calls give the same
// numbers whichever thread runs the chunk. That is also why spectral metrics may warm-start
// (each Lanczos run from the previous grid point's eigenvector, MetricOptions.warmStart).

import type { CompactGraph } from '../graph/compact.js';
import { createMask, type Mask } from '../graph/mask.js';
import { getChallenge } from '../challenges/registry.js';
import type { BandPlan, ResolvedParams } from '../challenges/types.js';
import { countOnes, eligibleUnits, lerp, removeUnit, stepsAt, unitCount } from '../challenges/units.js';
import type { Contingency, RValueSpec, WorstCase } from './types.js';
import type { ChallengeName } from '../challenges/types.js';
import type { ElementKind } from '../graph/element.js';
import { getMetric } from '../metrics/registry.js';
import { createRValue, unionFindR, type RFunction } from './r-value.js';
import {
  connectivityCurve,
  createUnionFindWorkspace,
  type ConnectivityCurve,
  type UnionFindWorkspace,
} from './union-find.js';
import { evaluateContingency } from './contingency.js';
import { searchWorstCase } from './worst-case.js';

/**
 * Realizations per band task: about 32 tasks per band (so two or four threads stay evenly
 * loaded), at most 16 realizations each. It depends on M only, never on the thread count —
 * part of what makes results thread-count independent.
 */
export function chunkSize(realizations: number): number {
  return Math.min(16, Math.max(1, Math.ceil(realizations / 32)));
}

/**
 * Realizations per batch of a sequential run (the gate adds batches until its decisions are
 * settled, gate/sequential.ts). Band tasks are also cut at every multiple of BATCH, so a
 * realization's value depends on its index and the policy's count alone, never on how many
 * batches ran.
 */
export const BATCH = 32;

export interface PlannedChallenge {
  params: ResolvedParams;
  type: 'band' | 'attack' | 'contingency';
  /** Contingency cases to evaluate at most. */
  maxCases: number;
  /** Worst-case search: largest exact enumeration allowed (0 = never exact), and beam width. */
  exactLimit: number;
  beam: number;
  /** Why this challenge was reduced, when it was. */
  degraded?: string;
}

export interface EvaluationPlan {
  r: RValueSpec;
  items: PlannedChallenge[];
  /** Reasons the evaluation as a whole was reduced. */
  degraded: string[];
  /** Challenges left out because the design lacks what they need (coordinates, risk groups). */
  notApplicable?: { challenge: ChallengeName; reason: string }[];
  /** Estimated work in element visits after any reduction (see evaluate.ts). */
  work: number;
}

export type Task =
  | { type: 'band'; item: number; from: number; to: number }
  | { type: 'attack'; item: number; piece?: { index: number; of: number } }
  | { type: 'contingency'; item: number }
  | { type: 'worst'; item: number };

export type TaskResult =
  /** `whole`: per realization, R at ⌊c⌋ and ⌈c⌉ of each grid point (StepEvaluator.at), when reusable. */
  | { type: 'band'; values: Float64Array[]; whole?: Float64Array[] }
  /** R at this piece's share of the attack's evaluated steps (attackPlan), in order. */
  | { type: 'attack'; sequence: Int32Array; values: Float64Array; every: number }
  | { type: 'contingency'; result: Contingency }
  | { type: 'worst'; result: WorstCase };

export function planTasks(plan: EvaluationPlan, g: CompactGraph): Task[] {
  const tasks: Task[] = [];
  plan.items.forEach((it, item) => {
    if (it.type === 'band') {
      const m = realizationCount(g, it);
      const chunk = chunkSize(m);
      for (let from = 0; from < m;) {
        const to = Math.min(m, from + chunk - (from % chunk), BATCH * (Math.floor(from / BATCH) + 1));
        tasks.push({ type: 'band', item, from, to });
        from = to;
      }
    } else if (it.type === 'attack') {
      const of = attackPieces(g, it.params);
      if (of === 1) tasks.push({ type: 'attack', item });
      else for (let index = 0; index < of; index++) tasks.push({ type: 'attack', item, piece: { index, of } });
    } else tasks.push({ type: 'contingency', item });
    if (it.params.worstCase > 0) tasks.push({ type: 'worst', item });
  });
  return tasks;
}

/** Realizations a band item runs: the requested count, or one per epicentre for regional. */
export function realizationCount(g: CompactGraph, it: PlannedChallenge): number {
  return bandPlan(g, it.params).realizations;
}

// Plans are pure functions of (graph, parameters) and `realize` rewrites its outputs in full, so
// one plan per graph and parameter set serves every task of a thread (ids are hashed once).
const planCache = new WeakMap<CompactGraph, Map<string, BandPlan>>();

export function bandPlan(g: CompactGraph, params: ResolvedParams): BandPlan {
  let byParams = planCache.get(g);
  if (!byParams) planCache.set(g, (byParams = new Map()));
  const key = JSON.stringify(params);
  const hit = byParams.get(key);
  if (hit) return hit;
  const c = getChallenge(params.challenge);
  if (c.type !== 'band') throw new TypeError(`${params.challenge} is not a band challenge`);
  const plan = c.plan(g, params);
  if (byParams.size > 64) byParams.clear();
  byParams.set(key, plan);
  return plan;
}

/** The unit kind a challenge removes. */
export function challengeKind(g: CompactGraph, params: ResolvedParams): ElementKind {
  const c = getChallenge(params.challenge);
  if (c.type === 'band') return bandPlan(g, params).kind;
  if (c.type === 'attack') return c.kind;
  return params.element;
}

/** Steps of an attack: ⌈until · count⌉ (R at `until` may be read between two steps), capped by what may be removed. */
export function attackSteps(g: CompactGraph, kind: ElementKind, until: number): number {
  return stepsAt(until, unitCount(g, kind), countOnes(eligibleUnits(g, kind)));
}

/**
 * Most evaluations of R along one attack. A targeted attack is one deterministic curve, but R
 * after every removal costs a full evaluation each: 2,000 of them for a fifth of a 10,000-site
 * design. Past this many steps R is computed every ⌈steps/ATTACK_EVALUATIONS⌉-th removal (and
 * after the last) and read linearly between; the area's trapezoids then span a few removals
 * each, on a curve that moves by about 1/N per removal. Attacks of up to this many steps (a
 * fifth of 1,000 sites) are computed at every step, as before.
 */
export const ATTACK_EVALUATIONS = 200;

/** Removals between two evaluations of R along an attack of `steps` steps (1: every step). */
export function attackStride(steps: number, free: boolean): number {
  return free || steps <= ATTACK_EVALUATIONS ? 1 : Math.ceil(steps / ATTACK_EVALUATIONS);
}

/** The removal counts at which R is computed along an attack of `len` steps: every `every`-th, and the last. */
export function attackEvaluationSteps(len: number, every: number): number[] {
  const at: number[] = [];
  for (let k = 0; k < len; k += every) at.push(k);
  at.push(len);
  return at;
}

/**
 * Evaluations of R one task of a long attack takes on. A strided attack's steps are independent
 * once its removal order is known, so they are shared out between tasks that each rank the
 * order again (only for rankings that cost a few passes, not R) and evaluate their share: the
 * pieces are fixed by the plan, never by the thread count, so the values stay the same.
 */
export const ATTACK_PIECE_EVALUATIONS = 25;

/** Attacks whose order costs no evaluation of R (so every piece may rank it again). */
const CHEAP_RANKINGS: ReadonlySet<ChallengeName> = new Set(['degree', 'degree-adaptive']);

/** How many tasks an attack is shared out to (1: one task). */
export function attackPieces(g: CompactGraph, params: ResolvedParams): number {
  const c = getChallenge(params.challenge);
  if (c.type !== 'attack' || !CHEAP_RANKINGS.has(params.challenge)) return 1;
  const steps = attackSteps(g, c.kind, params.until);
  if (steps <= ATTACK_EVALUATIONS) return 1;
  const evaluations = attackEvaluationSteps(steps, attackStride(steps, false)).length;
  return Math.max(1, Math.ceil(evaluations / ATTACK_PIECE_EVALUATIONS));
}

/**
 * An attack's order and stride, as runTask takes them. A join that serves a piece from a part's
 * values (gate-request.ts servedTasks) ranks it again without R: pieces exist only for
 * CHEAP_RANKINGS, which never ask for it.
 */
export function attackOrder(
  g: CompactGraph,
  plan: EvaluationPlan,
  item: number,
  rvalue: RFunction = () => Number.NaN,
): { sequence: Int32Array; every: number } {
  const params = plan.items[item].params;
  const c = getChallenge(params.challenge);
  if (c.type !== 'attack') throw new TypeError(`${params.challenge} is not an attack`);
  const sequence = c.sequence(g, attackSteps(g, c.kind, params.until), { rvalue });
  return { sequence, every: attackStride(sequence.length, unionFindR(g, plan.r) !== null) };
}

/** The removal counts a piece of an attack evaluates, and their range [from, to) among all its evaluated steps. */
export function pieceSteps(
  len: number,
  every: number,
  piece: { index: number; of: number } | undefined,
): { steps: number[]; from: number; to: number } {
  const at = attackEvaluationSteps(len, every);
  const [from, to] = pieceRange(at.length, piece);
  return { steps: at.slice(from, to), from, to };
}

/** The share [from, to) of `count` evaluated steps that piece `index` of `of` takes. */
export function pieceRange(count: number, piece: { index: number; of: number } | undefined): [number, number] {
  if (!piece) return [0, count];
  return [Math.floor((piece.index * count) / piece.of), Math.floor(((piece.index + 1) * count) / piece.of)];
}

/** R after every step 0..len from R at the evaluated steps `at`, read linearly between them. */
export function fillAttackCurve(at: readonly number[], computed: ArrayLike<number>, len: number): Float64Array {
  const out = new Float64Array(len + 1);
  for (let i = 0; i + 1 < at.length; i++) {
    const a = at[i];
    const b = at[i + 1];
    for (let k = a; k < b; k++) out[k] = lerp(computed[i], computed[i + 1], (k - a) / (b - a));
  }
  out[len] = computed[at.length - 1];
  return out;
}

// R of the intact design: every realization of every band task starts there, so a thread
// computes it once per evaluation (keyed by the evaluation's plan, then the graph). Only for an
// R whose value is a function of the mask alone: spectral metrics may warm-start
// (MetricOptions.warmStart; the engine asks for it), so with one in R the first evaluation also
// seeds the next and is never skipped. Any spectral metric counts, whether it warm-starts or not.
const intactCache = new WeakMap<object, WeakMap<CompactGraph, { r?: number }>>();

/** The slot holding R of the intact design for this scope and graph (a private one without scope). */
function sharedIntact(g: CompactGraph, scope: object | undefined): { r?: number } {
  if (!scope) return {};
  let byGraph = intactCache.get(scope);
  if (!byGraph) intactCache.set(scope, (byGraph = new WeakMap()));
  let slot = byGraph.get(g);
  if (!slot) byGraph.set(g, (slot = {}));
  return slot;
}

/** True when every metric of R gives the same value on a mask whatever was evaluated before. */
export function historyFree(spec: RValueSpec): boolean {
  return spec.metrics.every((m) => getMetric(m.id).cost !== 'spectral');
}

/** Evaluates R along one removal order at the given step counts (non-decreasing). */
export class StepEvaluator {
  private readonly rfn: RFunction;
  private readonly ufr: ((c: ConnectivityCurve, k: number) => number) | null;
  private readonly ws: UnionFindWorkspace | null;
  private readonly mask: Mask;
  /** R on the intact design once known (shared by `scope`), or null when R keeps history. */
  private readonly intact: { r?: number } | null;

  /** `scope`: the evaluation this evaluator works for (its plan); evaluators of one scope share R of the intact design. */
  constructor(
    private readonly g: CompactGraph,
    spec: RValueSpec,
    scope?: object,
  ) {
    // Warm starts are safe here: a task evaluates its masks in a fixed order (realizations of a
    // fixed chunk, grid points ascending), so every value is still a function of the plan alone.
    this.rfn = createRValue(g, spec, { warmStart: true });
    this.ufr = unionFindR(g, spec);
    this.ws = this.ufr ? createUnionFindWorkspace(g) : null;
    this.mask = createMask(g);
    this.intact = this.ufr === null && historyFree(spec) ? sharedIntact(g, scope) : null;
  }

  get r(): RFunction {
    return this.rfn;
  }

  /** True when every step is free (union–find curve). */
  get stepsAreFree(): boolean {
    return this.ufr !== null;
  }

  /**
   * True when R after k removals of an order is the same number however it is reached, so
   * values kept from a band task (`whole` of `at`) may stand for a recomputation.
   */
  get valuesAreReusable(): boolean {
    return this.ufr !== null || this.intact !== null;
  }

  /**
   * R after steps[j] units of `order` are removed, for each j (non-decreasing). A real count c
   * (a fraction of the units, units.ts countAt) reads R linearly between ⌊c⌋ and ⌈c⌉ removals of
   * this same order, so `order` must hold ⌈c⌉ units; a whole count is R there exactly.
   * `whole`, when given, receives R at ⌊c⌋ and ⌈c⌉ for each j (2j, 2j + 1).
   */
  at(
    kind: ElementKind,
    order: ArrayLike<number>,
    len: number,
    steps: ArrayLike<number>,
    out: Float64Array,
    whole?: Float64Array,
  ): Float64Array {
    if (this.ufr !== null) {
      // One curve gives every whole count; a real count costs one more lookup.
      const curve = connectivityCurve(this.g, kind, order, len, this.ws!);
      for (let j = 0; j < steps.length; j++) {
        const c = steps[j];
        const lo = Math.floor(c);
        const r = this.ufr(curve, lo);
        const up = c === lo ? r : this.ufr(curve, lo + 1);
        out[j] = c === lo ? r : lerp(r, up, c - lo);
        if (whole) {
          whole[2 * j] = r;
          whole[2 * j + 1] = up;
        }
      }
      return out;
    }
    const mask = this.mask;
    mask.node.fill(0);
    mask.link.fill(0);
    // Counts arrive ascending; a real count needs ⌊c⌋ and ⌈c⌉, and the next grid point may need
    // ⌊c⌋ again, so the last two evaluations are kept.
    const memo = this.memo;
    memo.applied = 0;
    memo.kLast = -1;
    memo.kPrev = -1;
    for (let j = 0; j < steps.length; j++) {
      const c = steps[j];
      const lo = Math.floor(c);
      const r = this.rAfter(kind, order, lo);
      const up = c === lo ? r : this.rAfter(kind, order, lo + 1);
      out[j] = c === lo ? r : lerp(r, up, c - lo);
      if (whole) {
        whole[2 * j] = r;
        whole[2 * j + 1] = up;
      }
    }
    return out;
  }

  private readonly memo = { applied: 0, kLast: -1, rLast: 0, kPrev: -1, rPrev: 0 };

  /** R after k removals of `order` on the shared mask; k never below the last two asked. */
  private rAfter(kind: ElementKind, order: ArrayLike<number>, k: number): number {
    const memo = this.memo;
    if (k === memo.kLast) return memo.rLast;
    if (k === memo.kPrev) return memo.rPrev;
    if (k < memo.applied) throw new RangeError(`removal counts must not decrease (${k} after ${memo.applied})`);
    while (memo.applied < k) removeUnit(this.g, this.mask, kind, order[memo.applied++]);
    const r = k === 0 ? this.rIntact() : this.rfn(this.mask);
    memo.kPrev = memo.kLast;
    memo.rPrev = memo.rLast;
    memo.kLast = k;
    memo.rLast = r;
    return r;
  }

  /** R on the intact design (the shared mask before any removal), once per scope when R allows. */
  private rIntact(): number {
    if (this.intact === null) return this.rfn(this.mask);
    return (this.intact.r ??= this.rfn(this.mask));
  }

  /** R after every step k = 0..len. */
  everyStep(kind: ElementKind, order: ArrayLike<number>, len: number): Float64Array {
    const steps = new Int32Array(len + 1);
    for (let k = 0; k <= len; k++) steps[k] = k;
    return this.at(kind, order, len, steps, new Float64Array(len + 1));
  }
}

export function runTask(g: CompactGraph, plan: EvaluationPlan, task: Task): TaskResult {
  const it = plan.items[task.item];
  const params = it.params;
  const ev = new StepEvaluator(g, plan.r, plan);
  switch (task.type) {
    case 'band': {
      const bp = bandPlan(g, params);
      const order = new Int32Array(bp.maxUnits);
      const steps = new Float64Array(bp.x.length);
      const values: Float64Array[] = [];
      // The whole counts' values let the weakest sequences be reported without evaluating again.
      const whole: Float64Array[] | undefined = ev.valuesAreReusable && !ev.stepsAreFree ? [] : undefined;
      for (let r = task.from; r < task.to; r++) {
        const len = bp.realize(r, order, steps);
        const w = whole ? new Float64Array(2 * bp.x.length) : undefined;
        values.push(ev.at(bp.kind, order, len, steps, new Float64Array(bp.x.length), w));
        if (whole) whole.push(w!);
      }
      return whole ? { type: 'band', values, whole } : { type: 'band', values };
    }
    case 'attack': {
      const kind = challengeKind(g, params);
      const { sequence, every } = attackOrder(g, plan, task.item, ev.r);
      const { steps } = pieceSteps(sequence.length, every, task.piece);
      const values = ev.at(kind, sequence, sequence.length, steps, new Float64Array(steps.length));
      return { type: 'attack', sequence, values, every };
    }
    case 'contingency': {
      const c = getChallenge(params.challenge);
      if (c.type !== 'contingency') throw new TypeError(`${params.challenge} is not a contingency`);
      return { type: 'contingency', result: evaluateContingency(g, params.element, c.order, ev.r, it.maxCases) };
    }
    case 'worst': {
      const kind = challengeKind(g, params);
      const result = searchWorstCase(g, kind, params.worstCase, ev.r, { exactLimit: it.exactLimit, beam: it.beam });
      return { type: 'worst', result };
    }
  }
}
