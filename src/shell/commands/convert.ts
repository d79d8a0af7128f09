// `netbrace convert FILE --to FORMAT [--out FILE]`: a design in another of the formats netbrace
// reads. The work is in src/topology/convert.ts; this reads, calls, writes and says what the
// target format could not hold. An existing file is never overwritten without --force.

import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { formatDiagnostic, isNetbraceError, UsageError } from '../../errors.js';
import { convertDesign, LENGTH_ESTIMATED, type Converted } from '../../topology/convert.js';
import { detectFormat, FORMAT_CHOICES, parseFormatName } from '../../topology/detect.js';
import type { DesignFormat, Topology } from '../../topology/model.js';
import { parseCommandArgs, wholeNumber } from '../args.js';
import type { Command, CommandIO } from '../io.js';
import { readDesign, type ReadDesignOptions } from '../read-design.js';

const NAME: Readonly<Record<DesignFormat, string>> = {
  'native-yaml': 'netbrace design (YAML)',
  'native-json': 'netbrace design (JSON)',
  graphml: 'GraphML',
  gml: 'GML',
  csv: 'CSV edge list',
  geojson: 'GeoJSON',
};

const HELP = `Usage: netbrace convert FILE --to FORMAT [--out FILE] [--force] [--no-estimate]
                        [--format F] [--max-bytes N] [--max-elements N]

Writes the design in FILE in another format netbrace reads (${FORMAT_CHOICES}): to
standard output, or to --out FILE (then --to may be left out: the extension tells). Ids,
labels, kinds, coordinates (the Topology Zoo's Latitude/Longitude included), hardened flags,
risk groups, lengths, latencies, capacities, weights and other attributes are kept where the
format can hold them, and the command says what it could not keep:

  yaml, json  everything (other attributes under "attributes:")
  graphml     no demands, risk group descriptions or latency budget; attributes that
              are lists or maps (a GeoJSON route) are left out
  gml         as GraphML; flags become 1/0, attribute names must be letters, digits and _
  csv         links only: no node labels, kinds, coordinates or attributes, no nodes
              without links, no demands, name or metadata; every cell is text
  geojson     needs coordinates on every node (refused otherwise); no demands, risk group
              descriptions or latency budget; links without a drawn route become straight
              lines between their sites, which say nothing about where the cables run

A link without a length gets the great-circle distance between its sites, marked with the
attribute ${LENGTH_ESTIMATED}: true, and the command says how many. That is the shortest
possible path: real routes are longer, so check estimated lengths before relying on them.

Options:
  --to FORMAT       the format to write: ${FORMAT_CHOICES}
  --out FILE        write FILE instead of standard output; never overwrites a file
  --force           overwrite --out FILE if it exists
  --no-estimate     leave missing lengths missing
  --format F        read FILE as F instead of by its extension
  --max-bytes N     refuse files larger than N bytes (default 20971520 = 20 MB)
  --max-elements N  refuse designs with more than N nodes + links (default 2000000)

Examples:
  netbrace convert zoo/Abilene.gml --out designs/abilene.net.yaml
  netbrace convert designs/core.net.yaml --to geojson --out core.geojson
  netbrace convert links.csv --to graphml > links.graphml

Exit codes:
  0  written
  1  FILE could not be read, or FORMAT cannot hold the design (GeoJSON without coordinates)
  2  usage error, or --out FILE exists (use --force)
`;

/** Our two spellings read each other: JSON is YAML. */
const compatible = (a: DesignFormat, b: DesignFormat) => a === b || (a === 'native-json' && b === 'native-yaml');

