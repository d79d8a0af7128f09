// The small family of errors a user can cause. Each carries a location so that every
// shell can print `file:line:col: message — hint` and tests can assert the kind, not the wording.

export interface SourceLocation {
  file: string;
  /** 1-based line; 0 when the problem concerns the whole file. */
  line: number;
  /** 1-based column; 0 when unknown. */
  column: number;
}

export type ErrorKind = 'design' | 'policy' | 'usage' | 'limit' | 'git';

export class NetbraceError extends Error {
  override name = 'NetbraceError';
  readonly kind: ErrorKind;
  readonly file: string;
  readonly line: number;
  readonly column: number;
  readonly hint: string;
  /** Further locations that belong to the same problem (e.g. the floor a scope loosens). */
  readonly related: readonly (SourceLocation & { message: string })[];

  constructor(
    kind: ErrorKind,
    message: string,
    where: Partial<SourceLocation> = {},
    hint = '',
    related: readonly (SourceLocation & { message: string })[] = [],
  ) {
    super(message);
    this.kind = kind;
    this.file = where.file ?? '';
    this.line = where.line ?? 0;
    this.column = where.column ?? 0;
    this.hint = hint;
    this.related = related;
  }

  /** `file:line:col: message — hint`, the one format every shell prints. */
  format(): string {
    return formatDiagnostic(this);
  }
}

export class DesignError extends NetbraceError {
  override name = 'DesignError';
  constructor(message: string, where: Partial<SourceLocation>, hint = '') {
    super('design', message, where, hint);
  }
}

export class PolicyError extends NetbraceError {
  override name = 'PolicyError';
  constructor(
    message: string,
    where: Partial<SourceLocation>,
    hint = '',
    related: readonly (SourceLocation & { message: string })[] = [],
  ) {
    super('policy', message, where, hint, related);
  }
}

export class UsageError extends NetbraceError {
  override name = 'UsageError';
  constructor(message: string, hint = '') {
    super('usage', message, {}, hint);
  }
}

export class LimitError extends NetbraceError {
  override name = 'LimitError';
  constructor(message: string, where: Partial<SourceLocation>, hint = '') {
    super('limit', message, where, hint);
  }
}

export class GitError extends NetbraceError {
  override name = 'GitError';
  constructor(message: string, hint = '') {
    super('git', message, {}, hint);
  }
}

export interface Diagnostic extends SourceLocation {
  severity: 'error' | 'warning';
  message: string;
  hint?: string;
}

export function formatDiagnostic(d: {
  file: string;
  line: number;
  column: number;
  message: string;
  hint?: string;
  related?: readonly (SourceLocation & { message: string })[];
}): string {
  const where = d.file ? `${d.file}:${d.line || 1}:${d.column || 1}: ` : '';
  let text = `${where}${d.message}${d.hint ? ` — ${d.hint}` : ''}`;
  for (const r of d.related ?? []) text += `\n  ${r.file}:${r.line || 1}:${r.column || 1}: ${r.message}`;
  return text;
}

export function isNetbraceError(e: unknown): e is NetbraceError {
  return e instanceof NetbraceError;
}
