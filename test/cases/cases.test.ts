// Every fixture case under fixtures/cases/ through `netbrace check`, judged against its
// expect.yaml. A case is a verdict a user saw go wrong once; each must keep its right answer.
import { afterAll, describe, expect, it } from 'vitest';
import { caseNames, cleanupCases, readExpectation, runCase } from './harness.js';

afterAll(cleanupCases);

describe('fixture cases through netbrace check', () => {
  for (const name of caseNames()) {
    const ex = readExpectation(name);
    it(`${name}: ${ex.about}`, async () => {
      const run = await runCase(name);
      const text = run.out + run.err;
      expect(run.code, text).toBe(ex.exit);
      if (ex.verdict) expect(run.report?.verdict, text).toBe(ex.verdict);
      for (const s of ex.output ?? []) expect(text).toContain(s);
      for (const s of ex.notOutput ?? []) expect(text).not.toContain(s);
      for (const [file, fx] of Object.entries(ex.files ?? {})) {
        const f = run.report?.files.find((x) => x.path === file);
        expect(f, `${file} in the report`).toBeDefined();
        if (!f) continue;
        if (fx.status) expect(f.status, JSON.stringify(f.findings.map((x) => x.message))).toBe(fx.status);
        const rules = f.findings.map((x) => `${x.rule}:${x.severity}`);
        for (const want of fx.findings ?? []) {
          expect(
            rules.some((r) => r === want || r.startsWith(`${want}:`)),
            `${want} among ${rules.join(', ')}`,
          ).toBe(true);
        }
        for (const not of fx.noFindings ?? []) {
          expect(
            rules.some((r) => r === not || r.startsWith(`${not}:`)),
            `${not} not among ${rules.join(', ')}`,
          ).toBe(false);
        }
        for (const m of fx.messages ?? []) expect(f.findings.map((x) => x.message).join('\n')).toContain(m);
        if (fx.deltaZero) {
          const withBoth = f.requirements.filter(
            (r) => r.base !== null && r.head !== null && !(fx.deltaZeroExcept ?? []).includes(r.id),
          );
          expect(withBoth.length).toBeGreaterThan(0);
          for (const r of withBoth) expect(r.delta, r.id).toBe(0);
        }
        for (const [id, status] of Object.entries(fx.requirements ?? {})) {
          expect(f.requirements.find((r) => r.id === id)?.status, id).toBe(status);
        }
      }
    });
  }
});
