// Messages between the pool and its worker threads (structured-clone data only).

import type { CompactGraph } from '../graph/compact.js';
import type { EvaluationPlan, Task, TaskResult } from '../envelope/engine.js';

export interface WorkerInit {
  g: CompactGraph;
  plan: EvaluationPlan;
}

export interface TaskMessage {
  id: number;
  task: Task;
}

export type ResultMessage = { id: number; result: TaskResult } | { id: number; error: string };
