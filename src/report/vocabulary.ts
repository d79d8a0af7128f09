// The words every view uses, one table per vocabulary: rule titles, file and requirement
// statuses, our status marks, and what makes a design fail. Views format; they do not name.
// Pure data and two predicates.

import type { FileReport, FileStatus, Finding, RequirementResult, Severity } from './report.js';

/** Every file status, in the order counts are listed (report.counts, outputs). */
export const FILE_STATUSES: readonly FileStatus[] = [
  'holds',
  'weakened',
  'below-floor',
  'new',
  'removed',
  'renamed',
  'unreadable',
];

/** A file status in words. */
export const FILE_STATUS_WORD: Record<FileStatus, string> = {
  holds: 'holds',
  weakened: 'weakened',
  'below-floor': 'below its floor',
  new: 'new design',
  removed: 'removed',
  renamed: 'renamed',
  unreadable: 'could not be read',
};

/** Worst first: the order files of equal severity are listed in. */
export const FILE_STATUS_RANK: Record<FileStatus, number> = {
  unreadable: 0,
  'below-floor': 1,
  weakened: 2,
  removed: 3,
  new: 4,
  renamed: 5,
  holds: 6,
};

/** A requirement's status in words (the line of "how much" starts with the status itself). */
export const REQUIREMENT_STATUS_WORD: Record<RequirementResult['status'], string> = {
  holds: 'holds',
  short: 'short of its floor',
  weakened: 'weakened',
  'inside-error': 'inside the error',
  unsettled: 'unsettled',
  'not-applicable': 'not applicable',
};

/** What a finding is, by rule: one title for every view (annotations, markdown, SARIF, HTML, terminal). */
export const RULE_TITLE: Record<Finding['rule'], string> = {
  'r-threshold': 'r-threshold not held',
  'area-floor': 'area below its floor',
  'spread-ceiling': 'spread above its ceiling',
  'n-1': 'N\u22121 rule broken',
  'new-bridge': 'new bridge',
  'new-cut-node': 'new cut node',
  'new-stranding-group': 'new stranding shared-risk group',
  'hardened-weak-point': 'weak point hidden by hardening',
  regression: 'requirement weakened',
  'weakest-sequence': 'weakest sequence',
  'parse-error': 'unreadable design',
  'removed-design': 'removed design',
  'policy-changed': 'policy changed',
  degraded: 'reduced evaluation',
  'not-computable': 'value not computable',
};

/** A finding's title when its judging status says more than its rule (a drop the policy allows). */
export const JUDGED_TITLE = {
  'within-allowance': 'robustness dropped within the allowance',
  'inside-error': 'change inside the Monte Carlo error',
} as const;

/** The title of one finding: its judging status's where that is milder than the rule's. */
export function judgedTitle(x: Pick<Finding, 'rule' | 'status' | 'severity'>): string {
  if (x.status === 'within-allowance' || x.status === 'inside-error') return JUDGED_TITLE[x.status];
  // A notice about a drop with no judging status weakened nothing.
  if (x.status === undefined && x.rule === 'regression' && x.severity === 'notice') return 'robustness changed';
  return RULE_TITLE[x.rule] ?? x.rule;
}

export const SEVERITY_WORD: Record<Severity, string> = { fail: 'failure', warn: 'warning', notice: 'notice' };

/**
 * Our status marks: geometric, not traffic lights, and always beside a word (a mark alone
 * carries no meaning for a screen reader or a colour-blind reader).
 */
export const MARK = {
  /** fails: a failure, or a design that blocks */
  fail: '\u25A0',
  /** a warning */
  warn: '\u25B2',
  /** a notice, context only */
  notice: '\u00B7',
  /** holds */
  holds: '\u25A1',
  /** inside the error, unsettled, not applicable */
  open: '\u25CC',
} as const;

/** The mark of a requirement line, by its status and severity. */
export function requirementMark(r: Pick<RequirementResult, 'status' | 'severity'>): string {
  if (r.status === 'holds') return MARK.holds;
  if (r.status === 'short' || r.status === 'weakened')
    return r.severity === 'fail' ? MARK.fail : r.severity === 'warn' ? MARK.warn : MARK.notice;
  return MARK.open;
}

/** Whether a file, on its own, fails: any fail-severity finding, or an error. */
export function fileFails(f: Pick<FileReport, 'status' | 'findings'>): boolean {
  return f.status === 'unreadable' || f.findings.some((x) => x.severity === 'fail');
}

/** Whether a file has warnings (and no failure). */
export function fileWarns(f: Pick<FileReport, 'status' | 'findings'>): boolean {
  return !fileFails(f) && f.findings.some((x) => x.severity === 'warn');
}
