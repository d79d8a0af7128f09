// The one order in which every view lists things: worst first. Shared so that the summary,
// the PR comment and the annotations agree on what "the worst findings" are. Pure.

import type { FileReport, Finding, Severity } from './report.js';
import { FILE_STATUS_RANK } from './vocabulary.js';

export const SEVERITY_RANK: Record<Severity, number> = { fail: 0, warn: 1, notice: 2 };

const STATUS_RANK = FILE_STATUS_RANK;

/** The most severe finding's severity, or undefined for a file without findings. */
export function worstSeverity(f: FileReport): Severity | undefined {
  let worst: Severity | undefined;
  for (const x of f.findings)
    if (worst === undefined || SEVERITY_RANK[x.severity] < SEVERITY_RANK[worst]) worst = x.severity;
  return f.status === 'unreadable' ? 'fail' : worst;
}

function countOf(f: FileReport, s: Severity): number {
  let n = 0;
  for (const x of f.findings) if (x.severity === s) n++;
  return n;
}

/** Files, worst first: by worst severity, then number of failures and warnings, status, path. */
export function rankFiles(files: readonly FileReport[]): FileReport[] {
  const rank = (f: FileReport) => {
    const w = worstSeverity(f);
    return w === undefined ? 3 : SEVERITY_RANK[w];
  };
  return [...files].sort(
    (a, b) =>
      rank(a) - rank(b) ||
      countOf(b, 'fail') - countOf(a, 'fail') ||
      countOf(b, 'warn') - countOf(a, 'warn') ||
      STATUS_RANK[a.status] - STATUS_RANK[b.status] ||
      (a.path < b.path ? -1 : a.path > b.path ? 1 : 0),
  );
}

/** Findings of one file, worst first; ties keep the order the gate gave (stable sort). */
export function rankFindings(findings: readonly Finding[]): Finding[] {
  return [...findings].sort((a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity]);
}
