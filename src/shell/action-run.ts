// The GitHub Action, testable: `run(env, deps)` reads the inputs and the event, works out which
// commits to compare, calls the gate (the same orchestrator as `netbrace check`), and writes
// every view of the one report: annotations, job summary, the living PR comment, SARIF, HTML,
// the JSON report and the step outputs. The verdict is decided by the gate alone; the comment,
// the API and the artifacts can fail without changing it. Everything that goes wrong ends in
// exactly one setFailed message. No input reaches a shell: git runs through execFile with
// argument arrays, and commit ids and refs are validated before they get there.

import { execFileSync } from 'node:child_process';
import { lstatSync, readFileSync, readdirSync, statSync, writeFileSync, appendFileSync, realpathSync } from 'node:fs';
import path from 'node:path';
import * as core from '@actions/core';
import { decodeText } from '../decode.js';
import { formatDiagnostic, isNetbraceError } from '../errors.js';
import type { GateRequest, GateResult } from '../run-gate.js';
import { planAnnotations, type Annotation } from '../report/annotations.js';
import { compareSettings, type SettingChange } from '../gate/own-settings.js';
import { logText, oneLine } from '../report/escape.js';
import { commentDigest, commentMarker, renderComment, renderSummary, reportDigest } from '../report/markdown.js';
import { CAUTION, REPORT_VERSION, serializeReport, type FileStatus, type Report } from '../report/report.js';
import { VERSION } from '../version.js';
import { DEFAULT_POLICY_PATH } from '../policy/defaults.js';
import { builtinPolicy, designNeedsHeader, isDesignPath, isDesignText, loadPolicy } from '../policy/resolve.js';
import { renderSarif } from '../report/sarif.js';
import {
  createClient,
  httpSettingsFromEnv,
  isPermissionError,
  listPullRequestFiles,
  pullRequestHead,
  upsertComment,
  type Client,
  type ClientOptions,
  type FoundComment,
  type UpsertResult,
} from './github.js';
import { WorkspacePathError, prepareWrite, repositoryPath, resolveInWorkspace, workspaceRelative } from './workspace.js';

// ---------------------------------------------------------------------------------------------
// Seams

/** The gate as the Action calls it (src/run-gate.ts, with git readers for the repository at `root`). */
export type GateRequestLike = GateRequest;
export type GateResultLike = GateResult;

export interface GitResult {
  code: number;
  stdout: string;
  stderr: string;
}

/** What the Action writes to the runner: the @actions/core protocol, behind a seam for tests. */
export interface ActionOutput {
  annotate(a: Annotation): void;
  info(message: string): void;
  warning(message: string): void;
  setOutput(name: string, value: string): void;
  setFailed(message: string): void;
  appendSummary(markdown: string): void;
}

export interface ActionDeps {
  gate(request: GateRequestLike, cwd: string): Promise<GateResultLike>;
  join(reports: readonly unknown[]): Report;
  git(args: string[], cwd: string): Promise<GitResult>;
  github(options: ClientOptions): Client;
  renderHtml?(report: Report): string;
  out: ActionOutput;
}

export interface RunOutcome {
  /** 0 pass (or inform), 1 the gate failed in block mode, 2 usage, configuration or internal error. */
  exitCode: number;
  verdict?: 'pass' | 'fail';
  comment?: UpsertResult | 'failed' | 'not-applicable';
}

type Env = Readonly<Record<string, string | undefined>>;

// ---------------------------------------------------------------------------------------------
// Inputs

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
  if (!/^\d+$/.test(v) || Number(v) < min || Number(v) > max) throw new InputError(`input "${name}" is "${oneLine(v, 40)}"; give a whole number from ${min} to ${max}`);
  return Number(v);
}

const KEY_RE = /^[A-Za-z0-9._/-]{1,64}$/;
const REF_RE = /^(?!-)(?!.*\.\.)[A-Za-z0-9._/@^~-]{1,200}$/;

