import { type Report } from '../report/report.js';
/** Accept a parsed report of this or an older version; UsageError for anything else. */
export declare function upgradeReport(value: unknown, name?: string): Report;
export declare function joinReports(reports: readonly unknown[]): Report;