async function run(args: string[], io: CommandIO): Promise<number> {
  const { values, positionals } = parseCommandArgs('convert', args, {
    to: { type: 'string' },
    out: { type: 'string' },
    force: { type: 'boolean' },
    'no-estimate': { type: 'boolean' },
    format: { type: 'string' },
    'max-bytes': { type: 'string' },
    'max-elements': { type: 'string' },
  });
  if (positionals.length !== 1)
    throw new UsageError(
      positionals.length === 0 ? 'convert needs a FILE' : 'convert takes one FILE',
      'netbrace convert designs/core.gml --to yaml',
    );
  const file = positionals[0];
  const implied = values.out !== undefined ? detectFormat(values.out) : undefined;
  const to = values.to !== undefined ? parseFormatName(values.to) : implied;
  if (to === undefined) {
    throw new UsageError(
      values.out !== undefined ? `cannot tell the format from --out ${values.out}` : 'convert needs --to FORMAT',
      `give --to (${FORMAT_CHOICES})`,
    );
  }
  if (implied !== undefined && !compatible(to, implied)) {
    throw new UsageError(
      `--out ${values.out} would be read as ${NAME[implied]}, not ${NAME[to]}`,
      'give the file the extension of its format (.net.yaml, .net.json, .graphml, .gml, .csv, .geojson)',
    );
  }
  const options: ReadDesignOptions = { cwd: io.cwd };
  if (values.format !== undefined) options.format = parseFormatName(values.format);
  const maxBytes = wholeNumber('--max-bytes', values['max-bytes'], 1);
  if (maxBytes !== undefined) options.maxBytes = maxBytes;
  const maxElements = wholeNumber('--max-elements', values['max-elements'], 1);
  if (maxElements !== undefined) options.maxElements = maxElements;

  // A design that cannot be read (or is over a limit), or cannot be written in this format: exit 1.
  let t: Topology;
  let result: Converted;
  try {
    t = readDesign(file, options);
    result = convertDesign(t, to, { estimateLengths: !values['no-estimate'] });
  } catch (e) {
    if (!isNetbraceError(e) || (e.kind !== 'design' && e.kind !== 'limit')) throw e;
    io.stderr(`${formatDiagnostic(e)}\n`);
    return 1;
  }

  const report: string[] = [];
  const say = (line: string) => report.push(line);
  for (const w of t.warnings.slice(0, 12)) say(`warning: ${formatDiagnostic(w)}`);
  if (t.warnings.length > 12) say(`warning: … and ${t.warnings.length - 12} more (netbrace inspect --json lists all)`);
  if (result.estimated > 0) {
    say(
      `${result.estimated} link length${result.estimated === 1 ? '' : 's'} estimated from the sites' coordinates (great-circle distance, ` +
        `a lower bound of the route; marked ${LENGTH_ESTIMATED}: true)`,
    );
  }
  if (result.overWeight > 0)
    say(`  ${result.overWeight} of them had only a weight: the weighted metrics now use these lengths instead`);
  if (result.unestimated > 0)
    say(
      `${result.unestimated} link${result.unestimated === 1 ? '' : 's'} left without a length: a site has no coordinates`,
    );
  if (result.lost.length > 0) say(`not kept by ${NAME[to]}: ${result.lost.join('; ')}`);
  for (const n of result.notes ?? []) say(`note: ${n}`);

  if (values.out === undefined) {
    io.stdout(result.text);
    if (report.length > 0) io.stderr(`${report.join('\n')}\n`);
    return 0;
  }
  const target = path.resolve(io.cwd, values.out);
  try {
    // "wx": create, failing if the file exists, in one step (no race between check and write).
    await writeFile(target, result.text, { flag: values.force ? 'w' : 'wx' });
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'EEXIST')
      throw new UsageError(
        `${values.out} exists already; convert never overwrites a file`,
        'give another --out FILE, or add --force',
      );
    if (code === 'ENOENT') throw new UsageError(`cannot write ${values.out}: its folder does not exist`);
    if (code === 'EISDIR') throw new UsageError(`cannot write ${values.out}: it is a folder`);
    throw e;
  }
  io.stdout(
    `wrote ${values.out} (${NAME[to]}): ${t.nodes.length} node${t.nodes.length === 1 ? '' : 's'}, ${t.links.length} link${t.links.length === 1 ? '' : 's'}\n`,
  );
  if (report.length > 0) io.stdout(`${report.join('\n')}\n`);
  return 0;
}

export const convertCommand: Command = {
  name: 'convert',
  summary: 'write a design in another format (YAML/JSON, GraphML, GML, CSV, GeoJSON)',
  help: HELP,
  run,
};
