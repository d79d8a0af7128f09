// The one place where a path that a user, a policy or an event names is turned into a file of
// the workspace (the checkout, or the repository the CLI runs in), and refused when it is not
// one: `../` that climbs out, an absolute path elsewhere, a NUL byte, or a symbolic link (at the
// file or at any directory on the way) whose target is outside. The lexical check catches the
// first kinds; realpath() of the target — or, for a file still to be written, of its nearest
// existing ancestor — catches the links. Writes never follow a link at the target itself.
//
// Who uses it: the Action's inputs (policy, report, sarif, html, join-parts, working-directory),
// the gate's reader of the working tree (design and policy files named by the policy, by git
// or on the command line), and the policy reader of `netbrace explain`. Not the files a local
// user names explicitly to `inspect`/`explain` or as `--json FILE`: those are the user's own.

import { existsSync, lstatSync, mkdirSync, readFileSync, realpathSync, statSync } from 'node:fs';
import path from 'node:path';
import { decodeText } from '../decode.js';
import { LimitError, UsageError } from '../errors.js';
import { DEFAULT_MAX_BYTES } from '../topology/model.js';

/** A path that leaves the workspace (a UsageError: exit code 2, one clear message). */
export class WorkspacePathError extends UsageError {
  override name = 'WorkspacePathError';
}

/** Whether `candidate` is `root` or below it (both absolute, already resolved). */
export function isInside(root: string, candidate: string): boolean {
  const rel = path.relative(root, candidate);
  return rel === '' || (!rel.startsWith(`..${path.sep}`) && rel !== '..' && !path.isAbsolute(rel));
}

function nearestExisting(p: string): string {
  let cur = p;
  while (!existsSync(cur)) {
    const parent = path.dirname(cur);
    if (parent === cur) break;
    cur = parent;
  }
  return cur;
}

/** `what (given)`, with control characters shown as `?` (a message is one line). */
function named(what: string, given: string): string {
  return `${what} (${given.replace(/[\0-\x1f\x7f]/g, '?')})`;
}

const inputLabel = (input: string) => `input "${input}"`;
const quoted = (file: string) => file.replace(/[\0-\x1f\x7f]/g, '?');

/**
 * The absolute path of `given` (relative to `base`, itself inside `workspace`), refused with a
 * message naming `input` when it leaves the workspace lexically or through a symbolic link.
 * Re-expressed under the workspace's real path, so later checks compare like with like.
 */
export function resolveInWorkspace(workspace: string, base: string, given: string, input: string): string {
  const label = inputLabel(input);
  if (given.includes('\0')) throw new WorkspacePathError(`${label} contains a NUL character`);
  const root = realpathSync(workspace);
  const full = path.resolve(base, given);
  if (!isInside(root, full) && !isInside(path.resolve(workspace), full)) {
    throw new WorkspacePathError(
      `${named(label, given)} points outside the workspace`,
      'give a path inside the repository',
    );
  }
  const existing = nearestExisting(full);
  const real = realpathSync(existing);
  if (!isInside(root, real)) {
    throw new WorkspacePathError(
      `${named(label, given)} leads outside the workspace through a symbolic link`,
      'give a path inside the repository',
    );
  }
  return path.join(real, path.relative(existing, full));
}

/** Like resolveInWorkspace, for a file to write: parents are created, a link or a directory at the target refused. */
export function prepareWrite(workspace: string, base: string, given: string, input: string): string {
  const full = resolveInWorkspace(workspace, base, given, input);
  const label = inputLabel(input);
  let st;
  try {
    // The path as given, not as resolved: resolving follows a link at the target.
    st = lstatSync(path.resolve(base, given));
  } catch {
    st = undefined;
  }
  if (st?.isSymbolicLink())
    throw new WorkspacePathError(`${named(label, given)} is a symbolic link; netbrace does not write through links`);
  if (st?.isDirectory()) throw new WorkspacePathError(`${named(label, given)} is a directory; name a file`);
  mkdirSync(path.dirname(full), { recursive: true });
  // The directories just created are inside; check the parent once more in case one of them
  // was replaced by a link meanwhile.
  if (!isInside(realpathSync(workspace), realpathSync(path.dirname(full)))) {
    throw new WorkspacePathError(`${named(label, given)} leads outside the workspace`);
  }
  return full;
}

