// The overall decision: the gate fails when any finding of severity "fail" remains (a broken
// floor, a regression beyond tolerance, a new single point of failure, an unreadable head, a
// deleted design when the policy says so). In inform mode the verdict is still reported, but
// the exit code is 0.

import type { FileReport, FileStatus, Report } from '../report/report.js';
import { FILE_STATUSES, fileFails } from '../report/vocabulary.js';

export { FILE_STATUSES };

export function countStatuses(files: readonly FileReport[]): Record<FileStatus, number> {
  const counts = Object.fromEntries(FILE_STATUSES.map((s) => [s, 0])) as Record<FileStatus, number>;
  for (const f of files) counts[f.status]++;
  return counts;
}

export function verdictOf(files: readonly FileReport[]): 'pass' | 'fail' {
  const failed = files.some(fileFails);
  return failed ? 'fail' : 'pass';
}

/** 0 pass (or inform), 1 the gate failed. Configuration errors (2) never reach a report. */
export function exitCodeOf(report: Pick<Report, 'verdict' | 'mode'>): 0 | 1 {
  return report.verdict === 'fail' && report.mode === 'block' ? 1 : 0;
}
