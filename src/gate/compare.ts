// One design file, base against head, under the rules that apply to it: every requirement
// becomes a row (base, head, delta ± se, status) and, where something needs saying, a
// finding with its elements and lines. Pure.
//
// Judging a value (higher is better, except spread):
//   missed        the head misses the floor (or ceiling)                → finding at the requirement's severity
//   uncertain     the head meets it, but the confidence interval of the quantile reaches past it,
//                 or the work behind it was cut by the budget (N−1 cases left out, a greedy
//                 worst case instead of the exact one), or the budget cut the realizations and
//                 the value clears the floor by no more than REDUCED_MARGIN_SE standard errors
//                 of its own (a minimum over cut realizations: always, since the minimum of
//                 fewer can only be higher), or the value could not be computed
//                                                                       → notice / warning, never "met"
//   regressed     it dropped from base by more than the allowance, and by at least
//                 noise-factor × se                                     → finding at the regression severity
//   within-noise  it dropped, but by less than noise-factor × se        → notice: Monte Carlo noise, not a failure
//   met           otherwise; a drop inside the allowance is a notice
// On realizations cut by the budget a drop is judged both ways: regressed only when it exceeds
// the allowance by more than noise-factor × se, a notice when it stays below the allowance by
// more than that, and uncertain in between; when the budget cut base and head differently
// their realizations do not pair, and the change is uncertain whatever its sign. Every
// requirement whose value rests on reduced work says so in a finding of its own.
// A new single point of failure is a bridge (by the link's stable key, its end ids) or cut node
// (by node id) of the head that the base does not have; hardened elements never count, since
// challenges never remove them.

import type { ElementKind } from '../envelope/types.js';
import { findCutElements } from '../graph/structure.js';
import { linksByLine, nodesByLine } from '../graph/compact.js';
import type { Finding, FileReport, FileStatus, ReportElement, RequirementResult, Severity } from '../report/report.js';
import type { FilePolicy, Requirement, SpofRequirement } from '../policy/types.js';
import { describeRequirement, formatDelta, formatR } from './describe.js';

/** A standard error in findings: three decimals, or "unknown" when it cannot be estimated. */
function formatSe(se: number): string {
  return Number.isFinite(se) ? se.toFixed(3) : 'unknown';
}
import { type DesignSide, locate, measure, type Measured } from './measure.js';

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
  /** The base could not be read: the head is judged on thresholds only. */
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

