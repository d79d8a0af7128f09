// The GitHub Action, testable: `run(env, deps)` reads the inputs (action-inputs.ts) and the
// event (action-event.ts), works out which commits to compare, calls the gate (the same
// orchestrator as `netbrace check`) or joins part reports (action-parts.ts), and writes every
// view of the one report: annotations, job summary, the living PR comment (action-comment.ts),
// SARIF, HTML, the JSON report and the step outputs (action-outputs.ts). The verdict is decided
// by the gate alone; the comment, the API and the artifacts can fail without changing it.
// Everything that goes wrong ends in exactly one setFailed message. No input reaches a shell:
// every git command goes through deps.git with argument arrays, and commit ids and refs are
// validated before they get there.

import { realpathSync, statSync } from 'node:fs';
import { formatDiagnostic, isNetbraceError } from '../errors.js';
import { logText } from '../report/escape.js';
import { renderComment, renderSummary } from '../report/markdown.js';
import { plainSentence, verdictStory } from '../report/story.js';
import type { Report } from '../report/report.js';
import type { ActionDeps, Env, GateRequestLike, RunOutcome } from './action-deps.js';
import { postComment, trustedPullRequest } from './action-comment.js';
import { FETCH_DEPTH_HINT, SHA_RE, designsAmong, ensureCommit, prFilesFallback, readTarget } from './action-event.js';
import { InputError, readInputs } from './action-inputs.js';
import {
  annotate,
  changedLines,
  emptyReport,
  readmeUrl,
  runUrl,
  setOutputs,
  writeArtifacts,
} from './action-outputs.js';
import { joinPartReports, splitJoinInput } from './action-parts.js';
import { applyBaseSettings, attachSettings, ownSettingChanges, type OwnSettings } from './action-settings.js';
import { WorkspacePathError, resolveInWorkspace } from './workspace.js';

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
    if (!statSync(workdir).isDirectory())
      throw new InputError(`input "working-directory" (${inputs.workingDirectory}) is not a directory`);
    // The gate works at the repository's top level (report paths are repository paths, as
    // annotations and SARIF want them); working-directory only says where the checkout is.
    // A join job reads reports only and needs no checkout.
    const repositoryRoot = async (): Promise<string> => {
      const top = await deps.git(['rev-parse', '--show-toplevel'], workdir);
      if (top.code !== 0 || top.stdout.trim() === '') {
        throw new InputError(
          `input "working-directory" (${inputs.workingDirectory}) is not inside a git repository; run actions/checkout before netbrace`,
        );
      }
      return resolveInWorkspace(workspace, workspace, top.stdout.trim(), 'working-directory');
    };
    const target = readTarget(env);
    const notes: string[] = [];
    let ownSettings: OwnSettings | undefined;

    let report: Report;
    let lines = new Map<string, Set<number>>();
    // Part reports of a design split by realizations are joined by the gate itself, in the checkout.
    const joinFolder = inputs.joinParts
      ? resolveInWorkspace(workspace, workspace, inputs.joinParts, 'join-parts')
      : undefined;
    const splitJoin = joinFolder !== undefined ? splitJoinInput(joinFolder) : undefined;
    if (joinFolder !== undefined && !splitJoin) {
      const joined = joinPartReports(deps, joinFolder, inputs.joinParts, notes);
      if ('failure' in joined) return fail(joined.failure, 2);
      report = joined.report;
    } else if (target.kind === 'nothing') {
      report = emptyReport(inputs, target);
      notes.push(`Nothing to judge: ${target.reason}.`);
    } else {
      const root = await repositoryRoot();
      let base = inputs.base || target.base;
      const head = target.head;
      if (inputs.base && !SHA_RE.test(inputs.base)) {
        const resolved = await deps.git(
          ['rev-parse', '--verify', '--quiet', '--end-of-options', `${inputs.base}^{commit}`],
          root,
        );
        if (resolved.code !== 0)
          throw new InputError(`input "base" (${inputs.base}) is not a commit in the clone; ${FETCH_DEPTH_HINT}`);
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
        if (missing)
          return fail(
            `netbrace: ${missing}. For pull_request_target, check out the pull request head (ref: \${{ github.event.pull_request.head.sha }}) or ${FETCH_DEPTH_HINT}.`,
            2,
          );
      }
      let kind: GateRequestLike['eventKind'] = target.kind === 'full' || !base ? 'schedule' : target.kind;
      let paths: string[] | undefined;
      if (base) {
        const missing = await ensureCommit(deps, root, base, 'base');
        if (missing) {
          // Fallback: the API knows which files the pull request changes. If none is a design,
          // the answer is "nothing to judge"; otherwise comparing needs the base: stop and say how.
          const fromApi = target.pr && head ? await prFilesFallback(deps, env, inputs, target) : undefined;
          if (fromApi && head && (await designsAmong(deps, root, head, inputs.policy, fromApi)) === 0) paths = [];
          if (paths === undefined) return fail(`netbrace: ${missing}. To fix it, ${FETCH_DEPTH_HINT}.`, 2);
          notes.push(
            'The base commit could not be fetched; the pull request\u2019s file list (REST API) shows that no design file changed.',
          );
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
        ...(splitJoin ? { join: splitJoin } : {}),
        eventKind: kind,
      };
      if (splitJoin)
        notes.push(
          `Joined from ${splitJoin.reports.length} part reports; designs split across the parts were judged here from their samples.`,
        );
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
    const files = writeArtifacts(deps, workspace, inputs, report, partJob, readmeUrl(env));
    if (!partJob) annotate(deps, report, lines, files.sarif);

    // The comment, then the summary (which mentions what happened to the comment).
    let comment: RunOutcome['comment'] = 'not-applicable';
    const url = runUrl(env);
    const readme = readmeUrl(env);
    const viewOptions = {
      ...(url ? { runUrl: url } : {}),
      ...(readme ? { readmeUrl: readme } : {}),
      artifacts: files.written,
      ...(inputs.title ? { title: inputs.title } : {}),
    };
    if (!partJob && !target.pr && inputs.pullRequest) {
      target.pr = await trustedPullRequest(deps, env, inputs, target, inputs.pullRequest);
    }
    if (!partJob) {
      const body = renderComment(report, { ...viewOptions, key: inputs.commentKey });
      comment = await postComment(deps, env, inputs, target, report, body);
      if (comment === 'failed')
        notes.push(
          'The pull-request comment could not be written (see the warning in the log); this does not change the verdict.',
        );
    }
    deps.out.appendSummary(renderSummary(report, { ...viewOptions, notes }));
    setOutputs(deps.out, report, files, comment);

    const verdict = report.verdict;
    if (partJob) {
      deps.out.info(
        `netbrace: part ${inputs.part!.index}/${inputs.part!.total} ${verdict === 'fail' ? 'has failures' : 'passes'}; the join job decides`,
      );
      return { exitCode: 0, verdict, comment };
    }
    // The verdict in the same sentence the summary and the comment open with (story.ts).
    const sentence = plainSentence(verdictStory(report).sentence);
    if (verdict === 'fail' && inputs.mode === 'block') {
      return { ...fail(`${sentence} (see the annotations and the job summary)`, 1), verdict, comment };
    }
    if (verdict === 'fail') deps.out.warning(sentence);
    return { exitCode: 0, verdict, comment };
  } catch (error) {
    if (isNetbraceError(error)) {
      if (error.file && error.line > 0) {
        deps.out.annotate({
          level: 'error',
          file: error.file,
          startLine: error.line,
          ...(error.column > 0 ? { startColumn: error.column } : {}),
          title: 'netbrace: configuration error',
          message: logText(error.message),
          rule: 'parse-error',
          inDiff: false,
        });
      }
      return fail(`netbrace: ${formatDiagnostic(error)}`, error.kind === 'design' ? 1 : 2);
    }
    if (error instanceof InputError || error instanceof WorkspacePathError)
      return fail(`netbrace: ${error.message}`, 2);
    const message = error instanceof Error ? error.message : String(error);
    return fail(`netbrace: internal error: ${message} \u2014 please report this with the workflow run`, 2);
  }
}
