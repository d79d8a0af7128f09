// What the envelope engine hands to the gate and the reports. Everything here is plain
// data (JSON-serialisable) except `samples`, which keeps each realization's curve so that
// two evaluations (base and head) can be compared pairwise with common random numbers.

import type { MetricId } from '../metrics/types.js';
import type { ChallengeName } from '../challenges/types.js';
import type { Consequence } from '../graph/consequence.js';
import type { ElementKind, ReportElement } from '../graph/element.js';

/** How normalized metrics combine into R. */
export interface RValueSpec {
  metrics: { id: MetricId; weight: number }[];
  combine: 'mean' | 'min';
  /**
   * efficiency searches from a seeded sample of this many sites on designs with more (absent:
   * from every site); the sample is keyed by `sourceSeed` and the site ids (metrics/kernels/
   * source-sample.ts), so base and head share it.
   */
  sources?: number;
  /** Seed of that sample: the policy's seed (gate-request.ts). */
  sourceSeed?: number;
}

/** How far R may be off because a metric of it searched from sampled sources (evaluate.ts). */
export interface SourceSampling {
  metric: 'efficiency';
  /** Sources searched from, and the sites of the design. */
  sources: number;
  nodes: number;
  /**
   * Standard error of R from the sample: the largest over the intact design, the weakest
   * realization of every band at each grid point and the end of every attack. Exact R: absent.
   */
  se: number;
}

/** A removal sequence reported to the user: element ids in removal order. */
export interface RemovalSequence {
  kind: ElementKind;
  elements: string[];
  /** R after each step (same length as elements), or after the steps listed in `steps`. */
  values: number[];
  /**
   * Removal counts at which `values` were taken, when R is costly per step (distance and
   * spectral metrics are evaluated at grid points only). Absent: after every step.
   */
  steps?: number[];
  /** Realization index for random challenges. */
  realization?: number;
  /** What the realization stands for, e.g. the epicentre site of a regional failure. */
  label?: string;
  /** The elements with their lines and labels (added by the gate for the report). */
  located?: ReportElement[];
  /** What the whole sequence costs (added by the gate for the report). */
  consequence?: Consequence;
}

export interface WorstCase extends RemovalSequence {
  k: number;
  method: 'exact' | 'greedy' | 'beam';
}

export interface QuantileBand {
  /** Point estimate at each grid point. */
  value: number[];
  /** Distribution-free confidence interval from order statistics (docs/METHODS.md §7.2). */
  lo: number[];
  hi: number[];
  /** Standard error of the estimate at each grid point. */
  se: number[];
}

/** A random challenge's envelope: a band over realizations (or epicentres). */
export interface Envelope {
  challenge: ChallengeName;
  kind: ElementKind;
  /** What the x axis counts: fraction of elements removed, or radius in km. */
  xUnit: 'fraction' | 'km';
  x: number[];
  realizations: number;
  /** Set when a sequential run stopped before the realizations its plan allowed: that count. */
  maxRealizations?: number;
  seed: number;
  band: [number, number];
  min: number[];
  max: number[];
  mean: number[];
  median: number[];
  /** Keyed by the quantile as written, e.g. "0.1", "0.5", "0.9". */
  quantiles: Record<string, QuantileBand>;
  /** netbrace's own summaries (docs/METHODS.md §5.4): mean of the median; mean band width. */
  area: number;
  spread: number;
  /** The three weakest realizations with their removal sequences. */
  weakest: RemovalSequence[];
  worstCase?: WorstCase;
  /**
   * netbrace's attack gap (docs/METHODS.md §5.4): mean over the grid of q_lo − R of the most harmful
   * targeted attack of the same element kind in this evaluation; absent without such an attack.
   */
  attackGap?: { value: number; attack: ChallengeName };
  /** Set when the engine had to reduce work (budgets); the report marks the result degraded. */
  degraded?: string;
}

/** A deterministic challenge (targeted attack, worst-first groups): one curve. */
export interface AttackCurve {
  challenge: ChallengeName;
  kind: ElementKind;
  /** x = k / N (or L, or groups) for k = 0..K, K = ⌈until·N⌉ (values at a fraction in between are interpolated). */
  x: number[];
  values: number[];
  sequence: string[];
  /** Units the x axis divides by: N, L or the number of groups (always set by the engine). */
  count?: number;
  /**
   * Mean of values[1..K] up to `until`·count removals (Schneider's R when the attack runs to the
   * end and R is the LCC share); when until·count is not whole, the last step counts with its
   * fraction and R there is interpolated (summary.ts attackArea).
   */
  area: number;
  /**
   * Set on long attacks (engine.ts ATTACK_EVALUATIONS): R was computed after every `every`-th
   * removal and after the last, and `values` in between are read linearly between those.
   */
  every?: number;
  worstCase?: WorstCase;
}

/** N-1 / N-2: every single element (or pair), exhaustively within a budget. */
export interface Contingency {
  challenge: 'n-1' | 'n-2';
  kind: 'node' | 'link';
  /** Cases evaluated and cases that exist. */
  evaluated: number;
  total: number;
  /** The worst cases, ascending by R (`located`: the elements with lines and labels, added by the gate). */
  worst: { elements: string[]; value: number; located?: ReportElement[] }[];
  /** Lowest R over evaluated cases. */
  min: number;
}

export interface StructureSummary {
  nodes: number;
  links: number;
  components: number;
  bridges: ReportElement[];
  cutNodes: ReportElement[];
}

/** Everything evaluated on one side (base or head) of one design. */
export interface Evaluation {
  r: RValueSpec;
  structure: StructureSummary;
  envelopes: Envelope[];
  attacks: AttackCurve[];
  contingencies: Contingency[];
  /** Reasons the evaluation was reduced by budgets; empty when it ran in full. */
  degraded: string[];
  /** Set when R is estimated from sampled sources (RValueSpec.sources): the estimate's error. */
  sampling?: SourceSampling;
  /** Challenges that do not apply to this design (it lacks coordinates, risk groups...), with why; absent when all applied. */
  notApplicable?: { challenge: ChallengeName; reason: string }[];
}