/** The path relative to the workspace, with forward slashes (for outputs and annotations). */
export function workspaceRelative(workspace: string, full: string): string {
  const rel = path.relative(realpathSync(workspace), full);
  return rel.split(path.sep).join('/') || '.';
}

/**
 * A repository path as the policy, git or an event names it: forward slashes, no `.` segments,
 * never absolute, never climbing above the root. Returns the normalised path; throws
 * WorkspacePathError naming `what` (e.g. `input "policy"`) otherwise. Pure (no file system).
 */
export function repositoryPath(given: string, what: string): string {
  if (given.includes('\0')) throw new WorkspacePathError(`${what} contains a NUL character`);
  const slashed = given.replace(/\\/g, '/');
  if (slashed.startsWith('/') || /^[A-Za-z]:\//.test(slashed)) {
    throw new WorkspacePathError(
      `${named(what, given)} is an absolute path`,
      'give a path relative to the repository root',
    );
  }
  const parts: string[] = [];
  for (const seg of slashed.split('/')) {
    if (seg === '' || seg === '.') continue;
    if (seg === '..') {
      if (parts.length === 0)
        throw new WorkspacePathError(
          `${named(what, given)} points outside the repository`,
          'give a path inside the repository',
        );
      parts.pop();
    } else parts.push(seg);
  }
  return parts.join('/');
}

/** Errors of a read that mean "there is no such file here". */
function absent(e: unknown): boolean {
  const code = (e as NodeJS.ErrnoException).code;
  return code === 'ENOENT' || code === 'ENOTDIR' || code === 'EISDIR';
}

/** A file too large to read at all (the parsers' own, smaller limit applies to what is read). */
export function tooLarge(file: string, bytes: number | undefined, maxBytes: number, revision = ''): LimitError {
  const size = bytes === undefined ? `more than ${maxBytes} bytes` : `${bytes} bytes > ${maxBytes}`;
  return new LimitError(
    `the file${revision ? ` at ${revision}` : ''} is larger than netbrace reads (${size})`,
    { file },
    `design and policy files are limited to ${DEFAULT_MAX_BYTES} bytes`,
  );
}

/**
 * A file of the tree at `root`, as text (decode.ts: EncodingError when it is not UTF-8); null
 * when it does not exist (or is a directory).
 * Refuses (WorkspacePathError) a path outside `root`, lexically or through a link; refuses
 * (LimitError, from stat, before reading) a file over `maxBytes`.
 */
export function readInsideSync(root: string, file: string, maxBytes = DEFAULT_MAX_BYTES): string | null {
  const full = path.resolve(root, file);
  if (file.includes('\0') || !isInside(path.resolve(root), full))
    throw new WorkspacePathError(`${quoted(file)} is outside the repository`, 'give paths inside the repository');
  try {
    const real = realpathSync(full);
    if (!isInside(realpathSync(root), real))
      throw new WorkspacePathError(`${quoted(file)} leads outside the repository through a symbolic link`);
    const st = statSync(real);
    if (st.isDirectory()) return null;
    if (st.size > maxBytes) throw tooLarge(file, st.size, maxBytes);
    return decodeText(readFileSync(real), file);
  } catch (e) {
    if (absent(e)) return null;
    throw e;
  }
}

/** readInsideSync for async callers (the gate's readers). */
export async function readInside(root: string, file: string, maxBytes = DEFAULT_MAX_BYTES): Promise<string | null> {
  return readInsideSync(root, file, maxBytes);
}
