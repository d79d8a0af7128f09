// Plain words for requirements and numbers, shared by the findings' messages.

import type { ChallengeDef, Requirement } from '../policy/types.js';

const WHAT: Record<string, string> = { nodes: 'nodes', links: 'links', 'risk-groups': 'risk groups', region: 'region' };

/** R values and deltas: three decimals, a true minus sign, no "-0.000". */
export function formatR(x: number): string {
  const s = x.toFixed(3);
  if (/^-0\.0+$/.test(s)) return s.slice(1);
  return s.replace(/^-/, '\u2212');
}

export function formatDelta(delta: number, se: number | null): string {
  const sign = delta > 0 && formatR(delta) !== '0.000' ? '+' : '';
  return `${sign}${formatR(delta)}${se !== null && se > 0 ? ` \u00b1 ${se.toFixed(3)}` : ''}`;
}

function percent(x: number): string {
  return `${Number((x * 100).toFixed(6))} %`;
}

function xWords(c: ChallengeDef | undefined, x: number): string {
  if (!c) return String(x);
  if (c.remove === 'region') return `radius ${x} km`;
  return `${percent(x)} of ${WHAT[c.remove]} removed`;
}

function challengeWords(c: ChallengeDef | undefined, name: string): string {
  if (!c) return `"${name}"`;
  const how = c.random ? 'random' : `${c.adaptive ? 'adaptive ' : ''}${c.order}`;
  return `"${name}" (${how} ${WHAT[c.remove]})`;
}

/** One line naming what a requirement judges, e.g. `10 % quantile of R at 20 % of nodes removed, "fail" (random nodes) ≥ 0.6`. */
export function describeRequirement(r: Requirement, challenges: readonly ChallengeDef[]): string {
  const c = 'challenge' in r ? challenges.find((x) => x.name === r.challenge) : undefined;
  switch (r.kind) {
    case 'r-threshold': {
      const on = challengeWords(c, r.challenge);
      const s = r.statistic;
      if (s.kind === 'worst-case') return `R after the worst ${s.removals} removals found, ${on} \u2265 ${r.min}`;
      const stat =
        s.kind === 'quantile' ? `${percent(s.q)} quantile of R` : s.kind === 'value' ? 'R' : `${s.kind} of R`;
      return `${stat} at ${xWords(c, r.at ?? 0)}, ${on} \u2265 ${r.min}`;
    }
    case 'area-floor':
      return `area of ${challengeWords(c, r.challenge)}${r.min === undefined ? ' (tracked)' : ` \u2265 ${r.min}`}`;
    case 'spread-ceiling':
      return `spread of ${challengeWords(c, r.challenge)} \u2264 ${r.max}`;
    case 'n-1':
      return `R after any single ${r.element} removal \u2265 ${r.min}`;
    case 'no-new-spof': {
      const what = [r.bridges ? 'bridges' : '', r.cutNodes ? 'cut nodes' : ''].filter(Boolean).join(' or ');
      return `no new ${what}`;
    }
  }
}
