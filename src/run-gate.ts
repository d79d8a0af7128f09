// The one orchestrator that the command line and the GitHub Action both call: a request in,
// a report and an exit code out. Every reader is injected (git, files, the engine), so the
// whole gate runs in tests without a repository or a process.
//
//   1. the policy, read from the trusted revision (the base, by default) with every file it
//      extends; a policy that the change modifies is reported and not applied;
//   2. the design files: the given paths, or those changed between base and head (renames
//      followed), or every design for a scheduled run (thresholds only); then the shard;
//   3. the rules for each file (overrides) — every configuration error surfaces here, before
//      anything is evaluated;
//   4. each file at head and at base: parse, compile, evaluate under the policy's work budget
//      (the same on both sides, realizations kept paired: gate/budget.ts), compare; a head that
//      cannot be parsed fails with its line, and the other files are still judged;
//   5. the report and the verdict.
// Configuration and usage problems are thrown (PolicyError, UsageError, GitError: exit 2);
// a failed gate is a result (exit 1).

import { isNetbraceError, PolicyError, UsageError } from './errors.js';
import { evaluateDesign, type DesignEvaluation, type EvaluationSpec } from './envelope/evaluate.js';
import type { ChallengeParams } from './envelope/types.js';
import { compileTopology, type CompactGraph } from './graph/compact.js';
import { budgetSpecs, notePairedCuts, type PairedCut } from './gate/budget.js';
import { compareDesign, type CompareInput, type DesignSide } from './gate/compare.js';
import { countStatuses, exitCodeOf, verdictOf } from './gate/verdict.js';
import { DEFAULT_POLICY_PATH } from './policy/defaults.js';
import { builtinPolicy, isDesignPath, loadPolicy, policyForFile } from './policy/resolve.js';
import type { FilePolicy, Policy } from './policy/types.js';
import { CAUTION, REPORT_VERSION, type FileReport, type Report } from './report/report.js';
import { addMapAndMend } from './map-mend-step.js';
import { parseDesign } from './topology/parse.js';
import { VERSION } from './version.js';

export { mergeReports } from './gate/merge.js';

/** A revision as git names it, or "worktree" for the files on disk. */
export type Revision = string;

export interface ChangedFile {
  status: 'added' | 'modified' | 'deleted' | 'renamed';
  path: string;
  /** For renames: the path at base. */
  previousPath?: string;
}

type MaybePromise<T> = T | Promise<T>;

