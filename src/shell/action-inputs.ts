// The Action's inputs: read from the runner's INPUT_<NAME> variables and validated before
// anything runs. Paths are never absolute or above the root; refs and keys are checked so that
// no input reaches git as an option.

import { oneLine } from '../report/escape.js';
import type { Env } from './action-deps.js';
import { MODE, PART, SEED, THREADS, type SharedOption } from './common-options.js';
import { repositoryPath } from './workspace.js';

export class InputError extends Error {
  override name = 'InputError';
}

export type CommentMode = 'every-run' | 'when-changed' | 'when-failing' | 'off';

export interface ActionInputs {
  policy: string;
  /** The organisation policy (a second checkout) the repository's policy must inherit; '' for none. */
  orgPolicy: string;
  policySource: 'base' | 'head';
  token: string;
  mode: 'block' | 'inform';
  comment: CommentMode;
  commentKey: string;
  report: string;
  sarif: string;
  sarifCategory: string;
  html: string;
  base: string;
  part?: { index: number; total: number };
  joinParts: string;
  workingDirectory: string;
  title: string;
  seed?: number;
  threads?: number;
  /** The pull request to comment on when the event has none (a workflow_run that posts a fork's report). */
  pullRequest?: number;
}

/** An input as the runner passes it: INPUT_<NAME>, upper-cased, spaces as underscores, dashes kept. */
export function getInput(env: Env, name: string): string {
  return (env[`INPUT_${name.replace(/ /g, '_').toUpperCase()}`] ?? '').trim();
}

function oneOf<T extends string>(env: Env, name: string, allowed: readonly T[], fallback: T): T {
  const v = getInput(env, name);
  if (v === '') return fallback;
  if ((allowed as readonly string[]).includes(v)) return v as T;
  throw new InputError(`input "${name}" is "${oneLine(v, 60)}"; use one of: ${allowed.join(', ')}`);
}

function relativePath(env: Env, name: string, fallback: string): string {
  const v = getInput(env, name) || fallback;
  if (v === '') return v;
  if (v.startsWith('-')) throw new InputError(`input "${name}" must not start with "-"`);
  if (/[\0\r\n]/.test(v)) throw new InputError(`input "${name}" contains a control character`);
  return v;
}

/** A repository path input (read from git, at the repository root): never absolute, never above the root. */
function repositoryInput(value: string, name: string): string {
  return value === '' ? value : repositoryPath(value, `input "${name}"`);
}

function optionalInt(env: Env, name: string, min: number, max: number): number | undefined {
  const v = getInput(env, name);
  if (v === '') return undefined;
  if (!/^\d+$/.test(v) || Number(v) < min || Number(v) > max)
    throw new InputError(`input "${name}" is "${oneLine(v, 40)}"; give a whole number from ${min} to ${max}`);
  return Number(v);
}

/** An input the Action shares with the CLI (common-options.ts), or undefined when not given. */
function sharedInput<T>(env: Env, name: string, option: SharedOption<T>, example = ''): T | undefined {
  const v = getInput(env, name);
  if (v === '') return undefined;
  const read = option.read(v);
  if (read === undefined)
    throw new InputError(`input "${name}" is "${oneLine(v, 60)}"; use ${option.expected}${example}`);
  return read;
}

const KEY_RE = /^[A-Za-z0-9._/-]{1,64}$/;
const REF_RE = /^(?!-)(?!.*\.\.)[A-Za-z0-9._/@^~-]{1,200}$/;

export function readInputs(env: Env): ActionInputs {
  const workingDirectory = relativePath(env, 'working-directory', '.');
  const part = sharedInput(env, 'part', PART, ', e.g. 2/4 (use the matrix: part: ${{ matrix.part }}/4)');
  const defaultKey =
    workingDirectory === '.' || workingDirectory === ''
      ? 'default'
      : workingDirectory.replace(/[^A-Za-z0-9._/-]/g, '-').slice(0, 64);
  const commentKey = getInput(env, 'comment-key') || defaultKey;
  if (!KEY_RE.test(commentKey))
    throw new InputError(`input "comment-key" may use letters, digits, ".", "_", "/" and "-" (at most 64)`);
  const base = getInput(env, 'base');
  if (base && !REF_RE.test(base)) throw new InputError(`input "base" is not a valid git ref or commit id`);
  const joinParts = relativePath(env, 'join-parts', '');
  if (joinParts && part)
    throw new InputError(
      'inputs "join-parts" and "part" exclude each other: parts evaluate, the join job combines their reports',
    );
  const category =
    getInput(env, 'sarif-category') || (commentKey === 'default' ? 'netbrace' : `netbrace-${commentKey}`);
  return {
    policy: repositoryInput(relativePath(env, 'policy', ''), 'policy'),
    orgPolicy: repositoryInput(relativePath(env, 'org-policy', ''), 'org-policy'),
    policySource: oneOf(env, 'policy-source', ['base', 'head'] as const, 'base'),
    token: getInput(env, 'token'),
    mode: sharedInput(env, 'mode', MODE) ?? 'block',
    comment: oneOf(env, 'comment', ['every-run', 'when-changed', 'when-failing', 'off'] as const, 'when-changed'),
    commentKey,
    report: relativePath(env, 'report', '.netbrace-out/netbrace-report.json'),
    sarif: relativePath(env, 'sarif', '.netbrace-out/netbrace.sarif'),
    sarifCategory: category.replace(/[^A-Za-z0-9._-]/g, '-'),
    html: relativePath(env, 'html', ''),
    base,
    part,
    joinParts,
    workingDirectory,
    title: oneLine(getInput(env, 'title'), 120),
    seed: sharedInput(env, 'seed', SEED),
    threads: sharedInput(env, 'threads', THREADS),
    pullRequest: optionalInt(env, 'pull-request', 1, 2 ** 31 - 1),
  };
}
