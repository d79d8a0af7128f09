// The policy for the commands that study one design on disk (explain, envelope): the file the
// gate reads, so that their R, challenges, seed and work budget are the gate's. `--policy FILE`
// (relative to where the command runs), else .netbrace.yaml at the root of the git repository
// that holds the working directory (the working directory itself outside git), else the
// built-in policy. Repository paths (the files a policy extends, the globs of its overrides)
// are taken from that root, as the gate takes them.

import { realpathSync } from 'node:fs';
import path from 'node:path';
import { GitError, UsageError } from '../errors.js';
import { builtinPolicy, DEFAULT_POLICY_PATH, loadPolicy, policyForFile } from '../policy/resolve.js';
import type { FilePolicy, Policy } from '../policy/types.js';
import { repoRoot } from './git.js';
import type { CommandIO } from './io.js';
import { readInsideSync } from './workspace.js';

export interface LocalPolicy {
  policy: Policy;
  /** Where it came from, in words: "policy .netbrace.yaml" or "the built-in policy". */
  source: string;
  /** The directory repository paths are taken from. */
  root: string;
}

/** The git repository's root, or the working directory outside one (or without git). */
async function rootOf(cwd: string): Promise<string> {
  try {
    return (await repoRoot(cwd)) ?? realpathSync(cwd);
  } catch (e) {
    if (e instanceof GitError) return realpathSync(cwd); // no git installed: files on disk only
    throw e;
  }
}

/** A path typed relative to the working directory, as a path from `root` (null when outside it). */
function fromRoot(root: string, cwd: string, given: string): string | null {
  const rel = path.relative(root, path.resolve(realpathSync(cwd), given));
  if (rel === '' || rel.startsWith('..') || path.isAbsolute(rel)) return null;
  return rel.split(path.sep).join('/');
}

/** Read the policy that applies where the command runs (see the file comment). Throws PolicyError / UsageError. */
export async function readLocalPolicy(io: CommandIO, given: string | undefined): Promise<LocalPolicy> {
  const root = await rootOf(io.cwd);
  const read = (p: string) => readInsideSync(root, p);
  if (given !== undefined) {
    const entry = fromRoot(root, io.cwd, given);
    if (entry === null)
      throw new UsageError(
        `policy file ${given} is outside ${root === realpathSync(io.cwd) ? 'the working directory' : 'the repository'}`,
        'a policy and the files it extends live in the repository',
      );
    if (read(entry) === null)
      throw new UsageError(`policy file ${given} not found`, 'give a path relative to the working directory');
    return { policy: loadPolicy(entry, read), source: `policy ${entry}`, root };
  }
  if (read(DEFAULT_POLICY_PATH) !== null)
    return { policy: loadPolicy(DEFAULT_POLICY_PATH, read), source: `policy ${DEFAULT_POLICY_PATH}`, root };
  return { policy: builtinPolicy(), source: 'the built-in policy', root };
}

/** The rules for one design file (overrides matched on its path from the root, as in the gate). */
export function designPolicy(local: LocalPolicy, io: CommandIO, file: string): FilePolicy {
  const rel = fromRoot(local.root, io.cwd, file) ?? file.split(path.sep).join('/');
  return policyForFile(local.policy, rel);
}
