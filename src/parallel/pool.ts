// Deterministic parallel evaluation: the plan's tasks (fixed chunks of realizations, attacks,
// contingencies, worst-case searches; see envelope/engine.ts) are handed to worker threads as
// they become free, and their results are merged in task order. Each task is a pure function
// of (graph, plan, task), so the serialised evaluation is byte-identical for any thread count.
// Threads are started on first use and kept idle (unreferenced) for the next evaluation.
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
import {
  assembleEvaluation,
  planEvaluation,
  type DesignEvaluation,
  type EvaluationSpec,
} from '../envelope/evaluate.js';
import type { ResultMessage } from './protocol.js';

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
  return {
    url: new URL('./worker.ts', moduleUrl),
    loader: pathToFileURL(join(dirname(tsx), 'dist', 'esm', 'api', 'index.mjs')).href,
  };
}

/** A thread running the worker; from source it loads worker.ts through tsx. */
function startWorker(entry: WorkerEntry): Worker {
  let worker: Worker;
  if (!entry.loader) worker = new Worker(entry.url);
  else {
    const url = JSON.stringify(entry.url.href);
    const boot = `import(${JSON.stringify(entry.loader)}).then(({ tsImport }) => tsImport(${url}, ${url}));`;
    worker = new Worker(boot, { eval: true });
  }
  // A thread that fails or stops while idle just leaves the pool (a running evaluation has
  // its own listeners and reports the failure).
  const drop = () => {
    const i = idle.indexOf(worker);
    if (i >= 0) idle.splice(i, 1);
  };
  worker.on('error', drop);
  worker.on('exit', drop);
  return worker;
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

/**
 * Runs some of a plan's tasks (a batch of a sequential run, gate/sequential stopping in
 * run-gate.ts) on up to `threads` worker threads, results in the order given; inline when the
 * plan is small or one thread is asked.
 */
export async function runTasksParallel(
  g: CompactGraph,
  plan: EvaluationPlan,
  tasks: Task[],
  threads: number,
  options: ParallelOptions = {},
): Promise<TaskResult[]> {
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`threads must be an integer ≥ 1, got ${threads}`);
  const workers = plan.work < (options.minWork ?? PARALLEL_MIN_WORK) ? 1 : Math.min(threads, tasks.length);
  return workers <= 1 ? tasks.map((t) => runTask(g, plan, t)) : runOnWorkers(g, plan, tasks, workers);
}

/**
 * The one wiring of worker threads into the gate (check, the Action, explain/map/mend): the
 * gate's task runner on `threads` threads, or nothing (this thread) for one thread or none.
 */
export function threadedGate(threads: number | undefined): {
  runTasks?: (g: CompactGraph, plan: EvaluationPlan, tasks: Task[], n?: number) => Promise<TaskResult[]>;
} {
  if (threads === undefined || threads <= 1) return {};
  return { runTasks: (g, plan, tasks, n) => runTasksParallel(g, plan, tasks, n ?? threads) };
}

// Idle workers are kept between evaluations (a gate evaluates many designs), unreferenced so
// that they never keep the process alive; one evaluation uses them at a time.
const idle: Worker[] = [];
let queue: Promise<unknown> = Promise.resolve();
let jobs = 0;

/** Stops the idle worker threads (tests, or a long-lived host that wants its threads back). */
export async function closeWorkers(): Promise<void> {
  const all = idle.splice(0);
  await Promise.all(all.map((w) => w.terminate()));
}

function runOnWorkers(g: CompactGraph, plan: EvaluationPlan, tasks: Task[], count: number): Promise<TaskResult[]> {
  const run = queue.then(() => runExclusive(g, plan, tasks, count));
  queue = run.catch(() => undefined);
  return run;
}

async function runExclusive(
  g: CompactGraph,
  plan: EvaluationPlan,
  tasks: Task[],
  count: number,
): Promise<TaskResult[]> {
  const entry = workerEntry();
  const pool = idle.splice(0, count);
  while (pool.length < count) pool.push(startWorker(entry));
  const job = ++jobs;
  const results: TaskResult[] = new Array(tasks.length);
  let next = 0;
  let failed = false;
  const listeners: (() => void)[] = [];
  try {
    await Promise.all(
      pool.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            worker.ref();
            const feed = () => {
              if (next >= tasks.length) {
                resolve();
                return;
              }
              const id = next++;
              worker.postMessage({ type: 'task', job, id, task: tasks[id] });
            };
            const onMessage = (msg: ResultMessage) => {
              if ('error' in msg) {
                reject(new Error(`worker task ${msg.id} failed: ${msg.error}`));
                return;
              }
              results[msg.id] = msg.result;
              feed();
            };
            const onExit = (code: number) => reject(new Error(`worker thread stopped with exit code ${code}`));
            worker.on('message', onMessage);
            worker.on('error', reject);
            worker.on('exit', onExit);
            listeners.push(() => {
              worker.off('message', onMessage);
              worker.off('error', reject);
              worker.off('exit', onExit);
            });
            worker.postMessage({ type: 'init', job, g, plan });
            feed();
          }),
      ),
    );
  } catch (error) {
    failed = true;
    throw error;
  } finally {
    listeners.forEach((off) => off());
    if (failed) await Promise.all(pool.map((w) => w.terminate()));
    else
      for (const w of pool) {
        w.unref();
        idle.push(w);
      }
  }
  return results;
}
