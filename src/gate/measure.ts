// What a requirement measures on one design, or on a base/head pair: the value (and, for
// a pair, the paired delta and its standard error from common random numbers), the
// confidence interval where the engine gives one, and the elements behind the number
// (the weakest removal sequence, the worst case, the element whose loss breaks N−1).
// When the work budget cut a random challenge's realizations (on either side), the value says
// so (`reduced`), carries the standard error of the head's own statistic (`headSe`) for the
// judging in compare.ts, and says when base and head were cut differently (`unpaired`).

import type { DesignEvaluation } from '../envelope/evaluate.js';
import { pairedStatistic, type Statistic } from '../envelope/pairing.js';
import type { AttackCurve, Contingency, Envelope, RemovalSequence } from '../envelope/types.js';
import type { ElementKind } from '../graph/element.js';
import { DEFAULTS as CHALLENGE_DEFAULTS } from '../challenges/registry.js';
import { gridIndex as indexOnGrid } from '../challenges/grid.js';
import { sitesWithCoordinates } from '../challenges/regional.js';
import { countAt, countOnes, eligibleUnits, unitCount, valueAtCount } from '../challenges/units.js';
import { quantileEstimate } from '../envelope/quantiles.js';
import { quantileKey, sortedColumn } from '../envelope/summary.js';
import type { CompactGraph } from '../graph/compact.js';
import { locateElement } from '../graph/element.js';
import type { ReportElement } from '../graph/element.js';
import type { ChallengeDef, Requirement, ThresholdRequirement } from '../policy/types.js';
import type { Topology } from '../topology/model.js';

/** One side of a comparison: the compiled design and what the engine made of it. */
export interface DesignSide {
  graph: CompactGraph;
  result: DesignEvaluation;
  /** The parsed design, for what the change does to its attributes (labels, lengths...). */
  topology?: Topology;
}

export interface Measured {
  base: number | null;
  head: number | null;
  delta: number | null;
  se: number | null;
  /** Confidence interval of the head value (order statistics), when known. */
  lo?: number;
  hi?: number;
  /** Higher is better (false for spread). */
  higherIsBetter: boolean;
  /** Elements behind the head value, in order. */
  elements: { id: string; kind: ElementKind }[];
  /** Set when the value could not be computed (challenge skipped, too few steps...). */
  missing?: string;
  /** Set with `missing` when the head lacks what the challenge needs (coordinates, risk groups). */
  notApplicable?: boolean;
  /**
   * Set when the value comes from incomplete work (N−1 cases or an exact worst-case search
   * cut by the work budget): it may be higher than the true value, so a floor it meets is
   * not proven. Says why.
   */
  incomplete?: string;
  /**
   * Set when the work budget left a random challenge with fewer realizations than the policy
   * asks for, on the head or the base: says how many ran. The value and the delta then rest on
   * fewer realizations.
   */
  reduced?: string;
  /** Standard error of the head value itself, when the head's realizations were cut. */
  headSe?: number;
  /** Set when the budget cut base and head differently, so their realizations do not pair. */
  unpaired?: string;
  /**
   * Set when the head's R is estimated from sampled sources: that estimate's standard error
   * (already part of `se`, and of `headSe` when set), and the sample's size.
   */
  sourceSe?: number;
  sources?: { sources: number; nodes: number };
}

/** The source-sampling error of one side's R (0 when exact). */
function sourceSe(side: DesignSide | undefined): number {
  return side?.result.evaluation.sampling?.se ?? 0;
}

/** What the head's sampled sources add to a measured value: their error, for the floor's judging. */
function sampledHead(head: DesignSide): Pick<Measured, 'sourceSe' | 'sources'> {
  const s = head.result.evaluation.sampling;
  return s ? { sourceSe: s.se, sources: { sources: s.sources, nodes: s.nodes } } : {};
}

/** Most elements a finding lists. */
export const MAX_ELEMENTS = 10;

/** Line (and label) of an element in the head design, else in the base design, else 0. */
export function locate(el: { id: string; kind: ElementKind }, head?: CompactGraph, base?: CompactGraph): ReportElement {
  return locateElement(el, head, base);
}

