// The event: which commits the Action compares (from the payload), and making sure they are in
// the clone. A pull request whose base cannot be fetched may still be judged "nothing to judge"
// from the REST API's file list, when that list is trusted and names no design.

import { readFileSync, statSync } from 'node:fs';
import { loadPolicyAt } from '../run-gate.js';
import { DEFAULT_POLICY_PATH } from '../policy/defaults.js';
import { builtinPolicy, designNeedsHeader, isDesignPath, isDesignText } from '../policy/resolve.js';
import { oneLine } from '../report/escape.js';
import type { ActionDeps, Env } from './action-deps.js';
import { InputError, type ActionInputs } from './action-inputs.js';
import { httpSettingsFromEnv, listPullRequestFiles } from './github.js';
import { repositoryPath } from './workspace.js';

export const SHA_RE = /^[0-9a-f]{40}([0-9a-f]{24})?$/;
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
  if (typeof value !== 'string' || !SHA_RE.test(value))
    throw new InputError(`the event payload has no valid ${what} (got ${oneLine(String(value), 60)})`);
  return value;
}

export function readTarget(env: Env): Target {
  const eventName = env.GITHUB_EVENT_NAME ?? '';
  // The payload is untrusted JSON, read field by field and each field checked where it is read.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  let payload: Record<string, any> = {};
  const eventPath = env.GITHUB_EVENT_PATH;
  if (eventPath) {
    const size = statSync(eventPath).size;
    if (size > 64 * 1024 * 1024) throw new InputError('the event payload is larger than 64 MiB');
    payload = JSON.parse(readFileSync(eventPath, 'utf8')) as typeof payload;
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
      pr: {
        owner,
        repo,
        number: Number(pr.number ?? payload.number),
        fork:
          Boolean(pr.head?.repo?.fork) || (headRepo !== undefined && headRepo !== baseRepo) || pr.head?.repo === null,
      },
    };
  }
  if (eventName === 'push') {
    const after = String(payload.after ?? env.GITHUB_SHA ?? '');
    if (payload.deleted === true || ZERO_RE.test(after))
      return { eventName, kind: 'nothing', reason: 'the push deleted a branch or tag' };
    const before = String(payload.before ?? '');
    if (ZERO_RE.test(before) || before === '')
      return { eventName, kind: 'push', head: sha(after, 'after'), newBranch: true };
    return { eventName, kind: 'push', base: sha(before, 'before'), head: sha(after, 'after') };
  }
  // workflow_dispatch, schedule and anything else: every design, thresholds only.
  const head = env.GITHUB_SHA && SHA_RE.test(env.GITHUB_SHA) ? env.GITHUB_SHA : undefined;
  const runHead = payload.workflow_run?.head_sha;
  return {
    eventName,
    kind: 'full',
    ...(head ? { head } : {}),
    ...(typeof runHead === 'string' && SHA_RE.test(runHead) ? { runHeadSha: runHead } : {}),
  };
}

async function hasCommit(deps: ActionDeps, cwd: string, commit: string): Promise<boolean> {
  return (await deps.git(['cat-file', '-e', `${commit}^{commit}`], cwd)).code === 0;
}

export const FETCH_DEPTH_HINT =
  'add `fetch-depth: 0` to the actions/checkout step (under `with:`), so that the base commit is in the clone';

/** Make sure the commit is in the clone: fetch exactly that one commit when it is missing. */
export async function ensureCommit(
  deps: ActionDeps,
  cwd: string,
  commit: string,
  what: string,
): Promise<string | undefined> {
  if (await hasCommit(deps, cwd, commit)) return undefined;
  deps.out.info(
    `netbrace: the ${what} commit ${commit.slice(0, 12)} is not in the clone (shallow checkout); fetching that one commit`,
  );
  const fetched = await deps.git(['fetch', '--no-tags', '--no-recurse-submodules', '--depth=1', 'origin', commit], cwd);
  if (fetched.code === 0 && (await hasCommit(deps, cwd, commit))) return undefined;
  return `the ${what} commit ${commit} is not in the clone and could not be fetched (git fetch: ${oneLine(fetched.stderr, 300) || `exit ${fetched.code}`})`;
}

/**
 * How many of the pull request's files (repository paths, from the API) are designs, by the
 * policy at head. Trusted only when the pull request leaves the policy files alone (then the
 * head's policy is the base's); a changed policy counts as "there may be designs".
 */
export async function designsAmong(
  deps: ActionDeps,
  root: string,
  head: string,
  policyPath: string,
  changed: string[],
): Promise<number> {
  let unsure = false;
  const read = async (p: string): Promise<string | null> => {
    const r = await deps.git(['show', '--no-textconv', '--end-of-options', `${head}:${p}`], root);
    if (r.code !== 0) return null;
    // git's output arrives as UTF-8 text: a file that is not (UTF-16, binary) cannot be judged here.
    if (r.stdout.includes('\uFFFD')) unsure = true;
    return r.stdout;
  };
  const entry = policyPath || DEFAULT_POLICY_PATH;
  const text = await read(entry);
  const policy = text === null ? builtinPolicy() : (await loadPolicyAt(entry, read)).policy;
  const policyFiles = new Set([entry, ...policy.files]);
  if (unsure || changed.some((p) => policyFiles.has(p))) return Number.POSITIVE_INFINITY;
  // A CSV the built-in glob alone selects counts when its header makes it a design (or when it
  // is gone at head: it may be a design the change deletes).
  let n = 0;
  for (const p of changed) {
    if (!isDesignPath(policy, p)) continue;
    if (!designNeedsHeader(policy, p)) n++;
    else {
      const t = await read(p);
      if (t === null || isDesignText(policy, p, t)) n++;
    }
  }
  return unsure ? Number.POSITIVE_INFINITY : n;
}

/** The pull request's changed files from the REST API, or undefined when the list is incomplete or untrusted. */
export async function prFilesFallback(
  deps: ActionDeps,
  env: Env,
  inputs: ActionInputs,
  target: Target,
): Promise<string[] | undefined> {
  if (!target.pr || !inputs.token) return undefined;
  try {
    const client = deps.github({
      token: inputs.token,
      baseUrl: env.GITHUB_API_URL || 'https://api.github.com',
      ...httpSettingsFromEnv(env),
    });
    const { files, truncated } = await listPullRequestFiles(client, {
      owner: target.pr.owner,
      repo: target.pr.repo,
      issueNumber: target.pr.number,
    });
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
    deps.out.warning(
      `netbrace: could not list the pull request\u2019s files (${oneLine(error instanceof Error ? error.message : String(error), 200)})`,
    );
    return undefined;
  }
}
