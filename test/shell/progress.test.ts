import { describe, expect, it } from 'vitest';
import { createProgress, progressAllowed } from '../../src/shell/progress.js';
import { colorEnabled, terminalWidth } from '../../src/shell/color.js';

function sink(tty: boolean, env: Record<string, string | undefined> = {}) {
  const err: string[] = [];
  return { err, io: { stderr: (t: string) => void err.push(t), stderrIsTTY: tty, env } };
}

describe('progress bar', () => {
  it('draws on a terminal after the delay, only when it changes, and clears itself', () => {
    let clock = 0;
    const { err, io } = sink(true);
    const p = createProgress(io, { label: 'explain', total: 4, width: 4, delayMs: 100, now: () => clock });
    p.update(1);
    expect(err).toEqual([]); // still within the delay
    clock = 150;
    p.update(2);
    p.update(2);
    p.update(4);
    p.finish();
    expect(err).toEqual([
      '\r\u001b[2Kexplain \u2588\u2588\u2591\u2591 50 % (2/4)',
      '\r\u001b[2Kexplain \u2588\u2588\u2588\u2588 100 % (4/4)',
      '\r\u001b[2K',
    ]);
  });

  it('is silent when stderr is not a terminal, or in CI', () => {
    for (const [tty, env] of [
      [false, {}],
      [true, { CI: 'true' }],
      [true, { CI: '1' }],
    ] as const) {
      const { err, io } = sink(tty, env);
      const p = createProgress(io, { label: 'x', total: 2, delayMs: 0 });
      p.update(1);
      p.finish();
      expect(err).toEqual([]);
    }
    expect(progressAllowed({ stderrIsTTY: true, env: { CI: 'false' } })).toBe(true);
    expect(progressAllowed({ stderrIsTTY: true, env: { CI: '' } })).toBe(true);
  });
});

describe('colour', () => {
  it('follows NO_COLOR (any non-empty value), then FORCE_COLOR, then the terminal', () => {
    expect(colorEnabled({ env: {}, stdoutIsTTY: true })).toBe(true);
    expect(colorEnabled({ env: {}, stdoutIsTTY: false })).toBe(false);
    expect(colorEnabled({ env: { NO_COLOR: '1' }, stdoutIsTTY: true })).toBe(false);
    expect(colorEnabled({ env: { NO_COLOR: '' }, stdoutIsTTY: true })).toBe(true);
    expect(colorEnabled({ env: { FORCE_COLOR: '1' }, stdoutIsTTY: false })).toBe(true);
    expect(colorEnabled({ env: { FORCE_COLOR: '0' }, stdoutIsTTY: false })).toBe(false);
    expect(colorEnabled({ env: { NO_COLOR: 'x', FORCE_COLOR: '1' }, stdoutIsTTY: true })).toBe(false);
  });

  it('takes the width from COLUMNS when it is sensible', () => {
    expect(terminalWidth({ env: { COLUMNS: '132' } })).toBe(132);
    expect(terminalWidth({ env: { COLUMNS: '12' } })).toBe(100);
    expect(terminalWidth({ env: {} })).toBe(100);
  });
});
