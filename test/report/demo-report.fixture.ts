// An input fixture for the report views: a realistic Report of the shape the gate produces
// for the demo's cost-saving change (one weakened design, one new design, one unreadable
// file). The numbers are made up to look like an evaluation; they are not a result.

import type { AttackCurve, Envelope, QuantileBand, WorstCase } from '../../src/envelope/types.js';
import { CAUTION, REPORT_VERSION, type Evaluation, type FileReport, type Report } from '../../src/report/report.js';

const round = (v: number) => Math.round(v * 1e6) / 1e6;
const grid = (until: number, points: number) =>
  Array.from({ length: points }, (_, i) => round((until * i) / (points - 1)));

function band(values: number[], se: number): QuantileBand {
  return {
    value: values,
    lo: values.map((v) => round(Math.max(0, v - 2 * se))),
    hi: values.map((v) => round(Math.min(1, v + 2 * se))),
    se: values.map(() => se),
  };
}

/** A random-failure envelope whose median falls like r0·(1 − a·x − b·x²). */
function envelope(opts: {
  challenge: Envelope['challenge'];
  kind: Envelope['kind'];
  r0: number;
  a: number;
  b: number;
  width: number;
  until: number;
  worstCase?: WorstCase;
  weakest?: Envelope['weakest'];
}): Envelope {
  const x = grid(opts.until, 13);
  const median = x.map((v) => round(Math.max(0, opts.r0 * (1 - opts.a * v - opts.b * v * v))));
  const spreadAt = (v: number) => opts.width * Math.sin((Math.PI * v) / (opts.until * 1.6));
  const lo = median.map((m, i) => round(Math.max(0, m - spreadAt(x[i]) * 0.65)));
  const hi = median.map((m, i) => round(Math.min(1, m + spreadAt(x[i]) * 0.35)));
  const mean = median.map((m, i) => round(m - spreadAt(x[i]) * 0.1));
  const area = round(median.reduce((s, v) => s + v, 0) / median.length);
  const spread = round(hi.reduce((s, v, i) => s + (v - lo[i]), 0) / hi.length);
  return {
    challenge: opts.challenge,
    kind: opts.kind,
    xUnit: 'fraction',
    x,
    realizations: 400,
    seed: 7,
    band: [0.1, 0.9],
    min: lo.map((v) => round(Math.max(0, v - 0.04))),
    max: hi.map((v) => round(Math.min(1, v + 0.02))),
    mean,
    median,
    quantiles: { '0.1': band(lo, 0.004), '0.5': band(median, 0.003), '0.9': band(hi, 0.004) },
    area,
    spread,
    weakest: opts.weakest ?? [],
    worstCase: opts.worstCase,
  };
}

function attack(
  challenge: AttackCurve['challenge'],
  kind: AttackCurve['kind'],
  count: number,
  r0: number,
  speed: number,
  sequence: string[],
): AttackCurve {
  const steps = Math.round(count * 0.4);
  const x = Array.from({ length: steps + 1 }, (_, k) => round(k / count));
  const values = x.map((v) => round(Math.max(0, r0 * Math.exp(-speed * v) - 0.15 * v)));
  return { challenge, kind, x, values, sequence, area: round(values.reduce((s, v) => s + v, 0) / values.length) };
}

const rSpec: Evaluation['r'] = {
  metrics: [
    { id: 'efficiency', weight: 0.4 },
    { id: 'largest_component', weight: 0.3 },
    { id: 'demand_served', weight: 0.3 },
  ],
  combine: 'mean',
};

const baseBackbone: Evaluation = {
  r: rSpec,
  structure: {
    nodes: 52,
    links: 71,
    components: 1,
    bridges: [{ id: 'wendlequist-yarlsquay', kind: 'link', line: 268 }],
    cutNodes: [{ id: 'wendlequist', kind: 'node', line: 96 }],
  },
  envelopes: [
    envelope({ challenge: 'random-nodes', kind: 'node', r0: 0.812, a: 1.05, b: 0.9, width: 0.11, until: 0.3 }),
    envelope({ challenge: 'random-links', kind: 'link', r0: 0.812, a: 0.62, b: 0.7, width: 0.08, until: 0.3 }),
  ],
  attacks: [
    attack('degree', 'node', 52, 0.812, 4.1, ['lunmere', 'quarnell', 'velmoss']),
    attack('betweenness-adaptive', 'node', 52, 0.812, 5.3, ['lunmere', 'tessaway', 'orrowin']),
    attack('link-betweenness', 'link', 71, 0.812, 2.2, ['lunmere-quarnell', 'tessaway-orrowin']),
  ],
  contingencies: [
    {
      challenge: 'n-1',
      kind: 'node',
      evaluated: 52,
      total: 52,
      worst: [{ elements: ['lunmere'], value: 0.702 }],
      min: 0.702,
    },
  ],
  degraded: [],
};

