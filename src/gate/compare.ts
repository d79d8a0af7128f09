// One design file, base against head, under the rules that apply to it: every requirement
// becomes a row (base, head, delta ± se, status) and, where something needs saying, a
// finding with its elements and lines. Pure.
//
// Judging a value (higher is better, except spread):
//   not-computable  the value (head, base or delta) is NaN or infinite    → failure, whatever the severity
//   short         the head misses the floor (or ceiling), or the head can no longer be judged
//                 while the base could (the change removed the coordinates, risk groups...
//                 the requirement needs)                                → finding at the requirement's severity
//   unsettled     the head meets it, but the confidence interval of the quantile reaches past it,
//                 or the work behind it was cut by the budget (N−1 cases left out, a greedy
//                 worst case instead of the exact one), or the budget cut the realizations and
//                 the value clears the floor by no more than REDUCED_MARGIN_SE standard errors
//                 of its own (a minimum over cut realizations: always, since the minimum of
//                 fewer can only be higher), or the value could not be computed on either side
//                                                                       → notice / warning, never "holds"
//   weakened      it dropped from base by more than the allowance, and by at least
//                 error-multiple × se                                     → finding at the weakening severity,
//                                                                         never graver than the requirement's
//   inside-error  it dropped, but by less than error-multiple × se        → notice: Monte Carlo noise, not a failure
//   not-applicable  a tracked value (no floor) whose challenge the design gives no data for on
//                 either side (no risk groups, no coordinates)            → no finding: nothing is required
//   holds         otherwise; a drop inside the allowance is a notice, a change of exactly 0 says nothing
// On realizations cut by the budget a drop is judged both ways: weakened only when it exceeds
// the allowance by more than error-multiple × se, a notice when it stays below the allowance by
// more than that, and unsettled in between; when the budget cut base and head differently
// their realizations do not pair, and the change is unsettled whatever its sign. Every
// requirement whose value rests on reduced work says so in a finding of its own.
// Every comparison is written so that a NaN falls to the failing side (`!(x <= limit)`, not
// `x > limit`), and messages print the digits that decide (describe.ts, decidingDecimals).
// A new single point of failure is a bridge, cut node or stranding shared-risk group of the head
// that the base does not have, base and head matched by id and, for renamed ids, by
// neighbourhood (spof.ts, rename.ts); hardened elements never count, but weak points hidden
// by newly hardened ones are findings of their own. Each kind is a row of its own.

import type { ElementKind } from '../graph/element.js';
import type {
  Finding,
  FileReport,
  FileStatus,
  FindingStatus,
  RequirementResult,
  RequirementSubject,
  Severity,
} from '../report/report.js';
import type { ReportElement } from '../graph/element.js';
import type { ChallengeDef, FilePolicy, Requirement, WeakeningRule } from '../policy/types.js';
import { withSequenceDetails } from './consequence.js';
import {
  changeDecimals,
  decidingDecimals,
  describeRequirement,
  attributeChanges,
  elementChanges,
  formatDelta,
  formatR,
} from './describe.js';
import { identityMatching, matchDesigns } from './rename.js';
import { judgeSpof } from './spof.js';

/** Finding rules of new single points of failure (a failing one makes the file "weakened"). */
const SPOF_RULES = new Set<Finding['rule']>([
  'new-bridge',
  'new-cut-node',
  'new-stranding-group',
  'hardened-weak-point',
]);

import { type DesignSide, locate, measure, type Measured } from './measure.js';
import { decide, type Decision } from './decide.js';

export type { DesignSide };

export interface LocatedProblem {
  message: string;
  line: number;
  column: number;
}

export interface CompareInput {
  path: string;
  previousPath?: string;
  change: 'added' | 'modified' | 'renamed' | 'deleted' | 'unchanged';
  /** Judge thresholds only (no base comparison): scheduled runs and new files. */
  thresholdsOnly?: boolean;
  policy: FilePolicy;
  format?: string;
  head?: DesignSide;
  base?: DesignSide;
  /** The head could not be read (parse error): the file fails with this line. */
  headError?: LocatedProblem;
  /** The head was read, but R cannot be computed on it (a metric of R does not apply): the file fails. */
  headUnsupported?: LocatedProblem;
  /** The base could not be read (or R cannot be computed on it): the head is judged on thresholds only. */
  baseError?: LocatedProblem;
}

