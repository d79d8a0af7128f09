import { describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import { commands } from '../../src/shell/commands/index.js';
import { recordIO } from './helpers-io.js';

describe('help', () => {
  it('lists every command with examples, exit codes and the caution', async () => {
    const io = recordIO('.');
    expect(await main(['--help'], io)).toBe(0);
    const text = io.out.join('');
    for (const c of commands)
      expect(text).toMatch(new RegExp(`^  ${c.name}\\s+${c.summary.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`, 'm'));
    expect(text).toContain('Examples:');
    expect(text).toMatch(/Exit codes:\n {2}0 .*\n {2}1 .*\n {2}2 /);
    expect(text).toContain('does\nnot replace engineering studies');
  });

  it('gives every command a help text with usage, examples and exit codes, by --help and by "help NAME"', async () => {
    for (const c of commands) {
      const a = recordIO('.');
      expect(await main([c.name, '--help'], a)).toBe(0);
      const b = recordIO('.');
      expect(await main(['help', c.name], b)).toBe(0);
      const help = a.out.join('');
      expect(b.out.join('')).toBe(help);
      expect(help, c.name).toMatch(new RegExp(`^Usage: netbrace ${c.name}\\b`));
      expect(help, c.name).toContain('Examples:');
      expect(help, c.name).toMatch(/Exit codes/);
    }
  });

  it('says how to find the list when a command is unknown', async () => {
    const io = recordIO('.');
    expect(await main(['chekc'], io)).toBe(2);
    expect(io.err.join('')).toContain('unknown command "chekc"');
  });
});
