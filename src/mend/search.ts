// What would mend a failing design: the smallest, cheapest sets of added links (and, as the
// alternative, elements to harden) that remove the design's failing and warning findings,
// each judged by the policy's own engine on the mended design.
//
//   1. Targets: new bridges and cut nodes, floors fallen short and weakenings (severity fail or
//      warn) — what a change to the design can fix.
//   2. Bounds: the Eswaran–Tarjan number of links (bridge-tree.ts), for the new bridges and
//      for every bridge of the design.
//   3. Structure first (cover.ts): the fewest candidate links after which no target bridge or
//      cut node is one any more, the cheapest few of that size.
//   4. The engine: each of those sets is applied to the design and judged exactly as `check`
//      judges it (same policy, seed, budget and pairing with the base: common random numbers,
//      so the delta is the effect of the links and not of new dice).
//   5. When none holds, a greedy search on R̄: the candidates ranked by Ghosh & Boyd's
//      algebraic-connectivity gradient (fiedler.ts), the top GREEDY_POOL judged by the engine,
//      the best kept (first fewer failures, then R̄ gained per km), until the design holds,
//      the link limit is reached or the evaluations run out.
//   6. Hardening: the same judgement with the target elements marked hardened.
// R̄ is the mean area of the policy's random-failure envelopes (each the mean of its median R
// over the grid), else of its attack curves: one number for "how robust", in the policy's R.
// The suggestions are ranked: those that hold, then by targets fixed, then by R̄ gained per
// km (or cost unit, or link). Deterministic: every step is ordered, ties go to the lower index.

import type { CompactGraph } from '../graph/compact.js';
import type { FileReport, Finding } from '../report/report.js';
import type { ReportElement } from '../graph/element.js';
import type { Topology } from '../topology/model.js';
import type { Change } from './apply.js';
import { eswaranTarjanBound } from './bridge-tree.js';
import { price, type Candidate, type CandidateSet } from './candidates.js';
import { solveCover } from './cover.js';
import { fiedler, ghoshBoydScore } from './fiedler.js';
import type { MendLink, MendReport, MendRequirement, MendSuggestion, MendTarget } from './types.js';

/** Most links one suggestion adds when the policy does not say (see MendContext.maxLinks). */
export const DEFAULT_MAX_LINKS = 3;
/** Candidates judged by the engine per greedy step. */
export const GREEDY_POOL = 3;
/** Structural sets judged by the engine. */
export const STRUCTURAL_KEEP = 3;
/** Link suggestions kept in the report. */
export const SUGGESTIONS_KEPT = 5;
/** Above this many sites candidates are not ranked by Ghosh–Boyd (the eigenvector costs too much); ties then go by price. */
export const FIEDLER_LIMIT = 20_000;

export const R_DEFINITION =
  'R\u0304: the mean area of the policy\u2019s random-failure envelopes (the mean of each median R over its grid); without envelopes, of its attack curves';

const FIXABLE = new Set<Finding['rule']>([
  'new-bridge',
  'new-cut-node',
  'r-threshold',
  'area-floor',
  'spread-ceiling',
  'n-1',
  'regression',
]);

export interface MendContext {
  /** The head design as parsed, and compiled. */
  topology: Topology;
  graph: CompactGraph;
  /** The head's judged report (compareDesign). */
  report: FileReport;
  candidates: CandidateSet;
  /** Most links one suggestion may add; default: DEFAULT_MAX_LINKS, or one more than the Eswaran–Tarjan bound of the new bridges when that is larger. */
  maxLinks?: number;
  /** Most engine evaluations the search may run (the hardening alternative included). */
  maxEvaluations: number;
  /** The design with a change applied, judged as `check` judges it. */
  judge: (change: Change) => Promise<FileReport>;
  /** Candidate file path (for the report). */
  candidatePath?: string;
  notes?: string[];
}

/** A finding's stable key: spof findings by element, value findings by requirement. */
export function targetKey(f: Pick<Finding, 'rule' | 'requirement' | 'elements'>): string {
  if (f.rule === 'new-bridge' || f.rule === 'new-cut-node')
    return `${f.rule}|${f.elements.map((e) => e.id).join('\u0000')}`;
  return `${f.rule}|${f.requirement ?? ''}`;
}

