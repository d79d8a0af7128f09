// `netbrace envelope FILE --challenge NAME ...`: one challenge on one design — the robustness
// envelope of a random challenge (band over realizations), the curve of a targeted attack, or
// the N−1 / N−2 table — with the weakest sequences and, on request, the worst-case search.
// The policy is the gate's (local-policy.ts): its R, seed and work budget apply unless an
// option says otherwise, and a challenge it defines can be named as the policy names it, to
// run with the parameters the gate gives it (evaluationSpecs in gate-request.ts).

import { availableParallelism } from 'node:os';
import type { Command, CommandIO } from '../io.js';
import { finiteNumber, parseCommandArgs, wholeNumber } from '../args.js';
import { DesignError, UsageError } from '../../errors.js';
import { unsupportedMetric } from '../../envelope/r-value.js';
import { compileTopology } from '../../graph/compact.js';
import { parseFormatName, FORMAT_CHOICES } from '../../topology/detect.js';
import { challenges, DEFAULTS, isChallengeName } from '../../challenges/registry.js';
import { isMetricId, metrics } from '../../metrics/registry.js';
import { CAUTION } from '../../report/report.js';
import type { DesignEvaluation, EvaluationSpec } from '../../envelope/evaluate.js';
import { budgetWork } from '../../policy/budget.js';
import { DEFAULT_POLICY_PATH, REGIONAL_UNTIL_KM } from '../../policy/defaults.js';
import { evaluationSpecs, policyR } from '../../gate-request.js';
import { designPolicy, readLocalPolicy } from '../local-policy.js';
import { evaluateDesignParallel } from '../../parallel/pool.js';
import type { AttackCurve, Contingency, Envelope, RValueSpec, WorstCase } from '../../envelope/types.js';
import type { ChallengeParams } from '../../challenges/types.js';
import type { MetricId } from '../../metrics/types.js';
import { readDesign, type ReadDesignOptions } from '../read-design.js';

const width = Math.max(...challenges.map((c) => c.name.length));
const CHALLENGE_LIST = challenges.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`).join('\n');

const HELP = `Usage: netbrace envelope FILE --challenge NAME [options] [--json]

Runs one challenge against one design and reports how the robustness value R degrades:
for a random challenge the envelope (min, max, mean, quantile band with confidence
intervals, area, spread, the three weakest realizations), for a targeted attack its curve at
every removal step and its removal sequence, for n-1 / n-2 the worst cases.

The policy is check's: --policy FILE, else ${DEFAULT_POLICY_PATH} at the root of the git
repository that holds the working directory (outside git: in the working directory), else
the built-in policy. Its r-value, seed and work budget for FILE apply unless --metric /
--score, --seed or --max-work say otherwise, and NAME may be a challenge the policy defines
(e.g. node-failures), run with the parameters "check" gives it; the options below change them.