export function readInputs(env: Env): ActionInputs {
  const workingDirectory = relativePath(env, 'working-directory', '.');
  const partText = getInput(env, 'part');
  let part: ActionInputs['part'];
  if (partText) {
    const m = /^(\d+)\s*\/\s*(\d+)$/.exec(partText);
    const index = m ? Number(m[1]) : NaN;
    const total = m ? Number(m[2]) : NaN;
    if (!m || index < 1 || total < 1 || index > total || total > 256) {
      throw new InputError(`input "part" is "${oneLine(partText, 40)}"; write k/n with 1 \u2264 k \u2264 n \u2264 256, e.g. 2/4 (use the matrix: part: \${{ matrix.part }}/4)`);
    }
    part = { index, total };
  }
  const defaultKey = workingDirectory === '.' || workingDirectory === '' ? 'default' : workingDirectory.replace(/[^A-Za-z0-9._/-]/g, '-').slice(0, 64);
  const commentKey = getInput(env, 'comment-key') || defaultKey;
  if (!KEY_RE.test(commentKey)) throw new InputError(`input "comment-key" may use letters, digits, ".", "_", "/" and "-" (at most 64)`);
  const base = getInput(env, 'base');
  if (base && !REF_RE.test(base)) throw new InputError(`input "base" is not a valid git ref or commit id`);
  const joinParts = relativePath(env, 'join-parts', '');
  if (joinParts && part) throw new InputError('inputs "join-parts" and "part" exclude each other: parts evaluate, the join job combines their reports');
  const category = getInput(env, 'sarif-category') || (commentKey === 'default' ? 'netbrace' : `netbrace-${commentKey}`);
  return {
    policy: repositoryInput(relativePath(env, 'policy', ''), 'policy'),
    orgPolicy: repositoryInput(relativePath(env, 'org-policy', ''), 'org-policy'),
    policySource: oneOf(env, 'policy-source', ['base', 'head'] as const, 'base'),
    token: getInput(env, 'token'),
    mode: oneOf(env, 'mode', ['block', 'inform'] as const, 'block'),
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
    seed: optionalInt(env, 'seed', 0, 2 ** 32 - 1),
    threads: optionalInt(env, 'threads', 1, 256),
    pullRequest: optionalInt(env, 'pull-request', 1, 2 ** 31 - 1),
  };
}

// ---------------------------------------------------------------------------------------------
// The event: which commits to compare

const SHA_RE = /^[0-9a-f]{40}([0-9a-f]{24})?$/;
const ZERO_RE = /^0+$/;

export interface Target {
  eventName: string;
  kind: 'pull-request' | 'push' | 'full' | 'nothing';
  base?: string;
  head?: string;
  pr?: { owner: string; repo: string; number: number; fork: boolean };
  /** Why the event has nothing to judge (a deleted branch). */
  reason?: string;
  /** A push that created a branch: compare with the head's parent, if there is one. */
  newBranch?: boolean;
  /** workflow_run: the head commit of the run that triggered this one. */
  runHeadSha?: string;
}

function sha(value: unknown, what: string): string {
  if (typeof value !== 'string' || !SHA_RE.test(value)) throw new InputError(`the event payload has no valid ${what} (got ${oneLine(String(value), 60)})`);
  return value;
}

export function readTarget(env: Env): Target {
  const eventName = env.GITHUB_EVENT_NAME ?? '';
  let payload: Record<string, any> = {};
  const eventPath = env.GITHUB_EVENT_PATH;
  if (eventPath) {
    const size = statSync(eventPath).size;
    if (size > 64 * 1024 * 1024) throw new InputError('the event payload is larger than 64 MiB');
    payload = JSON.parse(readFileSync(eventPath, 'utf8')) as Record<string, any>;
  }
  const [owner = '', repo = ''] = (env.GITHUB_REPOSITORY ?? '').split('/');
  if (eventName === 'pull_request' || eventName === 'pull_request_target') {
    const pr = payload.pull_request;
    if (!pr) throw new InputError(`the ${eventName} event payload has no pull_request`);
    const headRepo = pr.head?.repo?.full_name;
    const baseRepo = pr.base?.repo?.full_name ?? payload.repository?.full_name;
    return {
      eventName,
      kind: 'pull-request',
      base: sha(pr.base?.sha, 'pull_request.base.sha'),
      head: sha(pr.head?.sha, 'pull_request.head.sha'),
      pr: { owner, repo, number: Number(pr.number ?? payload.number), fork: Boolean(pr.head?.repo?.fork) || (headRepo !== undefined && headRepo !== baseRepo) || pr.head?.repo === null },
    };
  }
  if (eventName === 'push') {
    const after = String(payload.after ?? env.GITHUB_SHA ?? '');
    if (payload.deleted === true || ZERO_RE.test(after)) return { eventName, kind: 'nothing', reason: 'the push deleted a branch or tag' };
    const before = String(payload.before ?? '');
    if (ZERO_RE.test(before) || before === '') return { eventName, kind: 'push', head: sha(after, 'after'), newBranch: true };
    return { eventName, kind: 'push', base: sha(before, 'before'), head: sha(after, 'after') };
  }
  // workflow_dispatch, schedule and anything else: every design, thresholds only.
  const head = env.GITHUB_SHA && SHA_RE.test(env.GITHUB_SHA) ? env.GITHUB_SHA : undefined;
  const runHead = payload.workflow_run?.head_sha;
  return { eventName, kind: 'full', ...(head ? { head } : {}), ...(typeof runHead === 'string' && SHA_RE.test(runHead) ? { runHeadSha: runHead } : {}) };
}