/** An uncertain judgement is a warning, or a notice where the rule itself is only a notice. */
function uncertainSeverity(severity: Severity): Severity {
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

function floorOf(r: Requirement): number | null {
  if (r.kind === 'spread-ceiling') return r.max;
  if (r.kind === 'no-new-spof') return null;
  return r.min ?? null;
}

function judge(r: Requirement, input: CompareInput, description: string): { row: RequirementResult; findings: Finding[] } {
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
    status: 'met',
  };
  const findings: Finding[] = [];
  const elements = elementsOf(m.elements, head, input.base);
  const extra = { requirement: r.id, ...numbers(m) };
  if (m.missing !== undefined || m.head === null) {
    row.status = 'uncertain';
    findings.push(finding(THRESHOLD_RULE[r.kind as keyof typeof THRESHOLD_RULE], 'warn', `${description}: could not be judged: ${m.missing}`, [], extra));
    return { row, findings };
  }
  const better = (a: number, b: number) => (m.higherIsBetter ? a >= b : a <= b);
  const thresholdRule = THRESHOLD_RULE[r.kind as keyof typeof THRESHOLD_RULE];
  const margin = threshold === null ? 0 : m.higherIsBetter ? m.head - threshold : threshold - m.head;

  if (threshold !== null && !better(m.head, threshold)) {
    row.status = 'missed';
    const relation = m.higherIsBetter ? 'is below' : 'is above';
    findings.push(
      finding(THRESHOLD_RULE[r.kind as keyof typeof THRESHOLD_RULE], r.severity, `${description}: ${formatR(m.head)} ${relation} ${threshold}`, elements, extra),
    );
  } else if (threshold !== null && m.incomplete !== undefined) {
    // Met by incomplete work: not proven, so not "met".
    row.status = 'uncertain';
    findings.push(
      finding(THRESHOLD_RULE[r.kind as keyof typeof THRESHOLD_RULE], 'warn', `${description}: ${formatR(m.head)} meets it, but ${m.incomplete}`, elements, extra),
    );
  } else if (threshold !== null && m.lo !== undefined && m.hi !== undefined && !better(m.higherIsBetter ? m.lo : m.hi, threshold)) {
    row.status = 'uncertain';
    const edge = m.higherIsBetter ? m.lo : m.hi;
    const cut = m.reduced !== undefined ? `; ${m.reduced}` : '';
    findings.push(
      finding(
        thresholdRule,
        m.reduced !== undefined ? uncertainSeverity(r.severity) : 'notice',
        `${description}: ${formatR(m.head)} meets it, but its confidence interval reaches ${formatR(edge)}; more realizations would settle it${cut}`,
        elements,
        extra,
      ),
    );
  } else if (threshold !== null && m.headSe !== undefined && r.kind === 'r-threshold' && r.statistic.kind === 'min') {
    // The least of fewer realizations is never below the least of all of them: not proven.
    row.status = 'uncertain';
    findings.push(
      finding(
        thresholdRule,
        uncertainSeverity(r.severity),
        `${description}: ${formatR(m.head)} meets it, but ${m.reduced}, and the minimum of fewer realizations can only be higher than that of all of them`,
        elements,
        extra,
      ),
    );
  } else if (threshold !== null && m.headSe !== undefined && !(margin > REDUCED_MARGIN_SE * m.headSe)) {
    // Met on realizations the budget cut, by a margin their own error does not clear.
    row.status = 'uncertain';
    findings.push(
      finding(
        thresholdRule,
        uncertainSeverity(r.severity),
        `${description}: ${formatR(m.head)} meets it, but ${m.reduced}, and it clears the ${m.higherIsBetter ? 'floor' : 'ceiling'} by ${formatR(margin)}, not by more than ${REDUCED_MARGIN_SE} standard errors (${REDUCED_MARGIN_SE} \u00d7 ${formatSe(m.headSe)})`,
        elements,
        extra,
      ),
    );
  }

  if (m.base !== null && m.delta !== null && m.se !== null && m.unpaired !== undefined) {
    // Reduced differently on the two sides: the realizations do not pair, so no delta is judged.
    if (row.status === 'met') row.status = 'uncertain';
    const regression = input.policy.regression;
    findings.push(
      finding(
        'regression',
        uncertainSeverity(regression.severity),
        `${description}: from ${formatR(m.base)} to ${formatR(m.head)}, but ${m.unpaired}; the change cannot be judged`,
        elements,
        extra,
      ),
    );
  } else if (m.base !== null && m.delta !== null && m.se !== null) {
    const drop = m.higherIsBetter ? -m.delta : m.delta;
    if (drop > SAME * Math.max(1, Math.abs(m.base))) {
      const rule = input.policy.regression;
      const allowance = Math.max(rule.allowedDrop ?? 0, (rule.allowedRelativeDrop ?? 0) * Math.abs(m.base));
      const change = `from ${formatR(m.base)} to ${formatR(m.head)} (\u0394 ${formatDelta(m.delta, m.se)})`;
      const noise = rule.noiseFactor * m.se;
      const verb = m.higherIsBetter ? 'dropped' : 'rose';
      if (m.reduced !== undefined && !(drop > allowance + noise) && !(drop <= allowance - noise)) {
        // On cut realizations the drop is within noise-factor × se of the allowance: either side of it.
        if (row.status === 'met') row.status = 'uncertain';
        findings.push(
          finding(
            'regression',
            uncertainSeverity(rule.severity),
            `${description}: ${verb} ${change}, within ${rule.noiseFactor} \u00d7 its error of the allowed ${formatR(allowance)}, so it cannot be told whether it is beyond it: ${m.reduced}`,
            elements,
            extra,
          ),
        );
      } else if (m.reduced !== undefined && drop <= allowance - noise) {
        findings.push(
          finding('regression', 'notice', `${description}: ${verb} ${change}, within the allowed ${formatR(allowance)} by more than ${rule.noiseFactor} \u00d7 its error; ${m.reduced}`, elements, extra),
        );
      } else if (m.reduced !== undefined) {
        if (row.status !== 'missed') row.status = 'regressed';
        findings.push(
          finding(
            'regression',
            rule.severity,
            `${description}: ${verb} ${change}, more than the allowed ${formatR(allowance)} by more than ${rule.noiseFactor} \u00d7 its error; ${m.reduced}`,
            elements,
            extra,
          ),
        );
      } else if (drop < noise) {
        if (row.status === 'met') row.status = 'within-noise';
        findings.push(
          finding(
            'regression',
            'notice',
            `${description}: ${m.higherIsBetter ? 'dropped' : 'rose'} ${change}, less than ${rule.noiseFactor} \u00d7 its Monte Carlo error: within noise, not a failure`,
            elements,
            extra,
          ),
        );
      } else if (drop <= allowance) {
        findings.push(
          finding('regression', 'notice', `${description}: ${m.higherIsBetter ? 'dropped' : 'rose'} ${change}, within the allowed ${formatR(allowance)}`, elements, extra),
        );
      } else {
        if (row.status !== 'missed') row.status = 'regressed';
        findings.push(
          finding(
            'regression',
            rule.severity,
            `${description}: ${m.higherIsBetter ? 'dropped' : 'rose'} ${change}, more than the allowed ${formatR(allowance)}`,
            elements,
            extra,
          ),
        );
      }
    }
  }
  // Every requirement judged on reduced work says so, once.
  const reducedWork = m.reduced ?? m.incomplete;
  if (reducedWork !== undefined && !findings.some((f) => f.message.includes(reducedWork))) {
    findings.push(finding(thresholdRule, 'notice', `${description}: judged on reduced work, ${reducedWork}`, [], { requirement: r.id, line: 0 }));
  }
  return { row, findings };
}

