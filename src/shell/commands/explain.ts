// `netbrace explain FILE`: the planner's to-do list. Every single element (site, link, and
// shared-risk group: one duct is one event) is removed on its own, R is taken on what is left
// (the N−1 challenge, exhaustively), and the elements are ranked by the R they leave, worst
// first, each with its line in the design file and the sites it cuts off. R and the work
// budget are the gate's: the policy that applies to the file (local-policy.ts).
// Under the budget a big design is not ranked in full: single points of failure first, then
// shared-risk groups, then the best-connected sites and links (planSingleLosses), and the
// output says how many were left out.

import type { Command, CommandIO } from '../io.js';
import { finiteNumber, parseCommandArgs, wholeNumber } from '../args.js';
import { DesignError, UsageError } from '../../errors.js';
import { compileTopology, nodesByLine, type CompactGraph } from '../../graph/compact.js';
import { createMask } from '../../graph/mask.js';
import { findComponents, findCutElements } from '../../graph/structure.js';
import {
  createRValue,
  rSourceErrors,
  samplesSources,
  unsupportedMetric,
  type RFunction,
} from '../../envelope/r-value.js';
import type { SourceSampling } from '../../envelope/types.js';
import { needsBands, passCost, rCost, survivorShape } from '../../envelope/cost.js';
import type { RValueSpec } from '../../envelope/types.js';
import type { ElementKind } from '../../graph/element.js';
import { countOnes, eligibleUnits, removeUnit, restoreUnit, unitCount, unitIds } from '../../challenges/units.js';
import { getMetric, isMetricId, metrics as knownMetrics } from '../../metrics/registry.js';
import { DEFAULT_POLICY_PATH } from '../../policy/resolve.js';
import { budgetWork } from '../../policy/budget.js';
import { designPolicy, readLocalPolicy } from '../local-policy.js';
import { parseFormatName, FORMAT_CHOICES } from '../../topology/detect.js';
import type { Topology } from '../../topology/model.js';
import { CAUTION } from '../../report/report.js';
import { wrap } from '../../report/terminal.js';
import { readDesign, type ReadDesignOptions } from '../read-design.js';
import { createProgress, type Progress } from '../progress.js';
import { colorEnabled, terminalWidth } from '../color.js';
import { createColors } from 'picocolors';
import { policyR } from '../../gate-request.js';

export interface SingleLoss {
  rank: number;
  kind: ElementKind;
  id: string;
  /** Human name from the design, when it has one. */
  label?: string;
  line: number;
  /** R with this element removed. */
  r: number;
  /** intact R − r (≥ 0 for every metric netbrace has: none rises when an element goes). */
  drop: number;
  /** Sites no longer connected to the largest part (removed sites themselves not counted). */
  cutsOff: string[];
  /** A bridge (link) or a cut node (site) of the intact design. */
  singlePointOfFailure: boolean;
}

export interface Explanation {
  file: string;
  r: RValueSpec;
  /** Where R's definition came from. */
  rSource: string;
  intact: number;
  /** Elements evaluated per kind, and hardened ones left out. */
  evaluated: Record<ElementKind, number>;
  hardened: Record<ElementKind, number>;
  elements: SingleLoss[];
  /** Set when the work budget left single losses out (they are not ranked). */
  reduced?: ReducedRanking;
  /** Set when R's efficiency searched from sampled sources: the sample and R's standard error on the intact design. */
  sampling?: SourceSampling;
}

export interface ReducedRanking {
  /** Single losses evaluated, and how many there are. */
  evaluated: number;
  total: number;
  /** The work budget (element visits) and the work the whole ranking needs. */
  maxWork: number;
  work: number;
  /** Which ones were evaluated, in words. */
  chosen: string;
}

/** One planned ranking: which units of each kind are evaluated, within the budget. */
export interface SingleLossPlan {
  /** Per kind, the eligible units to evaluate (all of them unless reduced). */
  units: Map<ElementKind, Set<number>>;
  /** Work of one single loss: R plus the component search, in element visits. */
  perCase: number;
  reduced?: ReducedRanking;
}

const KINDS: readonly ElementKind[] = ['node', 'link', 'group'];

/**
 * Remove each eligible unit of the chosen kinds on its own and rank by the R left (ascending;
 * ties keep kind order node, link, group, then file order). Pure; `onStep` reports progress.
 */
