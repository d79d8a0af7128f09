// A progress bar on stderr for work that takes more than a moment. Silent when stderr is not
// a terminal or when CI is set (logs would fill with carriage returns), and it only appears
// after `delayMs`, so quick runs print nothing. Redraws only when the bar visibly changes.

import type { CommandIO } from './io.js';

export interface Progress {
  /** Set how much is done (0..total). */
  update(done: number): void;
  /** Clear the bar (call once, also on failure). */
  finish(): void;
}

export interface ProgressOptions {
  label: string;
  total: number;
  /** Cells of the bar (default 24). */
  width?: number;
  /** Show nothing before this much time has passed (default 400 ms). */
  delayMs?: number;
  /** The clock, injectable for tests (default Date.now). */
  now?: () => number;
}

const SILENT: Progress = { update() {}, finish() {} };

/** Whether a progress bar may be drawn: stderr is a terminal and CI is not set. */
export function progressAllowed(io: Pick<CommandIO, 'stderrIsTTY' | 'env'>): boolean {
  const ci = io.env.CI;
  return io.stderrIsTTY && (ci === undefined || ci === '' || ci === '0' || ci.toLowerCase() === 'false');
}

export function createProgress(
  io: Pick<CommandIO, 'stderr' | 'stderrIsTTY' | 'env'>,
  options: ProgressOptions,
): Progress {
  if (!progressAllowed(io) || options.total <= 0) return SILENT;
  const now = options.now ?? Date.now;
  const cells = options.width ?? 24;
  const delay = options.delayMs ?? 400;
  const start = now();
  let last = '';
  let drawn = false;
  return {
    update(done: number) {
      if (now() - start < delay) return;
      const f = Math.max(0, Math.min(1, done / options.total));
      const full = Math.round(f * cells);
      const text = `${options.label} ${'\u2588'.repeat(full)}${'\u2591'.repeat(cells - full)} ${Math.floor(f * 100)} % (${Math.min(done, options.total)}/${options.total})`;
      if (text === last) return;
      last = text;
      drawn = true;
      io.stderr(`\r\u001b[2K${text}`);
    },
    finish() {
      if (drawn) io.stderr('\r\u001b[2K');
      drawn = false;
    },
  };
}
