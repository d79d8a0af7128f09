// Messages between the pool and its worker threads (structured-clone data only).

import type { CompactGraph } from '../graph/compact.js';
import type { EvaluationPlan, Task, TaskResult } from '../envelope/engine.js';

/** The evaluation the following tasks belong to (sent once per evaluation and worker). */
export interface InitMessage {
  type: 'init';
  job: number;
  g: CompactGraph;
  plan: EvaluationPlan;
}

export interface TaskMessage {
  type: 'task';
  job: number;
  id: number;
  task: Task;
}

export type PoolMessage = InitMessage | TaskMessage;

export type ResultMessage = { id: number; result: TaskResult } | { id: number; error: string };
