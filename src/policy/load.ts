// One policy file: YAML text → a checked PolicyFile whose every definition knows its line.
// Schema checks (policy.schema.json, via ajv) come first, then the checks a schema cannot
// express (which removal orders exist for what, grids, duplicates). Pure: the caller reads
// the file; `inherits` and scopes are applied in resolve.ts.

import { PolicyError } from '../errors.js';
import type { RValueSpec } from '../envelope/types.js';
import type { ChallengeName, ChallengeParams } from '../challenges/types.js';
import type { MetricId } from '../metrics/types.js';
import type { DesignFormat } from '../topology/model.js';
import { firstNonNormal, fmt } from '../topology/quantities.js';
import { DEFAULTS as CHALLENGE_DEFAULTS } from '../challenges/registry.js';
import { DEFAULT_ERROR_MULTIPLE, DEFAULT_SOURCES, REGIONAL_UNTIL_KM } from './defaults.js';
import { globProblem } from './globs.js';
import { requirementId } from './requirement-id.js';
import { policyValidator } from './policy-validator.js';
import { describePath as describe, throwSchemaErrors } from './schema-errors.js';
import type {
  Budget,
  ChallengeDef,
  MendSettings,
  DesignGlob,
  PolicyFile,
  RemovalOrder,
  RemovedSeverity,
  RemoveWhat,
  Requirement,
  Scope,
  Severity,
  ThresholdStatistic,
  WeakeningRule,
  Where,
} from './types.js';
import { type Segment, YamlSource } from './yaml-source.js';

/**
 * Range of a metric weight in the r-value. Only ratios matter; a million to one is already more
 * than any mix means, and the bounds keep the weighted sum far from overflow (a weight of 1e308
 * made the sum Infinity and R 0 everywhere) and from subnormal products.
 */
export const MIN_METRIC_WEIGHT = 1e-6;
export const MAX_METRIC_WEIGHT = 1e6;

/** Which engine challenge a (remove, order, adaptive) triple is; undefined when it does not exist. */
const ENGINE: Record<
  RemoveWhat,
  Partial<Record<RemovalOrder, { static?: ChallengeName; adaptive?: ChallengeName }>>
> = {
  nodes: {
    random: { static: 'random-nodes' },
    degree: { static: 'degree', adaptive: 'degree-adaptive' },
    betweenness: { static: 'betweenness', adaptive: 'betweenness-adaptive' },
    eigenvector: { static: 'eigenvector' },
    closeness: { static: 'closeness' },
  },
  links: {
    random: { static: 'random-links' },
    betweenness: { static: 'link-betweenness', adaptive: 'link-betweenness-adaptive' },
  },
  'risk-groups': {
    random: { static: 'risk-groups' },
    'worst-first': { static: 'risk-groups-worst' },
  },
  region: {
    random: { static: 'regional' },
  },
};

type Obj = Record<string, unknown>;

/**
 * The globs of a `files` / `ignore` value (one glob or a list), each checked (globs.ts): a glob
 * that could select nothing is a PolicyError at its own line, named as `what` says.
 */
function globs(value: unknown, src: YamlSource, path: readonly Segment[], what: string): string[] {
  const list = typeof value === 'string' ? [value] : (value as string[]);
  list.forEach((g, j) => {
    const problem = globProblem(g);
    if (problem)
      throw new PolicyError(
        `${what}, glob "${g}" ${problem.message}`,
        src.where(typeof value === 'string' ? path : [...path, j]),
        problem.hint,
      );
  });
  return list;
}

class FileBuilder {
  constructor(readonly src: YamlSource) {}

  at(path: readonly Segment[], key = false): Where {
    return this.src.where(path, key);
  }

  fail(message: string, path: readonly Segment[], hint = '', key = false): never {
    throw new PolicyError(message, this.at(path, key), hint);
  }

