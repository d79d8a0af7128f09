// Fixture cases: a folder under fixtures/cases/<name>/ holds the repository at the base
// (base/), the files the change writes (head/, a file holding only the line "<deleted>" is
// removed) and what `netbrace check` must answer (expect.yaml). runCase builds a scratch git
// repository from it and runs the real command, as a user would.
import { execFileSync } from 'node:child_process';
import {
  cpSync,
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import YAML from 'yaml';
import { main } from '../../src/shell/dispatch.js';
import type { Report } from '../../src/report/report.js';
import { recordIO } from '../shell/helpers-io.js';

export const casesRoot = path.resolve(import.meta.dirname, '..', '..', 'fixtures', 'cases');

export interface CaseExpectation {
  /** One sentence: what the case is and why the answer is right. */
  about: string;
  /** Extra arguments for `netbrace check` (after --base main --head change). */
  args?: string[];
  exit: 0 | 1 | 2;
  verdict?: 'pass' | 'fail';
  files?: Record<string, FileExpectation>;
  /** Substrings the terminal output (stdout + stderr) must contain / must not contain. */
  output?: string[];
  notOutput?: string[];
}

export interface FileExpectation {
  status?: string;
  /** Finding rules that must be present (with severity, as "rule:severity" or "rule"). */
  findings?: string[];
  /** Finding rules that must be absent. */
  noFindings?: string[];
  /** Every requirement with both sides has delta exactly 0. */
  deltaZero?: boolean;
  /** Requirement ids left out of deltaZero (rows the change really moves). */
  deltaZeroExcept?: string[];
  /** Substrings some finding message must contain. */
  messages?: string[];
  /** Requirement id → status. */
  requirements?: Record<string, string>;
}

export interface CaseRun {
  code: number;
  out: string;
  err: string;
  report: Report | null;
  dir: string;
}

const scratch: string[] = [];
export function cleanupCases(): void {
  for (const d of scratch.splice(0)) rmSync(d, { recursive: true, force: true });
}

function git(cwd: string, ...args: string[]): string {
  return execFileSync('git', args, {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, GIT_AUTHOR_DATE: '2001-01-01T00:00:00Z', GIT_COMMITTER_DATE: '2001-01-01T00:00:00Z' },
  }).trim();
}

function overlay(from: string, to: string): void {
  for (const name of readdirSync(from)) {
    const src = path.join(from, name);
    const dst = path.join(to, name);
    if (statSync(src).isDirectory()) {
      mkdirSync(dst, { recursive: true });
      overlay(src, dst);
    } else if (readFileSync(src, 'latin1').trim() === '<deleted>') rmSync(dst, { force: true });
    else cpSync(src, dst);
  }
}

export function caseNames(): string[] {
  return readdirSync(casesRoot)
    .filter((n) => existsSync(path.join(casesRoot, n, 'expect.yaml')))
    .sort();
}

export function readExpectation(name: string): CaseExpectation {
  return YAML.parse(readFileSync(path.join(casesRoot, name, 'expect.yaml'), 'utf8')) as CaseExpectation;
}

/** Build the case's repository (main = base/, branch change = base/ + head/) and run check. */
export async function runCase(name: string, extraArgs: string[] = []): Promise<CaseRun> {
  const root = path.join(casesRoot, name);
  const dir = mkdtempSync(path.join(os.tmpdir(), `netbrace-case-`));
  scratch.push(dir);
  git(dir, 'init', '-q', '-b', 'main');
  git(dir, 'config', 'user.email', 'planner@example.invalid');
  git(dir, 'config', 'user.name', 'Planner');
  git(dir, 'config', 'commit.gpgsign', 'false');
  if (existsSync(path.join(root, 'base'))) overlay(path.join(root, 'base'), dir);
  git(dir, 'add', '-A');
  git(dir, 'commit', '-q', '--allow-empty', '-m', 'base');
  git(dir, 'checkout', '-q', '-b', 'change');
  if (existsSync(path.join(root, 'head'))) overlay(path.join(root, 'head'), dir);
  git(dir, 'add', '-A');
  git(dir, 'commit', '-q', '--allow-empty', '-m', 'change');
  const expectation = readExpectation(name);
  const io = recordIO(dir, { NO_COLOR: '1' });
  const args = [
    'check',
    '--base',
    'main',
    '--head',
    'change',
    '--json',
    '.out/report.json',
    ...(expectation.args ?? []),
    ...extraArgs,
  ];
  const code = await main(args, io);
  const reportPath = path.join(dir, '.out', 'report.json');
  const report = existsSync(reportPath) ? (JSON.parse(readFileSync(reportPath, 'utf8')) as Report) : null;
  return { code, out: io.out.join(''), err: io.err.join(''), report, dir };
}

/** Write a case folder from code (for generated fixtures); returns its path. */
export function writeCaseFile(name: string, side: 'base' | 'head', file: string, text: string): void {
  const p = path.join(casesRoot, name, side, file);
  mkdirSync(path.dirname(p), { recursive: true });
  writeFileSync(p, text);
}
