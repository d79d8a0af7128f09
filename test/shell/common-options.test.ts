// seed, threads, part and mode mean the same on the command line and in the Action: one
// parser (src/shell/common-options.ts) decides for both, so a value one accepts the other
// accepts, with the same meaning, and a value one refuses the other refuses.

import { describe, expect, it } from 'vitest';
import { sharedOption } from '../../src/shell/args.js';
import { readInputs } from '../../src/shell/action-inputs.js';
import { MODE, PART, SEED, THREADS, type SharedOption } from '../../src/shell/common-options.js';

const CASES: [name: 'seed' | 'threads' | 'part' | 'mode', option: SharedOption<unknown>, texts: string[]][] = [
  ['seed', SEED, ['0', '1', '4294967295', '4294967296', '-1', '1.5', '1e3', 'x', '007']],
  ['threads', THREADS, ['1', '256', '0', '257', '2.0', 'four']],
  ['part', PART, ['1/1', '2/4', '2 / 4', '4/4', '5/4', '0/4', '1/256', '1/257', '1/0', '2-4', '1/2/3']],
  ['mode', MODE, ['block', 'inform', 'enforce', 'advise', 'Block', 'strict']],
];

function viaCli(name: string, option: SharedOption<unknown>, text: string): unknown {
  try {
    return { ok: sharedOption(`--${name}`, text, option) };
  } catch (e) {
    return { refused: (e as Error).message };
  }
}

function viaAction(name: 'seed' | 'threads' | 'part' | 'mode', text: string): unknown {
  try {
    return { ok: readInputs({ [`INPUT_${name.toUpperCase()}`]: text })[name] };
  } catch (e) {
    return { refused: (e as Error).message };
  }
}

describe('the options the CLI and the Action share', () => {
  for (const [name, option, texts] of CASES) {
    it(`${name}: the same values accepted, with the same meaning, and the same refused`, () => {
      for (const text of texts) {
        const cli = viaCli(name, option, text) as { ok?: unknown; refused?: string };
        const action = viaAction(name, text) as { ok?: unknown; refused?: string };
        expect('ok' in action, `${name} "${text}": CLI ${JSON.stringify(cli)}, Action ${JSON.stringify(action)}`).toBe(
          'ok' in cli,
        );
        if ('ok' in cli) expect(action.ok).toEqual(cli.ok);
        else {
          expect(cli.refused).toContain(`--${name} must be ${option.expected}, not "${text}"`);
          expect(action.refused).toContain(`input "${name}" is "${text}"; use ${option.expected}`);
        }
      }
    });
  }

  it('the ranges are those the gate itself checks (seed up to 2^32 − 1, parts up to 256)', () => {
    expect(SEED.read('4294967295')).toBe(2 ** 32 - 1);
    expect(SEED.read('4294967296')).toBeUndefined();
    expect(PART.read('2 / 4')).toEqual({ index: 2, total: 4 });
    expect(PART.read('1/257')).toBeUndefined();
    expect(THREADS.read('0')).toBeUndefined();
    expect(MODE.read('inform')).toBe('inform');
  });
});