const headWorst: WorstCase = {
  kind: 'node',
  elements: ['kaskeld', 'lunmere', 'tessaway'],
  values: [0.655, 0.561, 0.468],
  k: 3,
  method: 'exact',
};

const headBackbone: Evaluation = {
  r: rSpec,
  structure: {
    nodes: 52,
    links: 69,
    components: 1,
    bridges: [
      { id: 'wendlequist-yarlsquay', kind: 'link', line: 268 },
      { id: 'kaskeld-ibberlin', kind: 'link', line: 201 },
      { id: 'lunmere-kaskeld', kind: 'link', line: 197 },
    ],
    cutNodes: [
      { id: 'kaskeld', kind: 'node', line: 31 },
      { id: 'wendlequist', kind: 'node', line: 96 },
    ],
  },
  envelopes: [
    envelope({
      challenge: 'random-nodes',
      kind: 'node',
      r0: 0.794,
      a: 1.3,
      b: 1.1,
      width: 0.15,
      until: 0.3,
      worstCase: headWorst,
      weakest: [
        { kind: 'node', elements: ['kaskeld', 'fenwhistle', 'lunmere'], values: [0.66, 0.6, 0.49], realization: 213 },
      ],
    }),
    envelope({ challenge: 'random-links', kind: 'link', r0: 0.794, a: 0.8, b: 0.9, width: 0.1, until: 0.3 }),
  ],
  attacks: [
    attack('degree', 'node', 52, 0.794, 4.9, ['lunmere', 'quarnell', 'velmoss']),
    attack('betweenness-adaptive', 'node', 52, 0.794, 6.4, ['kaskeld', 'lunmere', 'tessaway']),
    attack('link-betweenness', 'link', 71, 0.794, 2.9, ['lunmere-kaskeld', 'tessaway-orrowin']),
  ],
  contingencies: [
    {
      challenge: 'n-1',
      kind: 'node',
      evaluated: 52,
      total: 52,
      worst: [{ elements: ['kaskeld'], value: 0.655 }],
      min: 0.655,
    },
  ],
  degraded: [],
};

