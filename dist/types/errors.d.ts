export interface SourceLocation {
    file: string;
    /** 1-based line; 0 when the problem concerns the whole file. */
    line: number;
    /** 1-based column; 0 when unknown. */
    column: number;
}
export type ErrorKind = 'design' | 'policy' | 'usage' | 'limit' | 'git';
export declare class NetbraceError extends Error {
    name: string;
    readonly kind: ErrorKind;
    readonly file: string;
    readonly line: number;
    readonly column: number;
    readonly hint: string;
    /** Further locations that belong to the same problem (e.g. the floor a scope loosens). */
    readonly related: readonly (SourceLocation & {
        message: string;
    })[];
    constructor(kind: ErrorKind, message: string, where?: Partial<SourceLocation>, hint?: string, related?: readonly (SourceLocation & {
        message: string;
    })[]);
    /** `file:line:col: message — hint`, the one format every shell prints. */
    format(): string;
}
export declare class DesignError extends NetbraceError {
    name: string;
    constructor(message: string, where: Partial<SourceLocation>, hint?: string);
}
export declare class PolicyError extends NetbraceError {
    name: string;
    constructor(message: string, where: Partial<SourceLocation>, hint?: string, related?: readonly (SourceLocation & {
        message: string;
    })[]);
}
export declare class UsageError extends NetbraceError {
    name: string;
    constructor(message: string, hint?: string);
}
export declare class LimitError extends NetbraceError {
    name: string;
    constructor(message: string, where: Partial<SourceLocation>, hint?: string);
}
export declare class GitError extends NetbraceError {
    name: string;
    constructor(message: string, hint?: string);
}
export interface Diagnostic extends SourceLocation {
    severity: 'error' | 'warning';
    message: string;
    hint?: string;
}
export declare function formatDiagnostic(d: {
    file: string;
    line: number;
    column: number;
    message: string;
    hint?: string;
    related?: readonly (SourceLocation & {
        message: string;
    })[];
}): string;
export declare function isNetbraceError(e: unknown): e is NetbraceError;