  challenge(name: string, raw: Obj): ChallengeDef {
    const path = ['challenges', name];
    const remove = raw.remove as RemoveWhat;
    const order = (raw.order as RemovalOrder | undefined) ?? 'random';
    const adaptive = (raw.adaptive as boolean | undefined) ?? false;
    const options = ENGINE[remove];
    const entry = options[order];
    if (!entry) {
      this.fail(
        `challenge "${name}": ${remove} cannot be removed in ${order} order`,
        [...path, raw.order === undefined ? 'remove' : 'order'],
        `orders for ${remove}: ${Object.keys(options).join(', ')}`,
      );
    }
    const engine = adaptive ? entry.adaptive : entry.static;
    if (!engine) {
      this.fail(
        `challenge "${name}": the ${order} order of ${remove} has no adaptive form`,
        [...path, 'adaptive'],
        order === 'random' ? 'adaptive applies to targeted attacks only' : 'remove "adaptive: true"',
      );
    }
    const random = order === 'random';
    for (const key of ['realizations', 'band'] as const) {
      if (!random && raw[key] !== undefined) {
        this.fail(
          `challenge "${name}": "${key}" applies only to random order`,
          [...path, key],
          'a targeted attack is one curve',
          true,
        );
      }
    }
    if (raw['worst-case'] !== undefined && !(random && (remove === 'nodes' || remove === 'links'))) {
      this.fail(
        `challenge "${name}": "worst-case" applies only to random node or link removal`,
        [...path, 'worst-case'],
        '',
        true,
      );
    }
    const until = raw.until as number | undefined;
    if (remove !== 'region' && until !== undefined && until > 1) {
      this.fail(
        `challenge "${name}": "until" is a fraction of the ${remove} removed and must be ≤ 1 (it is ${until})`,
        [...path, 'until'],
        'e.g. 0.5 for half of them',
      );
    }
    const band = raw.band as [number, number] | undefined;
    if (band && !(band[0] < band[1])) {
      this.fail(
        `challenge "${name}": the band's lower quantile must be below its upper one`,
        [...path, 'band'],
        `e.g. [0.1, 0.9]`,
      );
    }
    // The engine's defaults, written out, so that reports say exactly what ran. A region's
    // radius is fixed here too (the engine would derive one from each design's extent, so base
    // and head could get different grids, whose areas and spreads do not compare).
    const params: ChallengeParams = {
      challenge: engine,
      until: until ?? (remove === 'region' ? REGIONAL_UNTIL_KM : CHALLENGE_DEFAULTS.until),
    };
    if (random) {
      params.points = (raw.points as number | undefined) ?? CHALLENGE_DEFAULTS.points;
      params.realizations = (raw.realizations as number | undefined) ?? CHALLENGE_DEFAULTS.realizations;
      params.band = band ?? [...CHALLENGE_DEFAULTS.band];
      params.worstCase = (raw['worst-case'] as number | undefined) ?? CHALLENGE_DEFAULTS.worstCase;
    } else if (raw.points !== undefined) {
      params.points = raw.points as number;
    }
    if (raw.seed !== undefined) params.seed = raw.seed as number;
    return { name, remove, order, adaptive, engine, random, params, where: this.at(path, true) };
  }

  statistic(raw: Obj, path: readonly Segment[]): ThresholdStatistic {
    const kind = (raw.statistic as ThresholdStatistic['kind'] | undefined) ?? 'median';
    if (raw.q !== undefined && kind !== 'quantile') {
      this.fail(
        `${describe(path)}: "q" needs "statistic: quantile"`,
        [...path, 'q'],
        'add "statistic: quantile" or remove "q"',
        true,
      );
    }
    if (raw.removals !== undefined && kind !== 'worst-case') {
      this.fail(`${describe(path)}: "removals" needs "statistic: worst-case"`, [...path, 'removals'], '', true);
    }
    if (kind === 'quantile') {
      if (raw.q === undefined)
        this.fail(`${describe(path)}: "statistic: quantile" needs "q"`, [...path, 'statistic'], 'e.g. "q: 0.1"');
      return { kind, q: raw.q as number };
    }
    if (kind === 'worst-case') {
      if (raw.removals === undefined) {
        this.fail(
          `${describe(path)}: "statistic: worst-case" needs "removals"`,
          [...path, 'statistic'],
          'e.g. "removals: 2"',
        );
      }
      if (raw.at !== undefined) {
        this.fail(
          `${describe(path)}: a worst-case threshold counts "removals", not "at"`,
          [...path, 'at'],
          'remove "at"',
          true,
        );
      }
      return { kind, removals: raw.removals as number };
    }
    return { kind };
  }

