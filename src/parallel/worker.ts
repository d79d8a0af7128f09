// Worker thread entry: receives an evaluation (graph and plan), then runs its tasks as they
// come; a later evaluation replaces the previous one. Bundled on its own to dist/worker.js by
// .ci/build.mjs.

import { parentPort } from 'node:worker_threads';
import type { CompactGraph } from '../graph/compact.js';
import { runTask, type EvaluationPlan } from '../envelope/engine.js';
import type { PoolMessage, ResultMessage } from './protocol.js';

const port = parentPort!;
let current: { job: number; g: CompactGraph; plan: EvaluationPlan } | null = null;
port.on('message', (msg: PoolMessage) => {
  if (msg.type === 'init') {
    current = { job: msg.job, g: msg.g, plan: msg.plan };
    return;
  }
  let reply: ResultMessage;
  try {
    if (!current || current.job !== msg.job) throw new Error(`task for evaluation ${msg.job} arrived before its graph`);
    reply = { id: msg.id, result: runTask(current.g, current.plan, msg.task) };
  } catch (error) {
    reply = { id: msg.id, error: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
  port.postMessage(reply);
});