/** The findings a change to the design can fix: severity fail or warn, on a requirement that fell short or weakened. */
export function mendTargets(report: FileReport): MendTarget[] {
  const rows = new Map(report.requirements.map((r) => [r.id, r]));
  const out: MendTarget[] = [];
  const seen = new Set<string>();
  for (const f of report.findings) {
    if (f.severity === 'notice' || !FIXABLE.has(f.rule)) continue;
    if (f.rule !== 'new-bridge' && f.rule !== 'new-cut-node') {
      const row = f.requirement ? rows.get(f.requirement) : undefined;
      if (!row || (row.status !== 'short' && row.status !== 'weakened')) continue;
    }
    const key = targetKey(f);
    if (seen.has(key)) continue;
    seen.add(key);
    const t: MendTarget = {
      key,
      rule: f.rule,
      severity: f.severity,
      message: f.message,
      elements: f.elements,
      line: f.line,
    };
    if (f.requirement !== undefined) t.requirement = f.requirement;
    out.push(t);
  }
  return out;
}

/** R̄ of a judged design (see the header); null when the policy evaluates neither envelopes nor attacks. */
export function meanArea(report: FileReport): number | null {
  const head = report.head;
  if (!head) return null;
  const areas = head.envelopes.length > 0 ? head.envelopes.map((e) => e.area) : head.attacks.map((a) => a.area);
  const finite = areas.filter(Number.isFinite);
  return finite.length ? finite.reduce((s, a) => s + a, 0) / finite.length : null;
}