interface SpofSet {
  bridges: Map<string, number>;
  cutNodes: Map<string, number>;
}

/** Bridges by stable link key and cut nodes by id, hardened ones left out; in file order. */
function spofs(side: DesignSide): SpofSet {
  const g = side.graph;
  const cuts = findCutElements(g);
  const bridges = new Map<string, number>();
  for (const e of linksByLine(g, cuts.bridges)) if (!g.linkHardened[e]) bridges.set(g.linkKeys[e], e);
  const cutNodes = new Map<string, number>();
  for (const v of nodesByLine(g, cuts.cutNodes)) if (!g.nodeHardened[v]) cutNodes.set(g.nodeIds[v], v);
  return { bridges, cutNodes };
}

function judgeSpof(r: SpofRequirement, input: CompareInput, description: string): { row: RequirementResult; findings: Finding[] } {
  const g = input.head!.graph;
  const head = spofs(input.head!);
  const comparing = !input.thresholdsOnly && input.base !== undefined;
  const base = comparing ? spofs(input.base!) : undefined;
  const count = (s: SpofSet) => (r.bridges ? s.bridges.size : 0) + (r.cutNodes ? s.cutNodes.size : 0);
  const row: RequirementResult = {
    id: r.id,
    description,
    severity: r.severity,
    base: base ? count(base) : null,
    head: count(head),
    delta: base ? count(head) - count(base) : null,
    se: base ? 0 : null,
    threshold: null,
    status: 'met',
  };
  const findings: Finding[] = [];
  if (!base) return { row, findings };
  if (r.bridges) {
    for (const [key, e] of head.bridges) {
      if (base.bridges.has(key)) continue;
      const el: ReportElement = { id: g.linkIds[e], kind: 'link', line: g.linkLine[e] };
      const ends = `${g.nodeIds[g.linkSource[e]]}\u2013${g.nodeIds[g.linkTarget[e]]}`;
      findings.push(
        finding('new-bridge', r.severity, `link ${el.id} (${ends}) is a new bridge: losing it splits the design, which the base did not`, [el], {
          requirement: r.id,
        }),
      );
    }
  }
  if (r.cutNodes) {
    for (const [id, v] of head.cutNodes) {
      if (base.cutNodes.has(id)) continue;
      const el: ReportElement = { id, kind: 'node', line: g.nodeLine[v] };
      findings.push(
        finding('new-cut-node', r.severity, `node ${id} is a new cut node: losing it splits the design, which the base did not`, [el], {
          requirement: r.id,
        }),
      );
    }
  }
  if (findings.length > 0) row.status = 'regressed';
  return { row, findings };
}

