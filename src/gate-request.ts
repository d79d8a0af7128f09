// What a gate run is asked (GateRequest) and given (GateDeps), and the engine runs of one side
// of one design: shared by runGate (run-gate.ts) and the map-and-mend step, which judges
// mended designs with the same specs and the same engine.

import { evaluateDesign, type DesignEvaluation, type EvaluationSpec } from './envelope/evaluate.js';
import type { ChallengeParams } from './challenges/types.js';
import type { CompactGraph } from './graph/compact.js';
import { notePairedCuts, type PairedCut } from './gate/budget.js';
import type { DesignSide } from './gate/compare.js';
import type { FilePolicy } from './policy/types.js';
import type { Report } from './report/report.js';
import type { Topology } from './topology/model.js';

/** A revision as git names it, or "worktree" for the files on disk. */
export type Revision = string;

export interface ChangedFile {
  status: 'added' | 'modified' | 'deleted' | 'renamed';
  path: string;
  /** For renames: the path at base. */
  previousPath?: string;
}

export type MaybePromise<T> = T | Promise<T>;

export interface GateDeps {
  /** Files changed between two revisions (head may be "worktree"), with rename detection. */
  listChanged(base: Revision, head: Revision): MaybePromise<ChangedFile[]>;
  /** A file's text at a revision; null when it does not exist there. */
  readAt(rev: Revision, path: string): MaybePromise<string | null>;
  /** Every file at a revision (for scheduled runs over all designs). */
  listAll(rev: Revision): MaybePromise<string[]>;
  /** A file of the organisation policy's folder (request.orgPolicyPath), outside the history. */
  readOrgPolicy?: (path: string) => MaybePromise<string | null>;
  /** The envelope engine; defaults to evaluateDesign on this thread. */
  evaluate?: (g: CompactGraph, spec: EvaluationSpec, threads?: number) => MaybePromise<DesignEvaluation>;
}

export interface GateRequest {
  /** Base revision; absent: no comparison, thresholds only. */
  base?: Revision;
  /** Head revision; ignored when `worktree` is set. */
  head?: Revision;
  /** Judge the files on disk instead of a head commit. */
  worktree?: boolean;
  /** Judge these repository paths instead of the changed files. */
  paths?: string[];
  /** Repository path of the policy file (default .netbrace.yaml; missing then means the built-in policy). */
  policyPath?: string;
  /** Where the policy is read: the base (trusted, the default) or the head. */
  policySource: 'base' | 'head';
  /**
   * The organisation's policy, which the repository's policy must inherit (and may only
   * tighten): its path as the repository's policy names it in `inherits`. Its files are read
   * with `GateDeps.readOrgPolicy` (a second checkout), never from the change under review.
   */
  orgPolicyPath?: string;
  mode: 'block' | 'inform';
  /** Overrides the policy's seed. */
  seed?: number;
  threads?: number;
  /** Evaluate part `index` (1-based) of `total`: a deterministic slice by path hash. */
  part?: { index: number; total: number };
  /** Scheduled runs judge every design against thresholds only. */
  eventKind?: 'pull-request' | 'push' | 'schedule' | 'local';
  /** Draw each design's map (default true), and search what would mend a design: when it fails (default), always, or never. */
  map?: boolean;
  mend?: 'failing' | 'always' | 'never';
}

export interface GateResult {
  report: Report;
  exitCode: 0 | 1;
}

/**
 * The engine request for one file: its challenges, every threshold's x on the grid, N−1 where
 * required, and the policy's work budget (runGate shares it out between the requests of a
 * design and pairs it across base and head: gate/budget.ts).
 */
export function evaluationSpecs(fp: FilePolicy, seed: number): EvaluationSpec[] {
  const challenges: ChallengeParams[] = fp.challenges.map((c) => {
    const at = fp.requirements
      .filter((r) => r.kind === 'r-threshold' && r.challenge === c.name && r.at !== undefined)
      .map((r) => (r.kind === 'r-threshold' ? r.at! : 0));
    const params: ChallengeParams = { ...c.params };
    if (c.random && at.length > 0) params.at = [...new Set(at)].sort((a, b) => a - b);
    return params;
  });
  const elements = [...new Set(fp.requirements.flatMap((r) => (r.kind === 'n-1' ? [r.element] : [])))].sort();
  // The engine runs each challenge once per evaluation: N−1 of a second element kind gets its own.
  const budget = { maxWork: fp.budget.maxWork };
  const specs: EvaluationSpec[] = [{ r: fp.rValue, challenges, seed, budget }];
  elements.forEach((element, i) => {
    const n1: ChallengeParams = { challenge: 'n-1', element };
    if (i === 0) specs[0].challenges.push(n1);
    else specs.push({ r: fp.rValue, challenges: [n1], seed, budget });
  });
  return specs;
}

/** Join the evaluations of several specs on the same graph. */
function joinEvaluations(parts: DesignEvaluation[]): DesignEvaluation {
  if (parts.length === 1) return parts[0];
  const [first, ...rest] = parts;
  const evaluation = { ...first.evaluation };
  evaluation.envelopes = [...first.evaluation.envelopes];
  evaluation.attacks = [...first.evaluation.attacks];
  evaluation.contingencies = [...first.evaluation.contingencies];
  evaluation.degraded = [...first.evaluation.degraded];
  const notApplicable = [...(first.evaluation.notApplicable ?? [])];
  const samples = new Map(first.samples);
  const labels = new Map(first.labels);
  for (const p of rest) {
    evaluation.envelopes.push(...p.evaluation.envelopes);
    evaluation.attacks.push(...p.evaluation.attacks);
    evaluation.contingencies.push(...p.evaluation.contingencies);
    evaluation.degraded.push(...p.evaluation.degraded);
    notApplicable.push(...(p.evaluation.notApplicable ?? []));
    for (const [k, v] of p.samples) samples.set(k, v);
    for (const [k, v] of p.labels) labels.set(k, v);
  }
  if (notApplicable.length) evaluation.notApplicable = notApplicable;
  else delete evaluation.notApplicable;
  return { evaluation, samples, labels };
}

export async function evaluateGraph(
  g: CompactGraph,
  topology: Topology | undefined,
  specs: EvaluationSpec[],
  cuts: readonly PairedCut[],
  request: GateRequest,
  deps: GateDeps,
): Promise<DesignSide> {
  const evaluate = deps.evaluate ?? ((graph: CompactGraph, spec: EvaluationSpec) => evaluateDesign(graph, spec));
  const parts: DesignEvaluation[] = [];
  for (const [i, spec] of specs.entries()) {
    const part = await evaluate(g, spec, request.threads);
    notePairedCuts(part, cuts, i);
    parts.push(part);
  }
  return { graph: g, result: joinEvaluations(parts), topology };
}

