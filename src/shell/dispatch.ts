// The command-line dispatcher: `main(argv, io)` picks the command and returns its exit code
// (runCommand turns errors into exit codes). Touches no real process: cli.ts, the bin, does.

import { commands } from './commands/index.js';
import type { CommandIO } from './io.js';
import { runCommand } from './run-command.js';
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
  return runCommand(command, rest, io);
}
