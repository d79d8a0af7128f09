// Input fixtures for the report views: a realistic report of an invented change to a
// regional operator's backbone (five designs, one of each kind of outcome). These are inputs
// the views render, not expected results; every test asserts on what the view made of them.

import { CAUTION, REPORT_VERSION } from '../../src/report/report.js';
import type { Evaluation, FileReport, Finding, Report, RequirementResult } from '../../src/report/report.js';
import type { Envelope } from '../../src/envelope/types.js';

const X = [0, 0.05, 0.1, 0.15, 0.2, 0.25, 0.3, 0.35, 0.4, 0.45, 0.5];

function curve(start: number, slope: number, bend: number): number[] {
  return X.map((x) => Math.max(0, Math.round((start - slope * x - bend * x * x) * 1000) / 1000));
}

function envelope(median: number[], width: number, weakest: string[]): Envelope {
  const lo = median.map((v) => Math.max(0, Math.round((v - width) * 1000) / 1000));
  const hi = median.map((v) => Math.min(1, Math.round((v + width / 2) * 1000) / 1000));
  const se = median.map(() => 0.004);
  return {
    challenge: 'random-nodes',
    kind: 'node',
    xUnit: 'fraction',
    x: X,
    realizations: 200,
    seed: 7,
    band: [0.1, 0.9],
    min: lo.map((v) => Math.max(0, v - 0.05)),
    max: hi,
    mean: median,
    median,
    quantiles: {
      '0.1': { value: lo, lo: lo.map((v) => v - 0.01), hi: lo.map((v) => v + 0.01), se },
      '0.5': { value: median, lo: median.map((v) => v - 0.01), hi: median.map((v) => v + 0.01), se },
      '0.9': { value: hi, lo: hi.map((v) => v - 0.01), hi: hi.map((v) => v + 0.01), se },
    },
    area: median.slice(1).reduce((a, b) => a + b, 0) / (median.length - 1),
    spread: width * 1.5,
    weakest: [
      {
        kind: 'node',
        elements: weakest,
        values: weakest.map((_, i) => Math.round((0.8 - 0.15 * i) * 1000) / 1000),
        realization: 17,
      },
    ],
  };
}

function evaluation(median: number[], bridges: { id: string; line: number }[], weakest: string[]): Evaluation {
  return {
    r: { metrics: [{ id: 'efficiency', weight: 1 }], combine: 'mean' },
    structure: {
      nodes: 12,
      links: bridges.length ? 13 : 14,
      components: 1,
      bridges: bridges.map((b) => ({ id: b.id, kind: 'link' as const, line: b.line })),
      cutNodes: [],
    },
    envelopes: [envelope(median, 0.08, weakest)],
    attacks: [
      {
        challenge: 'degree',
        kind: 'node',
        x: X,
        values: median.map((v) => Math.max(0, Math.round((v - 0.2) * 1000) / 1000)),
        sequence: weakest,
        area: 0.41,
      },
    ],
    contingencies: [
      {
        challenge: 'n-1',
        kind: 'link',
        evaluated: 14,
        total: 14,
        worst: [{ elements: ['l-kas-ost'], value: 0.61 }],
        min: 0.61,
      },
    ],
    degraded: [],
  };
}

function req(partial: Partial<RequirementResult> & Pick<RequirementResult, 'id' | 'description'>): RequirementResult {
  return { severity: 'fail', base: null, head: null, delta: null, se: 0, threshold: null, status: 'holds', ...partial };
}