Challenges (besides the policy's):
${CHALLENGE_LIST}

Options:
  --challenge NAME     the challenge (required): one the policy defines, or one of the list
  --policy FILE        the policy file (default ${DEFAULT_POLICY_PATH} at the repository root, if present)
  --metric ID          R is this one normalized metric (default: the policy's r-value)
  --score ID=W,...     R is a weighted combination of metrics, e.g. efficiency=2,largest_component=1
  --combine mean|min   how --score combines: weighted mean (default) or minimum
  --realizations M     random realizations (default ${DEFAULTS.realizations}); regional uses every epicentre
  --seed S             seed of the random orders (default: the policy's); same seed, same result
  --until X            end of the x axis: a fraction of nodes/links/groups (default ${DEFAULTS.until}),
                       or a radius in km for regional (default ${REGIONAL_UNTIL_KM} km, as in check)
  --points K           grid points on the x axis, 0 included (default ${DEFAULTS.points})
  --band LO,HI         quantiles of the band (default ${DEFAULTS.band.join(',')})
  --worst-case K       also search the weakest removal sequence of length K (exact for K ≤ 2)
  --beam B             beam width of that search beyond exact (default 1 = greedy)
  --element node|link  what n-1 / n-2 remove (default node)
  --threads N          worker threads (default: the machine's cores, at most 4); the result
                       does not depend on it
  --max-work W         work budget in element visits (default: the policy's budget for FILE);
                       beyond it realizations are reduced and the output says so
  --format F           read FILE as F (${FORMAT_CHOICES}) instead of by extension
  --json               print one JSON object

Metrics: ${metrics.map((m) => m.id).join(', ')}

Examples:
  netbrace envelope designs/core.net.yaml --challenge random-nodes --metric efficiency
  netbrace envelope designs/core.net.yaml --challenge node-failures   a challenge of the policy
  netbrace envelope core.graphml --challenge degree-adaptive --until 0.2 --json
  netbrace envelope core.net.yaml --challenge n-1 --element link
  netbrace envelope core.net.yaml --challenge regional --until 300 --points 7

The result informs engineering judgement under the stated model; it does not replace
engineering studies, and local codes, standards and licensed practice decide.

Exit codes: 0 evaluated, 1 the design could not be read or R cannot be computed on it, 2 usage error.
`;

export function parseScore(text: string, combine: string | undefined): RValueSpec {
  if (combine !== undefined && combine !== 'mean' && combine !== 'min') {
    throw new UsageError(`--combine must be "mean" or "min", not "${combine}"`);
  }
  const parts = text
    .split(',')
    .map((p) => p.trim())
    .filter(Boolean);
  if (parts.length === 0)
    throw new UsageError('--score needs at least one ID=WEIGHT', 'e.g. --score efficiency=2,largest_component=1');
  const list = parts.map((p) => {
    const [id, w = '1'] = p.split('=');
    if (!isMetricId(id))
      throw new UsageError(
        `unknown metric "${id}" in --score`,
        `known metrics: ${metrics.map((m) => m.id).join(', ')}`,
      );
    const weight = Number(w);
    if (!(weight > 0) || !Number.isFinite(weight))
      throw new UsageError(`weight of ${id} must be a number > 0, not "${w}"`);
    return { id: id as MetricId, weight };
  });
  return { metrics: list, combine: (combine ?? 'mean') as 'mean' | 'min' };
}

/** Where the run's R and challenge came from, for the output. */
export interface EnvelopeOrigin {
  /** The policy's name of the challenge, when NAME was one. */
  policyChallenge?: string;
  /** "--metric", "--score", or the policy R came from. */
  rSource?: string;
}

/** The command's JSON: one object per run (snake_case, as the CLI's other outputs). */
export function envelopeJson(
  file: string,
  spec: EvaluationSpec,
  ev: DesignEvaluation,
  origin: EnvelopeOrigin = {},
): Record<string, unknown> {
  const e = ev.evaluation;
  const common = {
    file,
    ...(origin.policyChallenge !== undefined ? { policy_challenge: origin.policyChallenge } : {}),
    r: spec.r,
    ...(origin.rSource !== undefined ? { r_source: origin.rSource } : {}),
    seed: spec.seed,
  };
  const worst = (w: WorstCase | undefined) =>
    w ? { worst_case: { k: w.k, method: w.method, kind: w.kind, elements: w.elements, values: w.values } } : {};
  const env: Envelope | undefined = e.envelopes[0];
  const attack: AttackCurve | undefined = e.attacks[0];
  const cont: Contingency | undefined = e.contingencies[0];
  let body: Record<string, unknown>;
  if (env) {
    body = {
      challenge: env.challenge,
      kind: env.kind,
      x_unit: env.xUnit,
      realizations: env.realizations,
      band: env.band,
      x: env.x,
      min: env.min,
      max: env.max,
      mean: env.mean,
      median: env.median,
      quantiles: env.quantiles,
      area: env.area,
      spread: env.spread,
      weakest: env.weakest,
      ...worst(env.worstCase),
    };
  } else if (attack) {
    body = {
      challenge: attack.challenge,
      kind: attack.kind,
      x: attack.x,
      values: attack.values,
      sequence: attack.sequence,
      area: attack.area,
      ...worst(attack.worstCase),
    };
  } else {
    body = {
      challenge: cont.challenge,
      kind: cont.kind,
      evaluated: cont.evaluated,
      total: cont.total,
      min: cont.min,
      worst: cont.worst,
    };
  }
  return { ...common, ...body, degraded: e.degraded, caution: CAUTION };
}

const f4 = (x: number) => (Number.isFinite(x) ? x.toFixed(4) : '  –   ');

function shortList(ids: readonly string[], limit = 10): string {
  return ids.slice(0, limit).join(', ') + (ids.length > limit ? `, … (${ids.length - limit} more)` : '');
}

/** The human view. */
export function formatEnvelope(
  file: string,
  spec: EvaluationSpec,
  ev: DesignEvaluation,
  origin: EnvelopeOrigin = {},
): string {
  const e = ev.evaluation;
  const rText =
    spec.r.metrics.length === 1
      ? spec.r.metrics[0].id
      : `${spec.r.combine} of ${spec.r.metrics.map((m) => `${m.id}×${m.weight}`).join(', ')}`;
  const lines: string[] = [];
  const env = e.envelopes[0];
  const attack = e.attacks[0];
  const cont = e.contingencies[0];
  const worstLines = (w: WorstCase | undefined) => {
    if (!w) return;
    lines.push(`  worst case (k = ${w.k}, ${w.method}): ${w.elements.join(' → ')}`);
    lines.push(`    R after each step: ${w.values.map(f4).join(', ')}`);
  };
  if (env) {
    const [lo, hi] = env.band.map(String);
    const unit = env.xUnit === 'km' ? 'radius km' : `${env.kind}s removed`;
    lines.push(
      `${file} — ${env.challenge}, R = ${rText}, ${env.realizations} ${env.challenge === 'regional' ? 'epicentres' : 'realizations'}, seed ${env.seed}`,
    );
    lines.push(`  ${unit.padStart(15)}     min   q${lo.padEnd(4)}  median  q${hi.padEnd(4)}     max    mean`);
    env.x.forEach((x, j) => {
      const xs = env.xUnit === 'km' ? x.toFixed(1) : `${(x * 100).toFixed(1)} %`;
      const q = env.quantiles;
      lines.push(
        `  ${xs.padStart(15)}  ${[env.min[j], q[lo].value[j], env.median[j], q[hi].value[j], env.max[j], env.mean[j]].map(f4).join('  ')}`,
      );
    });
    lines.push(
      `  area ${f4(env.area)} (mean median R; higher is better), spread ${f4(env.spread)} (mean band width; smaller is better)`,
    );
    for (const w of env.weakest) {
      lines.push(
        `  weak realization ${w.realization}${w.label ? ` (epicentre ${w.label})` : ''}: ${shortList(w.elements)}`,
      );
    }
    worstLines(env.worstCase);
  } else if (attack) {
    lines.push(`${file} — ${attack.challenge} attack, R = ${rText}, ${attack.sequence.length} ${attack.kind}s removed`);
    const K = attack.values.length - 1;
    const shown = [...new Set(Array.from({ length: 11 }, (_, i) => Math.round((i * K) / 10)))];
    lines.push(`  ${'removed'.padStart(10)}        R`);
    for (const k of shown)
      lines.push(`  ${`${k} (${(attack.x[k] * 100).toFixed(1)} %)`.padStart(16)}  ${f4(attack.values[k])}`);
    lines.push(`  area ${f4(attack.area)}; removal order: ${shortList(attack.sequence)}`);
    worstLines(attack.worstCase);
  } else if (cont) {
    lines.push(
      `${file} — ${cont.challenge} over ${cont.kind}s, R = ${rText}: ${cont.evaluated} of ${cont.total} cases evaluated`,
    );
    lines.push(`  lowest R ${f4(cont.min)}`);
    for (const w of cont.worst) lines.push(`  ${f4(w.value)}  ${w.elements.join(' + ')}`);
  }
  for (const d of e.degraded) lines.push(`  degraded: ${d}`);
  const from = [
    origin.policyChallenge !== undefined ? `challenge "${origin.policyChallenge}" of the policy` : '',
    origin.rSource !== undefined ? `R from ${origin.rSource}` : '',
  ].filter(Boolean);
  if (from.length) lines.push(`  ${from.join('; ')}`);
  lines.push('', `note: ${CAUTION}`);
  return `${lines.join('\n')}\n`;
}

export const envelopeCommand: Command = {
  name: 'envelope',
  summary: 'robustness envelope, attack curve or N-1/N-2 of one design under one challenge',
  help: HELP,
  async run(args: string[], io: CommandIO): Promise<number> {
    const parsed = parseCommandArgs('envelope', args, {
      challenge: { type: 'string' },
      policy: { type: 'string' },
      metric: { type: 'string' },
      score: { type: 'string' },
      combine: { type: 'string' },
      realizations: { type: 'string' },
      seed: { type: 'string' },
      until: { type: 'string' },
      points: { type: 'string' },
      band: { type: 'string' },
      'worst-case': { type: 'string' },
      beam: { type: 'string' },
      element: { type: 'string' },
      threads: { type: 'string' },
      'max-work': { type: 'string' },
      format: { type: 'string' },
      json: { type: 'boolean' },
    });
    const v = parsed.values;
    if (parsed.positionals.length !== 1)
      throw new UsageError(
        'envelope needs exactly one FILE',
        'netbrace envelope designs/core.net.yaml --challenge random-nodes',
      );
    const file = parsed.positionals[0];
    if (v.metric !== undefined && v.score !== undefined) throw new UsageError('give --metric or --score, not both');
    if (v.combine !== undefined && v.score === undefined) throw new UsageError('--combine goes with --score');
    const local = await readLocalPolicy(io, v.policy);
    const fp = designPolicy(local, io, file);
    const names = [
      ...fp.challenges.map((c) => c.name),
      ...challenges.map((c) => c.name).filter((n) => !fp.challenges.some((c) => c.name === n)),
    ];
    if (v.challenge === undefined) throw new UsageError('--challenge is required', `one of: ${names.join(', ')}`);
    const defined = fp.challenges.find((c) => c.name === v.challenge);
    if (!defined && !isChallengeName(v.challenge))
      throw new UsageError(`unknown challenge "${v.challenge}"`, `one of: ${names.join(', ')}`);
    const origin: EnvelopeOrigin = {};
    let r: RValueSpec = fp.rValue;
    if (v.score !== undefined) {
      r = parseScore(v.score, v.combine);
      origin.rSource = '--score';
    } else if (v.metric !== undefined) {
      if (!isMetricId(v.metric))
        throw new UsageError(`unknown metric "${v.metric}"`, `known metrics: ${metrics.map((m) => m.id).join(', ')}`);
      r = { metrics: [{ id: v.metric, weight: 1 }], combine: 'mean' };
      origin.rSource = '--metric';
    }
    const seed = wholeNumber('--seed', v.seed, 0) ?? fp.seed;
    if (v.score === undefined && v.metric === undefined) {
      r = policyR(fp, seed);
      origin.rSource = local.source;
    }
    let params: ChallengeParams;
    if (defined) {
      // The gate's request for this challenge (its grid includes every threshold's x).
      const gate = evaluationSpecs(fp, seed)[0].challenges.find((c) => c.challenge === defined.engine);
      params = { ...(gate ?? defined.params) };
      origin.policyChallenge = defined.name;
    } else {
      params = { challenge: v.challenge as ChallengeParams['challenge'] };
      // The radius the gate gives a region without "until" (the same for every design).
      if (v.challenge === 'regional') params.until = REGIONAL_UNTIL_KM;
    }
    const set = <K extends keyof ChallengeParams>(key: K, value: ChallengeParams[K] | undefined) => {
      if (value !== undefined) params[key] = value;
    };
    set('realizations', wholeNumber('--realizations', v.realizations, 1));
    set(
      'until',
      finiteNumber('--until', v.until, (x) => x >= 0, 'a number ≥ 0'),
    );
    set('points', wholeNumber('--points', v.points, 2));
    set('worstCase', wholeNumber('--worst-case', v['worst-case'], 0));
    set('beam', wholeNumber('--beam', v.beam, 1));
    if (v.band !== undefined) {
      const b = v.band.split(',').map(Number);
      if (b.length !== 2 || !(b[0] > 0 && b[0] < b[1] && b[1] < 1))
        throw new UsageError(`--band must be LO,HI with 0 < LO < HI < 1, not "${v.band}"`);
      params.band = [b[0], b[1]];
    }
    if (v.element !== undefined) {
      if (v.element !== 'node' && v.element !== 'link')
        throw new UsageError(`--element must be node or link, not "${v.element}"`);
      params.element = v.element;
    }
    // A threshold's x beyond a changed --until is not on the grid any more.
    if (params.at && params.until !== undefined) params.at = params.at.filter((x) => x <= params.until!);
    const threads = wholeNumber('--threads', v.threads, 1) ?? Math.min(4, availableParallelism());
    const maxWorkArg = finiteNumber('--max-work', v['max-work'], (x) => x > 0, 'a number > 0');
    // The same budget arithmetic as the gate's (policy/budget.ts).
    const maxWork = maxWorkArg !== undefined ? budgetWork({ visits: maxWorkArg }) : fp.budget.maxWork;
    const options: ReadDesignOptions = { cwd: io.cwd };
    if (v.format !== undefined) options.format = parseFormatName(v.format);
    else if (fp.format) options.format = fp.format; // as the gate reads it

    const g = compileTopology(readDesign(file, options));
    // A metric the design cannot support would give an envelope of zeros: refuse, naming what is missing.
    const unsupported = unsupportedMetric(g, r);
    if (unsupported) throw new DesignError(unsupported.message, { file }, unsupported.hint);
    const spec: EvaluationSpec = { r, seed, challenges: [params], budget: { maxWork } };
    let ev: DesignEvaluation;
    try {
      ev = await evaluateDesignParallel(g, spec, threads);
    } catch (e) {
      if (e instanceof RangeError) throw new UsageError(e.message);
      throw e;
    }
    const e = ev.evaluation;
    if (e.envelopes.length + e.attacks.length + e.contingencies.length === 0) {
      const na = e.notApplicable?.[0];
      throw new UsageError(
        na
          ? `${na.challenge} does not apply to this design: ${na.reason}`
          : (e.degraded[0] ?? `${v.challenge} produced no result`),
        'choose another challenge for this design',
      );
    }
    io.stdout(
      v.json
        ? `${JSON.stringify(envelopeJson(file, spec, ev, origin), null, 2)}\n`
        : formatEnvelope(file, spec, ev, origin),
    );
    return 0;
  },
};
