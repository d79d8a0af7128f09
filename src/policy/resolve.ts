// From policy files to the rules for one design file: follow `inherits`, fill what the root
// file leaves out from the built-in policy, merge layer by layer, then apply the scopes
// whose globs match the file. A floor may only ever be tightened (and the work budget that
// judges the floors only raised): a definition that loosens one written in its own file or in
// a file it inherits is a PolicyError naming both lines. A floor from a more basic file that is looser than one a more derived file set is
// simply outvoted (the tighter one holds). Pure: files are read through the `read` callback.

import picomatch from 'picomatch';
import { EncodingError } from '../decode.js';
import { PolicyError } from '../errors.js';
import type { RValueSpec } from '../envelope/types.js';
import type { DesignFormat } from '../topology/model.js';
import { isMetricId, metrics as knownMetrics } from '../metrics/registry.js';
import { closest } from '../topology/suggest.js';
import { budgetWork, ENGINE_VISITS_PER_SECOND } from './budget.js';
import { BUILTIN_POLICY_NAME, CSV_DESIGN_GLOB, DEFAULT_POLICY_PATH, STARTER_POLICY } from './defaults.js';
import { csvHasEdgeHeader } from '../topology/edgelist.js';
import { parsePolicyFile } from './load.js';
import { requirementId } from './requirement-id.js';
import type {
  Budget,
  ChallengeDef,
  FilePolicy,
  MendSettings,
  Policy,
  PolicyFile,
  PolicyScope,
  RemovedSeverity,
  Requirement,
  WeakeningRule,
  Where,
} from './types.js';

export { DEFAULT_POLICY_PATH };

/** Reads a repository file; null when it does not exist (at the revision in question). */
export type ReadFile = (path: string) => string | null;

const SEVERITY_RANK: Record<RemovedSeverity, number> = { ignore: 0, notice: 1, warn: 2, fail: 3 };

/** A definition plus the depth of the file that wrote it (0 = the most basic file). */
interface Layered<T> {
  value: T;
  layer: number;
}

let builtinFile: PolicyFile | undefined;

function builtin(): PolicyFile {
  builtinFile ??= parsePolicyFile(STARTER_POLICY, BUILTIN_POLICY_NAME);
  return builtinFile;
}

function related(where: Where, message: string): Where & { message: string } {
  return { ...where, message };
}

function describeValue(r: Requirement): string {
  switch (r.kind) {
    case 'spread-ceiling':
      return `max ${r.max}`;
    case 'no-new-spof':
      return `elements ${[r.bridges ? 'bridges' : '', r.cutNodes ? 'cut-nodes' : '', r.riskGroups ? 'risk-groups' : ''].filter(Boolean).join(', ')}`;
    case 'area-floor':
      return r.min === undefined ? 'no floor' : `min ${r.min}`;
    default:
      return `min ${r.min}`;
  }
}

/** Why `next` is looser than `prev` (same id), or undefined when it is at least as tight. */
function loosening(
  prev: Requirement,
  next: Requirement,
): { message: string; where: Where; prevWhere: Where } | undefined {
  if (SEVERITY_RANK[next.severity] < SEVERITY_RANK[prev.severity]) {
    return {
      message: `lowers the severity of ${prev.id} from ${prev.severity} to ${next.severity}`,
      where: next.where,
      prevWhere: prev.where,
    };
  }
  let looser = false;
  if (prev.kind === 'spread-ceiling' && next.kind === 'spread-ceiling') looser = next.max > prev.max;
  else if (prev.kind === 'no-new-spof' && next.kind === 'no-new-spof') {
    looser =
      (prev.bridges && !next.bridges) || (prev.cutNodes && !next.cutNodes) || (prev.riskGroups && !next.riskGroups);
    if (!looser && SEVERITY_RANK[next.hardenedWeakPoints] < SEVERITY_RANK[prev.hardenedWeakPoints]) {
      return {
        message: `lowers hardened-weak-points of ${prev.id} from ${prev.hardenedWeakPoints} to ${next.hardenedWeakPoints}`,
        where: next.hardenedWhere ?? next.where,
        prevWhere: prev.hardenedWhere ?? prev.where,
      };
    }
  } else if (prev.kind === 'area-floor' && next.kind === 'area-floor') {
    looser = prev.min !== undefined && (next.min === undefined || next.min < prev.min);
  } else if ('min' in prev && 'min' in next) looser = (next.min as number) < (prev.min as number);
  if (!looser) return undefined;
  return {
    message: `loosens ${prev.id}: ${describeValue(next)} where ${describeValue(prev)} is required`,
    where: next.valueWhere,
    prevWhere: prev.valueWhere,
  };
}