function envelopeOf(side: DesignSide, c: ChallengeDef): Envelope | undefined {
  return side.result.evaluation.envelopes.find((e) => e.challenge === c.engine);
}

function attackOf(side: DesignSide, c: ChallengeDef): AttackCurve | undefined {
  return side.result.evaluation.attacks.find((a) => a.challenge === c.engine);
}

function contingencyOf(side: DesignSide, element: 'node' | 'link'): Contingency | undefined {
  return side.result.evaluation.contingencies.find((x) => x.challenge === 'n-1' && x.kind === element);
}

/** Removals at x for an element kind on this design (as the engine counts them): x·N, possibly not whole. */
function removalsAt(g: CompactGraph, kind: ElementKind, x: number): number {
  return countAt(x, unitCount(g, kind), countOnes(eligibleUnits(g, kind)));
}

function sequenceElements(seq: RemovalSequence | undefined, count = MAX_ELEMENTS): { id: string; kind: ElementKind }[] {
  if (!seq) return [];
  return seq.elements.slice(0, Math.min(count, MAX_ELEMENTS)).map((id) => ({ id, kind: seq.kind }));
}

function gridIndex(env: Envelope, x: number): number {
  return indexOnGrid(env.x, x);
}

/** The engine's statistic for an envelope requirement. */
function statisticOf(req: Requirement): Statistic | undefined {
  if (req.kind === 'area-floor') return { kind: 'area' };
  if (req.kind === 'spread-ceiling') return { kind: 'spread' };
  if (req.kind !== 'r-threshold') return undefined;
  switch (req.statistic.kind) {
    case 'quantile':
      return { kind: 'quantile', q: req.statistic.q };
    case 'median':
      return { kind: 'quantile', q: 0.5 };
    case 'mean':
      return { kind: 'mean' };
    case 'min':
      return { kind: 'min' };
    default:
      return undefined;
  }
}

/** Realizations a random challenge ran on one side, against those the policy asks for there. */
function realizationsOf(env: Envelope, c: ChallengeDef, g: CompactGraph): { ran: number; asked: number } {
  const asked =
    c.engine === 'regional'
      ? sitesWithCoordinates(g).length
      : (c.params.realizations ?? CHALLENGE_DEFAULTS.realizations);
  return { ran: env.realizations, asked };
}

/** What the budget did to a challenge on both sides: how many realizations ran, and whether they pair. */
function reductionOf(
  c: ChallengeDef,
  head: DesignSide,
  env: Envelope,
  base?: DesignSide,
  baseEnv?: Envelope,
): Pick<Measured, 'reduced' | 'unpaired'> {
  const h = realizationsOf(env, c, head.graph);
  const b = base && baseEnv ? realizationsOf(baseEnv, c, base.graph) : undefined;
  // A sequential run that stopped before the budget's count (maxRealizations) was settled by
  // its decisions, not cut by the budget.
  const headCut = env.maxRealizations === undefined && h.ran < h.asked;
  const baseCut = b !== undefined && baseEnv!.maxRealizations === undefined && b.ran < b.asked;
  if (!headCut && !baseCut) return {};
  const out: Pick<Measured, 'reduced' | 'unpaired'> = {};
  if (b === undefined) out.reduced = `the work budget left ${h.ran} of the ${h.asked} realizations`;
  else if (h.ran === b.ran && h.asked === b.asked)
    out.reduced = `the work budget left ${h.ran} of the ${h.asked} realizations on head and base`;
  else
    out.reduced = `the work budget left ${h.ran} of the ${h.asked} realizations on the head and ${b.ran} of ${b.asked} on the base`;
  if (b !== undefined && base!.result !== head.result) {
    const lh = head.result.labels.get(c.engine);
    const lb = base!.result.labels.get(c.engine);
    const sameLabels =
      lh === undefined || lb === undefined || (lh.length === lb.length && lh.every((l, i) => l === lb[i]));
    if (h.ran !== b.ran)
      out.unpaired = `the budget cut base and head to different numbers of realizations (${b.ran} and ${h.ran}), so they do not pair`;
    else if (!sameLabels) out.unpaired = 'the budget cut base and head to different epicentres, so they do not pair';
  }
  return out;
}

