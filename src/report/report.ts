// The JSON report: the one contract between the gate and every view (terminal, markdown
// summary, PR comment, annotations, SARIF, HTML). Versioned; `merge` must keep reading
// reports of older versions. Keep it deterministic: no timings, no absolute paths, no dates.

import type { AttackCurve, Contingency, Envelope, RValueSpec } from '../envelope/types.js';
import type { DesignMap, OmittedMap } from '../map/types.js';
import type { MendReport } from '../mend/types.js';

export const REPORT_VERSION = 1;

export type FileStatus = 'pass' | 'regressed' | 'below-threshold' | 'new' | 'removed' | 'renamed' | 'error';
export type Severity = 'fail' | 'warn' | 'notice';

export interface ReportElement {
  id: string;
  kind: 'node' | 'link' | 'group';
  /** 1-based line in the design file (head side unless the element only exists at base). */
  line: number;
}

/** One requirement of the policy, judged on one file: the rows of the requirement table. */
export interface RequirementResult {
  /** Stable id, e.g. "threshold:random-nodes@0.2:q0.1" or "no-new-spof". */
  id: string;
  /** Plain words, e.g. "10 % quantile of R at 20 % nodes removed ≥ 0.60". */
  description: string;
  severity: Severity;
  base: number | null;
  head: number | null;
  /** head − base, paired; null when one side is missing. */
  delta: number | null;
  /** Standard error of the delta (Monte Carlo); 0 for deterministic quantities. */
  se: number | null;
  /** The floor (or ceiling) the head must respect, when the requirement has one. */
  threshold: number | null;
  /** met: fine; missed: below threshold; regressed: dropped beyond tolerance;
   *  within-noise: dropped, but by less than the Monte Carlo error; uncertain: could not be
   *  judged with enough confidence (never reported as met). */
  status: 'met' | 'missed' | 'regressed' | 'within-noise' | 'uncertain';
}

export interface Finding {
  /** Finding kind; also the SARIF rule id (stable). */
  rule:
    | 'r-threshold'
    | 'area-floor'
    | 'spread-ceiling'
    | 'n-1'
    | 'new-bridge'
    | 'new-cut-node'
    | 'regression'
    | 'weakest-sequence'
    | 'parse-error'
    | 'removed-design'
    | 'policy-changed'
    | 'degraded';
  /** The requirement id this finding is about, when there is one. */
  requirement?: string;
  severity: Severity;
  message: string;
  base?: number | null;
  head?: number | null;
  delta?: number | null;
  se?: number | null;
  /** Elements that cause the finding, in order (a weakest sequence is ordered). */
  elements: ReportElement[];
  /** Line to annotate: the first element's, or the error's. */
  line: number;
  column?: number;
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
}

export interface FileReport {
  path: string;
  /** For renamed files: the base-side path. */
  previousPath?: string;
  status: FileStatus;
  format?: string;
  findings: Finding[];
  requirements: RequirementResult[];
  head?: Evaluation;
  base?: Evaluation;
  /** For status "error": what could not be read. */
  error?: { message: string; line: number; column: number };
  /** Elements added and removed by the change (nodes by id, links by their ends), head lines for added, base lines for removed. */
  changes?: { added: ReportElement[]; removed: ReportElement[] };
  /** Where each site and link is drawn, base and head together (src/map/). */
  map?: DesignMap | OmittedMap;
  /** For a failing design: what would mend it (src/mend/). */
  mend?: MendReport;
}

export interface Report {
  version: typeof REPORT_VERSION;
  tool: { name: 'netbrace'; version: string };
  verdict: 'pass' | 'fail';
  mode: 'enforce' | 'advise';
  policy: {
    /** "file": read from the repository; "builtin": no policy file, defaults applied. */
    source: 'file' | 'builtin';
    path?: string;
    /** The revision the policy was read from (base by default). */
    revision?: string;
    /** True when the change under review modifies the policy itself (reported, not applied). */
    changed?: boolean;
    /** The policy file and the files it extends, the extending file first. */
    files?: string[];
    /** A plain sentence about the policy, e.g. why a changed policy was not applied. */
    note?: string;
  };
  base?: string;
  head?: string;
  seed: number;
  /** When this run evaluated one shard of the changed designs (index is 1-based: shard k of n). */
  shard?: { index: number; total: number };
  /** Set by mergeReports: the shards merged into this report (1-based), out of `total`. */
  shards?: { total: number; merged: number[] };
  /** What the run judged: the changed designs, the given paths, or every design (thresholds only). */
  scope?: 'changed' | 'paths' | 'all';
  counts: Record<FileStatus, number>;
  files: FileReport[];
  /** The plain statement that the tool informs engineering judgement and does not replace it. */
  caution: string;
}

export const CAUTION =
  'netbrace evaluates topology-level robustness under the stated assumptions (the metrics, challenges ' +
  'and removal models in the policy). It informs engineering judgement; it does not replace engineering ' +
  'studies. Local codes, regulators\u2019 standards and licensed practice decide for real infrastructure, ' +
  'power systems especially.';

/** Significant digits kept in the JSON report: enough for any R, few enough that engines that
 *  differ in the last bits of Math.exp/log still write the same bytes (SCIENCE.md §8). */
export const REPORT_DIGITS = 12;

/** The report as JSON: stable key order (construction order), numbers rounded to REPORT_DIGITS
 *  significant digits, non-finite numbers as null, two-space indent, final newline. */
export function serializeReport(report: Report): string {
  return `${JSON.stringify(
    report,
    (_key, value: unknown) => {
      if (typeof value !== 'number') return value;
      if (!Number.isFinite(value)) return null;
      if (Number.isInteger(value)) return value;
      const rounded = Number(value.toPrecision(REPORT_DIGITS));
      return Object.is(rounded, -0) ? 0 : rounded;
    },
    2,
  )}\n`;
}
