import type { FileReport, FileStatus, Report } from '../report/report.js';
export declare const FILE_STATUSES: readonly FileStatus[];
export declare function countStatuses(files: readonly FileReport[]): Record<FileStatus, number>;
export declare function verdictOf(files: readonly FileReport[]): 'pass' | 'fail';
/** 0 pass (or inform), 1 the gate failed. Configuration errors (2) never reach a report. */
export declare function exitCodeOf(report: Pick<Report, 'verdict' | 'mode'>): 0 | 1;
