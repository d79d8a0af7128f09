// Deterministic parallel evaluation: the plan's tasks (fixed chunks of realizations, attacks,
// contingencies, worst-case searches; see envelope/engine.ts) are handed to worker threads as
// they become free, and their results are merged in task order. Each task is a pure function
// of (graph, plan, task), so the serialised evaluation is byte-identical for any thread count.
//
// Where the worker lives: beside this module. Running from source (vitest, tsx), this file is
// src/parallel/pool.ts and the worker is worker.ts, started with the tsx loader; bundled, this
// code sits in dist/cli.js or dist/index.js and the worker is dist/worker.js.

import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { CompactGraph } from '../graph/compact.js';
import { planTasks, runTask, type EvaluationPlan, type Task, type TaskResult } from '../envelope/engine.js';
import { assembleEvaluation, planEvaluation, type DesignEvaluation, type EvaluationSpec } from '../envelope/evaluate.js';
import type { ResultMessage, WorkerInit } from './protocol.js';

/** Below this estimated work (element visits, about 0.1 s of engine time) no thread is started. */
export const PARALLEL_MIN_WORK = 5e7;

export interface WorkerEntry {
  /** The worker module. */
  url: URL;
  /** From source only: tsx's ESM API, whose tsImport loads the TypeScript worker in the thread. */
  loader?: string;
}

export function workerEntry(moduleUrl: string = import.meta.url): WorkerEntry {
  if (!moduleUrl.endsWith('.ts')) return { url: new URL('./worker.js', moduleUrl) };
  const tsx = createRequire(moduleUrl).resolve('tsx/package.json');
  return { url: new URL('./worker.ts', moduleUrl), loader: pathToFileURL(join(dirname(tsx), 'dist', 'esm', 'api', 'index.mjs')).href };
}

/** A thread running the worker; from source it loads worker.ts through tsx. */
function startWorker(entry: WorkerEntry, init: WorkerInit): Worker {
  if (!entry.loader) return new Worker(entry.url, { workerData: init });
  const url = JSON.stringify(entry.url.href);
  const boot = `import(${JSON.stringify(entry.loader)}).then(({ tsImport }) => tsImport(${url}, ${url}));`;
  return new Worker(boot, { eval: true, workerData: init });
}

export interface ParallelOptions {
  /** Run inline below this estimated work (default PARALLEL_MIN_WORK; 0 = always use threads). */
  minWork?: number;
}

export async function evaluateDesignParallel(
  g: CompactGraph,
  spec: EvaluationSpec,
  threads: number,
  options: ParallelOptions = {},
): Promise<DesignEvaluation> {
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`threads must be an integer ≥ 1, got ${threads}`);
  const plan = planEvaluation(g, spec);
  const tasks = planTasks(plan, g);
  // Small evaluations run inline: starting threads would cost more than it saves.
  const workers = plan.work < (options.minWork ?? PARALLEL_MIN_WORK) ? 1 : Math.min(threads, tasks.length);
  const results = workers <= 1 ? tasks.map((t) => runTask(g, plan, t)) : await runOnWorkers(g, plan, tasks, workers);
  return assembleEvaluation(g, plan, tasks, results);
}

async function runOnWorkers(g: CompactGraph, plan: EvaluationPlan, tasks: Task[], count: number): Promise<TaskResult[]> {
  const entry = workerEntry();
  const init: WorkerInit = { g, plan };
  const results: TaskResult[] = new Array(tasks.length);
  const pool = Array.from({ length: count }, () => startWorker(entry, init));
  let next = 0;
  try {
    await Promise.all(
      pool.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const feed = () => {
              if (next >= tasks.length) {
                resolve();
                return;
              }
              const id = next++;
              worker.postMessage({ id, task: tasks[id] });
            };
            worker.on('message', (msg: ResultMessage) => {
              if ('error' in msg) {
                reject(new Error(`worker task ${msg.id} failed: ${msg.error}`));
                return;
              }
              results[msg.id] = msg.result;
              feed();
            });
            worker.on('error', reject);
            worker.on('exit', (code) => {
              if (code !== 0) reject(new Error(`worker thread stopped with exit code ${code}`));
            });
            feed();
          }),
      ),
    );
  } finally {
    await Promise.all(pool.map((w) => w.terminate()));
  }
  return results;
}
