// Worker thread entry: receives the graph and the plan once, then runs tasks as they come.
// Bundled on its own to dist/worker.js by .ci/build.mjs.

import { parentPort, workerData } from 'node:worker_threads';
import { runTask } from '../envelope/engine.js';
import type { ResultMessage, TaskMessage, WorkerInit } from './protocol.js';

const { g, plan } = workerData as WorkerInit;
const port = parentPort!;
port.on('message', (msg: TaskMessage) => {
  let reply: ResultMessage;
  try {
    reply = { id: msg.id, result: runTask(g, plan, msg.task) };
  } catch (error) {
    reply = { id: msg.id, error: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
  port.postMessage(reply);
});