/**
 * Standard error of the head's own statistic: the engine's paired estimate against a twin
 * whose every sample is 0 (its statistic is then 0, so the paired delta is the head's value
 * and the paired se is the head's se: sd/√n for the mean, the seeded bootstrap otherwise).
 */
function ownSe(head: DesignEvaluation, env: Envelope, stat: Statistic, x: number | undefined): number {
  const samples = head.samples.get(env.challenge) ?? [];
  const zero: DesignEvaluation = {
    evaluation: { ...head.evaluation, envelopes: [env], attacks: [], contingencies: [] },
    samples: new Map([[env.challenge, samples.map((s) => new Float64Array(s.length))]]),
    labels: head.labels,
  };
  return pairedStatistic(zero, head, env.challenge, stat, x).se;
}

/** The head cannot give the value; the base's value, when the base could, says the head lost what it needs. */
function missing(reason: string, higherIsBetter = true, base: number | null = null, notApplicable = false): Measured {
  return {
    base,
    head: null,
    delta: null,
    se: null,
    higherIsBetter,
    elements: [],
    missing: reason,
    ...(notApplicable ? { notApplicable } : {}),
  };
}

/** Why a challenge has no result on this side: it does not apply (and why), or it did not run. */
function didNotRun(side: DesignSide, c: ChallengeDef): string {
  const why = notApplicableReason(side, c);
  return why !== undefined
    ? `challenge "${c.name}" does not apply to this design: ${why}`
    : `challenge "${c.name}" did not run on this design`;
}

function notApplicableReason(side: DesignSide, c: ChallengeDef | undefined): string | undefined {
  return c ? side.result.evaluation.notApplicable?.find((x) => x.challenge === c.engine)?.reason : undefined;
}

/** Value of a deterministic requirement on one side, with its elements. */
type Value = { value: number; elements: { id: string; kind: ElementKind }[]; incomplete?: string };

function deterministic(req: Requirement, c: ChallengeDef | undefined, side: DesignSide): Value | string {
  if (req.kind === 'n-1') {
    const cont = contingencyOf(side, req.element);
    if (!cont) return `the N\u22121 evaluation of ${req.element}s did not run`;
    if (cont.evaluated === 0) return `the design has no ${req.element} that can fail`;
    const worst = cont.worst[0];
    const out: Value = {
      value: cont.min,
      elements: worst ? worst.elements.map((id) => ({ id, kind: cont.kind })) : [],
    };
    if (cont.evaluated < cont.total)
      out.incomplete = `only ${cont.evaluated} of ${cont.total} single ${req.element} losses were evaluated (work budget)`;
    return out;
  }
  if (!c) return 'no challenge';
  if (req.kind === 'r-threshold' && req.statistic.kind === 'worst-case') {
    const env = envelopeOf(side, c);
    const wc = env?.worstCase;
    if (!wc) return `challenge "${c.name}" has no worst-case result`;
    const k = req.statistic.removals;
    const i = wc.steps ? wc.steps.indexOf(k) : k - 1;
    if (i < 0 || i >= wc.values.length) return `the worst-case search of "${c.name}" stopped before ${k} removals`;
    const out: Value = { value: wc.values[i], elements: sequenceElements(wc, k) };
    // Up to two removals the search is exact unless the budget (or the subset limit) forbade it.
    if (k <= 2 && wc.method !== 'exact')
      out.incomplete = `the worst case was searched greedily, not exhaustively (work budget), so the true worst case may be lower`;
    return out;
  }
  const curve = attackOf(side, c);
  if (!curve) return didNotRun(side, c);
  if (req.kind === 'area-floor')
    return {
      value: curve.area,
      elements: sequenceElements({ kind: curve.kind, elements: curve.sequence, values: [] }),
    };
  const t = req as ThresholdRequirement;
  // R at x·N removals: between the two neighbouring steps when x·N is not whole.
  const k = removalsAt(side.graph, curve.kind, t.at ?? 0);
  const value = valueAtCount(curve.values, k);
  if (Number.isNaN(value)) return `the attack "${c.name}" ends before ${t.at}`;
  return {
    value,
    elements: sequenceElements({ kind: curve.kind, elements: curve.sequence, values: [] }, Math.ceil(k)),
  };
}