/** Values closer than this (relative) are the same: no "−0.000" regressions. */
const SAME = 1e-12;

/**
 * On realizations cut by the budget, a value meets its floor only when it clears it by more
 * than this many of its own standard errors (about 97.7 % one-sided under a normal
 * approximation; common practice).
 */
export const REDUCED_MARGIN_SE = 2;

const GRAVITY: Record<Severity, number> = { fail: 0, warn: 1, notice: 2 };

/** The milder of two severities: a regression finding is never graver than its requirement. */
function milder(a: Severity, b: Severity): Severity {
  return GRAVITY[a] >= GRAVITY[b] ? a : b;
}

/** An unsettled judgement is a warning, or a notice where the rule itself is only a notice. */
function unsettledSeverity(severity: Severity): Severity {
  return severity === 'notice' ? 'notice' : 'warn';
}

const THRESHOLD_RULE: Record<Exclude<Requirement['kind'], 'no-new-spof'>, Finding['rule']> = {
  'r-threshold': 'r-threshold',
  'area-floor': 'area-floor',
  'spread-ceiling': 'spread-ceiling',
  'n-1': 'n-1',
};

function elementsOf(list: { id: string; kind: ElementKind }[], head?: DesignSide, base?: DesignSide): ReportElement[] {
  return list.map((e) => locate(e, head?.graph, base?.graph));
}

function finding(
  rule: Finding['rule'],
  severity: Severity,
  message: string,
  elements: ReportElement[],
  extra: Partial<Finding> = {},
): Finding {
  const line = extra.line ?? elements.find((e) => e.line > 0)?.line ?? 0;
  return { rule, severity, message, ...extra, elements, line };
}

function numbers(m: Measured): Pick<Finding, 'base' | 'head' | 'delta' | 'se'> {
  return { base: m.base, head: m.head, delta: m.delta, se: m.se };
}

/** What a requirement measures, as data for the views (RequirementResult.subject). */
function subjectOf(r: Requirement, challenges: readonly ChallengeDef[], higherIsBetter: boolean): RequirementSubject {
  const subject: RequirementSubject = { kind: r.kind, higherIsBetter };
  if (r.kind === 'n-1') {
    subject.remove = r.element === 'node' ? 'nodes' : 'links';
    return subject;
  }
  if (!('challenge' in r)) return subject;
  subject.challenge = r.challenge;
  const c = challenges.find((x) => x.name === r.challenge);
  if (c) {
    subject.remove = c.remove;
    subject.order = c.random ? 'random' : c.order;
    if (c.adaptive) subject.adaptive = true;
  }
  if (r.kind === 'r-threshold') {
    if (r.at !== undefined) subject.at = r.at;
    const st = r.statistic;
    subject.statistic =
      st.kind === 'quantile'
        ? { kind: 'quantile', q: st.q }
        : st.kind === 'worst-case'
          ? { kind: 'worst-case', removals: st.removals }
          : { kind: st.kind };
  }
  return subject;
}

function floorOf(r: Requirement): number | null {
  if (r.kind === 'spread-ceiling') return r.max;
  if (r.kind === 'no-new-spof') return null;
  return r.min ?? null;
}

/** Which of a measured value's numbers is NaN or infinite, in words; undefined when all are finite. */
function notFinite(m: Measured): string | undefined {
  const named: [string, number | null][] = [
    ['head value', m.head],
    ['base value', m.base],
    ['delta', m.delta],
  ];
  const bad = named.filter(([, v]) => v !== null && !Number.isFinite(v));
  if (!bad.length) return undefined;
  return `the ${bad.map(([n, v]) => `${n} is ${String(v)}`).join(' and the ')}, not a finite number`;
}

