// `netbrace inspect FILE...`: what a design file holds and where it is structurally weak
// (bridges, cut nodes, isolated nodes), without any policy or challenge.

import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs, wholeNumber } from '../args.js';
import { formatDiagnostic, isNetbraceError, UsageError, type Diagnostic } from '../../errors.js';
import type { Topology } from '../../topology/model.js';
import { parseFormatName, FORMAT_CHOICES } from '../../topology/detect.js';
import { compileTopology, linksByLine, nodesByLine } from '../../graph/compact.js';
import { findComponents, findCutElements } from '../../graph/structure.js';
import { readDesign, type ReadDesignOptions } from '../read-design.js';

const FORMAT_LABEL: Readonly<Record<Topology['format'], string>> = {
  'native-yaml': 'netbrace design (YAML)',
  'native-json': 'netbrace design (JSON)',
  graphml: 'GraphML',
  gml: 'GML',
  csv: 'CSV edge list',
  geojson: 'GeoJSON (RFC 7946)',
};

export interface InspectSummary {
  file: string;
  format: Topology['format'];
  name?: string;
  nodes: number;
  links: number;
  /** Links that have a parallel twin between the same two nodes. */
  parallel_links: number;
  risk_groups: number;
  demands: number;
  components: number;
  /** Component sizes, largest first. */
  component_sizes: number[];
  degree: { min: number; mean: number; max: number };
  /** Link ids whose loss disconnects their component (parallel links are never bridges). */
  bridges: string[];
  /** Node ids whose loss disconnects their component (articulation points). */
  cut_nodes: string[];
  /** Node ids with no link. */
  isolated: string[];
  warnings: { line: number; column: number; message: string; hint?: string }[];
}

/** The structural summary of a parsed design (pure; the command only prints it). */
export function summarize(t: Topology): InspectSummary {
  const g = compileTopology(t);
  const comps = findComponents(g);
  const cuts = findCutElements(g);
  let min = g.n > 0 ? Infinity : 0;
  let max = 0;
  const isolated: string[] = [];
  for (let v = 0; v < g.n; v++) {
    const d = g.offsets[v + 1] - g.offsets[v];
    if (d < min) min = d;
    if (d > max) max = d;
    if (d === 0) isolated.push(g.nodeIds[v]);
  }
  const pairs = new Map<number, number>();
  for (let e = 0; e < g.m; e++) {
    const a = g.linkSource[e];
    const b = g.linkTarget[e];
    const k = a < b ? a * g.n + b : b * g.n + a;
    pairs.set(k, (pairs.get(k) ?? 0) + 1);
  }
  let parallel = 0;
  for (const c of pairs.values()) if (c > 1) parallel += c;
  return {
    file: t.file,
    format: t.format,
    ...(t.name !== undefined ? { name: t.name } : {}),
    nodes: g.n,
    links: g.m,
    parallel_links: parallel,
    risk_groups: g.groupIds.length,
    demands: t.demands.length,
    components: comps.sizes.length,
    component_sizes: [...comps.sizes].sort((a, b) => b - a),
    // Mean degree 2L/N (each parallel link counts), rounded to 3 decimals.
    degree: { min, mean: g.n > 0 ? Math.round((2 * g.m * 1000) / g.n) / 1000 : 0, max },
    // Listed as the file lists them.
    bridges: linksByLine(g, cuts.bridges).map((e) => g.linkIds[e]),
    cut_nodes: nodesByLine(g, cuts.cutNodes).map((v) => g.nodeIds[v]),
    isolated: nodesByLine(
      g,
      isolated.map((id) => g.nodeIndex.get(id)!),
    ).map((v) => g.nodeIds[v]),
    warnings: t.warnings.map((w: Diagnostic) => ({
      line: w.line,
      column: w.column,
      message: w.message,
      ...(w.hint ? { hint: w.hint } : {}),
    })),
  };
}

const LIST_LIMIT = 12;

function list(ids: readonly string[]): string {
  if (ids.length === 0) return '';
  const shown = ids.slice(0, LIST_LIMIT).join(', ');
  return `: ${shown}${ids.length > LIST_LIMIT ? `, … (${ids.length - LIST_LIMIT} more)` : ''}`;
}