function loosenError(what: string, why: string, where: Where, prevWhere: Where): PolicyError {
  return new PolicyError(
    `${what} ${why}`,
    where,
    'an inheriting policy or a scope may tighten a floor, never loosen it',
    [related(prevWhere, 'the floor it would loosen')],
  );
}

/** Merge `next` into the list; tighten-only, see the file comment. */
function mergeRequirement(list: Layered<Requirement>[], next: Layered<Requirement>, what: string): void {
  const i = list.findIndex((r) => r.value.id === next.value.id);
  if (i < 0) {
    list.push(next);
    return;
  }
  const prev = list[i];
  const why = loosening(prev.value, next.value);
  if (!why) {
    list[i] = { value: next.value, layer: Math.max(prev.layer, next.layer) };
    return;
  }
  if (next.layer >= prev.layer) throw loosenError(what, why.message, why.where, why.prevWhere);
  // A more basic file's looser floor: the tighter one from a derived file holds.
}

type WeakeningField = 'allowedDrop' | 'allowedRelativeDrop' | 'errorMultiple';
const WEAKENING_FIELDS: readonly [WeakeningField, string][] = [
  ['allowedDrop', 'allowed-drop'],
  ['allowedRelativeDrop', 'allowed-relative-drop'],
  ['errorMultiple', 'error-multiple'],
];

/** Apply the fields `next` sets on top of `prev`, refusing to loosen any of them. */
function mergeWeakening(
  prev: Layered<WeakeningRule>,
  next: Layered<WeakeningRule>,
  what: string,
): Layered<WeakeningRule> {
  const merged: WeakeningRule = { ...prev.value, fieldWhere: { ...prev.value.fieldWhere }, where: next.value.where };
  const mayLoosen = next.layer < prev.layer;
  for (const [field, key] of WEAKENING_FIELDS) {
    const at = next.value.fieldWhere[field];
    if (!at) continue;
    const value = next.value[field] as number;
    const before = prev.value[field] ?? 0;
    const prevAt = prev.value.fieldWhere[field] ?? prev.value.where;
    if (value > before) {
      if (mayLoosen) continue;
      throw loosenError(what, `loosens weakening ${key}: ${value} where ${before} is allowed`, at, prevAt);
    }
    merged[field] = value;
    merged.fieldWhere[field] = at;
  }
  const sevAt = next.value.fieldWhere.severity;
  if (sevAt) {
    if (SEVERITY_RANK[next.value.severity] < SEVERITY_RANK[prev.value.severity]) {
      if (!mayLoosen) {
        throw loosenError(
          what,
          `lowers the weakening severity from ${prev.value.severity} to ${next.value.severity}`,
          sevAt,
          prev.value.fieldWhere.severity ?? prev.value.where,
        );
      }
    } else {
      merged.severity = next.value.severity;
      merged.fieldWhere.severity = sevAt;
    }
  }
  return { value: merged, layer: Math.max(prev.layer, next.layer) };
}

function mergeRemoved(
  prev: Layered<{ severity: RemovedSeverity; where?: Where }>,
  next: Layered<{ severity: RemovedSeverity; where: Where }>,
  what: string,
): Layered<{ severity: RemovedSeverity; where?: Where }> {
  if (SEVERITY_RANK[next.value.severity] >= SEVERITY_RANK[prev.value.severity]) return next;
  if (next.layer < prev.layer) return prev;
  throw loosenError(
    what,
    `lowers removed-designs from ${prev.value.severity} to ${next.value.severity}`,
    next.value.where,
    prev.value.where ?? next.value.where,
  );
}

/** Element visits in plain figures: 3e9, 2.5e9, 40000. */
function visits(n: number): string {
  return n >= 1e6 ? n.toExponential().replace('e+', 'e') : String(n);
}

