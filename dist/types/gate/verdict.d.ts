import { type FileReport, type FileStatus, type Report } from '../report/report.js';
import { FILE_STATUSES } from '../report/vocabulary.js';
export { FILE_STATUSES };
export declare function countStatuses(files: readonly FileReport[]): Record<FileStatus, number>;
export declare function verdictOf(files: readonly FileReport[]): 'pass' | 'fail';
/** 0 pass (or inform), 1 the gate failed. Configuration errors (2) never reach a report. */
export declare function exitCodeOf(report: Pick<Report, 'verdict' | 'mode'>): 0 | 1;
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
export declare function assembleReport(header: ReportHeader, files: FileReport[]): Report;