/** The human view of a summary. */
export function formatSummary(s: InspectSummary, t: Topology): string {
  const lines = [`${s.file} — ${FORMAT_LABEL[s.format]}${s.name ? `, "${s.name}"` : ''}`];
  const extras = [
    s.parallel_links ? `${s.parallel_links} of them parallel` : '',
    s.risk_groups ? `${s.risk_groups} risk group${s.risk_groups === 1 ? '' : 's'}` : '',
    s.demands ? `${s.demands} demand${s.demands === 1 ? '' : 's'}` : '',
  ].filter(Boolean);
  lines.push(`  nodes ${s.nodes}, links ${s.links}${extras.length ? ` (${extras.join(', ')})` : ''}`);
  const sizes = s.component_sizes.slice(0, 5).join(', ') + (s.component_sizes.length > 5 ? ', …' : '');
  lines.push(`  components ${s.components}${s.components > 1 ? ` (sizes ${sizes})` : ''}`);
  lines.push(`  degree min ${s.degree.min}, mean ${s.degree.mean.toFixed(2)}, max ${s.degree.max}`);
  lines.push(`  bridges ${s.bridges.length}${list(s.bridges)}`);
  lines.push(`  cut nodes ${s.cut_nodes.length}${list(s.cut_nodes)}`);
  lines.push(`  isolated nodes ${s.isolated.length}${list(s.isolated)}`);
  lines.push(`  warnings ${t.warnings.length}`);
  for (const w of t.warnings.slice(0, LIST_LIMIT)) lines.push(`    ${formatDiagnostic(w)}`);
  if (t.warnings.length > LIST_LIMIT) lines.push(`    … (${t.warnings.length - LIST_LIMIT} more; --json lists all)`);
  return `${lines.join('\n')}\n`;
}

const NOTE =
  'note: bridges and cut nodes are read from the graph alone. Links that share a duct, route or\n' +
  'building can fail together where the graph shows redundancy (declare risk_groups). This informs\n' +
  'engineering judgement; local codes, standards and licensed practice decide for real infrastructure.\n';

const HELP = `Usage: netbrace inspect FILE... [--json] [--format F] [--max-bytes N] [--max-elements N]

Reads design files and reports what they hold: node and link counts, connected components,
the degree summary, bridges (links whose loss splits the network), cut nodes (nodes whose
loss does), isolated nodes and parse warnings.

Options:
  --json            print one JSON object: for one FILE its summary, for several
                    {"files": [...]}; a file that failed is {"file", "error"}
  --format F        read every FILE as F (${FORMAT_CHOICES}) instead of by extension
  --max-bytes N     refuse files larger than N bytes (default 20971520 = 20 MB)
  --max-elements N  refuse designs with more than N nodes + links (default 2000000)

Every FILE is reported; one that cannot be read does not stop the others.

Examples:
  netbrace inspect designs/core.net.yaml
  netbrace inspect --json backbone.graphml | jq .bridges
  netbrace inspect --format csv links.txt

Exit codes: 0 all files read, 1 a file could not be read, 2 usage error.
`;

function errorJson(file: string, e: unknown): object {
  if (isNetbraceError(e)) {
    return {
      file,
      error: { kind: e.kind, message: e.message, line: e.line, column: e.column, ...(e.hint ? { hint: e.hint } : {}) },
    };
  }
  return { file, error: { kind: 'internal', message: e instanceof Error ? e.message : String(e) } };
}

export const inspectCommand: Command = {
  name: 'inspect',
  summary: 'show what a design file holds: counts, components, bridges, cut nodes, warnings',
  help: HELP,
  async run(args: string[], io: CommandIO): Promise<number> {
    const parsed = parseCommandArgs('inspect', args, {
      json: { type: 'boolean' },
      format: { type: 'string' },
      'max-bytes': { type: 'string' },
      'max-elements': { type: 'string' },
    });
    const files = parsed.positionals;
    if (files.length === 0)
      throw new UsageError('inspect needs at least one FILE', 'netbrace inspect designs/core.net.yaml');
    const options: ReadDesignOptions = { cwd: io.cwd };
    if (parsed.values.format !== undefined) options.format = parseFormatName(parsed.values.format);
    const maxBytes = wholeNumber('--max-bytes', parsed.values['max-bytes'], 1);
    if (maxBytes !== undefined) options.maxBytes = maxBytes;
    const maxElements = wholeNumber('--max-elements', parsed.values['max-elements'], 1);
    if (maxElements !== undefined) options.maxElements = maxElements;

    const results: object[] = [];
    let failed = 0;
    let text = '';
    for (const file of files) {
      try {
        const t = readDesign(file, options);
        const s = summarize(t);
        results.push(s);
        text += (text ? '\n' : '') + formatSummary(s, t);
      } catch (e) {
        failed++;
        results.push(errorJson(file, e));
        // A broken file is reported at once (stderr), whatever the output mode.
        io.stderr(
          `${isNetbraceError(e) ? formatDiagnostic(e) : `${file}: internal error: ${e instanceof Error ? e.message : String(e)}`}\n`,
        );
      }
    }
    if (parsed.values.json) {
      io.stdout(`${JSON.stringify(files.length === 1 ? results[0] : { files: results }, null, 2)}\n`);
    } else if (text) {
      io.stdout(`${text}\n${NOTE}`);
    }
    return failed > 0 ? 1 : 0;
  },
};
