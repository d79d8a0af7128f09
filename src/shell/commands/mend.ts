// `netbrace mend FILE`: what would mend one design — the smallest, cheapest sets of added
// links (and, as the alternative, elements to harden) that remove its failing and warning
// findings, each judged again by the gate. `--apply N --out FILE` writes the design with
// suggestion N applied (our YAML and JSON formats), ready to be checked and committed.

import { mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { UsageError } from '../../errors.js';
import { applyToText } from '../../mend/apply.js';
import { oneLine } from '../../report/escape.js';
import { renderMendText } from '../../report/mend-text.js';
import { REPORT_DIGITS } from '../../report/report.js';
import { parseDesign } from '../../topology/parse.js';
import type { DesignFormat } from '../../topology/model.js';
import type { Command, CommandIO } from '../io.js';
import { parseCommandArgs, wholeNumber } from '../args.js';
import { judgeOneDesign, ONE_DESIGN_OPTIONS } from '../one-design.js';

const HELP = `Usage: netbrace mend FILE [--base REF] [--json] [--apply N --out FILE2] [options]

What would mend a design: the smallest, cheapest sets of added links (and, as the
alternative, elements to harden) that remove its new single points of failure and lift
the floors it falls short of and its weakenings back within the policy. Each suggestion says what it
fixes, its length or cost, and R\u0304 (the mean area of the policy's envelopes) before and
after, and is judged again by the same engine, policy and seed as "check" (common random
numbers with the base), so "holds" means check passes once it is applied.

Candidate links come from the list the policy names (mend.candidates), else from site
pairs within mend.max-km, length = great-circle distance \u00d7 mend.route-factor (1.3 by
default, common practice). Methods: the Eswaran\u2013Tarjan lower bound on the links needed
(bridge-tree leaves), an exact search for the fewest links that remove the new bridges
and cut sites, candidates ranked by Ghosh & Boyd's algebraic-connectivity gradient, and
a greedy search on R\u0304 per km judged by the engine.

The design is judged as "netbrace check FILE" judges it: in a git repository the file on
disk against HEAD (or against where it left --base REF); outside one, on its own.

Options:
  --base REF       compare with REF (default: HEAD in a git repository; none outside)
  --policy FILE    the policy (default .netbrace.yaml at the repository root, else built-in)
  --seed S         seed of the random challenges (default: the policy's)
  --threads N      worker threads (results do not depend on N)
  --json           print the mend part of the JSON report ({targets, bounds, candidates,
                   suggestions, ...}) instead of text
  --apply N        write the design with suggestion N applied to --out (our formats only)
  --out FILE2      where --apply writes (never the design itself unless you name it)

Examples:
  netbrace mend designs/backbone.net.yaml --base main
  netbrace mend designs/backbone.net.yaml --base main --json | jq '.suggestions[0]'
  netbrace mend designs/backbone.net.yaml --base main --apply 1 --out designs/backbone.net.yaml

netbrace informs engineering judgement; a suggestion is a topology-level hint, not a route
survey or a cost estimate.

Exit codes:
  0  the design holds already, or a suggestion that holds was found (and written, with --apply)
  1  no suggestion holds, or FILE could not be read (the message gives file:line:col)
  2  usage or configuration error (bad option, broken policy, --apply on another format)
`;

/** Numbers as the JSON report writes them (serializeReport): 12 significant digits, so both agree. */
function reportNumber(_key: string, value: unknown): unknown {
  if (typeof value !== 'number') return value;
  if (!Number.isFinite(value)) return null;
  if (Number.isInteger(value)) return value;
  const rounded = Number(value.toPrecision(REPORT_DIGITS));
  return Object.is(rounded, -0) ? 0 : rounded;
}

async function run(args: string[], io: CommandIO): Promise<number> {
  const { values, positionals } = parseCommandArgs('mend', args, {
    ...ONE_DESIGN_OPTIONS,
    json: { type: 'boolean' },
    apply: { type: 'string' },
    out: { type: 'string' },
  });
  const [file, ...extra] = positionals;
  if (file === undefined)
    throw new UsageError('mend needs a design FILE', 'netbrace mend designs/backbone.net.yaml --base main');
  if (extra.length) throw new UsageError(`mend takes one FILE, got ${positionals.length}`, 'run it once per file');
  const apply = wholeNumber('--apply', values.apply, 1);
  if ((apply === undefined) !== (values.out === undefined))
    throw new UsageError('--apply N and --out FILE go together', 'e.g. --apply 1 --out mended.net.yaml');
  const { file: f, full } = await judgeOneDesign(file, values, io, { map: false, mend: 'always' });
  if (f.error) {
    io.stderr(`${oneLine(file)}:${f.error.line || 1}:${f.error.column || 1}: ${oneLine(f.error.message)}\n`);
    return 1;
  }
  const m = f.mend;
  if (values.json) io.stdout(`${JSON.stringify(m ?? null, reportNumber, 2)}\n`);
  else io.stdout(renderMendText(f));
  if (!m) return 0;
  const holdsAlready = m.targets.length === 0 && !f.findings.some((x) => x.severity === 'fail');
  if (apply !== undefined) {
    const s = m.suggestions[apply - 1];
    if (!s)
      throw new UsageError(
        `there is no suggestion ${apply}`,
        m.suggestions.length ? `choose 1 to ${m.suggestions.length}` : 'there are no suggestions',
      );
    const text = await readFile(full, 'utf8');
    const format = f.format as DesignFormat | undefined;
    const t = parseDesign(text, f.path, format ? { format } : {});
    const out = path.resolve(io.cwd, values.out!);
    const edited = applyToText(text, t.format, t, s);
    await mkdir(path.dirname(out), { recursive: true });
    await writeFile(out, edited);
    io.stderr(
      `suggestion ${apply} applied: ${oneLine(values.out!)} written${s.holds ? '' : ' (it does not hold on its own)'}\n`,
    );
    return s.holds ? 0 : 1;
  }
  return holdsAlready || m.suggestions.some((s) => s.holds) ? 0 : 1;
}

export const mendCommand: Command = {
  name: 'mend',
  summary: 'what would mend a design: added links or hardened elements, each judged again',
  help: HELP,
  run,
};
