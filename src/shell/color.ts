// Whether output may carry ANSI colour: never with NO_COLOR (no-color.org: any non-empty value),
// always with FORCE_COLOR (other than "0"), else only when stdout is a terminal.

import type { CommandIO } from './io.js';

export function colorEnabled(io: Pick<CommandIO, 'env' | 'stdoutIsTTY'>): boolean {
  const no = io.env.NO_COLOR;
  if (no !== undefined && no !== '') return false;
  const force = io.env.FORCE_COLOR;
  if (force !== undefined && force !== '' && force !== '0' && force !== 'false') return true;
  return io.stdoutIsTTY;
}

/** Columns for terminal output: COLUMNS when set, else 100. */
export function terminalWidth(io: Pick<CommandIO, 'env'>): number {
  const cols = Number(io.env.COLUMNS);
  return Number.isInteger(cols) && cols >= 40 ? cols : 100;
}
