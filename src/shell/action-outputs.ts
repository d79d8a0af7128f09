// What the Action leaves behind: the report files (JSON, SARIF, HTML) inside the workspace, the
// annotations, the step outputs, and the @actions/core protocol behind the ActionOutput seam.

import { appendFileSync, writeFileSync } from 'node:fs';
import * as core from '@actions/core';
import { FILE_STATUSES, assembleReport } from '../gate/verdict.js';
import { builtinPolicy } from '../policy/resolve.js';
import { planAnnotations } from '../report/annotations.js';
import { serializeReport, type Report } from '../report/report.js';
import { renderSarif } from '../report/sarif.js';
import type { ActionDeps, ActionOutput, Env, RunOutcome } from './action-deps.js';
import type { Target } from './action-event.js';
import type { ActionInputs } from './action-inputs.js';
import { prepareWrite, workspaceRelative } from './workspace.js';

/** The report of a run with nothing to judge: a pass that says so, put together as a run's report is. */
export function emptyReport(
  inputs: Pick<ActionInputs, 'mode' | 'policy' | 'seed'>,
  target: Pick<Target, 'base' | 'head'>,
): Report {
  return assembleReport(
    {
      mode: inputs.mode,
      policy: inputs.policy ? { source: 'file', path: inputs.policy } : { source: 'builtin' },
      ...(target.base ? { base: target.base } : {}),
      ...(target.head ? { head: target.head } : {}),
      // No policy was read: the seed is the built-in policy's, as the gate would have used.
      seed: inputs.seed ?? builtinPolicy().seed,
    },
    [],
  );
}

/** Lines touched at head per repository-relative path, from `git diff -U0`. */
export async function changedLines(
  deps: ActionDeps,
  cwd: string,
  base: string,
  head: string,
): Promise<Map<string, Set<number>>> {
  const out = new Map<string, Set<number>>();
  const diff = await deps.git(
    [
      '-c',
      'core.quotePath=false',
      'diff',
      '-U0',
      '--no-color',
      '--no-ext-diff',
      '-M',
      '--end-of-options',
      base,
      head,
      '--',
    ],
    cwd,
  );
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

export interface Artifacts {
  /** Workspace-relative paths of everything written, for the views to list. */
  written: string[];
  report: string;
  sarif: string;
  html: string;
}

/** The JSON report (every job), SARIF and HTML (not a part job: the join job writes those). */
export function writeArtifacts(
  deps: ActionDeps,
  workspace: string,
  inputs: ActionInputs,
  report: Report,
  partJob: boolean,
  readme?: string,
): Artifacts {
  const written: string[] = [];
  const write = (input: string, given: string, text: string): string => {
    const full = prepareWrite(workspace, workspace, given, input);
    writeFileSync(full, text);
    const rel = workspaceRelative(workspace, full);
    written.push(rel);
    return rel;
  };
  const reportPath = inputs.report ? write('report', inputs.report, serializeReport(report)) : '';
  let sarifPath = '';
  let htmlPath = '';
  if (!partJob) {
    if (inputs.sarif)
      sarifPath = write(
        'sarif',
        inputs.sarif,
        `${JSON.stringify(renderSarif(report, { category: inputs.sarifCategory }), null, 2)}\n`,
      );
    if (inputs.html && deps.renderHtml)
      htmlPath = write('html', inputs.html, deps.renderHtml(report, readme ? { readmeUrl: readme } : {}));
  }
  return { written, report: reportPath, sarif: sarifPath, html: htmlPath };
}

/** The annotations of the report's findings (the join job emits those of every part; a part job leaves them to it). */
export function annotate(deps: ActionDeps, report: Report, lines: Map<string, Set<number>>, sarifPath: string): void {
  const elsewhere = sarifPath ? `the job summary and ${sarifPath}` : 'the job summary and the JSON report';
  // A failing step also logs its setFailed message as an error annotation: keep a slot for it.
  const reservedErrors = report.verdict === 'fail' && report.mode === 'block' ? 1 : 0;
  const plan = planAnnotations(report, { changedLines: lines, elsewhere, reservedErrors });
  for (const a of plan.annotations) deps.out.annotate(a);
}

/** The step outputs action.yml declares. */
export function setOutputs(out: ActionOutput, report: Report, files: Artifacts, comment: RunOutcome['comment']): void {
  const counts: Record<string, number> = { ...report.counts };
  out.setOutput('verdict', report.verdict);
  for (const s of FILE_STATUSES) out.setOutput(`count-${s}`, String(counts[s] ?? 0));
  out.setOutput('designs', String(report.files.length));
  out.setOutput('findings', String(report.files.reduce((n, f) => n + f.findings.length, 0)));
  out.setOutput('report', files.report);
  out.setOutput('sarif', files.sarif);
  out.setOutput('html', files.html);
  out.setOutput('comment-url', typeof comment === 'object' && comment.url ? comment.url : '');
}

export function runUrl(env: Env): string | undefined {
  const server = env.GITHUB_SERVER_URL || 'https://github.com';
  if (!env.GITHUB_REPOSITORY || !env.GITHUB_RUN_ID) return undefined;
  return `${server}/${env.GITHUB_REPOSITORY}/actions/runs/${env.GITHUB_RUN_ID}`;
}

/**
 * netbrace's own README at the revision the workflow runs (GITHUB_ACTION_REPOSITORY and
 * GITHUB_ACTION_REF, set for a `uses:` step), which the views' definitions link to.
 */
export function readmeUrl(env: Env): string | undefined {
  const server = env.GITHUB_SERVER_URL || 'https://github.com';
  const repo = env.GITHUB_ACTION_REPOSITORY ?? '';
  const ref = env.GITHUB_ACTION_REF ?? '';
  if (!/^[A-Za-z0-9_.-]+\/[A-Za-z0-9_.-]+$/.test(repo) || !/^[A-Za-z0-9_./-]+$/.test(ref) || ref.includes('..'))
    return undefined;
  return `${server}/${repo}/blob/${ref}/README.md`;
}

/** @actions/core behind the ActionOutput seam; the summary goes to GITHUB_STEP_SUMMARY. */
export function coreOutput(env: Env): ActionOutput {
  return {
    annotate(a) {
      const props = a.file
        ? {
            title: a.title,
            file: a.file,
            startLine: a.startLine,
            ...(a.startColumn ? { startColumn: a.startColumn } : {}),
          }
        : { title: a.title };
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