/** How a drop from base to head is judged (see the header); NaN falls to "weakened" or "unsettled". */
function classifyDrop(
  drop: number,
  allowance: number,
  noise: number,
  reduced: boolean,
): Exclude<FindingStatus, 'short' | 'reduced-work' | 'not-computable'> {
  if (reduced) {
    if (drop > allowance + noise) return 'weakened';
    if (drop <= allowance - noise) return 'within-allowance';
    return 'unsettled';
  }
  if (drop < noise) return 'inside-error';
  if (drop <= allowance) return 'within-allowance';
  return 'weakened';
}

type Judged = { rows: RequirementResult[]; findings: Finding[] };
type RowStatus = RequirementResult['status'];

/** What the floor and the weakening judgement of one requirement share. */
export interface Judging {
  r: Requirement;
  m: Measured;
  /** The head value, known to be finite (judge() has dealt with a missing or broken one). */
  headValue: number;
  description: string;
  /** The floor (or ceiling) the requirement sets; null for a tracked value. */
  threshold: number | null;
  rule: Finding['rule'];
  elements: ReportElement[];
  /** The fields every finding of this requirement carries. */
  extra: Partial<Finding>;
}

/** The head against the floor (or ceiling): short, unsettled (interval, cut work, thin margin) or holds. */
export function judgeFloor(j: Judging): { status: RowStatus; findings: Finding[] } {
  const { r, m, headValue, description, threshold, rule, elements, extra } = j;
  let status: RowStatus = 'holds';
  const findings: Finding[] = [];
  // Meets the limit, with a NaN on either side counting as not meeting it.
  const meets = (v: number, limit: number) => (m.higherIsBetter ? v >= limit : v <= limit);
  const limitWord = m.higherIsBetter ? 'floor' : 'ceiling';
  /** A value beside the limit it is judged against, at the digits that tell them apart. */
  const against = (v: number, limit: number) => formatR(v, decidingDecimals(v, limit));

  if (threshold !== null && !meets(headValue, threshold)) {
    status = 'short';
    const relation = m.higherIsBetter ? 'is below' : 'is above';
    const d = decidingDecimals(headValue, threshold);
    findings.push(
      finding(rule, r.severity, `${description}: ${against(headValue, threshold)} ${relation} ${threshold}`, elements, {
        ...extra,
        status: 'short',
        ...(d > 3 ? { decimals: d } : {}),
      }),
    );
  } else if (threshold !== null && m.incomplete !== undefined) {
    // Met by incomplete work: not proven, so not "holds".
    status = 'unsettled';
    findings.push(
      finding(
        rule,
        unsettledSeverity(r.severity),
        `${description}: ${against(headValue, threshold)} meets it, but ${m.incomplete}`,
        elements,
        {
          ...extra,
          status: 'unsettled',
        },
      ),
    );
  } else if (
    threshold !== null &&
    m.lo !== undefined &&
    m.hi !== undefined &&
    !meets(m.higherIsBetter ? m.lo : m.hi, threshold)
  ) {
    status = 'unsettled';
    const edge = m.higherIsBetter ? m.lo : m.hi;
    const cut = m.reduced !== undefined ? `; ${m.reduced}` : '';
    const d = Math.max(decidingDecimals(headValue, threshold), decidingDecimals(edge, threshold));
    findings.push(
      finding(
        rule,
        m.reduced !== undefined ? unsettledSeverity(r.severity) : 'notice',
        `${description}: ${formatR(headValue, d)} meets it, but its confidence interval reaches ${formatR(edge, d)}; more realizations would settle it${cut}`,
        elements,
        { ...extra, status: 'unsettled' },
      ),
    );
  } else if (threshold !== null && m.headSe !== undefined && r.kind === 'r-threshold' && r.statistic.kind === 'min') {
    // The least of fewer realizations is never below the least of all of them: not proven.
    status = 'unsettled';
    findings.push(
      finding(
        rule,
        unsettledSeverity(r.severity),
        `${description}: ${against(headValue, threshold)} meets it, but ${m.reduced}, and the minimum of fewer realizations can only be higher than that of all of them`,
        elements,
        { ...extra, status: 'unsettled' },
      ),
    );
  } else if (
    threshold !== null &&
    m.sourceSe !== undefined &&
    m.sources !== undefined &&
    !((m.higherIsBetter ? headValue - threshold : threshold - headValue) > REDUCED_MARGIN_SE * m.sourceSe)
  ) {
    // Met by an R estimated from sampled sources, by a margin that estimate's own error does not clear.
    status = 'unsettled';
    const margin = m.higherIsBetter ? headValue - threshold : threshold - headValue;
    const needed = REDUCED_MARGIN_SE * m.sourceSe;
    const d = decidingDecimals(margin, needed);
    findings.push(
      finding(
        rule,
        unsettledSeverity(r.severity),
        `${description}: ${against(headValue, threshold)} meets it, but efficiency searched from ${m.sources.sources.toLocaleString('en')} of ${m.sources.nodes.toLocaleString('en')} sites, and it clears the ${limitWord} by ${formatR(margin, d)}, not by more than ${REDUCED_MARGIN_SE} standard errors of that estimate (${REDUCED_MARGIN_SE} \u00d7 ${formatR(m.sourceSe, d)}); more sources (r-value sources) would settle it`,
        elements,
        { ...extra, status: 'unsettled' },
      ),
    );
  } else if (threshold !== null && m.headSe !== undefined) {
    const margin = m.higherIsBetter ? headValue - threshold : threshold - headValue;
    const needed = REDUCED_MARGIN_SE * m.headSe;
    if (!(margin > needed)) {
      // Met on realizations the budget cut, by a margin their own error does not clear.
      status = 'unsettled';
      const d = decidingDecimals(margin, needed);
      const se = Number.isFinite(m.headSe) ? formatR(m.headSe, d) : 'unknown';
      findings.push(
        finding(
          rule,
          unsettledSeverity(r.severity),
          `${description}: ${against(headValue, threshold)} meets it, but ${m.reduced}, and it clears the ${limitWord} by ${formatR(margin, d)}, not by more than ${REDUCED_MARGIN_SE} standard errors (${REDUCED_MARGIN_SE} \u00d7 ${se})`,
          elements,
          { ...extra, status: 'unsettled' },
        ),
      );
    }
  }

  return { status, findings };
}