export function rankSingleLosses(
  g: CompactGraph,
  rfn: RFunction,
  kinds: readonly ElementKind[] = KINDS,
  onStep: (done: number, total: number) => void = () => {},
  only?: ReadonlyMap<ElementKind, ReadonlySet<number>>,
): {
  intact: number;
  evaluated: Record<ElementKind, number>;
  hardened: Record<ElementKind, number>;
  ranked: Omit<SingleLoss, 'rank' | 'label'>[];
} {
  const mask = createMask(g);
  const intact = rfn(mask);
  const cuts = findCutElements(g);
  const bridge = new Set(cuts.bridges);
  const cutNode = new Set(cuts.cutNodes);
  const evaluated: Record<ElementKind, number> = { node: 0, link: 0, group: 0 };
  const hardened: Record<ElementKind, number> = { node: 0, link: 0, group: 0 };
  const eligible = new Map(kinds.map((k) => [k, eligibleUnits(g, k)]));
  let total = 0;
  for (const k of kinds) total += only ? (only.get(k)?.size ?? 0) : countOnes(eligible.get(k)!);
  // Lists and ties follow the file, the order a planner reads it in.
  const byLine = nodesByLine(g, g.nodeIds.keys());
  const out: (Omit<SingleLoss, 'rank' | 'label'> & { order: number })[] = [];
  let done = 0;
  for (const kind of kinds) {
    const ok = eligible.get(kind)!;
    const ids = unitIds(g, kind);
    for (let u = 0; u < unitCount(g, kind); u++) {
      if (!ok[u]) {
        hardened[kind]++;
        continue;
      }
      if (only && !only.get(kind)?.has(u)) continue;
      removeUnit(g, mask, kind, u);
      const r = rfn(mask);
      const comps = findComponents(g, mask);
      const cutsOff: string[] = [];
      for (const v of byLine) if (comps.label[v] >= 0 && comps.label[v] !== comps.largest) cutsOff.push(g.nodeIds[v]);
      restoreUnit(g, mask, kind, u);
      evaluated[kind]++;
      out.push({
        kind,
        id: ids[u],
        line: kind === 'node' ? g.nodeLine[u] : kind === 'link' ? g.linkLine[u] : g.groupLine[u],
        r,
        drop: intact - r,
        cutsOff,
        singlePointOfFailure: kind === 'node' ? cutNode.has(u) : kind === 'link' ? bridge.has(u) : false,
        order: out.length,
      });
      onStep(++done, total);
    }
  }
  out.sort(
    (a, b) => a.r - b.r || kinds.indexOf(a.kind) - kinds.indexOf(b.kind) || a.line - b.line || a.order - b.order,
  );
  return { intact, evaluated, hardened, ranked: out.map(({ order: _order, ...rest }) => rest) };
}

/** R's definition from --metric ids (an equal-weight mean), or undefined when none is given. */
function metricR(metricIds: string[]): { spec: RValueSpec; source: string } | undefined {
  if (metricIds.length === 0) return undefined;
  for (const id of metricIds) {
    if (!isMetricId(id)) getMetric(id); // throws the UsageError that lists the known ids
  }
  return {
    spec: {
      metrics: metricIds.map((id) => ({ id: id as RValueSpec['metrics'][number]['id'], weight: 1 })),
      combine: 'mean',
    },
    source: metricIds.length === 1 ? '--metric' : '--metric (equal weights)',
  };
}

const CHOSEN =
  'single points of failure (cut sites, bridges) first, then shared-risk groups, then the other sites and links ' +
  'by the links they touch, most first (a share for each kind); the rest are not ranked, and one of them may hurt more than those shown';

/**
 * Which single losses to evaluate within `maxWork` element visits. One loss costs R on the
 * intact design (the engine's estimate, envelope/cost.ts: one element barely changes the
 * survivor) plus one pass for the components; the intact R costs one more. When all of them do not
 * fit, the order of CHOSEN is our own heuristic (not a published rule): elements that cut sites
 * off are the ones a planner must see, a duct fails many links at once, and an element that
 * touches more links tends to leave a lower R. Ties go to file order. Pure.
 */
