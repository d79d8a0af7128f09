// Paths the user names (inputs of the Action) are resolved against the workspace and must
// stay inside it, symlinks included: the lexical check catches `../..`, and realpath() of the
// target (or of its nearest existing ancestor, for a file still to be written) catches a
// symlink that points out. Writes never follow a symlink at the target itself.

import { existsSync, lstatSync, mkdirSync, realpathSync } from 'node:fs';
import path from 'node:path';

export class WorkspacePathError extends Error {
  override name = 'WorkspacePathError';
}

function inside(root: string, candidate: string): boolean {
  const rel = path.relative(root, candidate);
  return rel === '' || (!rel.startsWith('..') && !path.isAbsolute(rel));
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

/**
 * The absolute path of `given` (relative to `base`, itself inside `workspace`), refused with
 * a message naming `input` when it leaves the workspace lexically or through a symlink.
 */
export function resolveInWorkspace(workspace: string, base: string, given: string, input: string): string {
  if (given.includes('\0')) throw new WorkspacePathError(`input "${input}" contains a NUL character`);
  const root = realpathSync(workspace);
  const full = path.resolve(base, given);
  if (!inside(root, full) && !inside(path.resolve(workspace), full)) {
    throw new WorkspacePathError(`input "${input}" (${given}) points outside the workspace; give a path inside the repository`);
  }
  const existing = nearestExisting(full);
  const real = realpathSync(existing);
  if (!inside(root, real)) {
    throw new WorkspacePathError(`input "${input}" (${given}) leads outside the workspace through a symbolic link`);
  }
  // Re-expressed under the real workspace root, so later checks compare like with like.
  return path.join(real, path.relative(existing, full));
}

/** Like resolveInWorkspace, for a file to write: parents are created, a symlink target refused. */
export function prepareWrite(workspace: string, base: string, given: string, input: string): string {
  const full = resolveInWorkspace(workspace, base, given, input);
  let stat;
  try {
    stat = lstatSync(full);
  } catch {
    stat = undefined;
  }
  if (stat?.isSymbolicLink()) throw new WorkspacePathError(`input "${input}" (${given}) is a symbolic link; netbrace does not write through links`);
  if (stat?.isDirectory()) throw new WorkspacePathError(`input "${input}" (${given}) is a directory; name a file`);
  mkdirSync(path.dirname(full), { recursive: true });
  // The directories just created are inside the workspace; check the parent once more in case
  // one of them was a link created concurrently.
  if (!inside(realpathSync(workspace), realpathSync(path.dirname(full)))) {
    throw new WorkspacePathError(`input "${input}" (${given}) leads outside the workspace`);
  }
  return full;
}

/** The path relative to the workspace, with forward slashes (for outputs and annotations). */
export function workspaceRelative(workspace: string, full: string): string {
  const rel = path.relative(realpathSync(workspace), full);
  return rel.split(path.sep).join('/') || '.';
}