/**
 * Base against head under the policy's weakening rule: weakened, unsettled, inside the error,
 * within the allowance, or nothing (a rise or no change). `status` is the floor's verdict; a
 * "short" is never softened.
 */
export function judgeWeakening(
  j: Judging,
  policyRule: WeakeningRule,
  floorStatus: RowStatus,
): { status: RowStatus; findings: Finding[] } {
  const { r, m, headValue, description, elements, extra } = j;
  let status = floorStatus;
  const findings: Finding[] = [];
  const regressionSeverity = milder(policyRule.severity, r.severity);
  if (m.base !== null && m.delta !== null && m.se !== null && m.unpaired !== undefined) {
    // Reduced differently on the two sides: the realizations do not pair, so no delta is judged.
    if (status === 'holds') status = 'unsettled';
    findings.push(
      finding(
        'regression',
        unsettledSeverity(regressionSeverity),
        `${description}: from ${formatR(m.base)} to ${formatR(headValue)}, but ${m.unpaired}; the change cannot be judged`,
        elements,
        { ...extra, status: 'unsettled' },
      ),
    );
  } else if (m.base !== null && m.delta !== null && m.se !== null) {
    const base = m.base;
    const drop = m.higherIsBetter ? -m.delta : m.delta;
    // A rise, no change, or a drop within rounding says nothing (written so that NaN does not pass).
    if (!(drop <= SAME * Math.max(1, Math.abs(base)))) {
      const allowance = Math.max(policyRule.allowedDrop ?? 0, (policyRule.allowedRelativeDrop ?? 0) * Math.abs(base));
      const noise = policyRule.errorMultiple * m.se;
      const reduced = m.reduced !== undefined;
      const outcome = classifyDrop(drop, allowance, noise, reduced);
      // The digits that decide: the drop against the allowance (and the noise band around it).
      const digits = (limit: number) => changeDecimals(base, headValue, m.higherIsBetter, limit);
      const d =
        outcome === 'inside-error'
          ? digits(noise)
          : reduced
            ? Math.max(digits(allowance), digits(outcome === 'weakened' ? allowance + noise : allowance - noise))
            : digits(allowance);
      const verb = m.higherIsBetter ? 'dropped' : 'rose';
      const change = `${verb} from ${formatR(base, d)} to ${formatR(headValue, d)} (\u0394 ${formatDelta(m.delta, m.se, d)})`;
      const allowed = formatR(allowance, d);
      const k = policyRule.errorMultiple;
      const data = { ...extra, allowance, status: outcome, ...(d > 3 ? { decimals: d } : {}) };
      if (outcome === 'weakened') {
        if (status !== 'short') status = 'weakened';
        const beyond = reduced ? ` by more than ${k} \u00d7 its error; ${m.reduced}` : '';
        findings.push(
          finding(
            'regression',
            regressionSeverity,
            `${description}: ${change}, more than the allowed ${allowed}${beyond}`,
            elements,
            data,
          ),
        );
      } else if (outcome === 'unsettled') {
        // On cut realizations the drop is within error-multiple × se of the allowance: either side of it.
        if (status === 'holds') status = 'unsettled';
        findings.push(
          finding(
            'regression',
            unsettledSeverity(regressionSeverity),
            `${description}: ${change}, within ${k} \u00d7 its error of the allowed ${allowed}, so it cannot be told whether it is beyond it: ${m.reduced}`,
            elements,
            data,
          ),
        );
      } else if (outcome === 'inside-error') {
        if (status === 'holds') status = 'inside-error';
        findings.push(
          finding(
            'regression',
            'notice',
            `${description}: ${change}, less than ${k} \u00d7 its Monte Carlo error (${formatR(noise, d)}): inside the error, not a failure`,
            elements,
            data,
          ),
        );
      } else {
        const margin = reduced ? ` by more than ${k} \u00d7 its error; ${m.reduced}` : '';
        findings.push(
          finding(
            'regression',
            'notice',
            `${description}: ${change}, within the allowed ${allowed}${margin}`,
            elements,
            data,
          ),
        );
      }
    }
  }
  return { status, findings };
}