  requirement(raw: Obj, path: readonly Segment[]): Requirement {
    const where = this.at(path);
    const severity = (raw.severity as Severity | undefined) ?? 'fail';
    const valueKey = raw.min !== undefined ? 'min' : raw.max !== undefined ? 'max' : 'kind';
    const valueWhere = this.at([...path, valueKey]);
    const common = { id: '', severity, where, valueWhere };
    const ref = { challenge: raw.challenge as string, challengeWhere: this.at([...path, 'challenge']) };
    let req: Requirement;
    switch (raw.kind) {
      case 'r-threshold': {
        const statistic = this.statistic(raw, path);
        if (statistic.kind !== 'worst-case' && raw.at === undefined) {
          this.fail(`${describe(path)} has no "at"`, path, 'add "at:", the removal fraction where R is judged');
        }
        req = {
          ...common,
          kind: 'r-threshold',
          ...ref,
          statistic,
          min: raw.min as number,
          ...(raw.at !== undefined ? { at: raw.at as number } : {}),
        };
        break;
      }
      case 'area-floor':
        req = {
          ...common,
          kind: 'area-floor',
          ...ref,
          ...(raw.min !== undefined ? { min: raw.min as number } : {}),
        };
        break;
      case 'spread-ceiling':
        req = { ...common, kind: 'spread-ceiling', ...ref, max: raw.max as number };
        break;
      case 'n-1':
        req = {
          ...common,
          kind: 'n-1',
          element: (raw.element as 'node' | 'link' | undefined) ?? 'link',
          min: raw.min as number,
        };
        break;
      default: {
        const elements = (raw.elements as string[] | undefined) ?? ['bridges', 'cut-nodes', 'risk-groups'];
        req = {
          ...common,
          valueWhere: this.at([...path, raw.elements !== undefined ? 'elements' : 'kind']),
          kind: 'no-new-spof',
          bridges: elements.includes('bridges'),
          cutNodes: elements.includes('cut-nodes'),
          riskGroups: elements.includes('risk-groups'),
          hardenedWeakPoints: (raw['hardened-weak-points'] as RemovedSeverity | undefined) ?? 'warn',
          ...(raw['hardened-weak-points'] !== undefined
            ? { hardenedWhere: this.at([...path, 'hardened-weak-points']) }
            : {}),
        };
      }
    }
    req.id = requirementId(req);
    return req;
  }

  requirements(list: unknown, path: readonly Segment[]): Requirement[] {
    if (list === undefined) return [];
    const out: Requirement[] = [];
    const byId = new Map<string, Requirement>();
    (list as Obj[]).forEach((raw, i) => {
      const req = this.requirement(raw, [...path, i]);
      const twin = byId.get(req.id);
      if (twin) {
        throw new PolicyError(
          `${describe([...path, i])} repeats requirement ${req.id}`,
          req.where,
          'keep one of them',
          [{ ...twin.where, message: 'first written here' }],
        );
      }
      byId.set(req.id, req);
      out.push(req);
    });
    return out;
  }

  weakening(raw: Obj | undefined, path: readonly Segment[]): WeakeningRule | undefined {
    if (raw === undefined) return undefined;
    const fieldWhere: WeakeningRule['fieldWhere'] = {};
    const field = (key: string, name: keyof WeakeningRule['fieldWhere']) => {
      if (raw[key] !== undefined) fieldWhere[name] = this.at([...path, key]);
      return raw[key];
    };
    const rule: WeakeningRule = {
      errorMultiple: (field('error-multiple', 'errorMultiple') as number | undefined) ?? DEFAULT_ERROR_MULTIPLE,
      severity: (field('severity', 'severity') as Severity | undefined) ?? 'fail',
      where: this.at(path, true),
      fieldWhere,
    };
    const abs = field('allowed-drop', 'allowedDrop');
    const rel = field('allowed-relative-drop', 'allowedRelativeDrop');
    if (abs !== undefined) rule.allowedDrop = abs as number;
    if (rel !== undefined) rule.allowedRelativeDrop = rel as number;
    return rule;
  }

