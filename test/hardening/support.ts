// Shared pieces of the hardening suite: where the real inputs are, how an outcome is judged
// (a parsed result, or a located NetbraceError — nothing else), and the case-count lines the
// suite prints so that a CI log shows how much was fuzzed.

import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { isNetbraceError, type NetbraceError } from '../../src/errors.js';
import type { GitResult } from '../../src/shell/action-deps.js';
import { main } from '../../src/shell/dispatch.js';

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

/** The Internet Topology Zoo (Knight et al., IEEE JSAC 29(9):1765–1775, 2011; CC BY 4.0). */
export const ZOO = path.resolve(repoRoot, 'fixtures', 'topology-zoo');

/** One fixed seed for every property in the suite (fast-check replays it exactly). */
export const SEED = 20_240_817;

export interface SeedFile {
  name: string;
  text: string;
}

/**
 * The `count` smallest zoo files of a format above `minBytes`, in name order: real files
 * written by several tools, small enough that thousands of mutated copies parse in seconds.
 */
export function zooSeeds(format: 'gml' | 'graphml', count: number, minBytes = 2_000): SeedFile[] {
  const dir = path.join(ZOO, format);
  return readdirSync(dir)
    .filter((f) => f.endsWith(`.${format}`))
    .map((f) => ({ f, size: statSync(path.join(dir, f)).size }))
    .filter((x) => x.size >= minBytes)
    .sort((a, b) => a.size - b.size || (a.f < b.f ? -1 : 1))
    .slice(0, count)
    .sort((a, b) => (a.f < b.f ? -1 : 1))
    .map(({ f }) => ({ name: `topology-zoo/${format}/${f}`, text: readFileSync(path.join(dir, f), 'utf8') }));
}

export function fixtureText(...parts: string[]): string {
  return readFileSync(path.join(repoRoot, 'fixtures', ...parts), 'utf8');
}

/** Lines in a text as an editor counts them (a final newline opens no new line of content). */
export function lineCount(text: string): number {
  if (text === '') return 0;
  let n = 1;
  for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) n++;
  return n;
}

export type Outcome<T> = { ok: true; value: T; ms: number } | { ok: false; error: NetbraceError; ms: number };

/** Runs `fn`: a value or a NetbraceError; any other exception is rethrown (the property fails). */
export function attempt<T>(fn: () => T): Outcome<T> {
  const t0 = performance.now();
  try {
    const value = fn();
    return { ok: true, value, ms: performance.now() - t0 };
  } catch (e) {
    if (isNetbraceError(e)) return { ok: false, error: e, ms: performance.now() - t0 };
    const err = e instanceof Error ? e : new Error(String(e));
    throw new Error(`not a NetbraceError: ${err.name}: ${err.message}\n${err.stack ?? ''}`, { cause: e });
  }
}

/**
 * Problems with an error's location for an input `text` named `files` (empty: fine). The
 * error must name one of the files; where the input has lines, the line must be one of them
 * (0 is allowed only for whole-file limits: the size limit).
 */
export function locationProblems(e: NetbraceError, text: string, files: readonly string[]): string[] {
  const problems: string[] = [];
  if (!files.includes(e.file)) problems.push(`names file "${e.file}", not one of ${files.join(', ')}`);
  const lines = lineCount(text);
  const wholeFile = e.kind === 'limit' && e.line === 0 && /larger than the limit/.test(e.message);
  if (lines > 0 && !wholeFile) {
    if (!(e.line >= 1)) problems.push(`line ${e.line} < 1`);
    if (e.line > lines + 1) problems.push(`line ${e.line} is past the end (${lines} lines)`);
  }
  if (!(e.column >= 0)) problems.push(`column ${e.column} < 0`);
  if (e.message.trim() === '') problems.push('empty message');
  if (e.message.length > 4000) problems.push(`message of ${e.message.length} characters`);
  return problems;
}

/** Prints the count line the issue asks for, e.g. "fuzz: graphml 2000 cases". */
export function reportCount(theme: string, what: string, cases: number, extra = ''): void {
  console.log(`${theme}: ${what} ${cases} cases${extra ? ` (${extra})` : ''}`);
}

/** A tally of outcomes, for the count lines. */
export class Tally {
  cases = 0;
  parsed = 0;
  refused = 0;
  slowestMs = 0;
  kinds = new Map<string, number>();

  add(o: Outcome<unknown>): void {
    this.cases++;
    this.slowestMs = Math.max(this.slowestMs, o.ms);
    if (o.ok) this.parsed++;
    else {
      this.refused++;
      this.kinds.set(o.error.kind, (this.kinds.get(o.error.kind) ?? 0) + 1);
    }
  }

  summary(): string {
    const kinds = [...this.kinds]
      .sort()
      .map(([k, n]) => `${k} ${n}`)
      .join(', ');
    return `${this.parsed} parsed, ${this.refused} refused${kinds ? ` [${kinds}]` : ''}, slowest ${this.slowestMs.toFixed(0)} ms`;
  }
}

/** A scratch git repository with one commit of `files`; returns its directory. */
export function scratchRepo(root: string, files: Record<string, string>): string {
  const dir = mkdtempSync(path.join(root, 'repo-'));
  git(dir, 'init', '-q', '-b', 'main');
  git(dir, 'config', 'user.email', 'planner@example.invalid');
  git(dir, 'config', 'user.name', 'Planner');
  git(dir, 'config', 'commit.gpgsign', 'false');
  commitFiles(dir, files, 'base');
  return dir;
}

export function git(cwd: string, ...args: string[]): string {
  return execFileSync('git', args, {
    cwd,
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, GIT_AUTHOR_DATE: '2001-01-01T00:00:00Z', GIT_COMMITTER_DATE: '2001-01-01T00:00:00Z' },
  }).trim();
}

/** Writes the files (null deletes) and commits everything; returns the commit id. */
export function commitFiles(dir: string, files: Record<string, string | null>, message: string): string {
  for (const [p, text] of Object.entries(files)) {
    const full = path.join(dir, p);
    if (text === null) rmSync(full, { force: true });
    else {
      mkdirSync(path.dirname(full), { recursive: true });
      writeFileSync(full, text);
    }
  }
  git(dir, 'add', '-A');
  git(dir, 'commit', '-q', '--allow-empty', '-m', message);
  return git(dir, 'rev-parse', 'HEAD');
}

/** The CLI's main() as a user runs it, without colour. */
export async function cli(cwd: string, ...args: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(args, {
    stdout: (t) => void out.push(t),
    stderr: (t) => void err.push(t),
    cwd,
    env: { NO_COLOR: '1' },
    stdoutIsTTY: false,
    stderrIsTTY: false,
  });
  return { code, out: out.join(''), err: err.join('') };
}

/**
 * git as the Action asks it, faked: the workspace is the repository's top level; every command
 * succeeds, except that commit `missing` (a base a shallow clone lacks) is absent and cannot be
 * fetched.
 */
export function fakeGit(
  toplevel: string,
  missing?: string,
  fetchError = 'fatal: remote error: upload-pack: not our ref',
): (args: string[]) => GitResult {
  return (args) => {
    if (args.includes('--show-toplevel')) return { code: 0, stdout: `${toplevel}\n`, stderr: '' };
    if (missing && args[0] === 'cat-file' && args.some((a) => a.startsWith(missing)))
      return { code: 1, stdout: '', stderr: '' };
    if (missing && args[0] === 'fetch') return { code: 128, stdout: '', stderr: fetchError };
    return { code: 0, stdout: '', stderr: '' };
  };
}