function judge(r: Requirement, input: CompareInput, description: string): Judged {
  const head = input.head!;
  const comparing = !input.thresholdsOnly && input.base !== undefined;
  const m = measure(r, input.policy.challenges, head, comparing ? input.base : undefined);
  const threshold = floorOf(r);
  const row: RequirementResult = {
    id: r.id,
    description,
    severity: r.severity,
    base: m.base,
    head: m.head,
    delta: m.delta,
    se: m.se,
    threshold,
    status: 'holds',
    subject: subjectOf(r, input.policy.challenges, m.higherIsBetter),
  };
  const findings: Finding[] = [];
  // A sequential run: the random requirements are decided by confidence sequences (decide.ts).
  const decision = m.missing === undefined && m.head !== null ? sequentialDecision(r, input, m, threshold) : undefined;
  if (decision) {
    const needed = head.result.sequential!.needed.get(r.id);
    if (needed !== undefined) row.realizations = needed;
    row.bounds = { head: decision.head, ...(decision.delta ? { delta: decision.delta } : {}) };
  }
  const byCs = decision !== undefined && !decision.needsAll;
  const elements = elementsOf(m.elements, head, input.base);
  const rule = THRESHOLD_RULE[r.kind as keyof typeof THRESHOLD_RULE];
  const extra = { requirement: r.id, ...numbers(m), ...(threshold !== null ? { threshold } : {}) };
  const result = (): Judged => ({ rows: [row], findings });

  if (m.missing !== undefined || m.head === null) {
    const why = m.missing ?? 'no value';
    if (m.base !== null) {
      // The base could be judged and the head cannot: the change took away what the requirement needs.
      row.status = 'short';
      findings.push(
        finding(
          rule,
          r.severity,
          `${description}: the head can no longer be judged, though the base could (${formatR(m.base)}): ${why}`,
          [],
          {
            ...extra,
            status: 'short',
          },
        ),
      );
    } else if (m.notApplicable && threshold === null) {
      // A tracked value (no floor) on a challenge the design gives no data for: nothing is required.
      row.status = 'not-applicable';
    } else {
      // A floor the policy sets cannot be judged: never "holds".
      row.status = 'unsettled';
      findings.push(
        finding(rule, unsettledSeverity(r.severity), `${description}: could not be judged: ${why}`, [], {
          ...extra,
          status: 'unsettled',
        }),
      );
    }
    return result();
  }
  const broken = notFinite(m);
  if (broken !== undefined) {
    // A NaN or infinite R says the computation failed, not that the design is robust.
    row.status = 'unsettled';
    findings.push(
      finding(
        'not-computable',
        'fail',
        `${description}: ${broken}; a value that cannot be computed is never a pass`,
        elements,
        {
          ...extra,
          status: 'not-computable',
        },
      ),
    );
    return result();
  }

  const j: Judging = { r, m, headValue: m.head, description, threshold, rule, elements, extra };
  const floor = byCs && threshold !== null ? judgeFloorByCs(j, decision!, ranOf(input, r)) : judgeFloor(j);
  const paired = m.base !== null && m.delta !== null && m.se !== null && m.unpaired === undefined;
  const weakening =
    byCs && paired && decision!.weakening !== undefined
      ? judgeWeakeningByCs(m, decision!, {
          description,
          elements,
          extra,
          status: floor.status,
          severity: milder(input.policy.weakening.severity, r.severity),
          policy: input.policy,
          ran: ranOf(input, r),
        })
      : judgeWeakening(j, input.policy.weakening, floor.status);
  row.status = weakening.status;
  findings.push(...floor.findings, ...weakening.findings);
  // The digits the judging was stated at, for views that word the row themselves.
  const decimals = Math.max(3, ...findings.map((f) => f.decimals ?? 3));
  if (decimals > 3) row.decimals = decimals;
  // Every requirement judged on reduced work says so, once.
  const reducedWork = m.reduced ?? m.incomplete;
  if (reducedWork !== undefined && !findings.some((f) => f.message.includes(reducedWork))) {
    findings.push(
      finding(rule, 'notice', `${description}: judged on reduced work, ${reducedWork}`, [], {
        requirement: r.id,
        status: 'reduced-work',
        line: 0,
      }),
    );
  }
  return result();
}