/** The key of a budget that sets its element visits (the smaller limit), for naming its line. */
function bindingKey(b: Budget): 'visits' | 'seconds' | undefined {
  if (b.seconds !== undefined && (b.visits === undefined || b.seconds * ENGINE_VISITS_PER_SECOND <= b.visits))
    return 'seconds';
  return b.visits !== undefined ? 'visits' : undefined;
}

function describeBudget(b: Budget): string {
  return [
    b.visits !== undefined ? `visits ${visits(b.visits)}` : '',
    b.seconds !== undefined ? `seconds ${b.seconds}` : '',
  ]
    .filter(Boolean)
    .join(', ');
}

/**
 * Apply the keys `next` sets on top of `prev`. A budget is not a floor, but it is the effort
 * that judges the floors: what a smaller one cannot settle is "unsettled" (a warning), so a
 * derived file or a scope may raise it, never lower it.
 */
function mergeBudget(prev: Layered<Budget>, next: Layered<Budget>, what: string): Layered<Budget> {
  const merged: Budget = { ...prev.value, fieldWhere: { ...prev.value.fieldWhere }, where: next.value.where };
  for (const key of ['visits', 'seconds'] as const) {
    const value = next.value[key];
    if (value === undefined) continue;
    merged[key] = value;
    merged.fieldWhere[key] = next.value.fieldWhere[key];
  }
  const before = budgetWork(prev.value);
  const after = budgetWork(merged);
  if (after >= before) return { value: merged, layer: Math.max(prev.layer, next.layer) };
  if (next.layer < prev.layer) return prev; // a more basic file's smaller budget is outvoted
  const at = bindingKey(merged);
  const prevAt = bindingKey(prev.value);
  throw new PolicyError(
    `${what} lowers the budget to ${visits(after)} element visits (${describeBudget(merged)}) where ${visits(before)} (${describeBudget(prev.value)}) is in force`,
    (at && merged.fieldWhere[at]) || next.value.where,
    'an inheriting policy or a scope may raise the budget, never lower it: a smaller budget leaves requirements unsettled',
    [related((prevAt && prev.value.fieldWhere[prevAt]) || prev.value.where, 'the budget in force')],
  );
}

function sameRValue(a: RValueSpec, b: RValueSpec): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

function sameChallenge(a: ChallengeDef, b: ChallengeDef): boolean {
  return a.engine === b.engine && JSON.stringify(a.params) === JSON.stringify(b.params);
}

/** Requirement ↔ challenge consistency, checked once every file of the chain is known. */
function checkRequirement(r: Requirement, challenges: readonly ChallengeDef[], what: string): Requirement {
  if (r.kind === 'n-1' || r.kind === 'no-new-spof') return r;
  const c = challenges.find((x) => x.name === r.challenge);
  if (!c) {
    const near = closest(
      r.challenge,
      challenges.map((x) => x.name),
    );
    throw new PolicyError(
      `${what} refers to challenge "${r.challenge}", which the policy does not define`,
      r.challengeWhere,
      near ? `did you mean "${near}"?` : `defined challenges: ${challenges.map((x) => x.name).join(', ') || 'none'}`,
    );
  }
  if (r.kind === 'spread-ceiling' && !c.random) {
    throw new PolicyError(
      `${what}: challenge "${c.name}" is a targeted attack (one curve), so it has no spread`,
      r.where,
      'use a random challenge',
      [related(c.where, `"${c.name}" is defined here`)],
    );
  }
  if (r.kind !== 'r-threshold') return r;
  const s = r.statistic;
  if (s.kind === 'worst-case') {
    const depth = c.params.worstCase ?? 0;
    if (r.statistic.kind === 'worst-case' && s.removals > depth) {
      throw new PolicyError(
        `${what} asks for the worst ${s.removals} removals, but challenge "${c.name}" searches only ${depth} deep`,
        r.valueWhere,
        `set "worst-case: ${s.removals}" (or more) on challenge "${c.name}"`,
        [related(c.where, `"${c.name}" is defined here`)],
      );
    }
    return r;
  }
  if (!c.random) {
    if (s.kind === 'quantile' || s.kind === 'min' || s.kind === 'mean') {
      throw new PolicyError(
        `${what}: challenge "${c.name}" is a targeted attack (one curve); "statistic: ${s.kind}" needs a random challenge`,
        r.where,
        'leave "statistic" out (the curve\u2019s value is judged)',
        [related(c.where, `"${c.name}" is defined here`)],
      );
    }
    if (s.kind !== 'value') {
      const normalized: Requirement = { ...r, statistic: { kind: 'value' } };
      normalized.id = requirementId(normalized);
      return normalized;
    }
  } else if (s.kind === 'value') {
    throw new PolicyError(
      `${what}: challenge "${c.name}" is random; say which statistic of its envelope is judged`,
      r.where,
      'statistic: quantile (with q), median, mean or min',
    );
  }
  if (r.at !== undefined && c.params.until !== undefined && r.at > c.params.until + 1e-12) {
    throw new PolicyError(
      `${what} judges R at ${r.at}, beyond the end of challenge "${c.name}" (until ${c.params.until})`,
      r.where,
      `raise "until" of "${c.name}" or lower "at"`,
      [related(c.where, `"${c.name}" is defined here`)],
    );
  }
  return r;
}

