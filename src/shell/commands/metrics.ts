// `netbrace metrics FILE [--only id,id] [--json]`: every robustness metric of one design,
// intact (nothing removed), raw and normalised — a table for people, JSON for scripts.

import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs } from '../args.js';
import { UsageError } from '../../errors.js';
import { compileTopology, type CompactGraph } from '../../graph/compact.js';
import { createMask } from '../../graph/mask.js';
import { getMetric, metrics } from '../../metrics/registry.js';
import type { Metric, MetricOptions } from '../../metrics/types.js';
import { FORMAT_CHOICES, parseFormatName } from '../../topology/detect.js';
import { readDesign, type ReadDesignOptions } from '../read-design.js';

const HELP = `Usage: netbrace metrics FILE [--only ID,ID...] [--json] [--format F] [--latency-budget B]

Computes the robustness metrics of one design with nothing removed: each metric's own value
and its normalised score in [0, 1] (1 = the best the metric can say, 0 = no robustness left).
Metrics that need data the design lacks (link latencies or lengths, traffic demands) are left
out. Spectral metrics are taken on the simple graph (parallel links merged); above 300 nodes
natural_connectivity, and effective_resistance of dense, expander-like designs, are seeded
estimates (see the README).

Metrics:
${metrics.map((m) => `  ${m.id.padEnd(23)} ${m.description}\n  ${''.padEnd(23)} score: ${m.normalization}`).join('\n')}

Options:
  --only ID,ID        compute only these metrics (comma-separated ids from the list above)
  --json              print exactly one JSON object:
                      {"nodes": N, "links": L, "metrics": {"<id>": {"value": raw, "normalized": x}}}
                      (a value that is infinite or undefined is written as null)
  --format F          read FILE as F (${FORMAT_CHOICES}) instead of by extension
  --latency-budget B  latency budget factor for demand_served (overrides the design's)

Examples:
  netbrace metrics designs/core.net.yaml
  netbrace metrics backbone.graphml --only efficiency,algebraic_connectivity --json

Exit codes: 0 computed, 1 the design could not be read, 2 usage error.
`;

const NOTE =
  'note: scores describe the topology under the stated definitions only. They inform engineering\n' +
  'judgement; local codes, standards and licensed practice decide for real infrastructure.\n';

export interface MetricsResult {
  nodes: number;
  links: number;
  metrics: Record<string, { value: number; normalized: number }>;
}

/** Evaluate `selected` on the intact design (pure). */
export function computeMetrics(
  g: CompactGraph,
  selected: readonly Metric[],
  options: MetricOptions = {},
): MetricsResult {
  const mask = createMask(g);
  const out: MetricsResult = { nodes: g.n, links: g.m, metrics: {} };
  for (const m of selected) {
    const v = m.create(g, options)(mask);
    out.metrics[m.id] = { value: v.raw, normalized: v.normalized };
  }
  return out;
}

function formatNumber(x: number): string {
  if (Number.isNaN(x)) return '—';
  if (!Number.isFinite(x)) return x > 0 ? '∞' : '−∞';
  if (Number.isInteger(x)) return String(x);
  return Number(x.toPrecision(6)).toString();
}

/** The human table of a result (pure). */
export function formatMetricsTable(file: string, r: MetricsResult, skipped: readonly string[]): string {
  const rows = Object.entries(r.metrics).map(([id, v]) => [id, formatNumber(v.value), v.normalized.toFixed(4)]);
  const head = ['metric', 'value', 'score'];
  const w = head.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
  const line = (cells: string[]) =>
    `  ${cells[0].padEnd(w[0])}  ${cells[1].padStart(w[1])}  ${cells[2].padStart(w[2])}`;
  const text = [`${file} — ${r.nodes} nodes, ${r.links} links`, line(head), ...rows.map(line)];
  if (skipped.length) text.push(`  not applicable: ${skipped.join(', ')}`);
  return `${text.join('\n')}\n`;
}

/** Why a metric does not apply, for the message. */
function missing(id: string): string {
  if (id === 'weighted_efficiency') return 'needs latency, length or weight on every link';
  if (id === 'demand_served') return 'needs traffic demands';
  return 'not applicable';
}

export const metricsCommand: Command = {
  name: 'metrics',
  summary: 'compute the robustness metrics of one design (raw and normalised)',
  help: HELP,
  async run(args: string[], io: CommandIO): Promise<number> {
    const parsed = parseCommandArgs('metrics', args, {
      only: { type: 'string' },
      json: { type: 'boolean' },
      format: { type: 'string' },
      'latency-budget': { type: 'string' },
    });
    if (parsed.positionals.length !== 1) {
      throw new UsageError('metrics needs exactly one FILE', 'netbrace metrics designs/core.net.yaml');
    }
    const file = parsed.positionals[0];
    const requested =
      parsed.values.only === undefined
        ? metrics
        : parsed.values.only
            .split(',')
            .map((s) => s.trim())
            .filter(Boolean)
            .map((id) => getMetric(id));
    if (requested.length === 0)
      throw new UsageError(
        '--only needs at least one metric id',
        `known metrics: ${metrics.map((m) => m.id).join(', ')}`,
      );
    const options: MetricOptions = {};
    const budget = parsed.values['latency-budget'];
    if (budget !== undefined) {
      const b = Number(budget);
      if (!(b > 0) || !Number.isFinite(b))
        throw new UsageError(
          `--latency-budget must be a positive number, not "${budget}"`,
          'e.g. --latency-budget 1.5',
        );
      options.latencyBudget = b;
    }
    const read: ReadDesignOptions = { cwd: io.cwd };
    if (parsed.values.format !== undefined) read.format = parseFormatName(parsed.values.format);

    const g = compileTopology(readDesign(file, read));
    const applicable = requested.filter((m) => m.appliesTo(g));
    const skipped = requested.filter((m) => !m.appliesTo(g)).map((m) => m.id);
    if (parsed.values.only !== undefined) {
      for (const id of skipped) io.stderr(`netbrace: ${id} does not apply to ${file}: ${missing(id)}\n`);
    }
    const result = computeMetrics(g, applicable, options);
    if (parsed.values.json) io.stdout(`${JSON.stringify(result, null, 2)}\n`);
    else io.stdout(`${formatMetricsTable(file, result, skipped)}\n${NOTE}`);
    return 0;
  },
};
