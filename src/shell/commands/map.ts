// `netbrace map FILE --svg OUT`: the map of one design as a standalone SVG, the picture the
// HTML report shows (same gate, same highlights), written to a file.

import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { UsageError } from '../../errors.js';
import { mapHighlights, renderMapSvg } from '../../report/map-svg.js';
import { oneLine } from '../../report/escape.js';
import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs } from '../args.js';
import { judgeOneDesign, ONE_DESIGN_OPTIONS } from '../one-design.js';

const HELP = `Usage: netbrace map FILE --svg OUT [--base REF] [options]

Draws one design as a map and writes it as SVG: sites at their coordinates (a projection
fitted to the design's extent) or, without coordinates, a seeded force-directed layout.
Against the base: removed links dashed, added links doubled, new bridges thick and marked,
cut sites as diamonds (new ones filled), shared-risk groups whose loss strands sites under
a wide band, the weakest removal sequence numbered, and the links of the first "what would
mend it" suggestion dotted. Every element has a title (name, id, line). The file has no
script and loads nothing; the same inputs give the same bytes.

The design is judged as "netbrace check FILE" judges it: in a git repository the file on
disk against HEAD (or against where it left --base REF), under the policy; outside one,
on its own.

Options:
  --svg OUT        where the SVG goes (required)
  --base REF       compare with REF (default: HEAD in a git repository; none outside)
  --policy FILE    the policy (default .netbrace.yaml at the repository root, else built-in)
  --seed S         seed of the random challenges (default: the policy's)
  --threads N      worker threads (results do not depend on N)

Examples:
  netbrace map designs/backbone.net.yaml --svg backbone.svg
  netbrace map designs/backbone.net.yaml --base main --svg change.svg
  netbrace map lab.graphml --svg lab.svg --threads 2

Exit codes:
  0  the map was written
  1  FILE could not be read (the message gives file:line:col), or it is too large to draw
  2  usage or configuration error (bad option, broken policy); nothing was written
`;

async function run(args: string[], io: CommandIO): Promise<number> {
  const { values, positionals } = parseCommandArgs('map', args, { ...ONE_DESIGN_OPTIONS, svg: { type: 'string' } });
  const [file, ...extra] = positionals;
  if (file === undefined)
    throw new UsageError('map needs a design FILE', 'netbrace map designs/backbone.net.yaml --svg backbone.svg');
  if (extra.length) throw new UsageError(`map takes one FILE, got ${positionals.length}`, 'run it once per file');
  if (values.svg === undefined)
    throw new UsageError('map needs --svg OUT, the file to write', 'e.g. --svg backbone.svg');
  const { file: f } = await judgeOneDesign(file, values, io, { map: true, mend: 'failing' });
  if (f.error) {
    io.stderr(`${oneLine(file)}:${f.error.line || 1}:${f.error.column || 1}: ${oneLine(f.error.message)}\n`);
    return 1;
  }
  const map = f.map;
  if (!map || 'omitted' in map) {
    io.stderr(
      `netbrace map: no map of ${oneLine(file)}: ${map ? oneLine(map.omitted) : 'the design could not be drawn'}\n`,
    );
    return 1;
  }
  const svg = `<?xml version="1.0" encoding="UTF-8"?>\n${renderMapSvg(map, mapHighlights(f), { idPrefix: 'nb-map', title: `Map of ${f.path}` })}\n`;
  const out = path.resolve(io.cwd, values.svg);
  await mkdir(path.dirname(out), { recursive: true });
  await writeFile(out, svg);
  const changed = map.links.filter((l) => l.side !== 'both').length + map.nodes.filter((n) => n.side !== 'both').length;
  io.stdout(
    `map of ${oneLine(f.path)}: ${map.nodes.length} sites, ${map.links.length} links (${map.layout === 'geographic' ? 'at their coordinates' : 'force-directed layout'})` +
      `${changed ? `, ${changed} element${changed === 1 ? '' : 's'} changed` : ''}; written to ${oneLine(values.svg)}\n`,
  );
  return 0;
}

export const mapCommand: Command = {
  name: 'map',
  summary: 'draw one design as an SVG map: the change, its weak points, and what would mend it',
  help: HELP,
  run,
};