function checkMetrics(spec: RValueSpec, where: Where): void {
  for (const m of spec.metrics) {
    if (!isMetricId(m.id)) {
      throw new PolicyError(
        `metric "${m.id}" is not available in this version of netbrace`,
        where,
        `available: ${knownMetrics.map((x) => x.id).join(', ')}`,
      );
    }
  }
}

function describeRequirementSite(file: PolicyFile, r: Requirement, scope?: number): string {
  const list = scope === undefined ? file.requirements : file.scopes[scope].requirements;
  const index = (list ?? []).indexOf(r);
  const req = index >= 0 ? `requirement ${index + 1}` : 'a requirement';
  return scope === undefined ? req : `scope ${scope + 1}, ${req}`;
}

/** Read `entry` and every file it inherits, the most basic file first. */
function readChain(entry: string, read: ReadFile): PolicyFile[] {
  const chain: PolicyFile[] = [];
  const seen = new Set<string>();
  let path = entry;
  let from: Where | undefined;
  for (;;) {
    if (seen.has(path)) {
      throw new PolicyError(
        `"inherits" goes round in a circle back to ${path}`,
        from ?? { file: path },
        'remove one of the inherits lines',
      );
    }
    seen.add(path);
    let text: string | null;
    try {
      text = read(path);
    } catch (e) {
      // Bytes that are not text (decode.ts): the same located message, as a policy problem.
      if (e instanceof EncodingError)
        throw new PolicyError(e.message, { file: e.file, line: e.line, column: e.column }, e.hint);
      throw e;
    }
    if (text === null) {
      if (from)
        throw new PolicyError(
          `the base policy ${path} does not exist`,
          from,
          'check the path; it is relative to this file',
        );
      throw new PolicyError(
        `the policy file ${path} does not exist`,
        { file: path },
        'run "netbrace init" to write one',
      );
    }
    const file = parsePolicyFile(text, path);
    chain.unshift(file);
    if (!file.inherits) break;
    from = file.inherits.where;
    path = file.inherits.path;
  }
  return chain;
}

/** The built-in policy (communication backbones), as if it were the repository's policy file. */
export function builtinPolicy(): Policy {
  return { ...mergeChain([builtin()]), source: 'builtin', files: [] };
}

/** Load a policy file and the files it inherits. Throws PolicyError. */
export function loadPolicy(entry: string, read: ReadFile): Policy {
  return mergeChain(readChain(entry, read));
}

