// Stable ids of requirements: two requirements with the same id are the same floor (a
// scope or an inheriting policy may tighten it, never loosen it), and reports, SARIF
// fingerprints and PR comments key on them.

import type { Requirement, ThresholdStatistic } from './types.js';

function statisticTag(s: ThresholdStatistic): string {
  switch (s.kind) {
    case 'quantile':
      return `q${s.q}`;
    case 'worst-case':
      return `worst-case×${s.removals}`;
    default:
      return s.kind;
  }
}

export function requirementId(r: Requirement): string {
  switch (r.kind) {
    case 'r-threshold':
      return r.statistic.kind === 'worst-case'
        ? `r-threshold:${r.challenge}:${statisticTag(r.statistic)}`
        : `r-threshold:${r.challenge}@${r.at}:${statisticTag(r.statistic)}`;
    case 'area-floor':
    case 'spread-ceiling':
      return `${r.kind}:${r.challenge}`;
    case 'n-1':
      return `n-1:${r.element}`;
    case 'no-new-spof':
      // One id per kind of single point of failure, so a policy can fail on new bridges and
      // only warn on new cut nodes; a rule for both keeps the plain id (risk groups or not).
      if (r.bridges && r.cutNodes) return 'no-new-spof';
      return `no-new-spof:${[r.bridges ? 'bridges' : '', r.cutNodes ? 'cut-nodes' : '', r.riskGroups ? 'risk-groups' : ''].filter(Boolean).join('+')}`;
  }
}