export function planSingleLosses(
  g: CompactGraph,
  spec: RValueSpec,
  kinds: readonly ElementKind[],
  maxWork: number,
): SingleLossPlan {
  const perCase = rCost(g, spec, survivorShape(g, undefined, needsBands(spec))) + passCost(g);
  const units = new Map<ElementKind, Set<number>>();
  const eligible = new Map(kinds.map((k) => [k, eligibleUnits(g, k)]));
  let total = 0;
  for (const k of kinds) total += countOnes(eligible.get(k)!);
  const work = (total + 1) * perCase;
  const fit = Math.max(0, Math.floor(maxWork / perCase) - 1);
  if (work <= maxWork || fit >= total) {
    for (const k of kinds) {
      const ok = eligible.get(k)!;
      units.set(k, new Set(Array.from({ length: ok.length }, (_, u) => u).filter((u) => ok[u])));
    }
    return { units, perCase };
  }
  for (const k of kinds) units.set(k, new Set());
  let room = fit;
  const take = (k: ElementKind, u: number) => {
    if (room > 0 && !units.get(k)!.has(u)) {
      units.get(k)!.add(u);
      room--;
    }
  };
  // 1. Single points of failure, 2. groups: in file order while there is room.
  const cuts = findCutElements(g);
  const okOf = (k: ElementKind) => eligible.get(k);
  if (okOf('node')) for (const v of [...cuts.cutNodes].sort((a, b) => a - b)) if (okOf('node')![v]) take('node', v);
  if (okOf('link')) for (const e of [...cuts.bridges].sort((a, b) => a - b)) if (okOf('link')![e]) take('link', e);
  if (okOf('group')) for (let u = 0; u < g.groupIds.length; u++) if (okOf('group')![u]) take('group', u);
  // 3. The rest of the sites and links by the links they touch, most first; each kind its share of the room left.
  const degree = (v: number) => g.offsets[v + 1] - g.offsets[v];
  const rest = new Map<ElementKind, number[]>();
  for (const k of ['node', 'link'] as const) {
    const ok = okOf(k);
    if (!ok) continue;
    const score = k === 'node' ? degree : (e: number) => degree(g.linkSource[e]) + degree(g.linkTarget[e]) - 2;
    const list = Array.from({ length: ok.length }, (_, u) => u).filter((u) => ok[u] && !units.get(k)!.has(u));
    list.sort((a, b) => score(b) - score(a) || a - b);
    rest.set(k, list);
  }
  const left = [...rest.values()].reduce((s, l) => s + l.length, 0);
  const budget = room;
  for (const [k, list] of rest)
    for (const u of list.slice(0, Math.floor((budget * list.length) / Math.max(1, left)))) take(k, u);
  for (const [k, list] of rest) for (const u of list) take(k, u); // what rounding left over, in kind order
  let evaluated = 0;
  for (const s of units.values()) evaluated += s.size;
  return { units, perCase, reduced: { evaluated, total, maxWork, work, chosen: CHOSEN } };
}

export function explainDesign(
  t: Topology,
  spec: RValueSpec,
  source: string,
  kinds: readonly ElementKind[] = KINDS,
  progress?: Progress,
  g: CompactGraph = compileTopology(t),
  maxWork = Infinity,
): Explanation {
  const rfn = createRValue(g, spec, t.latencyBudget !== undefined ? { latencyBudget: t.latencyBudget } : undefined);
  const plan = planSingleLosses(g, spec, kinds, maxWork);
  const res = rankSingleLosses(g, rfn, kinds, (done) => progress?.update(done), plan.reduced ? plan.units : undefined);
  const labels = new Map(t.nodes.filter((n) => n.label).map((n) => [n.id, n.label as string]));
  return {
    file: t.file,
    r: spec,
    rSource: source,
    intact: res.intact,
    evaluated: res.evaluated,
    hardened: res.hardened,
    elements: res.ranked.map((e, i) => {
      const label = e.kind === 'node' ? labels.get(e.id) : undefined;
      return { rank: i + 1, ...e, ...(label !== undefined && label !== e.id ? { label } : {}) };
    }),
    ...(plan.reduced ? { reduced: plan.reduced } : {}),
    ...(samplesSources(g, spec)
      ? {
          sampling: {
            metric: 'efficiency' as const,
            sources: spec.sources!,
            nodes: g.n,
            se: rSourceErrors(g, spec, [createMask(g)])[0],
          },
        }
      : {}),
  };
}

/** Element visits in plain figures: 3e9, 40000. */
function visits(n: number): string {
  return n >= 1e6 ? n.toExponential(1).replace('e+', 'e').replace('.0e', 'e') : String(n);
}

const r4 = (v: number) => v.toFixed(4);
const KIND_WORD: Record<ElementKind, string> = { node: 'site', link: 'link', group: 'duct/group' };

