// One command run, as every caller runs it (the dispatcher, and the demo running `check`):
// `--help` prints the command's help; a user's mistake is one `file:line:col: message — hint`
// line and its exit code (1 for a design that cannot be read, 2 for usage and configuration);
// anything else is one "internal error" line, exit 2, never a bare stack trace.

import { formatDiagnostic, isNetbraceError } from '../errors.js';
import type { Command, CommandIO } from './io.js';

export async function runCommand(command: Command, args: string[], io: CommandIO): Promise<number> {
  if (args.includes('--help') || args.includes('-h')) {
    io.stdout(command.help);
    return 0;
  }
  try {
    return await command.run(args, io);
  } catch (error) {
    if (isNetbraceError(error)) {
      io.stderr(`${formatDiagnostic(error)}\n`);
      return error.kind === 'design' ? 1 : 2;
    }
    const message = error instanceof Error ? error.message : String(error);
    io.stderr(`netbrace: internal error: ${message}\n  please report this with the command you ran\n`);
    return 2;
  }
}
