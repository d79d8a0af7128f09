// One design judged as `check FILE` judges it, for the commands that look at a single design
// (`map`, `mend`): in a git repository the file on disk against HEAD, or against the point
// where it left --base REF; outside one, the file alone (thresholds only). The same runGate.

import path from 'node:path';
import { UsageError } from '../errors.js';
import { threadedGate } from '../parallel/pool.js';
import type { FileReport, Report } from '../report/report.js';
import { runGate, type GateDeps, type GateRequest } from '../run-gate.js';
import { gitDeps, mergeBase, repoRoot, resolveCommit, revParse } from './git.js';
import type { CommandIO } from './io.js';
import { readInside } from './workspace.js';
import { sharedOption } from './args.js';
import { SEED, THREADS } from './common-options.js';

export const ONE_DESIGN_OPTIONS = {
  base: { type: 'string' },
  policy: { type: 'string' },
  seed: { type: 'string' },
  threads: { type: 'string' },
} as const;

export interface OneDesignValues {
  base?: string;
  policy?: string;
  seed?: string;
  threads?: string;
}

export interface OneDesign {
  report: Report;
  file: FileReport;
  /** Where the file is on disk. */
  full: string;
}

function relative(from: string, cwd: string, p: string): string {
  const rel = path.relative(from, path.resolve(cwd, p));
  if (rel === '' || rel.startsWith('..') || path.isAbsolute(rel))
    throw new UsageError(`${p} is not inside ${from === cwd ? 'the working directory' : 'the repository'}`);
  return rel.split(path.sep).join('/');
}

/** Judge FILE through the gate, with the map and the mend search as asked. */
export async function judgeOneDesign(
  file: string,
  v: OneDesignValues,
  io: CommandIO,
  views: Pick<GateRequest, 'map' | 'mend'>,
): Promise<OneDesign> {
  const threads = sharedOption('--threads', v.threads, THREADS);
  const seed = sharedOption('--seed', v.seed, SEED);
  const request: GateRequest = { policySource: 'base', mode: 'block', eventKind: 'local', worktree: true, ...views };
  if (seed !== undefined) request.seed = seed;
  if (threads !== undefined) request.threads = threads;
  const threaded = threadedGate(threads);
  const root = await repoRoot(io.cwd);
  let deps: GateDeps;
  let top: string;
  if (root === null) {
    if (v.base !== undefined)
      throw new UsageError('--base needs a git repository', 'run it inside the repository, or leave --base out');
    top = io.cwd;
    deps = { listChanged: () => [], listAll: () => [], readAt: (_rev, p) => readInside(io.cwd, p) };
  } else {
    top = root;
    deps = gitDeps(root);
    const headSha = await revParse(root, 'HEAD');
    if (v.base !== undefined) {
      const b = await resolveCommit(root, v.base);
      request.base = (headSha && (await mergeBase(root, b, headSha))) ?? b;
    } else if (headSha) request.base = headSha;
  }
  deps = { ...deps, ...threaded };
  const rel = relative(top, io.cwd, file);
  request.paths = [rel];
  if (v.policy !== undefined) request.policyPath = relative(top, io.cwd, v.policy);
  const { report } = await runGate(request, deps);
  const f = report.files.find((x) => x.path === rel);
  if (!f) throw new UsageError(`${file} was not judged`, 'give the path of a design file');
  return { report, file: f, full: path.resolve(io.cwd, file) };
}
