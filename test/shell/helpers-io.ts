// A CommandIO double that records what a command prints.
import type { CommandIO } from '../../src/shell/io.js';

export interface RecordedIO extends CommandIO {
  out: string[];
  err: string[];
}

export function recordIO(cwd: string, env: Record<string, string | undefined> = {}, tty = false): RecordedIO {
  const out: string[] = [];
  const err: string[] = [];
  return {
    out,
    err,
    stdout: (t) => void out.push(t),
    stderr: (t) => void err.push(t),
    cwd,
    env,
    stdoutIsTTY: tty,
    stderrIsTTY: tty,
  };
}