function mergeChain(chain: PolicyFile[]): Policy {
  const root = chain[0];
  const base = builtin();
  const challenges = new Map<string, ChallengeDef>();
  for (const c of root.challenges ?? base.challenges ?? []) challenges.set(c.name, c);

  const rValue = { spec: (root.rValue ?? base.rValue)!.spec, where: (root.rValue ?? base.rValue)!.where };
  checkMetrics(rValue.spec, rValue.where);
  let designs = root.designs ?? base.designs ?? [];
  const exclude = [...(root.exclude?.globs ?? [])];
  let seed = (root.seed ?? base.seed)?.value ?? 1;
  let weakening: Layered<WeakeningRule> = { value: (root.weakening ?? base.weakening)!, layer: 0 };
  let removed: Layered<{ severity: RemovedSeverity; where?: Where }> = {
    value: root.removedDesigns ?? base.removedDesigns ?? { severity: 'notice' },
    layer: 0,
  };
  let budget: Layered<Budget> = { value: (root.budget ?? base.budget)!, layer: 0 };

  const requirements: Layered<Requirement>[] = [];
  const rootReqs =
    root.requirements ??
    (root.challenges === undefined
      ? (base.requirements ?? [])
      : (base.requirements ?? []).filter((r) => !('challenge' in r) || challenges.has(r.challenge)));
  for (const r of rootReqs) requirements.push({ value: r, layer: 0 });

  chain.forEach((file, layer) => {
    if (layer === 0) return;
    if (file.rValue && !sameRValue(file.rValue.spec, rValue.spec)) {
      throw new PolicyError(
        'an inheriting policy cannot change the r-value of the policy it inherits',
        file.rValue.where,
        'the floors of the base policy are measured in its R; remove "r-value" here',
        [related(rValue.where, 'the r-value in force')],
      );
    }
    for (const c of file.challenges ?? []) {
      const prev = challenges.get(c.name) ?? [...challenges.values()].find((x) => x.engine === c.engine);
      if (prev && !sameChallenge(prev, c)) {
        throw new PolicyError(
          `challenge "${c.name}" redefines challenge "${prev.name}" of the policy it inherits`,
          c.where,
          'an inheriting policy may add challenges, not change them',
          [related(prev.where, `"${prev.name}" is defined here`)],
        );
      }
      if (!prev) challenges.set(c.name, c);
    }
    if (file.designs) designs = [...designs, ...file.designs];
    for (const g of file.exclude?.globs ?? []) {
      if (!exclude.includes(g)) {
        throw new PolicyError(
          `an inheriting policy cannot exclude "${g}": the policy it inherits judges those files`,
          file.exclude!.where,
          'exclude the files in the base policy, or narrow the designs there',
        );
      }
    }
    if (file.seed) seed = file.seed.value;
    for (const r of file.requirements ?? []) {
      mergeRequirement(requirements, { value: r, layer }, describeRequirementSite(file, r));
    }
    if (file.weakening) weakening = mergeWeakening(weakening, { value: file.weakening, layer }, 'weakening');
    if (file.removedDesigns) removed = mergeRemoved(removed, { value: file.removedDesigns, layer }, 'the policy');
    if (file.budget) budget = mergeBudget(budget, { value: file.budget, layer }, 'the policy');
  });

  const challengeList = [...challenges.values()];
  const checked = requirements.map((r) => ({
    ...r,
    value: checkRequirement(r.value, challengeList, describeRequirementSite(chain[r.layer] ?? root, r.value)),
  }));

  // Scopes: check them against the merged top level now, so that a loosening is an
  // error whether or not a changed file matches; overlaps between scopes are per file.
  const scopes: PolicyScope[] = [];
  chain.forEach((file, layer) =>
    file.scopes.forEach((o, i) => {
      const what = (r: Requirement) => describeRequirementSite(file, r, i);
      const requirementsChecked = o.requirements.map((r) => checkRequirement(r, challengeList, what(r)));
      const scratch = checked.map((r) => ({ ...r }));
      for (const r of requirementsChecked) mergeRequirement(scratch, { value: r, layer }, what(r));
      if (o.weakening) mergeWeakening(weakening, { value: o.weakening, layer }, `scope ${i + 1}, weakening`);
      if (o.removedDesigns) mergeRemoved(removed, { value: o.removedDesigns, layer }, `scope ${i + 1}`);
      if (o.budget) mergeBudget(budget, { value: o.budget, layer }, `scope ${i + 1}`);
      scopes.push({ ...o, requirements: requirementsChecked, layer });
    }),
  );

  // Mend settings are advice, not floors: the extending file's keys simply win.
  const mend = chain.reduce<MendSettings | undefined>((acc, f) => (f.mend ? { ...acc, ...f.mend } : acc), undefined);

  return {
    source: 'file',
    files: chain.map((f) => f.path).reverse(),
    designs,
    exclude,
    seed,
    rValue: rValue.spec,
    challenges: challengeList,
    requirements: checked.map((r) => r.value),
    weakening: weakening.value,
    removedDesigns: removed.value,
    budget: budget.value,
    scopes,
    layers: {
      requirements: checked.map((r) => r.layer),
      weakening: weakening.layer,
      removed: removed.layer,
      budget: budget.layer,
    },
    ...(mend ? { mend } : {}),
  };
}