/** Nodes (by id) and links (by stable key) that the change added or removed. */
export function elementChanges(base: DesignSide, head: DesignSide): { added: ReportElement[]; removed: ReportElement[] } {
  const diff = (from: DesignSide, to: DesignSide): ReportElement[] => {
    const a = from.graph;
    const b = to.graph;
    const out: ReportElement[] = [];
    for (const v of nodesByLine(a, a.nodeIds.keys())) {
      const id = a.nodeIds[v];
      if (!b.nodeIndex.has(id)) out.push({ id, kind: 'node', line: a.nodeLine[v] });
    }
    const keys = new Set(b.linkKeys);
    for (const e of linksByLine(a, a.linkKeys.keys())) {
      if (!keys.has(a.linkKeys[e])) out.push({ id: a.linkIds[e], kind: 'link', line: a.linkLine[e] });
    }
    return out;
  };
  return { added: diff(head, base), removed: diff(base, head) };
}

/** Which status a judged file has, from its findings (only fail-severity findings change it). */
export function fileStatus(change: CompareInput['change'], findings: readonly Finding[]): FileStatus {
  const failing = findings.filter((f) => f.severity === 'fail');
  if (failing.some((f) => f.rule === 'parse-error')) return 'error';
  const thresholdRules = new Set<Finding['rule']>(Object.values(THRESHOLD_RULE));
  if (failing.some((f) => thresholdRules.has(f.rule))) return 'below-threshold';
  if (failing.some((f) => f.rule === 'regression' || f.rule === 'new-bridge' || f.rule === 'new-cut-node')) return 'regressed';
  if (change === 'added') return 'new';
  if (change === 'renamed') return 'renamed';
  return 'pass';
}

export function compareDesign(input: CompareInput): FileReport {
  const report: FileReport = { path: input.path, status: 'pass', findings: [], requirements: [] };
  if (input.previousPath !== undefined) report.previousPath = input.previousPath;
  if (input.format !== undefined) report.format = input.format;

  if (input.change === 'deleted') {
    report.status = 'removed';
    const severity = input.policy.removedDesigns;
    if (severity !== 'ignore') {
      report.findings.push(finding('removed-design', severity, 'the design file was deleted by this change', [], { line: 0 }));
    }
    return report;
  }
  if (input.headError || !input.head) {
    const e = input.headError ?? { message: 'the design could not be read', line: 0, column: 0 };
    report.status = 'error';
    report.error = { message: e.message, line: e.line, column: e.column };
    report.findings.push(finding('parse-error', 'fail', e.message, [], { line: e.line, column: e.column }));
    return report;
  }

  const effective: CompareInput = input.baseError ? { ...input, base: undefined, thresholdsOnly: true } : input;
  if (input.baseError) {
    report.findings.push(
      finding('parse-error', 'notice', `the base version could not be read (${input.baseError.message}); judged on thresholds only`, [], {
        line: 0,
      }),
    );
  }
  for (const r of input.policy.requirements) {
    const description = describeRequirement(r, input.policy.challenges);
    const { row, findings } = r.kind === 'no-new-spof' ? judgeSpof(r, effective, description) : judge(r, effective, description);
    report.requirements.push(row);
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
  report.head = input.head.result.evaluation;
  if (effective.base && !effective.thresholdsOnly) {
    report.base = effective.base.result.evaluation;
    const changes = elementChanges(effective.base, input.head);
    if (changes.added.length + changes.removed.length > 0) report.changes = changes;
  }
  report.status = fileStatus(input.change, report.findings);
  return report;
}
