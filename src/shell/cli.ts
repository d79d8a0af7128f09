// Command-line entry: a thin wrapper. `main` does the dispatch and returns an exit code;
// only the last lines touch the real process.

import { commands } from './commands/index.js';
import type { CommandIO } from './io.js';
import { formatDiagnostic, isNetbraceError } from '../errors.js';
import { VERSION } from '../version.js';

export const EXIT_CODES_HELP = `Exit codes:
  0  pass (or nothing to judge)
  1  the check failed: a design weakened or fell short of a floor, or could not be read
  2  usage or configuration error (bad option, broken policy); nothing was evaluated`;

export function generalHelp(): string {
  const width = Math.max(...commands.map((c) => c.name.length), 4);
  const list = commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`).join('\n');
  return `netbrace ${VERSION} — robustness check for network designs kept in git

Usage: netbrace <command> [options]

Commands:
${list}

Run "netbrace <command> --help" (or "netbrace help <command>") for a command's options
and examples; "netbrace --version" prints the version.

Examples:
  netbrace demo                                   the whole check on an invented backbone
  netbrace check --base main                      judge the designs changed since main
  netbrace explain designs/core.net.yaml          which single losses hurt R most
  netbrace inspect designs/core.net.yaml          counts, bridges and cut nodes

${EXIT_CODES_HELP}

netbrace evaluates topology-level robustness under the assumptions in the policy; it does
not replace engineering studies. Local codes, standards and licensed practice decide.
`;
}

export async function main(argv: string[], io: CommandIO): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    const topic = name === 'help' ? commands.find((c) => c.name === rest[0]) : undefined;
    io.stdout(topic ? topic.help : generalHelp());
    return 0;
  }
  if (name === '--version' || name === '-V') {
    io.stdout(`${VERSION}\n`);
    return 0;
  }
  const command = commands.find((c) => c.name === name);
  if (!command) {
    io.stderr(`netbrace: unknown command "${name}" — run "netbrace --help" for the list\n`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    io.stdout(command.help);
    return 0;
  }
  try {
    return await command.run(rest, io);
  } catch (error) {
    if (isNetbraceError(error)) {
      io.stderr(`${formatDiagnostic(error)}\n`);
      return error.kind === 'design' ? 1 : 2;
    }
    // Not a user error: still one clear line, never a bare stack trace.
    const message = error instanceof Error ? error.message : String(error);
    io.stderr(`netbrace: internal error: ${message}\n  please report this with the command you ran\n`);
    return 2;
  }
}

function isEntry(): boolean {
  const entry = process.argv[1] ?? '';
  return /(?:^|[\\/])(?:cli\.(?:js|ts)|netbrace)$/.test(entry);
}

if (isEntry()) {
  const io: CommandIO = {
    stdout: (t) => process.stdout.write(t),
    stderr: (t) => process.stderr.write(t),
    cwd: process.cwd(),
    env: process.env,
    stdoutIsTTY: Boolean(process.stdout.isTTY),
    stderrIsTTY: Boolean(process.stderr.isTTY),
  };
  main(process.argv.slice(2), io).then(
    (code) => {
      process.exitCode = code;
    },
    (error: unknown) => {
      process.stderr.write(`netbrace: ${error instanceof Error ? error.message : String(error)}\n`);
      process.exitCode = 2;
    },
  );
}
