// The overall decision: the gate fails when any finding of severity "fail" remains (a broken
// floor, a regression beyond tolerance, a new single point of failure, an unreadable head, a
// deleted design when the policy says so). In inform mode the verdict is still reported, but
// the exit code is 0.

import { CAUTION, REPORT_VERSION, type FileReport, type FileStatus, type Report } from '../report/report.js';
import { FILE_STATUSES, fileFails } from '../report/vocabulary.js';
import { VERSION } from '../version.js';

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

/** What a run says about itself; the rest of a report follows from its files. */
export interface ReportHeader {
  mode: Report['mode'];
  policy: Report['policy'];
  base?: string;
  head?: string;
  seed: number;
  part?: Report['part'];
  scope?: Report['scope'];
}

/** The one way a report is put together (a run's, or an empty one's): fixed key order, verdict and counts from the files. */
export function assembleReport(header: ReportHeader, files: FileReport[]): Report {
  return {
    version: REPORT_VERSION,
    tool: { name: 'netbrace', version: VERSION },
    verdict: verdictOf(files),
    mode: header.mode,
    policy: header.policy,
    ...(header.base !== undefined ? { base: header.base } : {}),
    ...(header.head !== undefined ? { head: header.head } : {}),
    seed: header.seed,
    ...(header.part ? { part: { index: header.part.index, total: header.part.total } } : {}),
    ...(header.scope !== undefined ? { scope: header.scope } : {}),
    counts: countStatuses(files),
    files,
    caution: CAUTION,
  };
}
