// git, for the gate: always through execFile with an argument array, never a shell string,
// so no file name, ref or input can become a command. Refs are checked before use (no
// leading "-", so none is read as an option) and paths follow "--". The working tree is
// read directly from disk, never outside the repository root.

import { execFile } from 'node:child_process';
import { decodeText } from '../decode.js';
import { GitError, UsageError } from '../errors.js';
import type { ChangedFile, GateDeps, Revision } from '../run-gate.js';
import { readInside, tooLarge } from './workspace.js';

/** Design files may be up to 20 MB; give git's output room beyond that. */
const MAX_BUFFER = 64 * 1024 * 1024;
/** A fetch of one commit; anything longer is a network problem, not a large repository. */
const FETCH_TIMEOUT_MS = 120_000;

export interface GitOutput<Stdout = string> {
  code: number;
  stdout: Stdout;
  stderr: string;
}

export function runGit(cwd: string, args: readonly string[], timeout = 0): Promise<GitOutput> {
  return execGit(cwd, args, timeout, 'utf8');
}

/** runGit with stdout as bytes: file contents, which decode.ts turns into text (or refuses). */
function runGitBytes(cwd: string, args: readonly string[]): Promise<GitOutput<Uint8Array>> {
  return execGit(cwd, args, 0, 'buffer');
}

function execGit<E extends 'utf8' | 'buffer'>(
  cwd: string,
  args: readonly string[],
  timeout: number,
  encoding: E,
): Promise<GitOutput<E extends 'utf8' ? string : Uint8Array>> {
  type Out = GitOutput<E extends 'utf8' ? string : Uint8Array>;
  return new Promise((resolve, reject) => {
    execFile(
      'git',
      args,
      {
        cwd,
        maxBuffer: MAX_BUFFER,
        timeout,
        encoding,
        // Never prompt for credentials (a fetch in CI would hang); stable English messages.
        env: { ...process.env, GIT_TERMINAL_PROMPT: '0', LC_ALL: 'C' },
      },
      (error, stdout, stderr) => {
        if (error && typeof (error as NodeJS.ErrnoException).code === 'string') {
          // ENOENT (no git) or ENOBUFS: not an answer of git's.
          const code = (error as NodeJS.ErrnoException).code;
          reject(
            new GitError(code === 'ENOENT' ? 'git is not installed or not on PATH' : `git failed: ${error.message}`),
          );
          return;
        }
        resolve({ code: error ? ((error as { code?: number }).code ?? 1) : 0, stdout, stderr: String(stderr) } as Out);
      },
    );
  });
}

/** git's own reason, in one line: its `fatal:` line when it has one (the first lines are often detail). */
function gitReason(out: GitOutput<unknown>): string {
  const lines = out.stderr
    .trim()
    .split('\n')
    .filter((l) => l.trim() !== '');
  return lines.find((l) => l.startsWith('fatal:')) ?? lines[0] ?? `git exited with ${out.code}`;
}

/** A hint for failures that mean the clone itself is damaged. */
function damageHint(out: GitOutput<unknown>): string {
  return /corrupt|unable to unpack|inflate|bad object|missing blob|missing tree/i.test(out.stderr)
    ? 'the clone is damaged (a git object cannot be read): run "git fsck", or clone the repository again'
    : '';
}

async function git(cwd: string, args: readonly string[], what: string): Promise<string> {
  const out = await runGit(cwd, args);
  if (out.code !== 0) throw new GitError(`${what}: ${gitReason(out)}`, damageHint(out));
  return out.stdout;
}

/** Refuse refs that git could read as options or that carry control characters. */
export function checkRef(ref: string): string {
  if (ref === '' || ref.startsWith('-') || /[\0-\x1f\x7f\s]/.test(ref)) {
    throw new UsageError(
      `"${ref.replace(/[\0-\x1f\x7f]/g, '?')}" is not a git revision`,
      'give a branch, tag or commit id',
    );
  }
  return ref;
}

/** The repository's top-level directory, or null outside a git repository. */
export async function repoRoot(cwd: string): Promise<string | null> {
  const out = await runGit(cwd, ['rev-parse', '--show-toplevel']);
  return out.code === 0 ? out.stdout.trim() : null;
}

/** The commit id a ref names, or null when it names none. */
export async function revParse(cwd: string, ref: string): Promise<string | null> {
  const out = await runGit(cwd, ['rev-parse', '--verify', '--quiet', '--end-of-options', `${checkRef(ref)}^{commit}`]);
  return out.code === 0 ? out.stdout.trim() : null;
}

export async function hasCommit(cwd: string, sha: string): Promise<boolean> {
  return (await runGit(cwd, ['cat-file', '-e', '--end-of-options', `${checkRef(sha)}^{commit}`])).code === 0;
}

/** The best common ancestor of two commits (what a pull request's diff starts from), or null. */
export async function mergeBase(cwd: string, a: string, b: string): Promise<string | null> {
  const out = await runGit(cwd, ['merge-base', '--end-of-options', checkRef(a), checkRef(b)]);
  return out.code === 0 ? out.stdout.trim() : null;
}

/**
 * Make sure a commit is in the clone: a shallow checkout usually lacks the base. Fetches that
 * one commit (depth 1) from the remote; a GitError saying what to change otherwise.
 */
