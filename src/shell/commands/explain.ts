// `netbrace explain FILE`: the planner's to-do list. Every single element (site, link, and
// shared-risk group: one duct is one event) is removed on its own, R is taken on what is left
// (the N−1 challenge, exhaustively), and the elements are ranked by the R they leave, worst
// first, each with its line in the design file and the sites it cuts off.

import path from 'node:path';
import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs, wholeNumber } from '../args.js';
import { UsageError } from '../../errors.js';
import { compileTopology, nodesByLine, type CompactGraph } from '../../graph/compact.js';
import { createMask } from '../../graph/mask.js';
import { findComponents, findCutElements } from '../../graph/structure.js';
import { createRValue, type RFunction } from '../../envelope/r-value.js';
import type { ElementKind, RValueSpec } from '../../envelope/types.js';
import { eligibleUnits, removeUnit, restoreUnit, unitCount, unitIds } from '../../challenges/units.js';
import { getMetric, isMetricId, metrics as knownMetrics } from '../../metrics/registry.js';
import { builtinPolicy, loadPolicy, policyForFile, DEFAULT_POLICY_PATH } from '../../policy/resolve.js';
import { parseFormatName, FORMAT_CHOICES } from '../../topology/detect.js';
import type { Topology } from '../../topology/model.js';
import { CAUTION } from '../../report/report.js';
import { wrap } from '../../report/terminal.js';
import { readDesign, type ReadDesignOptions } from '../read-design.js';
import { readInsideSync } from '../workspace.js';
import { createProgress, type Progress } from '../progress.js';
import { colorEnabled, terminalWidth } from '../color.js';
import { createColors } from 'picocolors';

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
): { intact: number; evaluated: Record<ElementKind, number>; hardened: Record<ElementKind, number>; ranked: Omit<SingleLoss, 'rank' | 'label'>[] } {
  const mask = createMask(g);
  const intact = rfn(mask);
  const cuts = findCutElements(g);
  const bridge = new Set(cuts.bridges);
  const cutNode = new Set(cuts.cutNodes);
  const evaluated: Record<ElementKind, number> = { node: 0, link: 0, group: 0 };
  const hardened: Record<ElementKind, number> = { node: 0, link: 0, group: 0 };
  const eligible = new Map(kinds.map((k) => [k, eligibleUnits(g, k)]));
  let total = 0;
  for (const k of kinds) for (const e of eligible.get(k)!) total += e;
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
  out.sort((a, b) => a.r - b.r || kinds.indexOf(a.kind) - kinds.indexOf(b.kind) || a.line - b.line || a.order - b.order);
  return { intact, evaluated, hardened, ranked: out.map(({ order: _order, ...rest }) => rest) };
}

/** R's definition: --metric ids, else the policy that applies to this file, else the built-in one. */
function resolveR(file: string, metricIds: string[], policyPath: string | undefined, io: CommandIO): { spec: RValueSpec; source: string } {
  if (metricIds.length) {
    for (const id of metricIds) {
      if (!isMetricId(id)) getMetric(id); // throws the UsageError that lists the known ids
    }
    return {
      spec: { metrics: metricIds.map((id) => ({ id: id as RValueSpec['metrics'][number]['id'], weight: 1 })), combine: 'mean' },
      source: metricIds.length === 1 ? '--metric' : '--metric (equal weights)',
    };
  }
  // The policy and the files it extends: inside the working directory, links included.
  const read = (p: string) => readInsideSync(io.cwd, p);
  const chosen = policyPath ?? (read(DEFAULT_POLICY_PATH) !== null ? DEFAULT_POLICY_PATH : undefined);
  if (chosen === undefined) return { spec: builtinPolicy().rValue, source: 'the built-in policy' };
  if (policyPath !== undefined && read(policyPath) === null) {
    throw new UsageError(`policy file ${policyPath} not found`, 'give a path relative to the working directory');
  }
  const policy = loadPolicy(chosen, read);
  const rel = path.relative(io.cwd, path.resolve(io.cwd, file)).split(path.sep).join('/');
  return { spec: policyForFile(policy, rel).rValue, source: `policy ${chosen}` };
}

export function explainDesign(
  t: Topology,
  spec: RValueSpec,
  source: string,
  kinds: readonly ElementKind[] = KINDS,
  progress?: Progress,
  g: CompactGraph = compileTopology(t),
): Explanation {
  const rfn = createRValue(g, spec, t.latencyBudget !== undefined ? { latencyBudget: t.latencyBudget } : undefined);
  const res = rankSingleLosses(g, rfn, kinds, (done) => progress?.update(done));
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
  };
}

const r4 = (v: number) => v.toFixed(4);
const KIND_WORD: Record<ElementKind, string> = { node: 'site', link: 'link', group: 'duct/group' };