// ---------------------------------------------------------------------------------------------
// git

async function hasCommit(deps: ActionDeps, cwd: string, commit: string): Promise<boolean> {
  return (await deps.git(['cat-file', '-e', `${commit}^{commit}`], cwd)).code === 0;
}

export const FETCH_DEPTH_HINT =
  'add `fetch-depth: 0` to the actions/checkout step (under `with:`), so that the base commit is in the clone';

/** Make sure the commit is in the clone: fetch exactly that one commit when it is missing. */
async function ensureCommit(deps: ActionDeps, cwd: string, commit: string, what: string): Promise<string | undefined> {
  if (await hasCommit(deps, cwd, commit)) return undefined;
  deps.out.info(`netbrace: the ${what} commit ${commit.slice(0, 12)} is not in the clone (shallow checkout); fetching that one commit`);
  const fetched = await deps.git(['fetch', '--no-tags', '--no-recurse-submodules', '--depth=1', 'origin', commit], cwd);
  if (fetched.code === 0 && (await hasCommit(deps, cwd, commit))) return undefined;
  return `the ${what} commit ${commit} is not in the clone and could not be fetched (git fetch: ${oneLine(fetched.stderr, 300) || `exit ${fetched.code}`})`;
}

/** The running workflow's path from GITHUB_WORKFLOW_REF (`owner/repo/path@ref`). */
export function workflowPathOf(env: Env): string | undefined {
  const ref = env.GITHUB_WORKFLOW_REF ?? '';
  const at = ref.lastIndexOf('@');
  const full = at > 0 ? ref.slice(0, at) : ref;
  const parts = full.split('/');
  if (parts.length < 3) return undefined;
  const p = parts.slice(2).join('/');
  return /^\.github\/workflows\/[^\0]+\.ya?ml$/.test(p) ? p : undefined;
}

async function showAt(deps: ActionDeps, cwd: string, rev: string, file: string): Promise<string | null> {
  const r = await deps.git(['show', `${rev}:${file}`], cwd);
  return r.code === 0 ? r.stdout : null;
}

/** The settings of this job's netbrace step that the change edits, when it edits its workflow. */
async function ownSettingChanges(deps: ActionDeps, env: Env, root: string, base: string, head: string): Promise<{ workflow: string; changes: SettingChange[] } | undefined> {
  const workflow = workflowPathOf(env);
  if (!workflow) return undefined;
  const [b, h] = [await showAt(deps, root, base, workflow), await showAt(deps, root, head, workflow)];
  if (b === h) return undefined;
  return { workflow, changes: compareSettings(b, h, env.GITHUB_JOB || undefined) };
}

/** Keep the base's value of every setting the head weakens (what the trusted revision said). */
function applyBaseSettings(inputs: ActionInputs, changes: readonly SettingChange[], deps: ActionDeps): void {
  for (const c of changes) {
    if (!c.weakens) continue;
    const base = c.base === '(unset)' ? '' : c.base;
    if (c.setting === 'mode' && base === 'block') inputs.mode = 'block';
    else if (c.setting === 'policy-source' && base === 'base') inputs.policySource = 'base';
    else if (c.setting === 'policy') inputs.policy = base;
    else if (c.setting === 'org-policy') inputs.orgPolicy = base;
    deps.out.warning(`netbrace: this change edits its own workflow: ${c.message}; the base's setting (${c.base}) applies`);
  }
}

function attachSettings(report: Report, own: { workflow: string; changes: SettingChange[] }, mode: ActionInputs['mode']): void {
  report.configuration = { workflow: own.workflow, changes: own.changes.map((c) => ({ ...c, severity: c.weakens ? 'fail' : 'notice' })) };
  if (own.changes.some((c) => c.weakens)) {
    report.verdict = 'fail';
    report.mode = mode;
  }
}