/** The human view: a ranked table, worst first. */
export function formatExplanation(x: Explanation, top: number, color: boolean, width: number): string {
  const c = createColors(color);
  const metrics = x.r.metrics.map((m) => `${m.id}${x.r.metrics.length > 1 ? ` ${m.weight}` : ''}`).join(', ');
  const out: string[] = [];
  out.push(c.bold(`${x.file} \u2014 single losses ranked by the R they leave`));
  out.push(
    c.dim(
      `R = ${x.r.combine === 'min' ? 'minimum' : x.r.metrics.length > 1 ? 'weighted mean' : 'normalized'} of ${metrics} (from ${x.rSource})`,
    ),
  );
  const hard = KINDS.filter((k) => x.hardened[k] > 0).map(
    (k) => `${x.hardened[k]} ${KIND_WORD[k]}${x.hardened[k] === 1 ? '' : 's'}`,
  );
  out.push(
    `intact R ${r4(x.intact)} \u00b7 evaluated ${x.evaluated.node} sites, ${x.evaluated.link} links, ${x.evaluated.group} shared-risk groups` +
      (hard.length ? ` \u00b7 hardened, not removed: ${hard.join(', ')}` : ''),
  );
  if (x.sampling) {
    const sm = x.sampling;
    const line =
      `estimated: efficiency searched from ${sm.sources} of ${sm.nodes} sites as seeded sources, the same for every loss; ` +
      `R's standard error about ${sm.se.toPrecision(2)} on the intact design. Every drop shares that sample, so drops compare ` +
      `better than that, but two drops close together may change places with every site as a source (r-value sources: all).`;
    for (const l of wrap(line, width)) out.push(c.yellow(l));
  }
  if (x.reduced) {
    const r = x.reduced;
    const line =
      `reduced: ${r.evaluated} of ${r.total} single losses evaluated within the work budget (${visits(r.maxWork)} element visits; ` +
      `all of them need ${visits(r.work)}): ${r.chosen}. Raise the policy's budget or give --max-work to rank them all.`;
    for (const l of wrap(line, width)) out.push(c.yellow(l));
  }
  out.push('');
  const rows = x.elements.slice(0, top);
  const shown = (e: SingleLoss) =>
    e.label && e.label.toLowerCase() !== e.id.toLowerCase() ? `${e.id} (${e.label})` : e.id;
  const idW = Math.min(34, Math.max(7, ...rows.map((e) => shown(e).length)));
  out.push(
    c.bold(
      `${'#'.padStart(3)}  ${'kind'.padEnd(10)}  ${'element'.padEnd(idW)}  ${'line'.padStart(5)}  ${'R left'.padStart(7)}  ${'drop'.padStart(7)}  cuts off`,
    ),
  );
  for (const e of rows) {
    const name = shown(e).slice(0, idW);
    const cut = e.cutsOff.length
      ? `${e.cutsOff.length} site${e.cutsOff.length === 1 ? '' : 's'}: ${e.cutsOff.slice(0, 6).join(', ')}${e.cutsOff.length > 6 ? ', \u2026' : ''}`
      : '\u2013';
    const prefix = `${String(e.rank).padStart(3)}  ${KIND_WORD[e.kind].padEnd(10)}  ${name.padEnd(idW)}  ${String(e.line).padStart(5)}  ${r4(e.r).padStart(7)}  ${('\u2212' + r4(Math.max(0, e.drop))).padStart(7)}  `;
    const room = Math.max(16, width - prefix.length);
    const line = prefix + (cut.length > room ? `${cut.slice(0, room - 1)}\u2026` : cut);
    out.push(e.cutsOff.length ? c.red(line) : e.drop > 0 ? line : c.dim(line));
  }
  if (x.elements.length > rows.length)
    out.push(c.dim(`  \u2026 ${x.elements.length - rows.length} more (--top N shows more)`));
  out.push('');
  const note =
    'Start at the top: each row is one element whose loss alone costs the most R. A row that cuts sites off ' +
    'is a single point of failure. A duct is one event: declare risk_groups for links that share one.';
  for (const l of wrap(note, width)) out.push(c.dim(l));
  for (const l of wrap(`Caution: ${CAUTION}`, width)) out.push(c.dim(l));
  return out.join('\n') + '\n';
}

