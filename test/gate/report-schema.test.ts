// Real reports validate against the published report schema (src/report/report.schema.json).
import { Ajv } from 'ajv';
import { describe, expect, it } from 'vitest';
import { joinReports, runGate } from '../../src/run-gate.js';
import { serializeReport } from '../../src/report/report.js';
import schema from '../../src/report/report.schema.json' with { type: 'json' };
import { gateFixture, memoryDeps, pairRepo } from './memory-repo.js';

const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);

function check(value: unknown): void {
  const ok = validate(value);
  expect(validate.errors ?? [], JSON.stringify(validate.errors?.slice(0, 3))).toEqual([]);
  expect(ok).toBe(true);
}

describe('report schema', () => {
  it('accepts reports of failing, passing, broken, deleted, renamed and runs in parts', async () => {
    const repo = pairRepo('ring-to-chain');
    repo.base['b.net.yaml'] = gateFixture('unchanged/base.net.yaml');
    repo.head['b.net.yaml'] = 'nodes: [\n';
    repo.base['gone.net.yaml'] = gateFixture('unchanged/base.net.yaml');
    repo.base['old.net.yaml'] = gateFixture('redundant-link/base.net.yaml');
    repo.head['new.net.yaml'] = gateFixture('redundant-link/head.net.yaml');
    repo.renames = { 'new.net.yaml': 'old.net.yaml' };
    const request = { base: 'base', head: 'head', policySource: 'base' as const, mode: 'inform' as const };
    const whole = await runGate(request, memoryDeps(repo));
    expect(whole.report.files.map((f) => f.status).sort()).toEqual(['removed', 'renamed', 'unreadable', 'weakened']);
    // Through JSON, as every reader sees it (non-finite numbers become null).
    check(JSON.parse(serializeReport(whole.report)));
    const parts = await Promise.all(
      [1, 2].map((index) => runGate({ ...request, part: { index, total: 2 } }, memoryDeps(repo))),
    );
    for (const s of parts) check(JSON.parse(serializeReport(s.report)));
    check(JSON.parse(serializeReport(joinReports(parts.map((s) => JSON.parse(serializeReport(s.report)))))));
  });

  it('rejects what is not a report', () => {
    expect(validate({ version: 1, verdict: 'maybe' })).toBe(false);
  });
});
