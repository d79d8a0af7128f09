// GitHub Action entry: the real runner, the real gate. Everything else is in action-run.ts,
// whose run() turns every error into one setFailed; the catch here is the last resort.
import * as core from '@actions/core';
import { renderHtml } from '../report/html.js';
import { mergeReports, runGate } from '../run-gate.js';
import { coreOutput, defaultGithub, run } from './action-run.js';
import { gitDeps, runGit } from './git.js';

run(process.env, {
  gate: (request, root) => runGate(request, gitDeps(root)),
  merge: mergeReports,
  git: (args, cwd) => runGit(cwd, args),
  github: defaultGithub,
  renderHtml,
  out: coreOutput(process.env),
}).catch((error: unknown) => core.setFailed(`netbrace: internal error: ${error instanceof Error ? error.message : String(error)}`));