  budget(raw: Obj | undefined, path: readonly Segment[]): Budget | undefined {
    if (raw === undefined) return undefined;
    const budget: Budget = { where: this.at(path, true), fieldWhere: {} };
    for (const key of ['visits', 'seconds'] as const) {
      if (raw[key] === undefined) continue;
      budget[key] = raw[key] as number;
      budget.fieldWhere[key] = this.at([...path, key]);
    }
    return budget;
  }

  mend(raw: Obj | undefined): MendSettings | undefined {
    if (raw === undefined) return undefined;
    const m: MendSettings = { where: this.at(['mend'], true) };
    if (raw.candidates !== undefined) {
      const c = String(raw.candidates).replace(/\\/g, '/');
      if (c.startsWith('/') || /^[A-Za-z]:\//.test(c) || c.split('/').includes('..')) {
        this.fail(
          `"mend.candidates" must be a path inside the repository, not ${c}`,
          ['mend', 'candidates'],
          'write it from the repository root, e.g. planning/candidate-links.yaml',
        );
      }
      m.candidates = c
        .split('/')
        .filter((s) => s !== '' && s !== '.')
        .join('/');
    }
    if (raw['route-factor'] !== undefined) m.routeFactor = raw['route-factor'] as number;
    if (raw['max-km'] !== undefined) m.maxKm = raw['max-km'] as number;
    if (raw['max-links'] !== undefined) m.maxLinks = raw['max-links'] as number;
    if (raw.evaluations !== undefined) m.evaluations = raw.evaluations as number;
    return m;
  }

  removed(raw: unknown, path: readonly Segment[]): { severity: RemovedSeverity; where: Where } | undefined {
    return raw === undefined ? undefined : { severity: raw as RemovedSeverity, where: this.at(path) };
  }
}

/** Normalise a repository path: forward slashes, no "." segments; PolicyError if it leaves the repository. */
export function joinRepoPath(fromFile: string, relative: string, where: Where): string {
  if (relative.startsWith('/') || /^[A-Za-z]:[\\/]/.test(relative)) {
    throw new PolicyError(
      `"inherits" must be a path inside the repository, not ${relative}`,
      where,
      'write it relative to this policy file',
    );
  }
  const dir = fromFile.split('/').slice(0, -1);
  const parts = [...dir];
  for (const seg of relative.replace(/\\/g, '/').split('/')) {
    if (seg === '' || seg === '.') continue;
    if (seg === '..') {
      if (parts.length === 0) {
        throw new PolicyError(
          `"inherits" leaves the repository: ${relative}`,
          where,
          'the base policy must be a file in this repository',
        );
      }
      parts.pop();
    } else {
      parts.push(seg);
    }
  }
  return parts.join('/');
}