const backbone: FileReport = {
  path: 'designs/lunmere-backbone.net.yaml',
  status: 'weakened',
  format: 'native-yaml',
  requirements: [
    {
      id: 'threshold:random-nodes@0.2:q0.1',
      description: '10 % quantile of R at 20 % sites removed \u2265 0.45',
      severity: 'fail',
      base: 0.498,
      head: 0.421,
      delta: -0.077,
      se: 0.006,
      threshold: 0.45,
      status: 'short',
    },
    {
      id: 'area:random-nodes',
      description: 'area under the median, random site failures \u2265 0.55',
      severity: 'fail',
      base: 0.689,
      head: 0.642,
      delta: -0.047,
      se: 0.002,
      threshold: 0.55,
      status: 'weakened',
    },
    {
      id: 'n-1:node',
      description: 'no single site loss leaves R below 0.60',
      severity: 'fail',
      base: 0.702,
      head: 0.655,
      delta: -0.047,
      se: 0,
      threshold: 0.6,
      status: 'holds',
    },
    {
      id: 'spread:random-links',
      description: 'band width, random link failures \u2264 0.12',
      severity: 'warn',
      base: 0.051,
      head: 0.0512,
      delta: 0.0002,
      se: 0.0003,
      threshold: 0.12,
      status: 'inside-error',
    },
    {
      id: 'no-new-spof',
      description: 'no new bridges or cut nodes',
      severity: 'fail',
      base: 1,
      head: 3,
      delta: 2,
      se: 0,
      threshold: null,
      status: 'short',
    },
  ],
  findings: [
    {
      rule: 'new-bridge',
      requirement: 'no-new-spof',
      severity: 'fail',
      message: 'new bridges: lunmere-kaskeld, kaskeld-ibberlin \u2014 losing either cuts Kaskeld and Ibberlin off',
      elements: [
        { id: 'lunmere-kaskeld', kind: 'link', line: 197 },
        { id: 'kaskeld-ibberlin', kind: 'link', line: 201 },
      ],
      line: 197,
    },
    {
      rule: 'new-cut-node',
      requirement: 'no-new-spof',
      severity: 'fail',
      message: 'new cut node: kaskeld',
      elements: [{ id: 'kaskeld', kind: 'node', line: 31 }],
      line: 31,
    },
    {
      rule: 'r-threshold',
      requirement: 'threshold:random-nodes@0.2:q0.1',
      severity: 'fail',
      message: '10 % quantile of R at 20 % sites removed is 0.421, below 0.45',
      base: 0.498,
      head: 0.421,
      delta: -0.077,
      se: 0.006,
      elements: [],
      line: 1,
    },
    {
      rule: 'weakest-sequence',
      severity: 'notice',
      message: 'weakest removal sequence found (exact, 3 sites): R 0.794 \u2192 0.468',
      elements: [
        { id: 'kaskeld', kind: 'node', line: 31 },
        { id: 'lunmere', kind: 'node', line: 12 },
        { id: 'tessaway', kind: 'node', line: 19 },
      ],
      line: 31,
    },
  ],
  base: baseBackbone,
  head: headBackbone,
  changes: {
    added: [],
    removed: [
      { id: 'kaskeld-fenwhistle', kind: 'link', line: 214 },
      { id: 'ibberlin-tarnquist', kind: 'link', line: 205 },
    ],
  },
};

const metroHead: Evaluation = {
  r: rSpec,
  structure: { nodes: 12, links: 16, components: 1, bridges: [], cutNodes: [] },
  envelopes: [
    envelope({ challenge: 'random-nodes', kind: 'node', r0: 0.702, a: 1.2, b: 1.4, width: 0.13, until: 0.3 }),
  ],
  attacks: [attack('degree', 'node', 12, 0.702, 3.8, ['ardlenoth', 'brisselholt'])],
  contingencies: [],
  degraded: ['betweenness attacks skipped: budget of 2 s per design reached'],
};

const metro: FileReport = {
  path: 'designs/metro/<west> & "ring".net.yaml',
  status: 'new',
  format: 'native-yaml',
  requirements: [
    {
      id: 'threshold:random-nodes@0.2:q0.1',
      description: '10 % quantile of R at 20 % sites removed \u2265 0.45',
      severity: 'fail',
      base: null,
      head: 0.468,
      delta: null,
      se: null,
      threshold: 0.45,
      status: 'holds',
    },
  ],
  findings: [
    {
      rule: 'degraded',
      severity: 'notice',
      message: 'betweenness attacks skipped: budget of 2 s per design reached',
      elements: [],
      line: 1,
    },
  ],
  head: metroHead,
};

const broken: FileReport = {
  path: 'designs/lab.graphml',
  status: 'unreadable',
  format: 'graphml',
  requirements: [],
  findings: [
    {
      rule: 'parse-error',
      severity: 'fail',
      message: 'link e7 refers to node n99, which the file does not define',
      elements: [],
      line: 41,
      column: 5,
    },
  ],
  error: { message: 'link e7 refers to node n99, which the file does not define', line: 41, column: 5 },
};

export function demoReport(): Report {
  return {
    version: REPORT_VERSION,
    tool: { name: 'netbrace', version: '0.1.0' },
    verdict: 'fail',
    mode: 'block',
    policy: { source: 'file', path: 'policy.yaml', revision: '3f9c2e1' },
    base: '3f9c2e1',
    head: '8a41d07',
    seed: 7,
    counts: { holds: 0, weakened: 1, 'below-floor': 0, new: 1, removed: 0, renamed: 0, unreadable: 1 },
    files: [structuredClone(backbone), structuredClone(metro), structuredClone(broken)],
    caution: CAUTION,
  };
}
