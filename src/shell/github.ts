// The REST API, for the two things the Action needs from it: the one living PR comment and,
// when git cannot tell, the list of files a pull request changed. Octokit comes from
// @actions/github (so proxies and GHES work as on any runner) with the retry and throttling
// plugins; every request has a timeout, and retries are bounded, so an API that is down makes
// the step slower by seconds, never hang. Nothing here decides the verdict: callers treat
// every failure as a warning.

import { getOctokit } from '@actions/github';
import { defaults as actionsDefaults } from '@actions/github/lib/utils';
import { retry } from '@octokit/plugin-retry';
import { throttling } from '@octokit/plugin-throttling';

export interface ClientOptions {
  token: string;
  /** The REST root, from GITHUB_API_URL (GHES and tests point it elsewhere). */
  baseUrl: string;
  /** Retries after the first attempt, for 5xx, timeouts and rate limits. Default 3. */
  retries?: number;
  /** Backoff unit in ms: the n-th retry waits n² units (the retry plugin's rule). Default 1000. */
  backoffMs?: number;
  /** Per-request timeout in ms. Default 20,000. */
  timeoutMs?: number;
  /** Wait for a primary rate-limit reset only when it is at most this many seconds away. Default 60. */
  maxRateLimitWaitS?: number;
  /** Where the client reports retries and give-ups (a warning line in the log). */
  log?: (message: string) => void;
  /**
   * The throttling plugin (rate-limit waits; it also spaces writes 3 s apart per process).
   * Default on; in-process tests that do not test rate limits turn it off to stay fast.
   */
  throttle?: boolean;
}

/**
 * The HTTP knobs, from the environment: documented for tests (which run the bundled action
 * against a loopback server and must finish in seconds), not for users.
 * NETBRACE_HTTP_RETRIES, NETBRACE_HTTP_BACKOFF_MS, NETBRACE_HTTP_TIMEOUT_MS.
 */
export function httpSettingsFromEnv(
  env: Readonly<Record<string, string | undefined>>,
): Pick<ClientOptions, 'retries' | 'backoffMs' | 'timeoutMs'> {
  const num = (name: string): number | undefined => {
    const raw = env[name];
    if (raw === undefined || raw.trim() === '') return undefined;
    const v = Number(raw);
    return Number.isFinite(v) && v >= 0 ? v : undefined;
  };
  const out: Pick<ClientOptions, 'retries' | 'backoffMs' | 'timeoutMs'> = {};
  const retries = num('NETBRACE_HTTP_RETRIES');
  const backoffMs = num('NETBRACE_HTTP_BACKOFF_MS');
  const timeoutMs = num('NETBRACE_HTTP_TIMEOUT_MS');
  if (retries !== undefined) out.retries = Math.min(10, Math.floor(retries));
  if (backoffMs !== undefined) out.backoffMs = backoffMs;
  if (timeoutMs !== undefined && timeoutMs > 0) out.timeoutMs = timeoutMs;
  return out;
}

export type Client = ReturnType<typeof getOctokit>;

type FetchLike = (url: string, init?: Record<string, unknown>) => Promise<Response>;

/** A fetch that gives up after `timeoutMs`, as a network error (which the retry plugin retries). */
function timedFetch(inner: FetchLike, timeoutMs: number): FetchLike {
  return async (url, init = {}) => {
    const timer = AbortSignal.timeout(timeoutMs);
    try {
      return await inner(url, { ...init, signal: timer });
    } catch (error) {
      // No `cause`: Octokit reports a TypeError by its cause's message, and this one must say
      // how long it waited.
      // eslint-disable-next-line preserve-caught-error
      if (timer.aborted) throw new TypeError(`no answer within ${timeoutMs} ms`);
      throw error;
    }
  };
}

export function createClient(options: ClientOptions): Client {
  const retries = options.retries ?? 3;
  const backoffMs = options.backoffMs ?? 1000;
  const timeoutMs = options.timeoutMs ?? 20_000;
  const maxWait = options.maxRateLimitWaitS ?? 60;
  const log = options.log ?? (() => {});
  const inner =
    (actionsDefaults.request as { fetch?: FetchLike } | undefined)?.fetch ?? (fetch as unknown as FetchLike);
  const onLimit =
    (kind: string) =>
    (retryAfter: number, request: { method: string; url: string }, _octokit: unknown, retryCount: number) => {
      if (retryCount < retries && retryAfter <= maxWait) {
        log(`GitHub API ${kind} on ${request.method} ${request.url}: retrying in ${retryAfter} s`);
        return true;
      }
      log(`GitHub API ${kind} on ${request.method} ${request.url}: giving up (reset in ${retryAfter} s)`);
      return false;
    };
  return getOctokit(
    options.token,
    {
      baseUrl: options.baseUrl.replace(/\/+$/, ''),
      request: { fetch: timedFetch(inner, timeoutMs) },
      retry: { retries, retryAfterBaseValue: backoffMs },
      throttle: {
        enabled: options.throttle ?? true,
        retryAfterBaseValue: backoffMs,
        fallbackSecondaryRateRetryAfter: 5,
        onRateLimit: onLimit('rate limit'),
        onSecondaryRateLimit: onLimit('secondary rate limit'),
      },
      log: { debug: () => {}, info: () => {}, warn: (m: string) => log(m), error: (m: string) => log(m) },
    } as Parameters<typeof getOctokit>[1],
    retry,
    throttling,
  );
}

export interface IssueRef {
  owner: string;
  repo: string;
  /** The pull request number (PR comments are issue comments). */
  issueNumber: number;
}