export interface GateDeps {
  /** Files changed between two revisions (head may be "worktree"), with rename detection. */
  listChanged(base: Revision, head: Revision): MaybePromise<ChangedFile[]>;
  /** A file's text at a revision; null when it does not exist there. */
  readAt(rev: Revision, path: string): MaybePromise<string | null>;
  /** Every file at a revision (for scheduled runs over all designs). */
  listAll(rev: Revision): MaybePromise<string[]>;
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
  mode: 'enforce' | 'advise';
  /** Overrides the policy's seed. */
  seed?: number;
  threads?: number;
  /** Evaluate shard `index` (1-based) of `total`: a deterministic slice by path hash. */
  shard?: { index: number; total: number };
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

/** FNV-1a 32-bit hash of a path (Fowler, Noll, Vo; common practice for stable bucketing). */
export function pathHash(path: string): number {
  let h = 0x811c9dc5;
  const bytes = new TextEncoder().encode(path);
  for (const b of bytes) {
    h ^= b;
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h >>> 0;
}

/** Whether a path belongs to shard `index` (1-based) of `total`. */
export function inShard(path: string, shard: { index: number; total: number }): boolean {
  return pathHash(path) % shard.total === shard.index - 1;
}

/** Signals that the synchronous policy loader needs a file that has not been read yet. */
class NeedFile {
  constructor(readonly path: string) {}
}

interface LoadedPolicy {
  policy: Policy;
  texts: Map<string, string | null>;
}

/** Load a policy through an async reader: the loader is pure and synchronous, so files are fetched on demand and the load retried. */
async function loadPolicyAt(entry: string, read: (path: string) => Promise<string | null>): Promise<LoadedPolicy> {
  const texts = new Map<string, string | null>();
  for (let attempt = 0; attempt < 64; attempt++) {
    try {
      const policy = loadPolicy(entry, (p) => {
        if (!texts.has(p)) throw new NeedFile(p);
        return texts.get(p)!;
      });
      return { policy, texts };
    } catch (e) {
      if (!(e instanceof NeedFile)) throw e;
      texts.set(e.path, await read(e.path));
    }
  }
  throw new PolicyError('the policy extends too many files', { file: entry }, 'keep the chain of extends short');
}

interface PolicyChoice {
  policy: Policy;
  info: Report['policy'];
}

async function choosePolicy(request: GateRequest, deps: GateDeps, base: Revision | undefined, head: Revision): Promise<PolicyChoice> {
  const path = request.policyPath ?? DEFAULT_POLICY_PATH;
  const explicit = request.policyPath !== undefined;
  const trusted = request.policySource === 'base' && base !== undefined ? base : head;
  const other = trusted === head ? base : head;
  const readTrusted = async (p: string) => deps.readAt(trusted, p);
  const entryText = await readTrusted(path);
  const otherText = other !== undefined ? await deps.readAt(other, path) : null;

  if (entryText === null) {
    if (otherText !== null && other !== undefined) {
      const p = builtinPolicy();
      return {
        policy: p,
        info: {
          source: 'builtin',
          path,
          revision: trusted,
          changed: true,
          note: `${path} is added by this change; it applies once merged, and the built-in policy judges this change`,
        },
      };
    }
    if (explicit) {
      throw new UsageError(`the policy file ${path} does not exist${trusted === 'worktree' ? '' : ` at ${trusted}`}`, 'check --policy, or run "netbrace init"');
    }
    return { policy: builtinPolicy(), info: { source: 'builtin', revision: trusted } };
  }

  const { policy, texts } = await loadPolicyAt(path, readTrusted);
  const info: Report['policy'] = { source: 'file', path, revision: trusted, files: policy.files };
  if (other !== undefined) {
    let changed = false;
    for (const [p, text] of texts) if ((await deps.readAt(other, p)) !== text) changed = true;
    if (changed) {
      info.changed = true;
      if (trusted === base) {
        let verdict = 'it applies once merged';
        try {
          await loadPolicyAt(path, async (p) => deps.readAt(other, p));
        } catch (e) {
          if (!isNetbraceError(e)) throw e;
          verdict = `the proposed version has an error: ${e.format().split('\n')[0]}`;
        }
        info.note = `this change modifies the policy; the version at the base judges it (${verdict})`;
      } else {
        info.note = 'this change modifies the policy, and the policy of the head applies (policy-source: head)';
      }
    }
  }
  return { policy, info };
}

interface Candidate {
  path: string;
  previousPath?: string;
  change: CompareInput['change'];
}

async function candidates(request: GateRequest, deps: GateDeps, policy: Policy, base: Revision | undefined, head: Revision): Promise<{ list: Candidate[]; scope: Report['scope'] }> {
  if (request.paths && request.paths.length > 0) {
    const list: Candidate[] = [];
    for (const path of [...new Set(request.paths.map(normalizePath))]) {
      if (base === undefined) {
        list.push({ path, change: 'unchanged' });
        continue;
      }
      const [h, b] = [await deps.readAt(head, path), await deps.readAt(base, path)];
      const change: Candidate['change'] = h === null ? 'deleted' : b === null ? 'added' : h === b ? 'unchanged' : 'modified';
      if (h === null && b === null) throw new UsageError(`${path} exists neither at ${head} nor at ${base}`, 'give paths relative to the repository root');
      list.push({ path, change });
    }
    return { list, scope: 'paths' };
  }
  if (base === undefined || request.eventKind === 'schedule') {
    const all = await deps.listAll(head);
    return { list: all.filter((p) => isDesignPath(policy, p)).map((path) => ({ path, change: 'unchanged' as const })), scope: 'all' };
  }
  const changed = await deps.listChanged(base, head);
  const list = changed
    .filter((f) => isDesignPath(policy, f.path) || (f.previousPath !== undefined && isDesignPath(policy, f.previousPath)))
    .map((f): Candidate => ({ path: f.path, change: f.status, ...(f.previousPath !== undefined ? { previousPath: f.previousPath } : {}) }));
  return { list, scope: 'changed' };
}

function normalizePath(p: string): string {
  return p.replace(/\\/g, '/').replace(/^\.\//, '');
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
  const samples = new Map(first.samples);
  const labels = new Map(first.labels);
  for (const p of rest) {
    evaluation.envelopes.push(...p.evaluation.envelopes);
    evaluation.attacks.push(...p.evaluation.attacks);
    evaluation.contingencies.push(...p.evaluation.contingencies);
    evaluation.degraded.push(...p.evaluation.degraded);
    for (const [k, v] of p.samples) samples.set(k, v);
    for (const [k, v] of p.labels) labels.set(k, v);
  }
  return { evaluation, samples, labels };
}

/** Parse and compile one side; a design error becomes the located problem the report shows. */
function compileText(text: string, path: string, fp: FilePolicy): { graph: CompactGraph } | { error: NonNullable<CompareInput['headError']> } {
  try {
    return { graph: compileTopology(parseDesign(text, path, fp.format ? { format: fp.format } : {})) };
  } catch (e) {
    if (isNetbraceError(e) && (e.kind === 'design' || e.kind === 'limit' || e.kind === 'usage')) {
      return { error: { message: e.hint ? `${e.message} — ${e.hint}` : e.message, line: e.line, column: e.column } };
    }
    throw e;
  }
}

export async function evaluateGraph(g: CompactGraph, specs: EvaluationSpec[], cuts: readonly PairedCut[], request: GateRequest, deps: GateDeps): Promise<DesignSide> {
  const evaluate = deps.evaluate ?? ((graph: CompactGraph, spec: EvaluationSpec) => evaluateDesign(graph, spec));
  const parts: DesignEvaluation[] = [];
  for (const [i, spec] of specs.entries()) {
    const part = await evaluate(g, spec, request.threads);
    notePairedCuts(part, cuts, i);
    parts.push(part);
  }
  return { graph: g, result: joinEvaluations(parts) };
}

function validateRequest(request: GateRequest): void {
  if (request.mode !== 'enforce' && request.mode !== 'advise') throw new UsageError(`mode must be enforce or advise, not ${String(request.mode)}`);
  if (request.policySource !== 'base' && request.policySource !== 'head') {
    throw new UsageError(`policy-source must be base or head, not ${String(request.policySource)}`);
  }
  const s = request.shard;
  if (s && !(Number.isInteger(s.index) && Number.isInteger(s.total) && s.total >= 1 && s.index >= 1 && s.index <= s.total)) {
    throw new UsageError(`shard ${s.index}/${s.total} is not k/n with 1 ≤ k ≤ n`, 'e.g. 2/4 for the second of four shards');
  }
  if (request.seed !== undefined && !(Number.isInteger(request.seed) && request.seed >= 0 && request.seed <= 0xffffffff)) {
    throw new UsageError(`seed must be a whole number from 0 to 4294967295, not ${request.seed}`);
  }
  if (request.threads !== undefined && !(Number.isInteger(request.threads) && request.threads >= 1)) {
    throw new UsageError(`threads must be a whole number ≥ 1, not ${request.threads}`);
  }
}

export async function runGate(request: GateRequest, deps: GateDeps): Promise<GateResult> {
  validateRequest(request);
  const head: Revision = request.worktree ? 'worktree' : (request.head ?? 'HEAD');
  const base = request.eventKind === 'schedule' ? undefined : request.base;

  const { policy, info } = await choosePolicy(request, deps, base, head);
  const { list: all, scope } = await candidates(request, deps, policy, base, head);
  const chosen = [...all].sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0)).filter((c) => !request.shard || inShard(c.path, request.shard));

  // Every file's rules before any evaluation: configuration errors stop the run here.
  const rules = chosen.map((c) => policyForFile(policy, c.path));
  const seed = request.seed ?? policy.seed;

  const files: FileReport[] = [];
  for (const [i, c] of chosen.entries()) {
    const fp = rules[i];
    const thresholdsOnly = base === undefined || scope === 'all';
    const input: CompareInput = { path: c.path, change: c.change, policy: fp, thresholdsOnly };
    if (c.previousPath !== undefined) input.previousPath = c.previousPath;
    if (fp.format) input.format = fp.format;
    if (c.change !== 'deleted') {
      const headText = await deps.readAt(head, c.path);
      if (headText === null) {
        input.change = 'deleted';
      } else {
        const h = compileText(headText, c.path, fp);
        if ('error' in h) input.headError = h.error;
        else {
          let baseGraph: CompactGraph | undefined;
          let same = false;
          if (!thresholdsOnly && c.change !== 'added') {
            const basePath = c.previousPath ?? c.path;
            const baseText = await deps.readAt(base!, basePath);
            if (baseText === headText) {
              same = true; // identical text: the same evaluation, delta exactly 0
            } else if (baseText !== null) {
              const b = compileText(baseText, basePath, fp);
              if ('error' in b) input.baseError = b.error;
              else baseGraph = b.graph;
            }
          }
          const specs = budgetSpecs(evaluationSpecs(fp, seed), fp.budget.maxWork, h.graph, baseGraph);
          input.head = await evaluateGraph(h.graph, specs.head, specs.cuts, request, deps);
          if (same) input.base = input.head;
          else if (baseGraph) input.base = await evaluateGraph(baseGraph, specs.base!, specs.cuts, request, deps);
        }
      }
    }
    const judged = compareDesign(input);
    await addMapAndMend(judged, input, { request, deps, head, ...(base !== undefined ? { base } : {}), seed });
    files.push(judged);
  }

  const report: Report = {
    version: REPORT_VERSION,
    tool: { name: 'netbrace', version: VERSION },
    verdict: verdictOf(files),
    mode: request.mode,
    policy: info,
    ...(base !== undefined ? { base } : {}),
    head,
    seed,
    ...(request.shard ? { shard: { index: request.shard.index, total: request.shard.total } } : {}),
    scope,
    counts: countStatuses(files),
    files,
    caution: CAUTION,
  };
  return { report, exitCode: exitCodeOf(report) };
}
