// The policy as the gate uses it: what a reviewed YAML file (plus the files it inherits and
// its scopes) says about which files are designs, how R is computed, which challenges
// run and what each design must satisfy. Every definition keeps its source location so
// that a conflict can name the lines involved.

import type { SourceLocation } from '../errors.js';
import type { RValueSpec } from '../envelope/types.js';
import type { ChallengeName, ChallengeParams } from '../challenges/types.js';
import type { Severity } from '../report/report.js';
import type { DesignFormat } from '../topology/model.js';

export type { Severity };

/** Where a definition was written. */
export type Where = SourceLocation;

/** What a challenge removes, in the policy's words. */
export type RemoveWhat = 'nodes' | 'links' | 'risk-groups' | 'region';
/** In which order, in the policy's words. */
export type RemovalOrder = 'random' | 'degree' | 'betweenness' | 'eigenvector' | 'closeness' | 'worst-first';

/** A challenge as the policy names it. `params` is handed to the engine (plus the grid's `at`). */
export interface ChallengeDef {
  /** The user's name for it (the key under `challenges:`); requirements refer to it. */
  name: string;
  remove: RemoveWhat;
  order: RemovalOrder;
  adaptive: boolean;
  engine: ChallengeName;
  /** Random challenges give envelopes (bands over realizations); the others one curve. */
  random: boolean;
  params: ChallengeParams;
  where: Where;
}

/** The statistic of an envelope an r-threshold judges. */
export type ThresholdStatistic =
  | { kind: 'quantile'; q: number }
  | { kind: 'median' }
  | { kind: 'mean' }
  | { kind: 'min' }
  /** R after the worst `removals` removals the worst-case search found. */
  | { kind: 'worst-case'; removals: number }
  /** The one value of a deterministic curve (targeted attack). */
  | { kind: 'value' };

interface RequirementBase {
  /** Stable id, e.g. "r-threshold:random-failures@0.2:q0.1"; equal ids are the same floor. */
  id: string;
  severity: Severity;
  where: Where;
  /** Location of the value that a tightening is judged on (the `min` / `max` line). */
  valueWhere: Where;
}

/** Where the `challenge:` reference was written. */
interface ChallengeRef {
  challenge: string;
  challengeWhere: Where;
}

export interface ThresholdRequirement extends RequirementBase, ChallengeRef {
  kind: 'r-threshold';
  /** Removal fraction (or km for regional challenges); absent for worst-case. */
  at?: number;
  statistic: ThresholdStatistic;
  min: number;
}

export interface AreaRequirement extends RequirementBase, ChallengeRef {
  kind: 'area-floor';
  /** Without a floor the area is only tracked (weakening is still judged). */
  min?: number;
}

export interface SpreadRequirement extends RequirementBase, ChallengeRef {
  kind: 'spread-ceiling';
  max: number;
}

export interface ContingencyRequirement extends RequirementBase {
  kind: 'n-1';
  element: 'node' | 'link';
  min: number;
}

export interface SpofRequirement extends RequirementBase {
  kind: 'no-new-spof';
  bridges: boolean;
  cutNodes: boolean;
  /** Shared-risk groups whose loss strands sites (default on). */
  riskGroups: boolean;
  /** What a new weak point hidden by a newly hardened element is (default warn). */
  hardenedWeakPoints: RemovedSeverity;
  /** Where hardened-weak-points was written (for loosening errors). */
  hardenedWhere?: Where;
}

export type Requirement =
  ThresholdRequirement | AreaRequirement | SpreadRequirement | ContingencyRequirement | SpofRequirement;

export interface WeakeningRule {
  /** Largest drop tolerated, in units of R (absolute). */
  allowedDrop?: number;
  /** Largest drop tolerated as a fraction of the base value. */
  allowedRelativeDrop?: number;
  /** A drop smaller than errorMultiple × se is Monte Carlo noise, never a failure. */
  errorMultiple: number;
  severity: Severity;
  where: Where;
  /** Per field, where it was written (for loosening errors). */
  fieldWhere: Partial<Record<'allowedDrop' | 'allowedRelativeDrop' | 'errorMultiple' | 'severity', Where>>;
}

