// The one orchestrator that the command line and the GitHub Action both call: a request in,
// a report and an exit code out. Every reader is injected (git, files, the engine), so the
// whole gate runs in tests without a repository or a process.
//
//   1. the policy, read from the trusted revision (the base, by default) with every file it
//      inherits; a policy that the change modifies is reported and not applied;
//   2. the design files: the given paths, or those changed between base and head (renames
//      followed, and a design deleted and added again in another file paired with it:
//      gate/pair-designs.ts), or every design for a scheduled run (thresholds only); then the part;
//   3. the rules for each file (scopes) — every configuration error surfaces here, before
//      anything is evaluated;
//   4. each file at head and at base: parse, compile, evaluate under the policy's work budget
//      (the same on both sides, realizations kept paired: gate/budget.ts), compare; a head that
//      cannot be parsed fails with its line, and the other files are still judged;
//   5. the report and the verdict.
// Configuration and usage problems are thrown (PolicyError, UsageError, GitError: exit 2);
// a failed gate is a result (exit 1).

import { EncodingError } from './decode.js';
import { isNetbraceError, PolicyError, UsageError, type Diagnostic, type NetbraceError } from './errors.js';
import { compileTopology, type CompactGraph } from './graph/compact.js';
import { askedSpecs, budgetSpecs } from './gate/budget.js';
import { matchDesigns, sameDesign } from './gate/rename.js';
import { compareDesign, type CompareInput } from './gate/compare.js';
import { assembleReport, exitCodeOf } from './gate/verdict.js';
import { pairDesigns, type UnpairedDesign } from './gate/pair-designs.js';
import { policyChanges } from './policy/compare.js';
import { BUILTIN_POLICY_NAME, DEFAULT_DESIGN_GLOBS, DEFAULT_POLICY_PATH } from './policy/defaults.js';
import {
  builtinPolicy,
  designFormat,
  designNeedsHeader,
  globsMatch,
  isDesignPath,
  isDesignText,
  loadPolicy,
  policyForFile,
} from './policy/resolve.js';
import type { FilePolicy, Policy } from './policy/types.js';
import { DESIGN_WARNINGS_KEPT, type FileReport, type Report, type SplitDesign } from './report/report.js';
import type { DesignFormat } from './topology/model.js';
import { addMapAndMend } from './map-mend-step.js';
import { fnv1a32 } from './random.js';
import {
  evaluateGraph,
  evaluateSequentially,
  evaluationSpecs,
  sequentialRun,
  servedTasks,
  splitAcrossParts,
  splitShare,
  type ChangedFile,
  type GateDeps,
  type GateRequest,
  type GateResult,
  type Revision,
} from './gate-request.js';

export type { ChangedFile, GateDeps, GateRequest, GateResult, Revision };
import { parseDesign } from './topology/parse.js';
import type { Topology } from './topology/model.js';
import { unsupportedMetric } from './envelope/r-value.js';

export { joinReports } from './gate/join.js';

/** Whether a path belongs to part `index` (1-based) of `total`. */
export function inPart(path: string, part: { index: number; total: number }): boolean {
  return fnv1a32(path) % part.total === part.index - 1;
}

