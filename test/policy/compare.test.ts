// What a proposed policy would judge differently (src/policy/compare.ts). Expected values
// follow from the policy's own meaning (a lower floor, a larger allowance or error multiple,
// a milder severity or a dropped requirement judges less strictly): common practice for
// tighten-only policies, and the same rule resolve.ts applies to inherits and scopes.
import { describe, expect, it } from 'vitest';
import { policyChanges } from '../../src/policy/compare.js';
import { loadPolicy } from '../../src/policy/resolve.js';

const load = (text: string) => loadPolicy('p.yaml', (p) => (p === 'p.yaml' ? text : null));

const BASE = `challenges:
  sites:
    remove: nodes
requirements:
  - kind: r-threshold
    challenge: sites
    at: 0.2
    min: 0.5
  - kind: no-new-spof
    elements: [bridges, cut-nodes]
weakening:
  allowed-drop: 0.01
  error-multiple: 2
`;

describe('policyChanges', () => {
  it('an identical policy changes nothing', () => {
    expect(policyChanges(load(BASE), load(BASE))).toEqual([]);
  });

  it('tells loosening from tightening, with the head file\u2019s lines', () => {
    const head = BASE.replace('min: 0.5', 'min: 0.4')
      .replace('elements: [bridges, cut-nodes]', 'elements: [bridges]')
      .replace('error-multiple: 2', 'error-multiple: 1.5');
    const changes = policyChanges(load(BASE), load(head));
    expect(changes.map((c) => [c.subject, c.key, c.effect, c.base, c.head])).toEqual([
      ['r-threshold:sites@0.2:median', 'min', 'loosens', 0.5, 0.4],
      ['no-new-spof:bridges', 'requirement', 'tightens', null, 'fail'],
      ['no-new-spof', 'requirement', 'loosens', 'fail', null],
      ['weakening', 'error-multiple', 'tightens', 2, 1.5],
    ]);
    expect(changes[0]).toMatchObject({ file: 'p.yaml', line: 8 });
  });

  it('a larger allowance and a milder weakening severity loosen', () => {
    const head = BASE.replace('allowed-drop: 0.01', 'allowed-drop: 0.05\n  severity: warn');
    expect(policyChanges(load(BASE), load(head)).map((c) => [c.key, c.effect])).toEqual([
      ['allowed-drop', 'loosens'],
      ['severity', 'loosens'],
    ]);
  });
});
