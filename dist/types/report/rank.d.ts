import type { FileReport, Finding, Severity } from './report.js';
export declare const SEVERITY_RANK: Record<Severity, number>;
/** The most severe finding's severity, or undefined for a file without findings. */
export declare function worstSeverity(f: FileReport): Severity | undefined;
/** Files, worst first: by worst severity, then number of failures and warnings, status, path. */
export declare function rankFiles(files: readonly FileReport[]): FileReport[];
/** Findings of one file, worst first; ties keep the order the gate gave (stable sort). */
export declare function rankFindings(findings: readonly Finding[]): Finding[];