/** Lines touched at head per repository-relative path, from `git diff -U0`. */
async function changedLines(deps: ActionDeps, cwd: string, base: string, head: string): Promise<Map<string, Set<number>>> {
  const out = new Map<string, Set<number>>();
  const diff = await deps.git(['-c', 'core.quotePath=false', 'diff', '-U0', '--no-color', '--no-ext-diff', '-M', '--end-of-options', base, head, '--'], cwd);
  if (diff.code !== 0) return out;
  let current: Set<number> | undefined;
  for (const line of diff.stdout.split('\n')) {
    if (line.startsWith('+++ ')) {
      const name = line.slice(4);
      current = name === '/dev/null' ? undefined : new Set();
      if (current) out.set(name.replace(/^b\//, ''), current);
      continue;
    }
    const m = /^@@ -\d+(?:,\d+)? \+(\d+)(?:,(\d+))? @@/.exec(line);
    if (m && current) {
      const start = Number(m[1]);
      const count = m[2] === undefined ? 1 : Number(m[2]);
      for (let i = 0; i < Math.min(count, 100_000); i++) current.add(start + i);
    }
  }
  return out;
}

// ---------------------------------------------------------------------------------------------
// Joining part reports (untrusted files: size-checked, parsed as data, shape-checked)

const MAX_REPORT_BYTES = 64 * 1024 * 1024;

/** The part reports in `folder` (and up to three levels below), parsed as data, not yet checked. */
export function readPartReports(folder: string): { reports: unknown[]; names: string[] } {
  const names: string[] = [];
  const walk = (dir: string, depth: number) => {
    for (const entry of readdirSync(dir, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : 1))) {
      const full = path.join(dir, entry.name);
      if (entry.isSymbolicLink()) continue; // never follow links out of the folder
      if (entry.isDirectory() && depth < 3) walk(full, depth + 1);
      else if (entry.isFile() && entry.name.endsWith('.json')) names.push(full);
    }
  };
  walk(folder, 0);
  const reports: unknown[] = [];
  for (const file of names) {
    const stat = lstatSync(file);
    if (stat.size > MAX_REPORT_BYTES) throw new InputError(`part report ${path.basename(file)} is larger than 64 MiB`);
    let parsed: unknown;
    try {
      parsed = JSON.parse(readFileSync(file, 'utf8'));
    } catch {
      throw new InputError(`part report ${path.basename(file)} is not valid JSON`);
    }
    reports.push(parsed);
  }
  if (!reports.length) throw new InputError(`input "join-parts": no part report (*.json) in ${path.basename(folder)}; download the parts' artifacts there first`);
  return { reports, names };
}

// ---------------------------------------------------------------------------------------------
// The comment

/** Whether to write the comment, given the mode, the report and the comment that exists. */
export function shouldWriteComment(mode: CommentMode, report: Report, existing: FoundComment | undefined): boolean {
  if (mode === 'off') return false;
  if (mode === 'every-run') return true;
  const failing = report.verdict === 'fail';
  if (mode === 'when-failing') return failing || existing !== undefined; // a stale failure is corrected
  // when-changed: update when what it says changed; create only when there is something to say.
  if (existing) return commentDigest(existing.body) !== reportDigest(report);
  return failing || report.files.some((f) => f.findings.length > 0);
}

async function postComment(deps: ActionDeps, env: Env, inputs: ActionInputs, target: Target, report: Report, body: string): Promise<RunOutcome['comment']> {
  if (!target.pr || inputs.comment === 'off') return 'not-applicable';
  if (!inputs.token) {
    deps.out.warning('netbrace: no token, so no pull-request comment (set the "token" input, default github.token)');
    return 'failed';
  }
  const apiUrl = env.GITHUB_API_URL || 'https://api.github.com';
  try {
    const client = deps.github({ token: inputs.token, baseUrl: apiUrl, ...httpSettingsFromEnv(env), log: (m) => deps.out.info(`netbrace: ${logText(m, 500)}`) });
    const ref = { owner: target.pr.owner, repo: target.pr.repo, issueNumber: target.pr.number };
    const result = await upsertComment(client, ref, commentMarker(inputs.commentKey), body, (existing) => shouldWriteComment(inputs.comment, report, existing));
    deps.out.info(`netbrace: pull-request comment ${result.action}${result.url ? ` (${result.url})` : ''}`);
    return result;
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    if (isPermissionError(error)) {
      deps.out.warning(
        `netbrace: the token cannot write the pull-request comment (${oneLine(why, 200)}). ` +
          (target.pr.fork
            ? 'This pull request comes from a fork, whose token is read-only; the verdict, summary and annotations are unaffected. To comment on fork pull requests, use the two-workflow pattern in the README.'
            : 'Grant `pull-requests: write` in the workflow\u2019s permissions.'),
      );
    } else {
      deps.out.warning(`netbrace: could not write the pull-request comment (${oneLine(why, 200)}); the verdict is unaffected`);
    }
    return 'failed';
  }
}

// ---------------------------------------------------------------------------------------------
// The run

const STATUSES: FileStatus[] = ['holds', 'weakened', 'below-floor', 'new', 'removed', 'renamed', 'unreadable'];

function runUrl(env: Env): string | undefined {
  const server = env.GITHUB_SERVER_URL || 'https://github.com';
  if (!env.GITHUB_REPOSITORY || !env.GITHUB_RUN_ID) return undefined;
  return `${server}/${env.GITHUB_REPOSITORY}/actions/runs/${env.GITHUB_RUN_ID}`;
}

function emptyCounts(): Record<FileStatus, number> {
  return { holds: 0, weakened: 0, 'below-floor': 0, new: 0, removed: 0, renamed: 0, unreadable: 0 };
}

export async function run(env: Env, deps: ActionDeps): Promise<RunOutcome> {
  let failed = false;
  const fail = (message: string, code: number): RunOutcome => {
    if (!failed) deps.out.setFailed(logText(message, 4000));
    failed = true;
    return { exitCode: code };
  };
  try {
    const inputs = readInputs(env);
    const workspaceGiven = env.GITHUB_WORKSPACE || process.cwd();
    const workspace = realpathSync(workspaceGiven);
    const workdir = resolveInWorkspace(workspace, workspace, inputs.workingDirectory || '.', 'working-directory');
    if (!statSync(workdir).isDirectory()) throw new InputError(`input "working-directory" (${inputs.workingDirectory}) is not a directory`);
    // The gate works at the repository's top level (report paths are repository paths, as
    // annotations and SARIF want them); working-directory only says where the checkout is.
    // A join job reads reports only and needs no checkout.
    const repositoryRoot = async (): Promise<string> => {
      const top = await deps.git(['rev-parse', '--show-toplevel'], workdir);
      if (top.code !== 0 || top.stdout.trim() === '') {
        throw new InputError(`input "working-directory" (${inputs.workingDirectory}) is not inside a git repository; run actions/checkout before netbrace`);
      }
      return resolveInWorkspace(workspace, workspace, top.stdout.trim(), 'working-directory');
    };
    const target = readTarget(env);
    const notes: string[] = [];
    let ownSettings: { workflow: string; changes: SettingChange[] } | undefined;

    let report: Report;
    let lines = new Map<string, Set<number>>();
    if (inputs.joinParts) {
      const folder = resolveInWorkspace(workspace, workspace, inputs.joinParts, 'join-parts');
      const { reports, names } = readPartReports(folder);
      deps.out.info(`netbrace: joining ${reports.length} part reports`);
      try {
        report = deps.join(reports);
      } catch (error) {
        // Name the file: the join numbers reports in the order they were read.
        const m = /^report (\d+)/.exec(error instanceof Error ? error.message : '');
        if (m && isNetbraceError(error)) throw new InputError(`part report ${path.basename(names[Number(m[1]) - 1] ?? '?')}: ${error.message.replace(/^report \d+ /, '')}`);
        throw error;
      }
      // The report keeps the mode its runs had (what the comment says); whether this step
      // fails follows this job's own "mode" input.
      const joined = report.parts;
      if (joined) {
        const missing = Array.from({ length: joined.total }, (_, i) => i + 1).filter((k) => !joined.joined.includes(k));
        if (missing.length) {
          return fail(`netbrace: part report${missing.length === 1 ? '' : 's'} ${missing.map((k) => `${k}/${joined.total}`).join(', ')} missing from ${inputs.joinParts}: every part must upload its report before the join job runs (needs: the part job)`, 2);
        }
      }
      notes.push(`Joined from ${names.length} part report${names.length === 1 ? '' : 's'}.`);
    } else if (target.kind === 'nothing') {
      report = emptyReport(inputs, target);
      notes.push(`Nothing to judge: ${target.reason}.`);
    } else {
      const root = await repositoryRoot();
      let base = inputs.base || target.base;
      const head = target.head;
      if (inputs.base && !SHA_RE.test(inputs.base)) {
        const resolved = await deps.git(['rev-parse', '--verify', '--quiet', '--end-of-options', `${inputs.base}^{commit}`], root);
        if (resolved.code !== 0) throw new InputError(`input "base" (${inputs.base}) is not a commit in the clone; ${FETCH_DEPTH_HINT}`);
        base = resolved.stdout.trim();
      }
      if (target.newBranch && !inputs.base && head) {
        // A new branch: compare with the parent of the pushed head, when the clone can have it.
        await deps.git(['fetch', '--no-tags', '--no-recurse-submodules', '--depth=2', 'origin', head], root);
        const parent = await deps.git(['rev-parse', '--verify', '--quiet', `${head}^1`], root);
        if (parent.code === 0 && SHA_RE.test(parent.stdout.trim())) base = parent.stdout.trim();
        else notes.push('A new branch without a parent commit: every design is judged against thresholds only.');
      }
      if (head) {
        const missing = await ensureCommit(deps, root, head, 'head');
        if (missing) return fail(`netbrace: ${missing}. For pull_request_target, check out the pull request head (ref: \${{ github.event.pull_request.head.sha }}) or ${FETCH_DEPTH_HINT}.`, 2);
      }
      let kind: GateRequestLike['eventKind'] = target.kind === 'full' || !base ? 'schedule' : target.kind;
      let paths: string[] | undefined;
      if (base) {
        const missing = await ensureCommit(deps, root, base, 'base');
        if (missing) {
          // Fallback: the API knows which files the pull request changes. If none is a design,
          // the answer is "nothing to judge"; otherwise comparing needs the base: stop and say how.
          const fromApi = target.pr && head ? await prFilesFallback(deps, env, inputs, target) : undefined;
          if (fromApi && head && designsAmong(root, head, inputs.policy, fromApi) === 0) paths = [];
          if (paths === undefined) return fail(`netbrace: ${missing}. To fix it, ${FETCH_DEPTH_HINT}.`, 2);
          notes.push('The base commit could not be fetched; the pull request\u2019s file list (REST API) shows that no design file changed.');
          base = undefined;
          kind = 'schedule';
        }
      }
      // A change to the workflow that runs this step: the base's settings stay in force.
      if (base && head && target.pr) {
        ownSettings = await ownSettingChanges(deps, env, root, base, head);
        if (ownSettings) applyBaseSettings(inputs, ownSettings.changes, deps);
      }
      const request: GateRequestLike = {
        ...(base ? { base } : {}),
        ...(head ? { head } : { worktree: true }),
        ...(paths ? { paths } : {}),
        ...(inputs.policy ? { policyPath: inputs.policy } : {}),
        ...(inputs.orgPolicy ? { orgPolicyPath: inputs.orgPolicy } : {}),
        policySource: inputs.policySource,
        mode: inputs.mode,
        ...(inputs.seed !== undefined ? { seed: inputs.seed } : {}),
        ...(inputs.threads !== undefined ? { threads: inputs.threads } : {}),
        ...(inputs.part ? { part: inputs.part } : {}),
        eventKind: kind,
      };
      if (paths && paths.length === 0) {
        report = emptyReport(inputs, target);
      } else {
        const result = await deps.gate(request, root);
        report = result.report;
        if (ownSettings) attachSettings(report, ownSettings, inputs.mode);
        if (base && head) lines = await changedLines(deps, root, base, head);
      }
    }

    const partJob = Boolean(inputs.part);
    const artifacts: string[] = [];
    const write = (input: string, given: string, text: string): string => {
      const full = prepareWrite(workspace, workspace, given, input);
      writeFileSync(full, text);
      const rel = workspaceRelative(workspace, full);
      artifacts.push(rel);
      return rel;
    };
    const reportPath = inputs.report ? write('report', inputs.report, serializeReport(report)) : '';
    let sarifPath = '';
    let htmlPath = '';
    if (!partJob) {
      if (inputs.sarif) sarifPath = write('sarif', inputs.sarif, `${JSON.stringify(renderSarif(report, { category: inputs.sarifCategory }), null, 2)}\n`);
      if (inputs.html && deps.renderHtml) htmlPath = write('html', inputs.html, deps.renderHtml(report));
    }

    // Annotations (the join job emits those of every part; a part job leaves them to it).
    if (!partJob) {
      const elsewhere = sarifPath ? `the job summary and ${sarifPath}` : 'the job summary and the JSON report';
      // A failing step also logs its setFailed message as an error annotation: keep a slot for it.
      const reservedErrors = report.verdict === 'fail' && report.mode === 'block' ? 1 : 0;
      const plan = planAnnotations(report, { changedLines: lines, elsewhere, reservedErrors });
      for (const a of plan.annotations) deps.out.annotate(a);
    }

    // The comment, then the summary (which mentions what happened to the comment).
    let comment: RunOutcome['comment'] = 'not-applicable';
    const url = runUrl(env);
    const viewOptions = { ...(url ? { runUrl: url } : {}), artifacts, ...(inputs.title ? { title: inputs.title } : {}) };
    if (!partJob && !target.pr && inputs.pullRequest) {
      target.pr = await trustedPullRequest(deps, env, inputs, target, inputs.pullRequest);
    }
    if (!partJob) {
      const body = renderComment(report, { ...viewOptions, key: inputs.commentKey });
      comment = await postComment(deps, env, inputs, target, report, body);
      if (comment === 'failed') notes.push('The pull-request comment could not be written (see the warning in the log); this does not change the verdict.');
    }
    deps.out.appendSummary(renderSummary(report, { ...viewOptions, notes }));

    // Outputs.
    const counts = { ...emptyCounts(), ...report.counts };
    deps.out.setOutput('verdict', report.verdict);
    for (const s of STATUSES) deps.out.setOutput(`count-${s}`, String(counts[s] ?? 0));
    deps.out.setOutput('designs', String(report.files.length));
    deps.out.setOutput('findings', String(report.files.reduce((n, f) => n + f.findings.length, 0)));
    deps.out.setOutput('report', reportPath);
    deps.out.setOutput('sarif', sarifPath);
    deps.out.setOutput('html', htmlPath);
    deps.out.setOutput('comment-url', typeof comment === 'object' && comment.url ? comment.url : '');

    const verdict = report.verdict;
    if (partJob) {
      deps.out.info(`netbrace: part ${inputs.part!.index}/${inputs.part!.total} ${verdict === 'fail' ? 'has failures' : 'passes'}; the join job decides`);
      return { exitCode: 0, verdict, comment };
    }
    if (verdict === 'fail' && inputs.mode === 'block') {
      const n = report.files.filter((f) => f.status === 'unreadable' || f.findings.some((x) => x.severity === 'fail')).length;
      const own = report.configuration?.changes.filter((c) => c.weakens).length ?? 0;
      const what = [
        ...(n > 0 ? [`${n} design${n === 1 ? '' : 's'} with failures`] : []),
        ...(own > 0 ? [`the change weakens netbrace's own settings in ${report.configuration!.workflow}`] : []),
      ].join('; ');
      return { ...fail(`netbrace: the gate failed: ${what} (see the annotations and the job summary)`, 1), verdict, comment };
    }
    if (verdict === 'fail') deps.out.warning('netbrace: the gate would fail; inform mode reports without failing the step');
    return { exitCode: 0, verdict, comment };
  } catch (error) {
    if (isNetbraceError(error)) {
      if (error.file && error.line > 0) {
        deps.out.annotate({ level: 'error', file: error.file, startLine: error.line, ...(error.column > 0 ? { startColumn: error.column } : {}), title: 'netbrace: configuration error', message: logText(error.message), rule: 'parse-error', inDiff: false });
      }
      return fail(`netbrace: ${formatDiagnostic(error)}`, error.kind === 'design' ? 1 : 2);
    }
    if (error instanceof InputError || error instanceof WorkspacePathError) return fail(`netbrace: ${error.message}`, 2);
    const message = error instanceof Error ? error.message : String(error);
    return fail(`netbrace: internal error: ${message} \u2014 please report this with the workflow run`, 2);
  }
}

/**
 * The pull request named by the "pull-request" input. In a workflow_run that posts the report
 * of a pull-request run (a fork's), the number comes from an artifact, which is untrusted: it
 * is used only if the pull request's head is the commit that run evaluated.
 */
async function trustedPullRequest(deps: ActionDeps, env: Env, inputs: ActionInputs, target: Target, number: number): Promise<Target['pr']> {
  const [owner = '', repo = ''] = (env.GITHUB_REPOSITORY ?? '').split('/');
  const pr = { owner, repo, number, fork: false };
  if (target.eventName !== 'workflow_run') return pr;
  if (!target.runHeadSha || !inputs.token) {
    deps.out.warning('netbrace: no comment: the workflow_run payload has no head commit to check the pull request against');
    return undefined;
  }
  try {
    const client = deps.github({ token: inputs.token, baseUrl: env.GITHUB_API_URL || 'https://api.github.com', ...httpSettingsFromEnv(env) });
    const head = await pullRequestHead(client, { owner, repo, issueNumber: number });
    if (head === target.runHeadSha) return pr;
    deps.out.warning(`netbrace: no comment: pull request #${number} is at ${head.slice(0, 12)}, not at ${target.runHeadSha.slice(0, 12)} which the report is about`);
  } catch (error) {
    deps.out.warning(`netbrace: no comment: could not read pull request #${number} (${oneLine(error instanceof Error ? error.message : String(error), 200)})`);
  }
  return undefined;
}

/**
 * How many of the pull request's files (repository paths, from the API) are designs, by the
 * policy at head. Trusted only when the pull request leaves the policy files alone (then the
 * head's policy is the base's); a changed policy counts as "there may be designs".
 */
function designsAmong(root: string, head: string, policyPath: string, changed: string[]): number {
  const read = (p: string): string | null => {
    try {
      return decodeText(execFileSync('git', ['show', '--no-textconv', '--end-of-options', `${head}:${p}`], { cwd: root, maxBuffer: 64 * 1024 * 1024, stdio: ['ignore', 'pipe', 'ignore'] }), p);
    } catch {
      return null;
    }
  };
  const entry = policyPath || DEFAULT_POLICY_PATH;
  const text = read(entry);
  const policy = text === null ? builtinPolicy() : loadPolicy(entry, read);
  const policyFiles = new Set([entry, ...policy.files]);
  if (changed.some((p) => policyFiles.has(p))) return Number.POSITIVE_INFINITY;
  // A CSV the built-in glob alone selects counts when its header makes it a design (or when it
  // is gone at head: it may be a design the change deletes).
  const counts = (p: string) => {
    if (!designNeedsHeader(policy, p)) return true;
    const t = read(p);
    return t === null || isDesignText(policy, p, t);
  };
  return changed.filter((p) => isDesignPath(policy, p) && counts(p)).length;
}

async function prFilesFallback(deps: ActionDeps, env: Env, inputs: ActionInputs, target: Target): Promise<string[] | undefined> {
  if (!target.pr || !inputs.token) return undefined;
  try {
    const client = deps.github({ token: inputs.token, baseUrl: env.GITHUB_API_URL || 'https://api.github.com', ...httpSettingsFromEnv(env) });
    const { files, truncated } = await listPullRequestFiles(client, { owner: target.pr.owner, repo: target.pr.repo, issueNumber: target.pr.number });
    if (truncated) return undefined;
    const names = files.filter((f) => f.status !== 'D').map((f) => f.path);
    // The names are data from the API: one that is not a plain repository path makes the list untrusted.
    const plain = (p: string) => {
      try {
        return repositoryPath(p, 'a file name') === p;
      } catch {
        return false;
      }
    };
    return names.every(plain) ? names : undefined;
  } catch (error) {
    deps.out.warning(`netbrace: could not list the pull request\u2019s files (${oneLine(error instanceof Error ? error.message : String(error), 200)})`);
    return undefined;
  }
}

/** The report of a run with nothing to judge: a pass that says so. */
export function emptyReport(inputs: Pick<ActionInputs, 'mode' | 'policy' | 'seed'>, target: Pick<Target, 'base' | 'head'>): Report {
  return {
    version: REPORT_VERSION,
    tool: { name: 'netbrace', version: VERSION },
    verdict: 'pass',
    mode: inputs.mode,
    policy: inputs.policy ? { source: 'file', path: inputs.policy } : { source: 'builtin' },
    ...(target.base ? { base: target.base } : {}),
    ...(target.head ? { head: target.head } : {}),
    seed: inputs.seed ?? 0,
    counts: emptyCounts(),
    files: [],
    caution: CAUTION,
  };
}

// ---------------------------------------------------------------------------------------------
// The real runner protocol

/** @actions/core behind the ActionOutput seam; the summary goes to GITHUB_STEP_SUMMARY. */
export function coreOutput(env: Env): ActionOutput {
  return {
    annotate(a) {
      const props = a.file ? { title: a.title, file: a.file, startLine: a.startLine, ...(a.startColumn ? { startColumn: a.startColumn } : {}) } : { title: a.title };
      if (a.level === 'error') core.error(a.message, props);
      else if (a.level === 'warning') core.warning(a.message, props);
      else core.notice(a.message, props);
    },
    info: (m) => core.info(m),
    warning: (m) => core.warning(m),
    setOutput: (name, value) => core.setOutput(name, value),
    setFailed: (m) => core.setFailed(m),
    appendSummary(markdown) {
      const file = env.GITHUB_STEP_SUMMARY;
      if (!file) {
        core.info(markdown);
        return;
      }
      appendFileSync(file, markdown.endsWith('\n') ? markdown : `${markdown}\n`);
    },
  };
}

export function defaultGithub(options: ClientOptions): Client {
  return createClient(options);
}
