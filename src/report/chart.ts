// The envelope chart: which series one chart shows (band, median, targeted attacks, the
// worst case, the base's median) and a pure SVG builder for it. The terminal chart reads the
// same series, so both views always show the same thing.

import type { AttackCurve, Envelope } from '../envelope/types.js';
import type { Evaluation } from './report.js';
import { escapeHtml } from './escape.js';
import { challengeLabel, formatFraction, formatValue, kindPlural, kindSingular, xAxisLabel } from './labels.js';

export interface ChartPoint {
  x: number;
  y: number;
}

export type SeriesRole = 'band' | 'median' | 'attack' | 'worst-case' | 'base-median';

export interface ChartSeries {
  role: SeriesRole;
  /** Stable id within the chart: "band", "median", "attack:degree", "worst-case", "base-median". */
  id: string;
  label: string;
  /** The line; for the band, its lower edge. */
  points: ChartPoint[];
  /** The band's upper edge. */
  upper?: ChartPoint[];
}

export interface EnvelopeChart {
  title: string;
  xLabel: string;
  xUnit: 'fraction' | 'km';
  xMax: number;
  series: ChartSeries[];
  /** One or two sentences for screen readers: what is drawn and the key values. */
  summary: string;
}

const zip = (x: readonly number[], y: readonly number[]): ChartPoint[] =>
  x.map((xi, i) => ({ x: xi, y: y[i] })).filter((p) => Number.isFinite(p.y));

/** The band's quantile curve, falling back to min/max when the quantile is not stored. */
function bandEdge(env: Envelope, q: number, fallback: number[]): number[] {
  const hit = env.quantiles[String(q)] ?? Object.entries(env.quantiles).find(([k]) => Number(k) === q)?.[1];
  return hit ? hit.value : fallback;
}

/** Clip a curve to [0, xMax], interpolating the last point so lines end at the chart's edge. */
function clip(points: ChartPoint[], xMax: number): ChartPoint[] {
  const out: ChartPoint[] = [];
  for (let i = 0; i < points.length; i++) {
    const p = points[i];
    if (p.x <= xMax + 1e-12) {
      out.push(p);
      continue;
    }
    const prev = points[i - 1];
    if (prev && prev.x < xMax) {
      const t = (xMax - prev.x) / (p.x - prev.x);
      out.push({ x: xMax, y: prev.y + t * (p.y - prev.y) });
    }
    break;
  }
  return out;
}

/** How many elements of a kind the design has, for placing worst-case steps on the x axis. */
function elementCount(ev: Evaluation, env: Envelope): number {
  if (env.kind === 'node') return ev.structure.nodes;
  if (env.kind === 'link') return ev.structure.links;
  const groupAttack = ev.attacks.find((a) => a.kind === 'group' && a.x.length > 1 && a.x[1] > 0);
  return groupAttack ? Math.round(1 / groupAttack.x[1]) : 0;
}

/** The attacks drawn on an envelope's chart: same element kind, fraction axis. */
export function attacksFor(env: Envelope, ev: Evaluation): AttackCurve[] {
  return env.xUnit === 'fraction' ? ev.attacks.filter((a) => a.kind === env.kind) : [];
}

/** The series of one envelope's chart, head side, with the base's median when it exists. */
export function envelopeChart(env: Envelope, head: Evaluation, base?: Evaluation): EnvelopeChart {
  const xMax = env.x.length ? env.x[env.x.length - 1] : 1;
  const [qLo, qHi] = env.band;
  const series: ChartSeries[] = [];
  const lo = bandEdge(env, qLo, env.min);
  const hi = bandEdge(env, qHi, env.max);
  const bandName = `${Math.round(qLo * 100)}\u2013${Math.round(qHi * 100)} % band`;
  series.push({ role: 'band', id: 'band', label: bandName, points: zip(env.x, lo), upper: zip(env.x, hi) });
  series.push({ role: 'median', id: 'median', label: 'median', points: zip(env.x, env.median) });
  for (const a of attacksFor(env, head)) {
    series.push({
      role: 'attack',
      id: `attack:${a.challenge}`,
      label: challengeLabel(a.challenge),
      points: clip(zip(a.x, a.values), xMax),
    });
  }
  const wc = env.worstCase;
  const count = elementCount(head, env);
  if (wc && wc.values.length > 0 && (env.xUnit === 'fraction' ? count > 0 : false)) {
    const start = env.median.length ? env.median[0] : wc.values[0];
    const pts = [{ x: 0, y: start }, ...wc.values.map((y, i) => ({ x: (i + 1) / count, y }))];
    series.push({
      role: 'worst-case',
      id: 'worst-case',
      label: `worst case found (${wc.method}, ${wc.k} ${wc.k === 1 ? kindSingular(wc.kind) : kindPlural(wc.kind)})`,
      points: clip(pts, xMax),
    });
  }
  const baseEnv = base?.envelopes.find((b) => b.challenge === env.challenge && b.kind === env.kind);
  if (baseEnv) {
    series.push({
      role: 'base-median',
      id: 'base-median',
      label: 'base median',
      points: clip(zip(baseEnv.x, baseEnv.median), xMax),
    });
  }
  return {
    title: `R under ${challengeLabel(env.challenge)}`,
    xLabel: xAxisLabel(env.kind, env.xUnit),
    xUnit: env.xUnit,
    xMax,
    series,
    summary: describe(env, series, xMax),
  };
}

