// The netbrace step of a workflow at base and at head: which edits weaken the check.
import { describe, expect, it } from 'vitest';
import { compareSettings, usesNetbrace } from '../../src/gate/own-settings.js';

const wf = (step: string, job = '') =>
  `on: [pull_request]\njobs:\n  gate:\n${job}    runs-on: ubuntu-latest\n    steps:\n      - uses: actions/checkout@v5\n${step}`;
const step = (w: string, extra = '') => `      - uses: acme/netbrace@v1\n${extra}        with:\n${w}`;

describe('own settings', () => {
  it('recognises netbrace steps by their uses', () => {
    expect(['acme/netbrace@v1', 'OWNER/netbrace@0123', './', 'acme/netbrace/sub@v2'].every(usesNetbrace)).toBe(true);
    expect(['actions/checkout@v5', 'acme/netbracelet@v1', undefined].some(usesNetbrace)).toBe(false);
  });

  it('block → inform and base → head weaken; the line is the head’s', () => {
    const base = wf(step('          mode: block\n'));
    const head = wf(step('          mode: inform\n          policy-source: head\n'));
    const c = compareSettings(base, head, 'gate');
    expect(c.map((x) => [x.setting, x.base, x.head, x.weakens])).toEqual([
      ['mode', 'block', 'inform', true],
      ['policy-source', 'base', 'head', true],
    ]);
    expect(head.split('\n')[c[0].line - 1]).toContain('mode: inform');
  });

  it('dropping the step, continue-on-error and a condition weaken; tightening does not', () => {
    const base = wf(step('          mode: inform\n'));
    expect(compareSettings(base, wf(''), 'gate')[0]).toMatchObject({ setting: 'the netbrace step', weakens: true });
    expect(
      compareSettings(base, wf(step('          mode: inform\n', '        continue-on-error: true\n')), 'gate')[0],
    ).toMatchObject({ setting: 'continue-on-error', weakens: true });
    expect(
      compareSettings(base, wf(step('          mode: inform\n', "        if: github.actor != 'me'\n")), 'gate')[0],
    ).toMatchObject({ setting: 'if', weakens: true });
    expect(compareSettings(base, wf(step('          mode: block\n')), 'gate')).toEqual([
      expect.objectContaining({ setting: 'mode', weakens: false }),
    ]);
    expect(compareSettings(base, base, 'gate')).toEqual([]);
  });

  it('continue-on-error on the job counts like on the step', () => {
    const base = wf(step('          mode: block\n'));
    expect(
      compareSettings(base, wf(step('          mode: block\n'), '    continue-on-error: true\n'), 'gate')[0],
    ).toMatchObject({ setting: 'continue-on-error', weakens: true });
  });
});