export function sampleReport(): Report {
  const coreFindings: Finding[] = [
    {
      rule: 'new-bridge',
      requirement: 'no-new-spof',
      severity: 'fail',
      message: 'link l-kas-ost (kaskeld \u2013 ostmark) is a new bridge: its loss splits the network',
      elements: [{ id: 'l-kas-ost', kind: 'link', line: 42 }],
      line: 42,
    },
    {
      rule: 'regression',
      requirement: 'area:random-nodes',
      severity: 'fail',
      message: 'area of the random site failure envelope dropped by 0.062 \u00b1 0.004 (allowed 0.020)',
      base: 0.742,
      head: 0.68,
      delta: -0.062,
      se: 0.004,
      elements: [],
      line: 1,
    },
    {
      rule: 'weakest-sequence',
      severity: 'notice',
      message: 'weakest removal sequence: kaskeld \u2192 ostmark \u2192 brenna (R 0.80 \u2192 0.50)',
      elements: [
        { id: 'kaskeld', kind: 'node', line: 12 },
        { id: 'ostmark', kind: 'node', line: 15 },
        { id: 'brenna', kind: 'node', line: 9 },
      ],
      line: 12,
    },
  ];
  const core: FileReport = {
    path: 'backbone/core.net.yaml',
    status: 'weakened',
    format: 'native-yaml',
    findings: coreFindings,
    requirements: [
      req({
        id: 'no-new-spof',
        description: 'no new bridges or cut nodes',
        base: 0,
        head: 1,
        delta: 1,
        status: 'short',
      }),
      req({
        id: 'area:random-nodes',
        description: 'area of the random site failure envelope may drop by at most 0.020',
        base: 0.742,
        head: 0.68,
        delta: -0.062,
        se: 0.004,
        threshold: 0.722,
        status: 'weakened',
      }),
      req({
        id: 'threshold:random-nodes@0.2:q0.1',
        description: '10 % quantile of R at 20 % sites removed \u2265 0.50',
        severity: 'warn',
        base: 0.655,
        head: 0.59,
        delta: -0.065,
        se: 0.005,
        threshold: 0.5,
        status: 'holds',
      }),
    ],
    base: evaluation(curve(1, 0.9, 0.4), [], ['kaskeld', 'ostmark', 'brenna']),
    head: evaluation(curve(1, 1.05, 0.6), [{ id: 'l-kas-ost', line: 42 }], ['kaskeld', 'ostmark', 'brenna']),
  };
  const metro: FileReport = {
    path: 'metro/north.graphml',
    status: 'below-floor',
    format: 'graphml',
    findings: [
      {
        rule: 'r-threshold',
        requirement: 'threshold:random-nodes@0.3:median',
        severity: 'warn',
        message: 'median R at 30 % sites removed is 0.548, below 0.600',
        base: 0.556,
        head: 0.548,
        delta: -0.008,
        se: 0.006,
        elements: [],
        line: 1,
      },
      {
        rule: 'n-1',
        requirement: 'n-1:node',
        severity: 'warn',
        message: 'losing site hub-3 drops R to 0.58, below 0.65',
        head: 0.58,
        elements: [{ id: 'hub-3', kind: 'node', line: 88 }],
        line: 88,
      },
    ],
    requirements: [
      req({
        id: 'threshold:random-nodes@0.3:median',
        description: 'median R at 30 % sites removed \u2265 0.60',
        severity: 'warn',
        base: 0.556,
        head: 0.548,
        delta: -0.008,
        se: 0.006,
        threshold: 0.6,
        status: 'inside-error',
      }),
    ],
    base: evaluation(curve(1, 1.2, 0.3), [], ['hub-3', 'hub-1']),
    head: evaluation(curve(1, 1.22, 0.3), [], ['hub-3', 'hub-1']),
  };
  const fabric: FileReport = {
    path: 'dc/fabric.gml',
    status: 'holds',
    format: 'gml',
    findings: [],
    requirements: [
      req({
        id: 'area:random-links',
        description: 'area of the random link failure envelope may drop by at most 0.020',
        base: 0.91,
        head: 0.915,
        delta: 0.005,
        se: 0.002,
        status: 'holds',
      }),
    ],
    base: evaluation(curve(1, 0.2, 0.1), [], ['spine-1', 'spine-2']),
    head: evaluation(curve(1, 0.19, 0.1), [], ['spine-1', 'spine-2']),
  };
  const removed: FileReport = {
    path: 'legacy/ring-old.net.yaml',
    status: 'removed',
    findings: [
      { rule: 'removed-design', severity: 'notice', message: 'design removed in this change', elements: [], line: 1 },
    ],
    requirements: [],
  };
  const broken: FileReport = {
    path: 'edge/west.net.yaml',
    status: 'unreadable',
    format: 'native-yaml',
    findings: [
      {
        rule: 'parse-error',
        severity: 'fail',
        message: 'link l-7 names an unknown site "westgate" (did you mean "west-gate"?)',
        elements: [],
        line: 7,
        column: 13,
      },
    ],
    requirements: [],
    error: { message: 'link l-7 names an unknown site "westgate"', line: 7, column: 13 },
  };
  return {
    version: REPORT_VERSION,
    tool: { name: 'netbrace', version: '0.1.0' },
    verdict: 'fail',
    mode: 'block',
    policy: {
      source: 'file',
      path: 'netbrace.policy.yaml',
      revision: 'b1e5c0ffee00000000000000000000000000abcd',
      changed: false,
    },
    base: 'b1e5c0ffee00000000000000000000000000abcd',
    head: 'feedface0000000000000000000000000000beef',
    seed: 7,
    counts: { holds: 1, weakened: 1, 'below-floor': 1, new: 0, removed: 1, renamed: 0, unreadable: 1 },
    files: [fabric, core, removed, metro, broken],
    caution: CAUTION,
  };
}

/** A passing report with nothing to say: no design changed. */
export function emptyReport(): Report {
  const r = sampleReport();
  r.verdict = 'pass';
  r.files = [];
  r.counts = { holds: 0, weakened: 0, 'below-floor': 0, new: 0, removed: 0, renamed: 0, unreadable: 0 };
  return r;
}

/**
 * A report far too big for any view's budget: `designs` files of `findingsEach` findings,
 * with long messages. Severities cycle fail, warn, notice so ranking is visible.
 */
export function hugeReport(designs: number, findingsEach: number): Report {
  const r = sampleReport();
  const template = r.files[1];
  const severities = ['notice', 'warn', 'fail'] as const;
  r.files = [];
  for (let d = 0; d < designs; d++) {
    const findings: Finding[] = [];
    for (let i = 0; i < findingsEach; i++) {
      const severity = severities[(d + i) % 3];
      findings.push({
        rule: severity === 'fail' ? 'new-cut-node' : severity === 'warn' ? 'n-1' : 'weakest-sequence',
        severity,
        message: `site s-${d}-${i} ${'is a long-winded explanation of why this matters '.repeat(4)}`,
        elements: [{ id: `s-${d}-${i}`, kind: 'node', line: 10 + i }],
        line: 10 + i,
      });
    }
    r.files.push({ ...template, path: `region-${String(d).padStart(3, '0')}/site.net.yaml`, findings });
  }
  r.counts = { holds: 0, weakened: designs, 'below-floor': 0, new: 0, removed: 0, renamed: 0, unreadable: 0 };
  return r;
}