/** The part reports were made by runs of this one: the same revisions and seed. */
function checkJoin(
  join: NonNullable<GateRequest['join']>,
  base: Revision | undefined,
  head: Revision,
  seed: number,
): void {
  for (const r of join.reports) {
    const name = `part ${r.part!.index}/${r.part!.total}`;
    if (r.head !== head || r.base !== base) {
      throw new UsageError(
        `${name} judged ${r.base ?? '(no base)'} → ${r.head ?? '?'}, not ${base ?? '(no base)'} → ${head}`,
        'join with the same --base and --head the parts ran with',
      );
    }
    if (r.seed !== seed)
      throw new UsageError(`${name} ran with seed ${r.seed}, not ${seed}`, 'join with the seed the parts ran with');
  }
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
export async function loadPolicyAt(
  entry: string,
  read: (path: string) => Promise<string | null>,
): Promise<LoadedPolicy> {
  const texts = new Map<string, string | null>();
  // A file that is not text is an error of the policy that names it (readChain says where).
  const unreadable = new Map<string, EncodingError>();
  for (let attempt = 0; attempt < 64; attempt++) {
    try {
      const policy = loadPolicy(entry, (p) => {
        const bad = unreadable.get(p);
        if (bad) throw bad;
        if (!texts.has(p)) throw new NeedFile(p);
        return texts.get(p)!;
      });
      return { policy, texts };
    } catch (e) {
      if (!(e instanceof NeedFile)) throw e;
      try {
        texts.set(e.path, await read(e.path));
      } catch (r) {
        if (!(r instanceof EncodingError)) throw r;
        unreadable.set(e.path, r);
      }
    }
  }
  throw new PolicyError('the policy inherits too many files', { file: entry }, 'keep the chain of inherits short');
}

interface PolicyChoice {
  policy: Policy;
  info: Report['policy'];
}

/** The folder of the organisation policy: its files come from the second checkout. */
function orgFolder(orgPath: string): string {
  const i = orgPath.lastIndexOf('/');
  return i < 0 ? '' : orgPath.slice(0, i + 1);
}

function isOrgFile(request: GateRequest, p: string): boolean {
  const org = request.orgPolicyPath;
  if (org === undefined) return false;
  const folder = orgFolder(org);
  return p === org || (folder !== '' && p.startsWith(folder));
}

/** The repository's policy must inherit the organisation's: else a located error naming both. */
function requireOrgPolicy(request: GateRequest, entry: string, policy: Policy): void {
  const org = request.orgPolicyPath;
  if (org === undefined || entry === org || policy.files.includes(org)) return;
  throw new PolicyError(
    `${entry} does not inherit the organisation policy ${org}`,
    { file: entry, line: 1, column: 1 },
    `add "inherits: ${org}" (or inherit a file that inherits it); a team policy may only tighten the organisation's floors`,
    [{ file: org, line: 1, column: 1, message: 'the organisation policy every team policy must inherit' }],
  );
}

async function choosePolicy(
  request: GateRequest,
  deps: GateDeps,
  base: Revision | undefined,
  head: Revision,
): Promise<PolicyChoice> {
  const path = request.policyPath ?? DEFAULT_POLICY_PATH;
  const explicit = request.policyPath !== undefined;
  const trusted = request.policySource === 'base' && base !== undefined ? base : head;
  const other = trusted === head ? base : head;
  const readOrg = async (p: string): Promise<string | null> => {
    if (!deps.readOrgPolicy)
      throw new UsageError(`the organisation policy ${p} cannot be read here`, 'give the path of its checkout');
    return deps.readOrgPolicy(p);
  };
  const readAtRev = (rev: Revision) => async (p: string) => (isOrgFile(request, p) ? readOrg(p) : deps.readAt(rev, p));
  const readTrusted = readAtRev(trusted);
  // Whether the entry exists decides between the file and the built-in policy; one that is not
  // text exists (loadPolicyAt reports it).
  const exists = async (rev: Revision, p: string) => {
    try {
      return (await deps.readAt(rev, p)) !== null;
    } catch (e) {
      if (e instanceof EncodingError) return true;
      throw e;
    }
  };
  const entryExists = await exists(trusted, path);
  const otherExists = other !== undefined && (await exists(other, path));

  if (!entryExists) {
    if (otherExists) {
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
      throw new UsageError(
        `the policy file ${path} does not exist${trusted === 'worktree' ? '' : ` at ${trusted}`}`,
        'check --policy, or run "netbrace init"',
      );
    }
    if (request.orgPolicyPath !== undefined) {
      // No policy of its own: the organisation's applies as it is.
      const org = request.orgPolicyPath;
      const { policy } = await loadPolicyAt(org, readOrg);
      return {
        policy,
        info: {
          source: 'file',
          path: org,
          files: policy.files,
          note: `the repository has no policy; the organisation policy ${org} applies`,
        },
      };
    }
    return { policy: builtinPolicy(), info: { source: 'builtin', revision: trusted } };
  }

  const { policy, texts } = await loadPolicyAt(path, readTrusted);
  requireOrgPolicy(request, path, policy);
  const info: Report['policy'] = { source: 'file', path, revision: trusted, files: policy.files };
  if (other !== undefined) {
    let changed = false;
    for (const [p, text] of texts)
      if (!isOrgFile(request, p) && (await readSide(deps, other, p)) !== text) changed = true;
    if (changed) {
      info.changed = true;
      // The other side's policy, to say what the head's would loosen or tighten (policy/compare.ts).
      let otherPolicy: Policy | undefined;
      let otherError: string | undefined;
      try {
        const loaded = await loadPolicyAt(path, readAtRev(other));
        requireOrgPolicy(request, path, loaded.policy);
        otherPolicy = loaded.policy;
      } catch (e) {
        if (!isNetbraceError(e)) throw e;
        otherError = e.format().split('\n')[0];
      }
      if (otherPolicy)
        info.changes = trusted === base ? policyChanges(policy, otherPolicy) : policyChanges(otherPolicy, policy);
      if (trusted === base) {
        const verdict =
          otherError === undefined ? 'it applies once merged' : `the proposed version has an error: ${otherError}`;
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

interface Candidates {
  list: Candidate[];
  scope: Report['scope'];
  /** A sentence for the report when a `designs` glob selects nothing (see deadGlobNote). */
  note?: string;
}

async function candidates(
  request: GateRequest,
  deps: GateDeps,
  policy: Policy,
  base: Revision | undefined,
  head: Revision,
): Promise<Candidates> {
  if (request.paths && request.paths.length > 0) {
    const list: Candidate[] = [];
    for (const path of [...new Set(request.paths.map(normalizePath))]) {
      if (base === undefined) {
        // A path that is not there is a typing mistake, not a design to report as removed.
        if ((await deps.readAt(head, path)) === null) {
          throw new UsageError(
            `${path} does not exist${head === 'worktree' ? '' : ` at ${head}`} (or is not a file)`,
            'give the path of a design file',
          );
        }
        list.push({ path, change: 'unchanged' });
        continue;
      }
      const [h, b] = [await readSide(deps, head, path), await readSide(deps, base, path)];
      const change: Candidate['change'] =
        h === null ? 'deleted' : b === null ? 'added' : typeof h === 'string' && h === b ? 'unchanged' : 'modified';
      if (h === null && b === null)
        throw new UsageError(
          `${path} exists neither at ${head} nor at ${base}`,
          'give paths relative to the repository root',
        );
      list.push({ path, change });
    }
    return { list, scope: 'paths' };
  }
  if (base === undefined || request.eventKind === 'schedule') {
    const all = await deps.listAll(head);
    const list = all.filter((p) => isDesignPath(policy, p)).map((path) => ({ path, change: 'unchanged' as const }));
    return { list: await withDesignHeaders(list, deps, policy, undefined, head), scope: 'all' };
  }
  const changed = await deps.listChanged(base, head);
  const selected = changed
    .filter(
      (f) => isDesignPath(policy, f.path) || (f.previousPath !== undefined && isDesignPath(policy, f.previousPath)),
    )
    .map((f): Candidate => ({
      path: f.path,
      change: f.status,
      ...(f.previousPath !== undefined ? { previousPath: f.previousPath } : {}),
    }));
  const list = await withDesignHeaders(selected, deps, policy, base, head);
  const note = await deadGlobNote(changed, deps, policy, base, head);
  return { list: await pairMovedDesigns(list, deps, policy, base, head), scope: 'changed', ...(note ? { note } : {}) };
}

/** A file's text for a header check; null when it is absent or not text (then it is no design). */
async function textOrNull(deps: GateDeps, rev: Revision, path: string): Promise<string | null> {
  try {
    return await deps.readAt(rev, path);
  } catch (e) {
    if (e instanceof EncodingError) return null;
    throw e;
  }
}

/** Whether a file is a CSV design by its header, at the head or at the base of the change. */
async function hasDesignHeader(
  c: Candidate,
  deps: GateDeps,
  policy: Policy,
  base: Revision | undefined,
  head: Revision,
): Promise<boolean> {
  const sides: [Revision, string][] = [];
  if (c.change !== 'deleted') sides.push([head, c.path]);
  if (base !== undefined && c.change !== 'added') sides.push([base, c.previousPath ?? c.path]);
  for (const [rev, p] of sides) if (isDesignText(policy, p, await textOrNull(deps, rev, p))) return true;
  return false;
}

/**
 * A CSV that only the built-in `**\/*.csv` glob selects is judged when its header has source
 * and target columns, on either side of the change (csvHasEdgeHeader); any other CSV — a
 * spreadsheet of something else — is not a design and is left out without a word.
 */
async function withDesignHeaders(
  list: Candidate[],
  deps: GateDeps,
  policy: Policy,
  base: Revision | undefined,
  head: Revision,
): Promise<Candidate[]> {
  const kept: Candidate[] = [];
  for (const c of list) {
    const sniffed =
      designNeedsHeader(policy, c.path) || (c.previousPath !== undefined && designNeedsHeader(policy, c.previousPath));
    if (!sniffed || (await hasDesignHeader(c, deps, policy, base, head))) kept.push(c);
  }
  return kept;
}

/** The network name a design file gives itself, or undefined when it names none or cannot be read. */
function networkName(text: string | null, path: string, policy: Policy): string | undefined {
  if (text === null) return undefined;
  try {
    const format = designFormat(policy, path);
    const t = parseDesign(text, path, format ? { format } : {});
    const name = t.name ?? t.metadata.name; // GML's "name" when it has no label
    return typeof name === 'string' ? name : undefined;
  } catch (e) {
    if (isNetbraceError(e)) return undefined; // it is judged (and its error reported) as it stands
    throw e;
  }
}

/**
 * A design deleted and another added by the same change, that are one design moved (and
 * usually converted to another format): judged as renamed, base against head
 * (gate/pair-designs.ts says how they are paired).
 */
async function pairMovedDesigns(
  list: Candidate[],
  deps: GateDeps,
  policy: Policy,
  base: Revision,
  head: Revision,
): Promise<Candidate[]> {
  const deleted = list.filter((c) => c.change === 'deleted');
  const added = list.filter((c) => c.change === 'added');
  if (deleted.length === 0 || added.length === 0) return list;
  const named = async (rev: Revision, cs: Candidate[]): Promise<UnpairedDesign[]> => {
    const out: UnpairedDesign[] = [];
    for (const c of cs) {
      const name = networkName(await deps.readAt(rev, c.path), c.path, policy);
      out.push({ path: c.path, ...(name !== undefined ? { name } : {}) });
    }
    return out;
  };
  const pairs = pairDesigns(await named(base, deleted), await named(head, added));
  if (pairs.length === 0) return list;
  const gone = new Set(pairs.map((p) => p.previousPath));
  const into = new Map(pairs.map((p) => [p.path, p.previousPath]));
  return list
    .filter((c) => !(c.change === 'deleted' && gone.has(c.path)))
    .map((c) =>
      c.change === 'added' && into.has(c.path)
        ? { path: c.path, previousPath: into.get(c.path)!, change: 'renamed' as const }
        : c,
    );
}

/** Shown at most this many design files that no glob selects. */
const UNSELECTED_SHOWN = 5;

/**
 * A `designs` glob written in the policy that matches no file at the base or the head, in a
 * change that touches design-looking files (by the built-in globs) that the policy neither
 * judges nor excludes: most likely a misspelt directory, and the change passes unjudged. Said
 * as a notice: a glob that matches nothing yet is allowed (a directory still to come), and
 * a design-looking file outside the globs may be left out on purpose. Globs of the built-in
 * policy are never named (a repository rarely has every format).
 */
async function deadGlobNote(
  changed: readonly ChangedFile[],
  deps: GateDeps,
  policy: Policy,
  base: Revision,
  head: Revision,
): Promise<string | undefined> {
  const looksLikeDesign = (p: string) =>
    globsMatch(DEFAULT_DESIGN_GLOBS, p) && !isDesignPath(policy, p) && !globsMatch(policy.exclude, p);
  const looking = [
    ...new Set(
      changed
        .flatMap((f) => [f.path, ...(f.previousPath !== undefined ? [f.previousPath] : [])])
        .filter(looksLikeDesign),
    ),
  ].sort();
  if (looking.length === 0) return undefined;
  const written = policy.designs
    .flatMap((d) => d.paths.map((glob: string, i: number) => ({ glob, where: d.fileWhere[i] ?? d.where })))
    .filter((g) => g.where.file !== BUILTIN_POLICY_NAME);
  if (written.length === 0) return undefined;
  const files = [...new Set([...(await deps.listAll(base)), ...(await deps.listAll(head))])];
  const dead = written.filter((g) => !files.some((f) => globsMatch([g.glob], f)));
  if (dead.length === 0) return undefined;
  // A CSV looks like a design only when its header says so (at the head or the base).
  const builtin = builtinPolicy();
  const unselected: string[] = [];
  for (const p of looking) {
    if (!designNeedsHeader(builtin, p)) unselected.push(p);
    else if (
      isDesignText(builtin, p, await textOrNull(deps, head, p)) ||
      isDesignText(builtin, p, await textOrNull(deps, base, p))
    )
      unselected.push(p);
  }
  if (unselected.length === 0) return undefined;
  const globs = dead
    .map((g) => `designs glob "${g.glob}" (${g.where.file}:${g.where.line}:${g.where.column})`)
    .join(', ');
  const shown =
    unselected.slice(0, UNSELECTED_SHOWN).join(', ') +
    (unselected.length > UNSELECTED_SHOWN ? `, and ${unselected.length - UNSELECTED_SHOWN} more` : '');
  return (
    `${globs} ${dead.length === 1 ? 'matches' : 'match'} no file at the base or the head, and this change touches design files that no glob ` +
    `selects, so they were not judged: ${shown}; check the glob`
  );
}

function normalizePath(p: string): string {
  return p.replace(/\\/g, '/').replace(/^\.\//, '');
}

/** A design error as the located problem the report shows. */
function problemOf(e: NetbraceError): NonNullable<CompareInput['headError']> {
  return { message: e.hint ? `${e.message} — ${e.hint}` : e.message, line: e.line, column: e.column };
}

/**
 * A file's text at a revision; null when absent. A file that cannot be read as text (not UTF-8,
 * decode.ts) is that file's located problem, so the other files are still judged.
 */
async function readSide(
  deps: GateDeps,
  rev: Revision,
  path: string,
): Promise<string | null | { error: NonNullable<CompareInput['headError']> }> {
  try {
    return await deps.readAt(rev, path);
  } catch (e) {
    if (e instanceof EncodingError) return { error: problemOf(e) };
    throw e;
  }
}

/**
 * Parse and compile one side; a design error becomes the located problem the report shows, and
 * so does an R the design cannot support (a metric of R that does not apply to it: demand_served
 * without demands), which would otherwise score 0 on every state.
 */
function compileText(
  text: string,
  path: string,
  format: DesignFormat | undefined,
  rValue: FilePolicy['rValue'],
):
  | { graph: CompactGraph; topology: Topology }
  | { error: NonNullable<CompareInput['headError']> }
  | { unsupported: NonNullable<CompareInput['headUnsupported']> } {
  try {
    const topology = parseDesign(text, path, format ? { format } : {});
    const graph = compileTopology(topology);
    const problem = unsupportedMetric(graph, rValue);
    if (problem) return { unsupported: { message: `${problem.message} \u2014 ${problem.hint}`, line: 0, column: 0 } };
    return { graph, topology };
  } catch (e) {
    if (isNetbraceError(e) && (e.kind === 'design' || e.kind === 'limit' || e.kind === 'usage')) {
      return { error: problemOf(e) };
    }
    throw e;
  }
}

function validateRequest(request: GateRequest): void {
  if (request.mode !== 'block' && request.mode !== 'inform')
    throw new UsageError(`mode must be block or inform, not ${String(request.mode)}`);
  if (request.policySource !== 'base' && request.policySource !== 'head') {
    throw new UsageError(`policy-source must be base or head, not ${String(request.policySource)}`);
  }
  if (request.part && request.join)
    throw new UsageError('a join judges no part of its own', 'leave out --part when joining part reports');
  const s = request.part;
  if (
    s &&
    !(Number.isInteger(s.index) && Number.isInteger(s.total) && s.total >= 1 && s.index >= 1 && s.index <= s.total)
  ) {
    throw new UsageError(
      `part ${s.index}/${s.total} is not k/n with 1 ≤ k ≤ n`,
      'e.g. 2/4 for the second of four parts',
    );
  }
  if (
    request.seed !== undefined &&
    !(Number.isInteger(request.seed) && request.seed >= 0 && request.seed <= 0xffffffff)
  ) {
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
  const { list: all, scope, note } = await candidates(request, deps, policy, base, head);
  if (note) info.note = info.note ? `${info.note}. ${note}` : note;
  // A part keeps every design in view: one whose path hashes elsewhere may be large enough to be
  // split across the parts (splitAcrossParts), and then this part runs its share of it.
  const part = request.part && request.part.total > 1 ? request.part : undefined;
  const sorted = [...all].sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const chosen = sorted.filter((c) => !request.part || part !== undefined || inPart(c.path, request.part));

  // Every file's rules before any evaluation: configuration errors stop the run here.
  const rules = chosen.map((c) => policyForFile(policy, c.path));
  const seed = request.seed ?? policy.seed;
  const join = request.join;
  if (join) checkJoin(join, base, head, seed);

  const files: FileReport[] = [];
  const split: SplitDesign[] = [];
  for (const [i, c] of chosen.entries()) {
    const fp = rules[i];
    const home = !part || inPart(c.path, part);
    const fromPart = join?.files.get(c.path);
    if (fromPart) {
      files.push(fromPart);
      continue;
    }
    // Judged whole by its own part; here only when it turns out to be split.
    const onlyIfSplit = !home || join !== undefined;
    const thresholdsOnly = base === undefined || scope === 'all';
    const input: CompareInput = { path: c.path, change: c.change, policy: fp, thresholdsOnly };
    if (c.previousPath !== undefined) input.previousPath = c.previousPath;
    if (fp.format) input.format = fp.format;
    let headWarnings: readonly Diagnostic[] = [];
    let fileDeps = deps;
    let share: SplitDesign | undefined;
    let evaluated = false;
    if (c.change !== 'deleted') {
      const headText = await readSide(deps, head, c.path);
      if (headText === null) {
        input.change = 'deleted';
      } else {
        const h = typeof headText === 'string' ? compileText(headText, c.path, fp.format, fp.rValue) : headText;
        if ('topology' in h) headWarnings = h.topology.warnings;
        if ('error' in h) input.headError = h.error;
        else if ('unsupported' in h) input.headUnsupported = h.unsupported;
        else {
          let baseGraph: CompactGraph | undefined;
          let baseTopology: Topology | undefined;
          let same = false;
          if (!thresholdsOnly && c.change !== 'added') {
            const basePath = c.previousPath ?? c.path;
            const baseText = await readSide(deps, base!, basePath);
            if (baseText === headText) {
              same = true; // identical text: the same evaluation, delta exactly 0
            } else if (baseText !== null) {
              // The base may be another file in another format (a design moved and converted).
              const b =
                typeof baseText === 'string'
                  ? compileText(
                      baseText,
                      basePath,
                      basePath === c.path ? fp.format : designFormat(policy, basePath),
                      fp.rValue,
                    )
                  : baseText;
              if ('error' in b) input.baseError = b.error;
              else if ('unsupported' in b) input.baseError = b.unsupported;
              else {
                baseGraph = b.graph;
                baseTopology = b.topology;
              }
            }
          }
          // Only ids spelt differently: one evaluation judges both sides (delta exactly 0), and
          // the base keeps its own graph so that the renames are still listed.
          const oneEvaluation =
            same || (baseGraph !== undefined && sameDesign(baseGraph, h.graph, matchDesigns(baseGraph, h.graph)));
          const specs = budgetSpecs(
            evaluationSpecs(fp, seed),
            fp.budget.maxWork,
            h.graph,
            oneEvaluation ? undefined : baseGraph,
          );
          const otherGraph = oneEvaluation ? undefined : baseGraph;
          const isSplit =
            !deps.evaluate &&
            splitAcrossParts(part?.total ?? join?.total ?? 1, specs.head, h.graph, otherGraph, askedSpecs(specs));
          if (join && isSplit !== join.split.has(c.path)) {
            throw new UsageError(
              `${c.path} was ${isSplit ? 'not ' : ''}split across the parts, and would be ${isSplit ? '' : 'not '}here`,
              'join the part reports of one run: the same revisions, policy, seed and netbrace version',
            );
          }
          if (part && isSplit) {
            const sides = [
              { side: 'head' as const, graph: h.graph, specs: specs.head },
              ...(otherGraph ? [{ side: 'base' as const, graph: otherGraph, specs: specs.base! }] : []),
            ];
            share = await splitShare(c.path, part, sides, request, deps);
          } else if (!onlyIfSplit || isSplit) {
            evaluated = true;
            if (join && isSplit) fileDeps = { ...deps, runTasks: servedTasks(join, c.path, h.graph, otherGraph, deps) };
            if (!fileDeps.evaluate && sequentialRun(request, askedSpecs(specs), h.graph, otherGraph)) {
              const sides = await evaluateSequentially(
                fp,
                { graph: h.graph, topology: h.topology },
                otherGraph && { graph: otherGraph, topology: baseTopology! },
                specs,
                !thresholdsOnly && (same || baseGraph !== undefined),
                request,
                fileDeps,
              );
              input.head = sides.head;
              if (same) input.base = input.head;
              else if (baseGraph)
                input.base = oneEvaluation
                  ? { graph: baseGraph, topology: baseTopology!, result: input.head.result }
                  : sides.base!;
            } else {
              input.head = await evaluateGraph(h.graph, h.topology, specs.head, specs.cuts, request, fileDeps);
              if (same) input.base = input.head;
              else if (baseGraph) {
                if (oneEvaluation)
                  input.base = { graph: baseGraph, topology: baseTopology!, result: input.head.result };
                else
                  input.base = await evaluateGraph(
                    baseGraph,
                    baseTopology!,
                    specs.base!,
                    specs.cuts,
                    request,
                    fileDeps,
                  );
              }
            }
          }
        }
      }
    }
    if (share) {
      split.push(share);
      continue;
    }
    if (onlyIfSplit && !evaluated) {
      if (!join) continue;
      throw new UsageError(
        `no part report judges ${c.path} (part ${(fnv1a32(c.path) % join.total) + 1}/${join.total} would)`,
        'join the part reports of one run: the same revisions, policy and seed',
      );
    }
    const judged = compareDesign(input);
    if (headWarnings.length) {
      judged.warnings = headWarnings
        .slice(0, DESIGN_WARNINGS_KEPT)
        .map((w) => ({ message: w.message, line: w.line, column: w.column, ...(w.hint ? { hint: w.hint } : {}) }));
    }
    await addMapAndMend(judged, input, {
      request,
      deps: fileDeps,
      head,
      ...(base !== undefined ? { base } : {}),
      seed,
    });
    files.push(judged);
  }

  const report = assembleReport(
    {
      mode: request.mode,
      policy: info,
      ...(base !== undefined ? { base } : {}),
      head,
      seed,
      ...(request.part ? { part: request.part } : {}),
      scope,
    },
    files,
  );
  if (split.length) report.split = split;
  return { report, exitCode: exitCodeOf(report) };
}