export interface FoundComment {
  id: number;
  body: string;
  url?: string;
}

/** The login GitHub gives the workflow's own token (GITHUB_TOKEN), documented by GitHub. */
export const WORKFLOW_TOKEN_LOGIN = 'github-actions[bot]';

/**
 * The login the token acts as: GET /user answers for personal and user tokens; the workflow
 * token and app installation tokens are refused there (401/403/404), and the workflow token's
 * comments are written by github-actions[bot]. A failure of another kind is thrown.
 */
export async function tokenLogin(client: Client): Promise<string> {
  try {
    const res = await client.rest.users.getAuthenticated();
    if (typeof res.data.login === 'string' && res.data.login !== '') return res.data.login;
    return WORKFLOW_TOKEN_LOGIN;
  } catch (e) {
    const status = (e as { status?: number } | null)?.status;
    if (status === 401 || status === 403 || status === 404) return WORKFLOW_TOKEN_LOGIN;
    throw e;
  }
}

/**
 * Our comment on the issue: the first whose body contains `marker` and whose author is the
 * identity the token acts as (every page is read). Anyone can paste the marker into a comment
 * of their own; such a comment is never adopted, so it is never edited. The token's identity
 * is asked for only when some comment carries the marker.
 */
export async function findComment(
  client: Client,
  ref: IssueRef,
  marker: string,
  login?: () => Promise<string>,
): Promise<FoundComment | undefined> {
  const iterator = client.paginate.iterator(client.rest.issues.listComments, {
    owner: ref.owner,
    repo: ref.repo,
    issue_number: ref.issueNumber,
    per_page: 100,
  });
  const marked: { found: FoundComment; author: string }[] = [];
  for await (const page of iterator) {
    for (const c of page.data) {
      if (typeof c.body !== 'string' || !c.body.includes(marker)) continue;
      marked.push({ found: { id: c.id, body: c.body, url: c.html_url }, author: c.user?.login ?? '' });
    }
  }
  if (marked.length === 0) return undefined;
  const me = await (login ?? (() => tokenLogin(client)))();
  return marked.find((m) => m.author === me)?.found;
}

export type CommentAction = 'created' | 'updated' | 'unchanged' | 'skipped';

export interface UpsertResult {
  action: CommentAction;
  id?: number;
  url?: string;
}

/**
 * The living comment: find the one carrying `marker`; `decide` says whether to write given
 * what exists; then update it in place, or create it. Never creates a second one.
 */
export async function upsertComment(
  client: Client,
  ref: IssueRef,
  marker: string,
  body: string,
  decide: (existing: FoundComment | undefined) => boolean = () => true,
): Promise<UpsertResult> {
  if (!body.includes(marker)) throw new Error('the comment body must contain its marker');
  const existing = await findComment(client, ref, marker);
  if (!decide(existing)) return { action: 'skipped', ...(existing ? { id: existing.id, url: existing.url } : {}) };
  if (existing) {
    if (existing.body === body) return { action: 'unchanged', id: existing.id, url: existing.url };
    const res = await client.rest.issues.updateComment({
      owner: ref.owner,
      repo: ref.repo,
      comment_id: existing.id,
      body,
    });
    return { action: 'updated', id: res.data.id, url: res.data.html_url };
  }
  const res = await client.rest.issues.createComment({
    owner: ref.owner,
    repo: ref.repo,
    issue_number: ref.issueNumber,
    body,
  });
  return { action: 'created', id: res.data.id, url: res.data.html_url };
}

export interface ChangedFile {
  path: string;
  /** git-like status letter: A added, M modified, D deleted, R renamed. */
  status: 'A' | 'M' | 'D' | 'R';
  previousPath?: string;
}

/** The API lists at most 3,000 files for a pull request. */
export const PR_FILES_LIMIT = 3000;

/** The files a pull request changes, from the REST API (paginated, 100 per page). */
export async function listPullRequestFiles(
  client: Client,
  ref: IssueRef,
): Promise<{ files: ChangedFile[]; truncated: boolean }> {
  const raw = await client.paginate(client.rest.pulls.listFiles, {
    owner: ref.owner,
    repo: ref.repo,
    pull_number: ref.issueNumber,
    per_page: 100,
  });
  const files: ChangedFile[] = raw.map((f) => {
    const status = f.status === 'added' ? 'A' : f.status === 'removed' ? 'D' : f.status === 'renamed' ? 'R' : 'M';
    return { path: f.filename, status, ...(f.previous_filename ? { previousPath: f.previous_filename } : {}) };
  });
  return { files, truncated: files.length >= PR_FILES_LIMIT };
}

/** The head commit of a pull request, as the API sees it now. */
export async function pullRequestHead(client: Client, ref: IssueRef): Promise<string> {
  const res = await client.rest.pulls.get({ owner: ref.owner, repo: ref.repo, pull_number: ref.issueNumber });
  return res.data.head.sha;
}

/**
 * Whether an API error means "this token may not write here": a pull request from a fork
 * (GitHub answers 403 "Resource not accessible by integration"), or a token without
 * `pull-requests: write`. Rate limits (403 with x-ratelimit-remaining: 0) are not this.
 */
export function isPermissionError(error: unknown): boolean {
  const e = error as {
    status?: number;
    response?: { headers?: Record<string, string | undefined> };
    message?: string;
  } | null;
  if (!e || (e.status !== 403 && e.status !== 404)) return false;
  if (e.response?.headers?.['x-ratelimit-remaining'] === '0') return false;
  if (/rate limit/i.test(e.message ?? '')) return false;
  return true;
}
