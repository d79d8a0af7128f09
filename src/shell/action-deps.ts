// The Action's seams: what run() (action-run.ts) is given — the gate, the part join, git, the
// REST client and the runner protocol — so that tests replace each with a recording double.

import type { GateRequest, GateResult } from '../run-gate.js';
import type { Annotation } from '../report/annotations.js';
import type { Report } from '../report/report.js';
import type { Client, ClientOptions, UpsertResult } from './github.js';

/** The environment the runner gives the step (inputs as INPUT_<NAME>, GITHUB_* variables). */
export type Env = Readonly<Record<string, string | undefined>>;

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
  /** Every git command of the Action goes through here (argument arrays, never a shell). */
  git(args: string[], cwd: string): Promise<GitResult>;
  github(options: ClientOptions): Client;
  renderHtml?(report: Report, options?: { readmeUrl?: string }): string;
  out: ActionOutput;
}

export interface RunOutcome {
  /** 0 pass (or inform), 1 the gate failed in block mode, 2 usage, configuration or internal error. */
  exitCode: number;
  verdict?: 'pass' | 'fail';
  comment?: UpsertResult | 'failed' | 'not-applicable';
}
