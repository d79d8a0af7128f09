// GitHub Action entry: the real runner, the real gate. Everything else is in action-run.ts,
// whose run() turns every error into one setFailed; the catch here is the last resort.
import { availableParallelism } from 'node:os';
import * as core from '@actions/core';
import { threadedGate } from '../parallel/pool.js';
import { renderHtml } from '../report/html.js';
import { joinReports, runGate } from '../run-gate.js';
import { defaultGithub } from './action-comment.js';
import { coreOutput } from './action-outputs.js';
import { run } from './action-run.js';
import { gitDeps, runGit } from './git.js';

run(process.env, {
  gate: (request, root) => {
    // Worker threads on every core the runner gives (the result does not depend on the count).
    const threads = request.threads ?? availableParallelism();
    return runGate(request, { ...gitDeps(root), ...threadedGate(threads) });
  },
  join: joinReports,
  git: (args, cwd) => runGit(cwd, args),
  github: defaultGithub,
  renderHtml,
  out: coreOutput(process.env),
}).catch((error: unknown) =>
  core.setFailed(`netbrace: internal error: ${error instanceof Error ? error.message : String(error)}`),
);