/** Parse and check one policy file. Throws PolicyError with file:line:col. */
export function parsePolicyFile(text: string, file: string): PolicyFile {
  const src = new YamlSource(text, file);
  const data = (src.data ?? {}) as unknown;
  if (typeof data !== 'object' || data === null || Array.isArray(data)) {
    throw new PolicyError(
      'the policy must be a mapping of keys (key: value lines)',
      src.where([]),
      'see "netbrace init" for a starter file',
    );
  }
  // Before the schema, which would call .inf or 1e400 "not a number" without saying why.
  const odd = firstNonNormal(data, []);
  if (odd)
    throw new PolicyError(`${describe(odd.path)} ${odd.why}`, src.where(odd.path), 'write a plain decimal number');
  const v = policyValidator();
  v(data);
  if (v.errors && v.errors.length > 0) throwSchemaErrors(v.errors, src);

  const raw = data as Obj;
  const b = new FileBuilder(src);
  const policy: PolicyFile = { path: file, scopes: [] };

  if (raw.inherits !== undefined) {
    const where = src.where(['inherits']);
    policy.inherits = { path: joinRepoPath(file, raw.inherits as string, where), where };
  }
  if (raw.designs !== undefined) {
    policy.designs = (raw.designs as Obj[]).map((d, i): DesignGlob => ({
      paths: globs(d.paths, src, ['designs', i, 'paths'], `designs entry ${i + 1}`),
      ...(d.format !== undefined ? { format: d.format as DesignFormat } : {}),
      where: src.where(['designs', i]),
      fileWhere:
        typeof d.paths === 'string'
          ? [src.where(['designs', i, 'paths'])]
          : (d.paths as string[]).map((_, j) => src.where(['designs', i, 'paths', j])),
    }));
  }
  if (raw.exclude !== undefined)
    policy.exclude = { globs: globs(raw.exclude, src, ['exclude'], 'exclude'), where: src.where(['exclude']) };
  if (raw.seed !== undefined) policy.seed = { value: raw.seed as number, where: src.where(['seed']) };
  if (raw['r-value'] !== undefined) {
    const r = raw['r-value'] as Obj;
    for (const [id, weight] of Object.entries(r.metrics as Record<string, number>)) {
      if (weight < MIN_METRIC_WEIGHT || weight > MAX_METRIC_WEIGHT) {
        throw new PolicyError(
          `the weight of ${id} in r-value.metrics is ${fmt(weight)}, outside ${fmt(MIN_METRIC_WEIGHT)} to ${fmt(MAX_METRIC_WEIGHT)}`,
          src.where(['r-value', 'metrics', id]),
          'weights only set the metrics against each other (R is their weighted mean): 1 and 2 say the same as 1000 and 2000',
        );
      }
    }
    const spec: RValueSpec = {
      metrics: Object.entries(r.metrics as Record<string, number>).map(([id, weight]) => ({
        id: id as MetricId,
        weight,
      })),
      combine: (r.combine as 'mean' | 'min' | undefined) ?? 'mean',
    };
    // Unset takes the built-in count, as every key left out does; "all" is the exact value.
    const sources = r.sources ?? DEFAULT_SOURCES;
    if (typeof sources === 'number' && spec.metrics.some((m) => m.id === 'efficiency')) spec.sources = sources;
    if (typeof r.sources === 'number' && !spec.metrics.some((m) => m.id === 'efficiency'))
      throw new PolicyError(
        'r-value.sources applies to efficiency, which this r-value does not use',
        src.where(['r-value', 'sources']),
        'remove "sources", or add efficiency to r-value.metrics',
      );
    policy.rValue = { spec, where: src.where(['r-value'], true) };
  }

  const byEngine = new Map<string, ChallengeDef>();
  if (raw.challenges !== undefined) policy.challenges = [];
  for (const [name, c] of Object.entries((raw.challenges as Record<string, Obj> | undefined) ?? {})) {
    const def = b.challenge(name, c);
    const twin = byEngine.get(def.engine);
    if (twin) {
      throw new PolicyError(
        `challenges "${twin.name}" and "${name}" are the same challenge (${def.remove}, ${def.order}${def.adaptive ? ', adaptive' : ''})`,
        def.where,
        'define each challenge once',
        [{ ...twin.where, message: `"${twin.name}" is defined here` }],
      );
    }
    byEngine.set(def.engine, def);
    policy.challenges?.push(def);
  }

  if (raw.requirements !== undefined) policy.requirements = b.requirements(raw.requirements, ['requirements']);
  const weakening = b.weakening(raw.weakening as Obj | undefined, ['weakening']);
  if (weakening) policy.weakening = weakening;
  const removed = b.removed(raw['removed-designs'], ['removed-designs']);
  if (removed) policy.removedDesigns = removed;
  const budget = b.budget(raw.budget as Obj | undefined, ['budget']);
  if (budget) policy.budget = budget;
  const mend = b.mend(raw.mend as Obj | undefined);
  if (mend) policy.mend = mend;

  policy.scopes = ((raw.scopes as Obj[] | undefined) ?? []).map((o, i): Scope => {
    const path: Segment[] = ['scopes', i];
    const scope: Scope = {
      paths: globs(o.paths, src, [...path, 'paths'], `scope ${i + 1}`),
      requirements: b.requirements(o.requirements, [...path, 'requirements']),
      where: src.where(path),
    };
    const rule = b.weakening(o.weakening as Obj | undefined, [...path, 'weakening']);
    if (rule) scope.weakening = rule;
    const rem = b.removed(o['removed-designs'], [...path, 'removed-designs']);
    if (rem) scope.removedDesigns = rem;
    const ob = b.budget(o.budget as Obj | undefined, [...path, 'budget']);
    if (ob) scope.budget = ob;
    return scope;
  });
  return policy;
}