/** The confidence-sequence decisions of a requirement in a sequential run, else undefined. */
function sequentialDecision(
  r: Requirement,
  input: CompareInput,
  m: Measured,
  threshold: number | null,
): Decision | undefined {
  const head = input.head!;
  if (!head.result.sequential) return undefined;
  const comparing = !input.thresholdsOnly && input.base !== undefined && m.base !== null && m.unpaired === undefined;
  const challenge = 'challenge' in r ? input.policy.challenges.find((x) => x.name === r.challenge) : undefined;
  return decide({
    requirement: r,
    challenge,
    head: head.result,
    ...(comparing ? { base: input.base!.result } : {}),
    weakening: input.policy.weakening,
    baseValue: comparing ? m.base : null,
    threshold,
    higherIsBetter: m.higherIsBetter,
  });
}

/** Realizations the head's envelope of a requirement's challenge ran. */
function ranOf(input: CompareInput, r: Requirement): number {
  const c = 'challenge' in r ? input.policy.challenges.find((x) => x.name === r.challenge) : undefined;
  return input.head!.result.evaluation.envelopes.find((e) => e.challenge === c?.engine)?.realizations ?? 0;
}

interface CsContext {
  description: string;
  elements: ReportElement[];
  extra: Partial<Finding>;
  /** The floor's verdict; a "short" is never softened. */
  status: RowStatus;
  severity: Severity;
  policy: FilePolicy;
  ran: number;
}

