// The library API, for people who script: the same pipeline the command line runs.
//
//   import { readDesign, toGraph, fromGraph, evaluate, check } from 'netbrace';
//
// readDesign parses a design's text (any of our formats) into a Topology; toGraph / fromGraph
// turn it into a graphology multigraph and back; evaluate judges one design against a policy
// (thresholds only); check judges a change (files at base and head) exactly as `netbrace check`
// does and returns the JSON report. Everything here is pure except that the work runs on this
// thread: nothing is read from or written to disk.

import { DEFAULT_POLICY_PATH } from '../policy/defaults.js';
import type { FileReport, Report } from '../report/report.js';
import { runGate, type ChangedFile, type GateDeps } from '../run-gate.js';
import type { ParseOptions, Topology } from '../topology/model.js';
import { parseDesign } from '../topology/parse.js';
import { writeNativeJson } from '../topology/write-native.js';

export {
  toGraph,
  fromGraph,
  type DesignGraph,
  type NodeAttributes,
  type LinkAttributes,
  type DesignAttributes,
  type FromGraphOptions,
} from './graph.js';
export type { Topology, TopoNode, TopoLink, RiskGroup, Demand, DesignFormat } from '../topology/model.js';
export type { Report, FileReport, Finding, RequirementResult, Evaluation } from '../report/report.js';
export { serializeReport } from '../report/report.js';
export { writeNativeJson } from '../topology/write-native.js';

/** Parse a design file's text; the format comes from the file name unless `options.format` is given. */
export function readDesign(text: string, file: string, options: ParseOptions = {}): Topology {
  return parseDesign(text, file, options);
}

/** A design given as file text, or as a Topology (written in our format for the gate). */
export type DesignInput = string | Topology;

function asText(path: string, d: DesignInput): { path: string; text: string } {
  if (typeof d === 'string') return { path, text: d };
  // A Topology travels as our JSON format; keep the caller's path when it already says so.
  const jsonPath = /\.net\.json$/i.test(path) ? path : `${path}.net.json`;
  return { path: jsonPath, text: writeNativeJson(d) };
}

export interface CheckInput {
  /** Repository path → design at the base (absent: every design is new, thresholds only). */
  base?: Record<string, DesignInput>;
  /** Repository path → design at the head. A path missing here that the base has is deleted. */
  head: Record<string, DesignInput>;
  /** The policy's YAML text (default: the built-in policy). Files it inherits go in `policyFiles`. */
  policy?: string;
  /** Further policy files by path, for a policy that inherits others. */
  policyFiles?: Record<string, string>;
  /** block (default): exitCode 1 when the change fails; inform: report the same, exitCode 0. */
  mode?: 'block' | 'inform';
  seed?: number;
}

export interface CheckResult {
  report: Report;
  /** 0: the change passes; 1: it fails (what `netbrace check` exits with). */
  exitCode: 0 | 1;
}

function memoryRepo(
  files: Record<string, DesignInput> | undefined,
  policy: Record<string, string>,
): Map<string, string> {
  const out = new Map<string, string>(Object.entries(policy));
  for (const [p, d] of Object.entries(files ?? {})) {
    const { path, text } = asText(p, d);
    out.set(path, text);
  }
  return out;
}

/** Judge a change: every design that differs between base and head, under the policy. */
export async function check(input: CheckInput): Promise<CheckResult> {
  const policy: Record<string, string> = { ...(input.policyFiles ?? {}) };
  if (input.policy !== undefined) policy[DEFAULT_POLICY_PATH] = input.policy;
  const sides = { base: memoryRepo(input.base, policy), head: memoryRepo(input.head, policy) };
  const side = (rev: string) => (rev === 'base' ? sides.base : sides.head);
  const deps: GateDeps = {
    listChanged() {
      const out: ChangedFile[] = [];
      for (const [p, text] of sides.head) {
        const before = sides.base.get(p);
        if (before === undefined) out.push({ status: 'added', path: p });
        else if (before !== text) out.push({ status: 'modified', path: p });
      }
      for (const p of sides.base.keys()) if (!sides.head.has(p)) out.push({ status: 'deleted', path: p });
      return out;
    },
    readAt: (rev, p) => side(rev).get(p) ?? null,
    listAll: (rev) => [...side(rev).keys()].sort(),
  };
  const request = {
    ...(input.base !== undefined ? { base: 'base' } : {}),
    head: 'head',
    policySource: 'base' as const,
    mode: input.mode ?? 'block',
    eventKind: 'local' as const,
    ...(input.seed !== undefined ? { seed: input.seed } : {}),
  };
  return runGate(request, deps);
}

export interface EvaluateOptions {
  /** The path the design is judged under (policy scopes match it); default "design.net.json". */
  path?: string;
  policy?: string;
  policyFiles?: Record<string, string>;
  seed?: number;
}

/** Evaluate one design against the policy's floors (no comparison): its file report. */
export async function evaluate(design: DesignInput, options: EvaluateOptions = {}): Promise<FileReport> {
  const path = options.path ?? (typeof design === 'string' ? 'design.net.yaml' : 'design.net.json');
  const { report } = await check({
    head: { [path]: design },
    ...(options.policy !== undefined ? { policy: options.policy } : {}),
    ...(options.policyFiles !== undefined ? { policyFiles: options.policyFiles } : {}),
    ...(options.seed !== undefined ? { seed: options.seed } : {}),
  });
  const file = report.files[0];
  if (!file) throw new Error(`${path} is not a design under this policy (check its designs paths)`);
  return file;
}