/** The human view: a ranked table, worst first. */
export function formatExplanation(x: Explanation, top: number, color: boolean, width: number): string {
  const c = createColors(color);
  const metrics = x.r.metrics.map((m) => `${m.id}${x.r.metrics.length > 1 ? ` ${m.weight}` : ''}`).join(', ');
  const out: string[] = [];
  out.push(c.bold(`${x.file} \u2014 single losses ranked by the R they leave`));
  out.push(c.dim(`R = ${x.r.combine === 'min' ? 'minimum' : x.r.metrics.length > 1 ? 'weighted mean' : 'normalized'} of ${metrics} (from ${x.rSource})`));
  const hard = KINDS.filter((k) => x.hardened[k] > 0).map((k) => `${x.hardened[k]} ${KIND_WORD[k]}${x.hardened[k] === 1 ? '' : 's'}`);
  out.push(
    `intact R ${r4(x.intact)} \u00b7 evaluated ${x.evaluated.node} sites, ${x.evaluated.link} links, ${x.evaluated.group} shared-risk groups` +
      (hard.length ? ` \u00b7 hardened, not removed: ${hard.join(', ')}` : ''),
  );
  out.push('');
  const rows = x.elements.slice(0, top);
  const shown = (e: SingleLoss) => (e.label && e.label.toLowerCase() !== e.id.toLowerCase() ? `${e.id} (${e.label})` : e.id);
  const idW = Math.min(34, Math.max(7, ...rows.map((e) => shown(e).length)));
  out.push(c.bold(`${'#'.padStart(3)}  ${'kind'.padEnd(10)}  ${'element'.padEnd(idW)}  ${'line'.padStart(5)}  ${'R left'.padStart(7)}  ${'drop'.padStart(7)}  cuts off`));
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
  if (x.elements.length > rows.length) out.push(c.dim(`  \u2026 ${x.elements.length - rows.length} more (--top N shows more)`));
  out.push('');
  const note =
    'Start at the top: each row is one element whose loss alone costs the most R. A row that cuts sites off ' +
    'is a single point of failure. A duct is one event: declare risk_groups for links that share one.';
  for (const l of wrap(note, width)) out.push(c.dim(l));
  for (const l of wrap(`Caution: ${CAUTION}`, width)) out.push(c.dim(l));
  return out.join('\n') + '\n';
}

const HELP = `Usage: netbrace explain FILE [--metric ID]... [--top N] [--kind K] [--policy FILE] [--json]

The planner's to-do list: removes every site, every link and every shared-risk group
(a duct: all its links at once) on its own, computes R on what is left, and ranks them
by the R they leave, worst first. Each row gives the element's line in FILE, the R it
leaves, the drop from the intact R, and the sites it cuts off from the largest part.

R is defined by, in this order: the --metric options (equal weights); the policy's
r-value for FILE (--policy FILE, else ${DEFAULT_POLICY_PATH} in the working directory, if
present); the built-in policy. Hardened elements are never removed.

Options:
  --metric ID    a metric for R (repeat for an equal-weight mean); one of:
                 ${knownMetrics.map((m) => m.id).join(', ')}
  --top N        show the N worst rows (default 15; --json lists all)
  --kind K       node, link, group or all (default all)
  --policy FILE  the policy file whose r-value applies (default ${DEFAULT_POLICY_PATH} if present)
  --format F     read FILE as F (${FORMAT_CHOICES}) instead of by extension
  --json         print the ranking as JSON: {file, r, intact, evaluated, hardened, elements}

Examples:
  netbrace explain designs/backbone.net.yaml
  netbrace explain designs/backbone.net.yaml --metric largest_component --top 5
  netbrace explain core.graphml --kind link --json | jq '.elements[0]'

Exit codes:
  0  the ranking was printed
  1  FILE could not be read (the message gives file:line:col)
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
      format: { type: 'string' },
      json: { type: 'boolean' },
    });
    const [file, ...extra] = parsed.positionals;
    if (file === undefined) throw new UsageError('explain needs a design FILE', 'netbrace explain designs/backbone.net.yaml');
    if (extra.length) throw new UsageError(`explain takes one FILE, got ${parsed.positionals.length}`, 'run it once per file');
    const top = wholeNumber('--top', parsed.values.top, 1) ?? 15;
    const kindArg = parsed.values.kind ?? 'all';
    if (!['node', 'link', 'group', 'all'].includes(kindArg)) {
      throw new UsageError(`--kind must be node, link, group or all, not "${kindArg}"`);
    }
    const kinds = kindArg === 'all' ? KINDS : [kindArg as ElementKind];
    const options: ReadDesignOptions = { cwd: io.cwd };
    if (parsed.values.format !== undefined) options.format = parseFormatName(parsed.values.format);

    const { spec, source } = resolveR(file, parsed.values.metric ?? [], parsed.values.policy, io);
    const t = readDesign(file, options);
    const g = compileTopology(t);
    const total = kinds.reduce((s, k) => s + unitCount(g, k), 0);
    const progress = createProgress(io, { label: `explain ${file}`, total });
    let x: Explanation;
    try {
      x = explainDesign(t, spec, source, kinds, progress, g);
    } finally {
      progress.finish();
    }
    if (parsed.values.json) io.stdout(`${JSON.stringify(x, null, 2)}\n`);
    else io.stdout(formatExplanation(x, top, colorEnabled(io), terminalWidth(io)));
    return 0;
  },
};