/** The head against its floor in a sequential run: short by the estimate, unsettled while the confidence sequence reaches past it, else holds. */
function judgeFloorByCs(j: Judging, d: Decision, ran: number): { status: RowStatus; findings: Finding[] } {
  const { r, m, headValue, description, threshold, rule, elements, extra } = j;
  const meets = m.higherIsBetter ? headValue >= threshold! : headValue <= threshold!;
  if (!meets || d.needsAll) return judgeFloor(j);
  if (d.floor !== 'open') return { status: 'holds', findings: [] };
  // Met by the estimate, but the confidence sequence still reaches past the limit at the most realizations allowed.
  const edge = m.higherIsBetter ? d.head.lo : d.head.hi;
  const dd = Math.max(decidingDecimals(headValue, threshold!), decidingDecimals(edge, threshold!));
  const cut = m.reduced !== undefined ? `; ${m.reduced}` : '';
  return {
    status: 'unsettled',
    findings: [
      finding(
        rule,
        unsettledSeverity(r.severity),
        `${description}: ${formatR(headValue, dd)} meets it, but after ${ran} realizations its confidence sequence still reaches ${formatR(edge, dd)}, so it is not settled${cut}`,
        elements,
        { ...extra, status: 'unsettled' },
      ),
    ],
  };
}

/** A drop judged by the confidence sequence of the change: beyond, within, or (at the most realizations allowed) not settled. */
function judgeWeakeningByCs(m: Measured, d: Decision, c: CsContext): { status: RowStatus; findings: Finding[] } {
  const out = { status: c.status, findings: [] as Finding[] };
  const base = m.base!;
  const headValue = m.head!;
  const drop = m.higherIsBetter ? -m.delta! : m.delta!;
  if (drop <= SAME * Math.max(1, Math.abs(base)) && d.weakening !== 'beyond') return out;
  const rule = c.policy.weakening;
  const allowance = Math.max(rule.allowedDrop ?? 0, (rule.allowedRelativeDrop ?? 0) * Math.abs(base));
  const noise = rule.errorMultiple * m.se!;
  const dropLo = m.higherIsBetter ? -d.delta!.hi : d.delta!.lo;
  const dropHi = m.higherIsBetter ? -d.delta!.lo : d.delta!.hi;
  const digits = (limit: number) => changeDecimals(base, headValue, m.higherIsBetter, limit);
  const dd = Math.max(digits(allowance), digits(dropLo), digits(dropHi));
  const verb = m.higherIsBetter ? 'dropped' : 'rose';
  const change = `${verb} from ${formatR(base, dd)} to ${formatR(headValue, dd)} (\u0394 ${formatDelta(m.delta!, m.se, dd)})`;
  const allowed = formatR(allowance, dd);
  const range = `its confidence sequence puts the drop between ${formatR(dropLo, dd)} and ${formatR(dropHi, dd)} after ${c.ran} realizations`;
  if (d.weakening === 'beyond') {
    if (out.status !== 'short') out.status = 'weakened';
    out.findings.push(
      finding(
        'regression',
        c.severity,
        `${c.description}: ${change}, more than the allowed ${allowed}: ${range}`,
        c.elements,
        { ...c.extra, allowance, status: 'weakened' },
      ),
    );
  } else if (d.weakening === 'open') {
    if (out.status === 'holds') out.status = 'unsettled';
    const cut = m.reduced !== undefined ? `; ${m.reduced}` : '';
    out.findings.push(
      finding(
        'regression',
        unsettledSeverity(c.severity),
        `${c.description}: ${change}; ${range}, on both sides of the allowed ${allowed}, so it is not settled${cut}`,
        c.elements,
        { ...c.extra, allowance, status: 'unsettled' },
      ),
    );
  } else if (drop < noise) {
    if (out.status === 'holds') out.status = 'inside-error';
    out.findings.push(
      finding(
        'regression',
        'notice',
        `${c.description}: ${change}, less than ${rule.errorMultiple} \u00d7 its Monte Carlo error (${formatR(noise, dd)}): inside the error, not a failure; ${range}`,
        c.elements,
        {
          ...c.extra,
          allowance,
          status: 'inside-error',
        },
      ),
    );
  } else {
    out.findings.push(
      finding(
        'regression',
        'notice',
        `${c.description}: ${change}, within the allowed ${allowed}: ${range}`,
        c.elements,
        { ...c.extra, allowance, status: 'within-allowance' },
      ),
    );
  }
  return out;
}