const matchers = new Map<string, (path: string) => boolean>();

/** Whether any of the globs matches the repository path (every policy glob goes through here). */
export function globsMatch(globs: readonly string[], given: string): boolean {
  // picomatch's `**` is a regex `.`, which stops at line terminators: a design in a directory
  // whose name holds a line break would slip past every `**/` glob. Match such paths with the
  // breaks stood in for by a character `.` does match.
  const path = given.replace(/[\r\n\u2028\u2029]/g, '\u001a');
  return globs.some((g) => {
    let m = matchers.get(g);
    if (!m) {
      m = picomatch(g, { dot: true });
      matchers.set(g, m);
    }
    return m(path);
  });
}

/** Whether the policy treats this repository path as a design file. */
export function isDesignPath(policy: Policy, path: string): boolean {
  return policy.designs.some((d) => globsMatch(d.paths, path)) && !globsMatch(policy.exclude, path);
}

/**
 * Whether the policy selects this path only by the built-in CSV glob (`**\/*.csv`, in an entry
 * that forces no format): such a file is a design only if its header says so
 * (`isDesignText`). A CSV that any other glob selects is judged whatever it holds.
 */
export function designNeedsHeader(policy: Policy, path: string): boolean {
  const matching = policy.designs.flatMap((d) =>
    d.paths.filter((g: string) => globsMatch([g], path)).map((g: string) => ({ g, format: d.format })),
  );
  return matching.length > 0 && matching.every((m) => m.g === CSV_DESIGN_GLOB && m.format === undefined);
}

/** Whether a file with this text (null: absent or unreadable) at this path is a design the policy judges. */
export function isDesignText(policy: Policy, path: string, text: string | null): boolean {
  if (!isDesignPath(policy, path)) return false;
  return !designNeedsHeader(policy, path) || (text !== null && csvHasEdgeHeader(text));
}

/** The format the policy forces on this path (a `designs` entry's `format`), if any. */
export function designFormat(policy: Policy, path: string): DesignFormat | undefined {
  return policy.designs.find((d) => d.format !== undefined && globsMatch(d.paths, path))?.format;
}

/** The rules for one design file: the policy with its matching scopes applied. Throws PolicyError. */
export function policyForFile(policy: Policy, path: string): FilePolicy {
  const layers = policy.layers;
  const requirements: Layered<Requirement>[] = policy.requirements.map((value, i) => ({
    value,
    layer: layers.requirements[i],
  }));
  let weakening: Layered<WeakeningRule> = { value: policy.weakening, layer: layers.weakening };
  let removed: Layered<{ severity: RemovedSeverity; where?: Where }> = {
    value: policy.removedDesigns,
    layer: layers.removed,
  };
  let budget: Layered<Budget> = { value: policy.budget, layer: layers.budget };
  for (const o of policy.scopes) {
    if (!globsMatch(o.paths, path)) continue;
    const { layer } = o;
    const what = `a scope matching ${path}`;
    for (const r of o.requirements) mergeRequirement(requirements, { value: r, layer }, what);
    if (o.weakening) weakening = mergeWeakening(weakening, { value: o.weakening, layer }, `${what}:`);
    if (o.removedDesigns) removed = mergeRemoved(removed, { value: o.removedDesigns, layer }, what);
    if (o.budget) budget = mergeBudget(budget, { value: o.budget, layer }, what);
  }
  const b = budget.value;
  const format = designFormat(policy, path);
  return {
    rValue: policy.rValue,
    seed: policy.seed,
    challenges: policy.challenges,
    requirements: requirements.map((r) => r.value),
    weakening: weakening.value,
    removedDesigns: removed.value.severity,
    budget: {
      ...(b.visits !== undefined ? { visits: b.visits } : {}),
      ...(b.seconds !== undefined ? { seconds: b.seconds } : {}),
      maxWork: budgetWork(b),
    },
    ...(format ? { format } : {}),
    ...(policy.mend ? { mend: policy.mend } : {}),
  };
}