export type RemovedSeverity = Severity | 'ignore';

export interface DesignGlob {
  paths: string[];
  format?: DesignFormat;
  where: Where;
  /** Where each of `paths` was written (the built-in policy's globs included). */
  fileWhere: Where[];
}

/**
 * The work budget of each design evaluation (head and base alike). Not a floor of the design,
 * but the effort that judges the floors: an inheriting policy or a scope may raise it,
 * never lower it (a smaller budget turns judgements into "unsettled").
 */
export interface Budget {
  /** Element visits (the engine's unit of work). */
  visits?: number;
  /** Seconds, converted to element visits at a fixed rate (src/policy/budget.ts). */
  seconds?: number;
  where: Where;
  fieldWhere: Partial<Record<'visits' | 'seconds', Where>>;
}

/** A budget in force for one file: as written, and the element visits it allows. */
export interface ResolvedBudget {
  visits?: number;
  seconds?: number;
  maxWork: number;
}

export interface Scope {
  paths: string[];
  requirements: Requirement[];
  weakening?: WeakeningRule;
  removedDesigns?: { severity: RemovedSeverity; where: Where };
  budget?: Budget;
  where: Where;
}

/** How to look for what would mend a failing design (advice only; never changes a verdict). */
export interface MendSettings {
  /** Repository path of the planner's candidate-link file. */
  candidates?: string;
  /** Generated candidates: great-circle distance × this factor. */
  routeFactor?: number;
  /** Generated candidates: most great-circle km between the two sites. */
  maxKm?: number;
  /** Most links one suggestion adds. */
  maxLinks?: number;
  /** Most engine evaluations per failing design; 0: no search. */
  evaluations?: number;
  where?: Where;
}

/** One policy file as written (before `inherits` and scopes are applied). */
export interface PolicyFile {
  path: string;
  inherits?: { path: string; where: Where };
  designs?: DesignGlob[];
  exclude?: { globs: string[]; where: Where };
  seed?: { value: number; where: Where };
  rValue?: { spec: RValueSpec; where: Where };
  /** Undefined when the file leaves `challenges` out (then it inherits them). */
  challenges?: ChallengeDef[];
  /** Undefined when the file leaves `requirements` out. */
  requirements?: Requirement[];
  weakening?: WeakeningRule;
  removedDesigns?: { severity: RemovedSeverity; where: Where };
  budget?: Budget;
  mend?: MendSettings;
  scopes: Scope[];
}

/** The policy after `inherits` is resolved; scopes still apply per file. */
export interface Policy {
  /** "builtin" when no policy file exists and the defaults apply. */
  source: 'file' | 'builtin';
  /** The policy file and the files it inherits, the inheriting file first. */
  files: string[];
  designs: DesignGlob[];
  exclude: string[];
  seed: number;
  rValue: RValueSpec;
  challenges: ChallengeDef[];
  requirements: Requirement[];
  weakening: WeakeningRule;
  removedDesigns: { severity: RemovedSeverity; where?: Where };
  budget: Budget;
  /** Mend settings, the inheriting file's keys over the inherited file's. */
  mend?: MendSettings;
  /** Scopes of every file of the chain, the most basic file's first. */
  scopes: PolicyScope[];
  /** Depth of the file each definition came from (0 = the most basic): a definition may
   *  not loosen one from its own or a more basic file. */
  layers: { requirements: number[]; weakening: number; removed: number; budget: number };
}

export interface PolicyScope extends Scope {
  layer: number;
}

/** What applies to one design file. */
export interface FilePolicy {
  rValue: RValueSpec;
  seed: number;
  challenges: ChallengeDef[];
  requirements: Requirement[];
  weakening: WeakeningRule;
  removedDesigns: RemovedSeverity;
  budget: ResolvedBudget;
  format?: DesignFormat;
  mend?: MendSettings;
}