/** Which status a judged file has, from its findings (only fail-severity findings change it). */
export function fileStatus(change: CompareInput['change'], findings: readonly Finding[]): FileStatus {
  const failing = findings.filter((f) => f.severity === 'fail');
  if (failing.some((f) => f.rule === 'parse-error' || f.rule === 'not-computable')) return 'unreadable';
  const thresholdRules = new Set<Finding['rule']>(Object.values(THRESHOLD_RULE));
  if (failing.some((f) => thresholdRules.has(f.rule))) return 'below-floor';
  if (failing.some((f) => f.rule === 'regression' || SPOF_RULES.has(f.rule))) return 'weakened';
  if (change === 'added') return 'new';
  if (change === 'renamed') return 'renamed';
  return 'holds';
}

export function compareDesign(input: CompareInput): FileReport {
  const report: FileReport = { path: input.path, status: 'holds', findings: [], requirements: [] };
  if (input.previousPath !== undefined) report.previousPath = input.previousPath;
  if (input.format !== undefined) report.format = input.format;

  if (input.change === 'deleted') {
    report.status = 'removed';
    const severity = input.policy.removedDesigns;
    if (severity !== 'ignore') {
      report.findings.push(
        finding('removed-design', severity, 'the design file was deleted by this change', [], { line: 0 }),
      );
    }
    return report;
  }
  if (input.headError || input.headUnsupported || !input.head) {
    const e = input.headError ??
      input.headUnsupported ?? { message: 'the design could not be read', line: 0, column: 0 };
    report.status = 'unreadable';
    report.error = { message: e.message, line: e.line, column: e.column };
    const rule = input.headUnsupported && !input.headError ? 'not-computable' : 'parse-error';
    report.findings.push(
      finding(rule, 'fail', e.message, [], {
        line: e.line,
        column: e.column,
        ...(rule === 'not-computable' ? { status: 'not-computable' as const } : {}),
      }),
    );
    return report;
  }

  const effective: CompareInput = input.baseError ? { ...input, base: undefined, thresholdsOnly: true } : input;
  if (input.baseError) {
    report.findings.push(
      finding(
        'parse-error',
        'notice',
        `the base version could not be read (${input.baseError.message}); judged on thresholds only`,
        [],
        {
          line: 0,
        },
      ),
    );
  }
  const comparing = effective.base !== undefined && !effective.thresholdsOnly;
  const matching = !comparing
    ? undefined
    : effective.base!.graph === input.head.graph
      ? identityMatching(input.head.graph)
      : matchDesigns(effective.base!.graph, input.head.graph);
  for (const r of input.policy.requirements) {
    const description = describeRequirement(r, input.policy.challenges);
    const { rows, findings } =
      r.kind === 'no-new-spof'
        ? judgeSpof(r, description, input.head, comparing ? effective.base : undefined, matching)
        : judge(r, effective, description);
    report.requirements.push(...rows);
    report.findings.push(...findings);
  }
  for (const reason of input.head.result.evaluation.degraded) {
    report.findings.push(finding('degraded', 'notice', `head evaluation reduced: ${reason}`, [], { line: 0 }));
  }
  if (effective.base && !effective.thresholdsOnly && effective.base.result !== input.head.result) {
    for (const reason of effective.base.result.evaluation.degraded) {
      report.findings.push(finding('degraded', 'notice', `base evaluation reduced: ${reason}`, [], { line: 0 }));
    }
  }
  report.head = withSequenceDetails(input.head.result.evaluation, input.head.graph);
  if (effective.base && !effective.thresholdsOnly) {
    report.base = withSequenceDetails(
      effective.base.result.evaluation,
      effective.base.result === input.head.result ? input.head.graph : effective.base.graph,
    );
    const changes = elementChanges(effective.base.graph, input.head.graph, matching!);
    // Attributes changed on elements both sides have (by id and link key), with both lines.
    const modified =
      effective.base.topology && input.head.topology
        ? attributeChanges(effective.base.topology, input.head.topology)
        : undefined;
    if (modified?.length) changes.modified = modified;
    if (
      changes.added.length +
        changes.removed.length +
        (changes.renamed?.length ?? 0) +
        (changes.hardened?.length ?? 0) +
        (changes.modified?.length ?? 0) >
      0
    )
      report.changes = changes;
  }
  report.status = fileStatus(input.change, report.findings);
  return report;
}