const HELP = `Usage: netbrace explain FILE [--metric ID]... [--top N] [--kind K] [--policy FILE] [--max-work W] [--json]

The planner's to-do list: removes every site, every link and every shared-risk group
(a duct: all its links at once) on its own, computes R on what is left, and ranks them
by the R they leave, worst first. Each row gives the element's line in FILE, the R it
leaves, the drop from the intact R, and the sites it cuts off from the largest part.

The policy is check's: --policy FILE, else ${DEFAULT_POLICY_PATH} at the root of the git
repository that holds the working directory (outside git: in the working directory), else
the built-in policy. R is the --metric options (equal weights), else the policy's r-value for
FILE. The work is held to the policy's budget for FILE (or --max-work): on a design too big
to rank in full, single points of failure come first, then shared-risk groups, then the
sites and links that touch the most links, and the output says how many were left out.
Hardened elements are never removed.

Options:
  --metric ID    a metric for R (repeat for an equal-weight mean); one of:
                 ${knownMetrics.map((m) => m.id).join(', ')}
  --top N        show the N worst rows (default 15; --json lists all)
  --kind K       node, link, group or all (default all)
  --policy FILE  the policy file (default ${DEFAULT_POLICY_PATH} at the repository root, if present)
  --max-work W   work budget in element visits (default: the policy's budget for FILE)
  --format F     read FILE as F (${FORMAT_CHOICES}) instead of by extension
  --json         print the ranking as JSON: {file, r, intact, evaluated, hardened, elements,
                 reduced (when the budget left losses out)}

Examples:
  netbrace explain designs/backbone.net.yaml
  netbrace explain designs/backbone.net.yaml --metric largest_component --top 5
  netbrace explain core.graphml --kind link --json | jq '.elements[0]'
  netbrace explain big.graphml --max-work 1e10      rank more of a big design

Exit codes:
  0  the ranking was printed
  1  FILE could not be read (the message gives file:line:col), or R cannot be computed
     on it (a metric that needs demands or link lengths the design does not have)
  2  usage or configuration error (bad option, unknown metric, broken policy)
`;

export const explainCommand: Command = {
  name: 'explain',
  summary: 'rank the sites, links and ducts whose single loss hurts R most (with their lines)',
  help: HELP,
  async run(args: string[], io: CommandIO): Promise<number> {
    const parsed = parseCommandArgs('explain', args, {
      metric: { type: 'string', multiple: true },
      top: { type: 'string' },
      kind: { type: 'string' },
      policy: { type: 'string' },
      'max-work': { type: 'string' },
      format: { type: 'string' },
      json: { type: 'boolean' },
    });
    const [file, ...extra] = parsed.positionals;
    if (file === undefined)
      throw new UsageError('explain needs a design FILE', 'netbrace explain designs/backbone.net.yaml');
    if (extra.length)
      throw new UsageError(`explain takes one FILE, got ${parsed.positionals.length}`, 'run it once per file');
    const top = wholeNumber('--top', parsed.values.top, 1) ?? 15;
    const kindArg = parsed.values.kind ?? 'all';
    if (!['node', 'link', 'group', 'all'].includes(kindArg)) {
      throw new UsageError(`--kind must be node, link, group or all, not "${kindArg}"`);
    }
    const kinds = kindArg === 'all' ? KINDS : [kindArg as ElementKind];
    const options: ReadDesignOptions = { cwd: io.cwd };
    if (parsed.values.format !== undefined) options.format = parseFormatName(parsed.values.format);

    const maxWorkArg = finiteNumber('--max-work', parsed.values['max-work'], (x) => x > 0, 'a number > 0');

    const local = await readLocalPolicy(io, parsed.values.policy);
    const fp = designPolicy(local, io, file);
    const { spec, source } = metricR(parsed.values.metric ?? []) ?? {
      spec: policyR(fp, fp.seed),
      source: local.source,
    };
    // The same budget arithmetic as the gate's (policy/budget.ts).
    const maxWork = maxWorkArg !== undefined ? budgetWork({ visits: maxWorkArg }) : fp.budget.maxWork;
    if (options.format === undefined && fp.format) options.format = fp.format; // as the gate reads it
    const t = readDesign(file, options);
    const g = compileTopology(t);
    // A metric the design cannot support would rank every loss at R 0: refuse, naming what is missing.
    const unsupported = unsupportedMetric(g, spec);
    if (unsupported) throw new DesignError(unsupported.message, { file }, unsupported.hint);
    const total = [...planSingleLosses(g, spec, kinds, maxWork).units.values()].reduce((s, u) => s + u.size, 0);
    const progress = createProgress(io, { label: `explain ${file}`, total });
    let x: Explanation;
    try {
      x = explainDesign(t, spec, source, kinds, progress, g, maxWork);
    } finally {
      progress.finish();
    }
    if (parsed.values.json) io.stdout(`${JSON.stringify(x, null, 2)}\n`);
    else io.stdout(formatExplanation(x, top, colorEnabled(io), terminalWidth(io)));
    return 0;
  },
};