function describe(env: Envelope, series: ChartSeries[], xMax: number): string {
  const at = (xs: number) => (env.xUnit === 'km' ? `${xs} km` : formatFraction(xs));
  const med = series.find((s) => s.role === 'median')?.points ?? [];
  const parts = [
    `Envelope of R over ${env.realizations} realizations (seed ${env.seed}) from ${at(0)} to ${at(xMax)} ${env.xUnit === 'km' ? 'radius' : 'removed'}.`,
  ];
  if (med.length) parts.push(`Median R falls from ${formatValue(med[0].y)} to ${formatValue(med[med.length - 1].y)}.`);
  for (const s of series) {
    if (s.role === 'attack' || s.role === 'worst-case' || s.role === 'base-median') {
      const last = s.points[s.points.length - 1];
      if (last) parts.push(`${capital(s.label)}: R ${formatValue(last.y)} at ${at(last.x)}.`);
    }
  }
  return parts.join(' ');
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

// --- SVG ------------------------------------------------------------------------------

/** Our palette: deep teal median over a sea-glass band; warm, dashed attack lines. */
export const CHART_COLORS = {
  band: '#a9d3cb',
  bandEdge: '#6faea3',
  median: '#0d4f5c',
  base: '#6d6a64',
  worst: '#b3141f',
  attacks: ['#c2620a', '#7b3f98', '#a31d4f', '#52711e', '#1d5fa3', '#8a6d00'],
  ink: '#22303a',
  grid: '#d9d4c7',
};
const ATTACK_DASH = ['7 3', '2 3', '10 3 2 3', '4 2 1 2', '12 4', '1 2'];

export interface SvgOptions {
  /** Prefix for element ids, unique within the page. */
  idPrefix?: string;
  width?: number;
}

const esc = (s: string) => escapeHtml(s);
const num = (v: number) => (Math.round(v * 10) / 10).toString();

/** The chart as one standalone SVG element (inline attributes only, so it survives copying). */
export function renderChartSvg(chart: EnvelopeChart, options: SvgOptions = {}): string {
  const id = options.idPrefix ?? 'nb-chart';
  const width = options.width ?? 600;
  const plotH = 240;
  const m = { left: 56, right: 20, top: 18, bottom: 48 };
  const legendItems = chart.series.length;
  const legendCols = 2;
  const legendRowH = 20;
  const legendH = Math.ceil(legendItems / legendCols) * legendRowH + 8;
  const height = m.top + plotH + m.bottom + legendH;
  const plotW = width - m.left - m.right;
  const xMax = chart.xMax > 0 ? chart.xMax : 1;
  const sx = (x: number) => m.left + (x / xMax) * plotW;
  const sy = (y: number) => m.top + (1 - Math.max(0, Math.min(1, y))) * plotH;
  const line = (pts: ChartPoint[]) => pts.map((p) => `${num(sx(p.x))},${num(sy(p.y))}`).join(' ');

  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="nb-chart" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-labelledby="${id}-title ${id}-desc" data-series-count="${chart.series.length}">`,
  );
  out.push(`<title id="${id}-title">${esc(chart.title)}</title>`);
  out.push(`<desc id="${id}-desc">${esc(chart.summary)}</desc>`);
  out.push(
    `<rect x="${m.left}" y="${m.top}" width="${plotW}" height="${plotH}" fill="#fffdf8" stroke="${CHART_COLORS.grid}"/>`,
  );

  // Grid and ticks (decorative for assistive technology: the desc says what matters).
  out.push('<g aria-hidden="true" font-family="inherit" font-size="12" fill="' + CHART_COLORS.ink + '">');
  for (let i = 0; i <= 5; i++) {
    const y = i / 5;
    out.push(
      `<line x1="${m.left}" x2="${m.left + plotW}" y1="${num(sy(y))}" y2="${num(sy(y))}" stroke="${CHART_COLORS.grid}" stroke-width="${i === 0 ? 1.2 : 0.6}"/>`,
    );
    out.push(`<text x="${m.left - 8}" y="${num(sy(y) + 4)}" text-anchor="end">${y.toFixed(1)}</text>`);
  }
  for (const x of niceTicks(xMax)) {
    out.push(
      `<line x1="${num(sx(x))}" x2="${num(sx(x))}" y1="${m.top}" y2="${m.top + plotH}" stroke="${CHART_COLORS.grid}" stroke-width="0.6"/>`,
    );
    const label = chart.xUnit === 'km' ? `${num(x)}` : `${Math.round(x * 100)} %`;
    out.push(`<text x="${num(sx(x))}" y="${m.top + plotH + 16}" text-anchor="middle">${label}</text>`);
  }
  out.push(
    `<text x="${m.left + plotW / 2}" y="${m.top + plotH + 36}" text-anchor="middle" font-size="13">${esc(chart.xLabel)}</text>`,
  );
  out.push(
    `<text transform="translate(16 ${m.top + plotH / 2}) rotate(-90)" text-anchor="middle" font-size="13">R (robustness value, 0\u20131)</text>`,
  );
  out.push('</g>');

  let attackIndex = 0;
  const styleOf = (s: ChartSeries): { stroke: string; dash: string; width: number } => {
    switch (s.role) {
      case 'median':
        return { stroke: CHART_COLORS.median, dash: '', width: 2.6 };
      case 'base-median':
        return { stroke: CHART_COLORS.base, dash: '5 4', width: 1.6 };
      case 'worst-case':
        return { stroke: CHART_COLORS.worst, dash: '', width: 1.8 };
      case 'attack': {
        const i = attackIndex++;
        return {
          stroke: CHART_COLORS.attacks[i % CHART_COLORS.attacks.length],
          dash: ATTACK_DASH[i % ATTACK_DASH.length],
          width: 1.8,
        };
      }
      default:
        return { stroke: CHART_COLORS.bandEdge, dash: '', width: 0.8 };
    }
  };
  const styles = chart.series.map(styleOf);

  // Draw order: band under everything, base median next, then attacks, worst case, median on top.
  const order: SeriesRole[] = ['band', 'base-median', 'attack', 'worst-case', 'median'];
  for (const role of order) {
    chart.series.forEach((s, i) => {
      if (s.role !== role) return;
      const st = styles[i];
      const attrs = `data-series="${s.role}" data-id="${esc(s.id)}" aria-label="${esc(s.label)}"`;
      if (s.role === 'band') {
        const upper = s.upper ?? [];
        const d = `M${line(upper).replace(/ /g, ' L')} L${line([...s.points].reverse()).replace(/ /g, ' L')} Z`;
        out.push(
          `<path ${attrs} d="${d}" fill="${CHART_COLORS.band}" fill-opacity="0.75" stroke="${st.stroke}" stroke-width="${st.width}"/>`,
        );
        return;
      }
      out.push(`<g ${attrs}>`);
      out.push(
        `<polyline points="${line(s.points)}" fill="none" stroke="${st.stroke}" stroke-width="${st.width}"${st.dash ? ` stroke-dasharray="${st.dash}"` : ''} stroke-linejoin="round" stroke-linecap="round"/>`,
      );
      if (s.role === 'worst-case') {
        for (const p of s.points.slice(1)) {
          out.push(`<rect x="${num(sx(p.x) - 3)}" y="${num(sy(p.y) - 3)}" width="6" height="6" fill="${st.stroke}"/>`);
        }
      }
      out.push('</g>');
    });
  }

  // The chart's own legend names every line, in series order, two columns under the axis label.
  out.push(`<g class="nb-legend" aria-hidden="true" font-size="12.5" fill="${CHART_COLORS.ink}">`);
  const colW = plotW / legendCols;
  chart.series.forEach((s, i) => {
    const st = styles[i];
    const x = m.left + (i % legendCols) * colW;
    const y = m.top + plotH + m.bottom + Math.floor(i / legendCols) * legendRowH + 4;
    out.push(`<g data-legend="${esc(s.id)}">`);
    if (s.role === 'band') {
      out.push(
        `<rect x="${x}" y="${y}" width="26" height="10" fill="${CHART_COLORS.band}" stroke="${st.stroke}" stroke-width="0.8"/>`,
      );
    } else {
      out.push(
        `<line x1="${x}" x2="${x + 26}" y1="${y + 5}" y2="${y + 5}" stroke="${st.stroke}" stroke-width="${st.width}"${st.dash ? ` stroke-dasharray="${st.dash}"` : ''}/>`,
      );
      if (s.role === 'worst-case')
        out.push(`<rect x="${x + 10}" y="${y + 2}" width="6" height="6" fill="${st.stroke}"/>`);
    }
    out.push(`<text x="${x + 34}" y="${y + 9}">${esc(s.label)}</text>`);
    out.push('</g>');
  });
  out.push('</g>');
  out.push('</svg>');
  return out.join('\n');
}

/** Tick positions: 0 and up to 5 round steps up to xMax. */
export function niceTicks(xMax: number): number[] {
  if (!(xMax > 0)) return [0];
  const raw = xMax / 5;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((f) => f * mag).find((s) => s >= raw - 1e-12) ?? raw;
  const ticks: number[] = [];
  for (let k = 0; k * step <= xMax + step * 1e-9; k++) ticks.push(Number((k * step).toPrecision(12)));
  return ticks;
}