export async function ensureCommit(cwd: string, sha: string, remote = 'origin'): Promise<void> {
  if (await hasCommit(cwd, sha)) return;
  const out = await runGit(
    cwd,
    ['fetch', '--no-tags', '--no-recurse-submodules', '--depth=1', checkRef(remote), checkRef(sha)],
    FETCH_TIMEOUT_MS,
  );
  if (out.code === 0 && (await hasCommit(cwd, sha))) return;
  throw new GitError(
    `commit ${sha} is not in this clone and could not be fetched from ${remote} (${out.stderr.trim().split('\n').pop() || `exit ${out.code}`})`,
    'fetch the history: with actions/checkout set "fetch-depth: 0", or run "git fetch origin <base>" first',
  );
}

/** The commit a ref names; a full commit id missing from a shallow clone is fetched (that one commit only). */
export async function resolveCommit(root: string, ref: string): Promise<string> {
  if (/^[0-9a-f]{40}$/.test(ref) && !(await revParse(root, ref))) await ensureCommit(root, ref);
  const sha = await revParse(root, ref);
  if (!sha)
    throw new UsageError(
      `"${ref}" is not a commit in this repository`,
      'check the ref (git fetch it first if it is remote)',
    );
  return sha;
}

const STATUS: Record<string, ChangedFile['status']> = {
  A: 'added',
  M: 'modified',
  D: 'deleted',
  R: 'renamed',
  T: 'modified',
  C: 'added',
  U: 'modified',
};

/** Parse `git diff --name-status -z` output. */
export function parseNameStatus(out: string): ChangedFile[] {
  const parts = out.split('\0');
  const files: ChangedFile[] = [];
  for (let i = 0; i + 1 < parts.length;) {
    const code = parts[i];
    if (code === '') {
      i++;
      continue;
    }
    const status = STATUS[code[0]] ?? 'modified';
    if (code[0] === 'R' || code[0] === 'C') {
      const [from, to] = [parts[i + 1], parts[i + 2]];
      files.push(code[0] === 'R' ? { status, path: to, previousPath: from } : { status, path: to });
      i += 3;
    } else {
      files.push({ status, path: parts[i + 1] });
      i += 2;
    }
  }
  return files;
}

/** Files changed from base to head (a commit, or "worktree" with untracked files as added), renames detected. */
export async function listChanged(cwd: string, base: Revision, head: Revision): Promise<ChangedFile[]> {
  const range = head === 'worktree' ? [checkRef(base)] : [checkRef(base), checkRef(head)];
  const diff = await git(
    cwd,
    ['diff', '--name-status', '-M', '-z', '--no-ext-diff', '--end-of-options', ...range, '--'],
    'git diff',
  );
  const files = parseNameStatus(diff);
  if (head === 'worktree') {
    const untracked = await git(cwd, ['ls-files', '-z', '--others', '--exclude-standard'], 'git ls-files');
    for (const p of untracked.split('\0')) if (p) files.push({ status: 'added', path: p });
  }
  return files;
}

/** A file at a revision, decoded (decode.ts: EncodingError when it is not UTF-8); null when it does not exist there. */
export async function showFile(cwd: string, rev: string, file: string): Promise<string | null> {
  const spec = `${checkRef(rev)}:${file}`;
  const out = await runGitBytes(cwd, ['show', '--no-textconv', '--end-of-options', spec]).catch((e: unknown) => {
    // A blob over the output buffer: say which file, not what the buffer is called.
    if (e instanceof GitError && /maxBuffer/i.test(e.message))
      throw tooLarge(file, undefined, MAX_BUFFER, rev.slice(0, 12));
    throw e;
  });
  if (out.code === 0) return decodeText(out.stdout, file);
  // Tell "no such file at this revision" from a clone that cannot read it: ask the tree, which
  // lists the file without reading its object. (`cat-file -e` fails for both, and a missing
  // object must not make a changed design look deleted.)
  const listed = await runGit(cwd, ['ls-tree', '-z', '--end-of-options', checkRef(rev), '--', file]);
  if (listed.code === 0 && listed.stdout === '') return null;
  throw new GitError(`git show ${spec}: ${gitReason(out)}`, damageHint(out) || damageHint(listed));
}

/** A file of the working tree, read from disk; null when absent. Never outside `root`, links included (workspace.ts). */
export async function readWorktree(root: string, file: string): Promise<string | null> {
  // The same ceiling as `git show`: what is read is then held to the parsers' size limit.
  return readInside(root, file, MAX_BUFFER);
}

/** Every file at a revision; for the working tree, tracked and untracked-but-not-ignored files on disk. */
export async function listFiles(cwd: string, rev: Revision): Promise<string[]> {
  const split = (out: string) => out.split('\0').filter(Boolean);
  if (rev !== 'worktree') {
    return [
      ...new Set(
        split(await git(cwd, ['ls-tree', '-r', '-z', '--name-only', '--end-of-options', checkRef(rev)], 'git ls-tree')),
      ),
    ].sort();
  }
  const all = split(await git(cwd, ['ls-files', '-z', '--cached', '--others', '--exclude-standard'], 'git ls-files'));
  const deleted = new Set(split(await git(cwd, ['ls-files', '-z', '--deleted'], 'git ls-files')));
  return [...new Set(all.filter((f) => !deleted.has(f)))].sort();
}

/** The gate's readers for the repository at `root` (its top-level directory). The
 *  organisation policy comes from disk (a second checkout inside the repository's folder). */
export function gitDeps(root: string): Pick<GateDeps, 'listChanged' | 'readAt' | 'listAll' | 'readOrgPolicy'> {
  return {
    listChanged: (base, head) => listChanged(root, base, head),
    readAt: (rev, file) => (rev === 'worktree' ? readWorktree(root, file) : showFile(root, rev, file)),
    listAll: (rev) => listFiles(root, rev),
    readOrgPolicy: (file) => readWorktree(root, file),
  };
}
