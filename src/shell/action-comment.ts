// The living pull-request comment: whether to write it (the "comment" input), which pull request
// it belongs to, and the upsert itself. A comment that cannot be written is a warning, never a
// change of the verdict.

import { commentDigest, commentMarker, reportDigest } from '../report/markdown.js';
import { logText, oneLine } from '../report/escape.js';
import type { Report } from '../report/report.js';
import type { ActionDeps, Env, RunOutcome } from './action-deps.js';
import type { Target } from './action-event.js';
import type { ActionInputs, CommentMode } from './action-inputs.js';
import {
  createClient,
  httpSettingsFromEnv,
  isPermissionError,
  pullRequestHead,
  upsertComment,
  type Client,
  type ClientOptions,
  type FoundComment,
} from './github.js';

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

export async function postComment(
  deps: ActionDeps,
  env: Env,
  inputs: ActionInputs,
  target: Target,
  report: Report,
  body: string,
): Promise<RunOutcome['comment']> {
  if (!target.pr || inputs.comment === 'off') return 'not-applicable';
  if (!inputs.token) {
    deps.out.warning('netbrace: no token, so no pull-request comment (set the "token" input, default github.token)');
    return 'failed';
  }
  const apiUrl = env.GITHUB_API_URL || 'https://api.github.com';
  try {
    const client = deps.github({
      token: inputs.token,
      baseUrl: apiUrl,
      ...httpSettingsFromEnv(env),
      log: (m) => deps.out.info(`netbrace: ${logText(m, 500)}`),
    });
    const ref = { owner: target.pr.owner, repo: target.pr.repo, issueNumber: target.pr.number };
    const result = await upsertComment(client, ref, commentMarker(inputs.commentKey), body, (existing) =>
      shouldWriteComment(inputs.comment, report, existing),
    );
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
      deps.out.warning(
        `netbrace: could not write the pull-request comment (${oneLine(why, 200)}); the verdict is unaffected`,
      );
    }
    return 'failed';
  }
}

/**
 * The pull request named by the "pull-request" input. In a workflow_run that posts the report
 * of a pull-request run (a fork's), the number comes from an artifact, which is untrusted: it
 * is used only if the pull request's head is the commit that run evaluated.
 */
export async function trustedPullRequest(
  deps: ActionDeps,
  env: Env,
  inputs: ActionInputs,
  target: Target,
  number: number,
): Promise<Target['pr']> {
  const [owner = '', repo = ''] = (env.GITHUB_REPOSITORY ?? '').split('/');
  const pr = { owner, repo, number, fork: false };
  if (target.eventName !== 'workflow_run') return pr;
  if (!target.runHeadSha || !inputs.token) {
    deps.out.warning(
      'netbrace: no comment: the workflow_run payload has no head commit to check the pull request against',
    );
    return undefined;
  }
  try {
    const client = deps.github({
      token: inputs.token,
      baseUrl: env.GITHUB_API_URL || 'https://api.github.com',
      ...httpSettingsFromEnv(env),
    });
    const head = await pullRequestHead(client, { owner, repo, issueNumber: number });
    if (head === target.runHeadSha) return pr;
    deps.out.warning(
      `netbrace: no comment: pull request #${number} is at ${head.slice(0, 12)}, not at ${target.runHeadSha.slice(0, 12)} which the report is about`,
    );
  } catch (error) {
    deps.out.warning(
      `netbrace: no comment: could not read pull request #${number} (${oneLine(error instanceof Error ? error.message : String(error), 200)})`,
    );
  }
  return undefined;
}

export function defaultGithub(options: ClientOptions): Client {
  return createClient(options);
}