/** Measure one requirement (not no-new-spof) on head, and on base when there is one. */
export function measure(
  req: Requirement,
  challenges: readonly ChallengeDef[],
  head: DesignSide,
  base?: DesignSide,
): Measured {
  const c = 'challenge' in req ? challenges.find((x) => x.name === req.challenge) : undefined;
  const higherIsBetter = req.kind !== 'spread-ceiling';
  const stat = c?.random ? statisticOf(req) : undefined;

  if (c?.random && stat) {
    const env = envelopeOf(head, c);
    const x = req.kind === 'r-threshold' ? req.at : undefined;
    const baseEnv = base ? envelopeOf(base, c) : undefined;
    if (!env) {
      // The base's own value, when it has one: then the head lost what the challenge needs.
      const baseValue =
        baseEnv && base!.result !== head.result && (x === undefined || gridIndex(baseEnv, x) >= 0)
          ? pairedStatistic(base!.result, base!.result, c.engine, stat, x).base
          : null;
      return missing(didNotRun(head, c), higherIsBetter, baseValue, notApplicableReason(head, c) !== undefined);
    }
    const j = x === undefined ? -1 : gridIndex(env, x);
    if (x !== undefined && j < 0) return missing(`${x} is not on the grid of "${c.name}"`, higherIsBetter);
    const same = base !== undefined && base.result === head.result;
    const p = pairedStatistic(baseEnv ? base!.result : head.result, head.result, c.engine, stat, x);
    const out: Measured = {
      base: baseEnv ? p.base : null,
      head: p.head,
      delta: baseEnv ? (same ? 0 : p.delta) : null,
      // Sampled sources add an error the realizations do not show (the sample is fixed).
      se: baseEnv ? (same ? 0 : Math.hypot(p.se, sourceSe(base), sourceSe(head))) : null,
      ...sampledHead(head),
      higherIsBetter,
      elements: sequenceElements(
        env.weakest[0],
        x === undefined ? MAX_ELEMENTS : Math.ceil(removalsAt(head.graph, env.kind, x)),
      ),
    };
    if (stat.kind === 'quantile' && j >= 0) {
      // The band's quantiles carry their interval; any other q gets the same order-statistic one.
      const band = env.quantiles[quantileKey(stat.q)];
      const ci = band
        ? { lo: band.lo[j], hi: band.hi[j] }
        : quantileEstimate(sortedColumn(head.result.samples.get(c.engine) ?? [], j), stat.q);
      out.lo = ci.lo;
      out.hi = ci.hi;
    }
    const reduction = reductionOf(c, head, env, baseEnv ? base : undefined, baseEnv);
    if (reduction.reduced !== undefined) {
      out.reduced = reduction.reduced;
      const h = realizationsOf(env, c, head.graph);
      if (h.ran < h.asked) out.headSe = Math.hypot(ownSe(head.result, env, stat, x), sourceSe(head));
    }
    if (reduction.unpaired !== undefined) out.unpaired = reduction.unpaired;
    return out;
  }

  const h = deterministic(req, c, head);
  const b = base ? deterministic(req, c, base) : undefined;
  const bv = b !== undefined && typeof b !== 'string' ? b.value : null;
  if (typeof h === 'string')
    return missing(
      h,
      higherIsBetter,
      base !== undefined && base.result !== head.result ? bv : null,
      notApplicableReason(head, c) !== undefined,
    );
  const same = base !== undefined && base.result === head.result;
  return {
    base: bv,
    head: h.value,
    delta: bv === null ? null : same ? 0 : h.value - bv,
    se: bv === null ? null : same ? 0 : Math.hypot(sourceSe(base), sourceSe(head)),
    ...sampledHead(head),
    higherIsBetter,
    elements: h.elements,
    ...(h.incomplete !== undefined ? { incomplete: h.incomplete } : {}),
  };
}