/** Latency of a new link from the design's own links: a least-squares line through latency against length. */
export function latencyModel(t: Topology): ((km: number) => number) | null {
  if (t.links.length === 0 || !t.links.every((l) => l.latency !== undefined)) return null;
  const pts = t.links
    .filter((l) => l.length !== undefined && l.latency !== undefined)
    .map((l) => [l.length!, l.latency!] as const);
  if (pts.length < 2) return null;
  const n = pts.length;
  const mx = pts.reduce((s, p) => s + p[0], 0) / n;
  const my = pts.reduce((s, p) => s + p[1], 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (const [x, y] of pts) {
    sxx += (x - mx) * (x - mx);
    sxy += (x - mx) * (y - my);
  }
  const slope = sxx > 0 ? Math.max(0, sxy / sxx) : 0;
  const intercept = Math.max(0, my - slope * mx);
  return (km) => Math.round((intercept + slope * km) * 1000) / 1000;
}

interface Judged {
  report: FileReport;
  change: Change;
  candidates: number[];
}

export async function mendDesign(ctx: MendContext): Promise<MendReport> {
  const g = ctx.graph;
  const cand = ctx.candidates;
  const targets = mendTargets(ctx.report);
  const notes = [...(ctx.notes ?? []), ...cand.notes];
  const bridgeTargets: number[] = [];
  const cutTargets: number[] = [];
  for (const t of targets) {
    for (const e of t.elements) {
      if (t.rule === 'new-bridge' && e.kind === 'link') {
        const i = g.linkIndex.get(e.id);
        if (i !== undefined && !bridgeTargets.includes(i)) bridgeTargets.push(i);
      } else if (t.rule === 'new-cut-node' && e.kind === 'node') {
        const v = g.nodeIndex.get(e.id);
        if (v !== undefined && !cutTargets.includes(v)) cutTargets.push(v);
      }
    }
  }
  const out: MendReport = {
    targets,
    rDefinition: R_DEFINITION,
    bounds: { allBridges: eswaranTarjanBound(g) },
    candidates: {
      source: cand.source,
      ...(ctx.candidatePath !== undefined ? { path: ctx.candidatePath } : {}),
      count: cand.list.length,
      ...(cand.routeFactor !== undefined ? { routeFactor: cand.routeFactor } : {}),
      ...(cand.maxKm !== undefined ? { maxKm: cand.maxKm } : {}),
    },
    suggestions: [],
    evaluations: 0,
    notes,
  };
  if (bridgeTargets.length > 0) out.bounds.newBridges = eswaranTarjanBound(g, bridgeTargets);
  const maxLinks = ctx.maxLinks ?? Math.max(DEFAULT_MAX_LINKS, (out.bounds.newBridges?.links ?? 0) + 1);
  if (targets.length === 0) {
    notes.push('nothing to mend: no failing or warning finding that a change to the design can fix');
    return out;
  }

  const rBefore = meanArea(ctx.report);
  const latency = latencyModel(ctx.topology);
  const usedIds = new Set(g.linkIds);
  const linkFor = (c: Candidate, taken: Set<string>): MendLink => {
    const a = g.nodeIds[c.a];
    const b = g.nodeIds[c.b];
    let id = c.id ?? `${a}-${b}`;
    for (let k = 2; usedIds.has(id) || taken.has(id); k++) id = `${c.id ?? `${a}-${b}`}-${k}`;
    taken.add(id);
    const l: MendLink = { id, between: [a, b], source: c.source };
    if (c.lengthKm !== undefined) l.lengthKm = c.lengthKm;
    if (c.latencyMs !== undefined) l.latencyMs = c.latencyMs;
    else if (latency && c.lengthKm !== undefined) {
      l.latencyMs = latency(c.lengthKm);
      l.latencyEstimated = true;
    }
    if (c.cost !== undefined) l.cost = c.cost;
    if (c.riskGroups) l.riskGroups = [...c.riskGroups];
    if (c.line !== undefined) l.line = c.line;
    return l;
  };
  const changeFor = (set: readonly number[]): Change => {
    const taken = new Set<string>();
    return { links: set.map((i) => linkFor(cand.list[i], taken)), harden: [] };
  };

  const cache = new Map<string, Judged>();
  const judgeSet = async (set: number[], change: Change = changeFor(set)): Promise<Judged | null> => {
    const key = change.links.length
      ? [...set].sort((a, b) => a - b).join(',')
      : `harden:${change.harden.map((e) => `${e.kind}:${e.id}`).join(',')}`;
    const hit = cache.get(key);
    if (hit) return hit;
    if (out.evaluations >= ctx.maxEvaluations) return null;
    out.evaluations++;
    const judged: Judged = { report: await ctx.judge(change), change, candidates: [...set] };
    cache.set(key, judged);
    return judged;
  };

  const prices = cand.list.map((c) => price(c, cand.unit));
  const pairs = cand.list.map((c) => [c.a, c.b] as const);
  const ranked = g.n <= FIEDLER_LIMIT;
  if (!ranked) notes.push(`more than ${FIEDLER_LIMIT} sites: candidates are not ranked by algebraic connectivity`);
  const scoreOf = (extra: readonly number[]) => {
    if (!ranked) return pairs.map(() => 0);
    const f = fiedler(
      g,
      extra.map((c) => pairs[c]),
    );
    return pairs.map(([a, b]) => ghoshBoydScore(f, a, b));
  };
  const scores = scoreOf([]);
  // Keep one evaluation for the hardening alternative.
  const hardenTargets = hardenSet(targets);
  const linkBudget = () => ctx.maxEvaluations - (hardenTargets.length > 0 ? 1 : 0);
  const judgedSets: { judged: Judged; method: string }[] = [];

  let start: number[][] = [[]];
  let structuralMethod = '';
  let structuralFailed = false;
  if ((bridgeTargets.length > 0 || cutTargets.length > 0) && cand.list.length > 0) {
    const cover = solveCover({
      g,
      pairs,
      price: prices,
      score: scores,
      bridges: bridgeTargets,
      cutNodes: cutTargets,
      maxLinks,
      keep: STRUCTURAL_KEEP,
    });
    if (cover.sets.length === 0) {
      notes.push(`no link suggestion removes every new bridge and cut site: ${cover.reason}`);
      structuralFailed = true;
    } else {
      const size = cover.sets[0].length;
      const bound = out.bounds.newBridges?.links;
      structuralMethod =
        `removes the new single points of failure with ${size} link${size === 1 ? '' : 's'}` +
        (cover.minimal
          ? bound !== undefined && size === bound
            ? `, the fewest possible (the Eswaran\u2013Tarjan bound is ${bound})`
            : ', the fewest the candidates allow'
          : ` (the smallest found; the search stopped at its limit, the Eswaran\u2013Tarjan bound is ${bound ?? cover.lowerBound})`);
      start = cover.sets;
    }
  } else if (bridgeTargets.length > 0 || cutTargets.length > 0) {
    notes.push('there are no candidate links to try');
  }

  // Without a structural fix the design cannot hold: links are not searched further.
  if (cand.list.length > 0 && !structuralFailed) {
    for (const set of start) {
      if (set.length === 0) continue;
      if (out.evaluations >= linkBudget()) break;
      const j = await judgeSet(set);
      if (j) judgedSets.push({ judged: j, method: `${structuralMethod}; judged by the engine` });
    }
    // Greedy on R̄ from the best structural set (or from nothing) while nothing holds.
    const better = (a: Judged, b: Judged) => compareJudged(a, b, targets, rBefore, prices, cand.unit) < 0;
    let current: Judged | null = null;
    for (const { judged } of judgedSets) if (!current || better(judged, current)) current = judged;
    const holds = (j: Judged | null) => j !== null && !fails(j.report);
    let step = 0;
    while (!holds(current) && out.evaluations < linkBudget()) {
      const base = current?.candidates ?? (start[0].length === 0 ? [] : start[0]);
      if (base.length >= maxLinks) break;
      const stepScores = base.length ? scoreOf(base) : scores;
      const inSet = new Set(base);
      const pool = cand.list
        .map((_, c) => c)
        .filter((c) => !inSet.has(c))
        .map((c) => ({ c, s: stepScores[c] }))
        .sort((x, y) => y.s - x.s || prices[x.c] - prices[y.c] || x.c - y.c)
        .slice(0, GREEDY_POOL);
      if (pool.length === 0) break;
      let best: Judged | null = null;
      step++;
      for (const { c } of pool) {
        if (out.evaluations >= linkBudget()) break;
        const j = await judgeSet([...base, c]);
        if (!j) break;
        judgedSets.push({
          judged: j,
          method: `${base.length ? `${structuralMethod ? 'the structural set' : 'the set so far'} plus ` : ''}a link ranked by Ghosh\u2013Boyd (greedy step ${step}); judged by the engine`,
        });
        if (!best || better(j, best)) best = j;
      }
      if (!best || (current && !better(best, current))) break;
      current = best;
    }
    if (!holds(current) && out.evaluations >= linkBudget())
      notes.push(`the search stopped after ${out.evaluations} engine evaluations (its limit)`);
  } else if (targets.some((t) => t.rule !== 'new-bridge' && t.rule !== 'new-cut-node')) {
    notes.push('there are no candidate links to try');
  }

  const suggestions: MendSuggestion[] = [];
  const seenLinks = new Set<string>();
  for (const { judged, method } of judgedSets) {
    const key = [...judged.candidates].sort((a, b) => a - b).join(',');
    if (seenLinks.has(key)) continue;
    seenLinks.add(key);
    const s = suggestion(judged, 'links', method, targets, ctx.report, rBefore, prices, cand.unit);
    if (s.fixes.length > 0 || s.holds) suggestions.push(s);
  }
  suggestions.sort((a, b) => rankSuggestions(a, b));
  out.suggestions = suggestions.slice(0, SUGGESTIONS_KEPT);

  if (hardenTargets.length > 0) {
    const j = await judgeSet([], { links: [], harden: hardenTargets });
    if (j) {
      out.suggestions.push(
        suggestion(
          j,
          'harden',
          'harden the elements of the new single points of failure (they then never fail in any challenge); judged by the engine',
          targets,
          ctx.report,
          rBefore,
          prices,
          cand.unit,
        ),
      );
    }
  }
  return out;
}

/** The target elements a hardening would cover: new bridges and cut nodes. */
function hardenSet(targets: readonly MendTarget[]): ReportElement[] {
  const out: ReportElement[] = [];
  const seen = new Set<string>();
  for (const t of targets) {
    if (t.rule !== 'new-bridge' && t.rule !== 'new-cut-node') continue;
    for (const e of t.elements) {
      const k = `${e.kind}:${e.id}`;
      if (seen.has(k)) continue;
      seen.add(k);
      out.push(e);
    }
  }
  return out;
}

function fails(r: FileReport): boolean {
  return r.status === 'unreadable' || r.findings.some((f) => f.severity === 'fail');
}

function remaining(r: FileReport, targets: readonly MendTarget[]): string[] {
  const present = new Set(r.findings.filter((f) => f.severity !== 'notice').map(targetKey));
  return targets.filter((t) => present.has(t.key)).map((t) => t.key);
}

function failCount(r: FileReport): number {
  return r.findings.filter((f) => f.severity === 'fail').length;
}

function totalOf(set: readonly number[], prices: readonly number[], unit: CandidateSet['unit']): number | null {
  if (unit === 'link') return set.length;
  return Math.round(set.reduce((s, c) => s + prices[c], 0) * 1000) / 1000;
}

function gain(r: FileReport, rBefore: number | null, total: number | null): number | null {
  const after = meanArea(r);
  if (after === null || rBefore === null || total === null || !(total > 0)) return null;
  return (after - rBefore) / total;
}

/** Negative when a is the better step: fewer failures, fewer targets left, more R̄ per unit, cheaper. */
function compareJudged(
  a: Judged,
  b: Judged,
  targets: readonly MendTarget[],
  rBefore: number | null,
  prices: readonly number[],
  unit: CandidateSet['unit'],
): number {
  const fa = failCount(a.report);
  const fb = failCount(b.report);
  if (fa !== fb) return fa - fb;
  const ra = remaining(a.report, targets).length;
  const rb = remaining(b.report, targets).length;
  if (ra !== rb) return ra - rb;
  const ga = gain(a.report, rBefore, totalOf(a.candidates, prices, unit)) ?? -Infinity;
  const gb = gain(b.report, rBefore, totalOf(b.candidates, prices, unit)) ?? -Infinity;
  if (ga !== gb) return gb - ga;
  return (totalOf(a.candidates, prices, unit) ?? 0) - (totalOf(b.candidates, prices, unit) ?? 0);
}

function rankSuggestions(a: MendSuggestion, b: MendSuggestion): number {
  if (a.holds !== b.holds) return a.holds ? -1 : 1;
  if (a.fixes.length !== b.fixes.length) return b.fixes.length - a.fixes.length;
  const ga = a.gainPerUnit ?? -Infinity;
  const gb = b.gainPerUnit ?? -Infinity;
  if (ga !== gb) return gb - ga;
  if ((a.total ?? 0) !== (b.total ?? 0)) return (a.total ?? 0) - (b.total ?? 0);
  const ka = a.links.map((l) => l.id).join(',');
  const kb = b.links.map((l) => l.id).join(',');
  return ka < kb ? -1 : ka > kb ? 1 : 0;
}

function suggestion(
  j: Judged,
  kind: MendSuggestion['kind'],
  method: string,
  targets: readonly MendTarget[],
  before: FileReport,
  rBefore: number | null,
  prices: readonly number[],
  unit: CandidateSet['unit'],
): MendSuggestion {
  const left = remaining(j.report, targets);
  const leftSet = new Set(left);
  const total = kind === 'links' ? totalOf(j.candidates, prices, unit) : j.change.harden.length;
  const rAfter = meanArea(j.report);
  const wanted = new Set(targets.map((t) => t.requirement).filter((r): r is string => r !== undefined));
  const afterRows = new Map(j.report.requirements.map((r) => [r.id, r]));
  const requirements: MendRequirement[] = before.requirements
    .filter((r) => wanted.has(r.id))
    .map((r) => {
      const a = afterRows.get(r.id);
      return {
        id: r.id,
        description: r.description,
        before: r.head,
        after: a?.head ?? null,
        status: a?.status ?? 'unsettled',
      };
    });
  return {
    kind,
    links: [...j.change.links],
    harden: [...j.change.harden],
    total,
    unit: kind === 'harden' ? 'element' : unit,
    fixes: targets.filter((t) => !leftSet.has(t.key)).map((t) => t.key),
    leaves: left,
    status: j.report.status,
    holds: !fails(j.report),
    rBefore,
    rAfter,
    gainPerUnit: rAfter !== null && rBefore !== null && total !== null && total > 0 ? (rAfter - rBefore) / total : null,
    requirements,
    method,
  };
}
