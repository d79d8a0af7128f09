import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { findingFingerprint, renderSarif } from '../../src/report/sarif.js';
import { hugeReport, sampleReport } from './sample-report.js';

// The published SARIF 2.1.0 schema (OASIS, "sarif-schema-2.1.0", the rtm.5 text that
// schemastore serves), as shipped in the npm package @microsoft/jest-sarif 1.0.0-beta.0.
// It is a draft-04 JSON Schema, so it is compiled with ajv's draft-04 class.
const require = createRequire(import.meta.url);
const schemaPath = require.resolve('@microsoft/jest-sarif/lib/schemas/sarif-2.1.0-rtm.5.json');
const schema = JSON.parse(readFileSync(schemaPath, 'utf8'));
// A CommonJS package whose default export is the Ajv class.
const AjvDraft04 = require('ajv-draft-04').default as typeof import('ajv-draft-04').default;

// The schema's language pattern is written for non-Unicode regular expressions.
const ajv = new AjvDraft04({ allErrors: true, strict: false, unicodeRegExp: false });
// The schema's formats, checked rather than ignored.
ajv.addFormat('uri', (s: string) => {
  try {
    new URL(s);
    return true;
  } catch {
    return false;
  }
});
ajv.addFormat('uri-reference', (s: string) => !/[\s<>"{}|\\^`]/.test(s));
ajv.addFormat('date-time', (s: string) => !Number.isNaN(Date.parse(s)) && /^\d{4}-\d\d-\d\dT/.test(s));
const validate = ajv.compile(schema);

function results(log: ReturnType<typeof renderSarif>): any[] {
  return (log.runs[0] as any).results;
}

describe('SARIF 2.1.0', () => {
  it('is valid against the published schema', () => {
    const log = renderSarif(sampleReport());
    const ok = validate(JSON.parse(JSON.stringify(log)));
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  it('the validator does reject broken SARIF', () => {
    const log: any = JSON.parse(JSON.stringify(renderSarif(sampleReport())));
    log.version = '2.0.0';
    log.runs[0].results[0].level = 'fatal';
    expect(validate(log)).toBe(false);
  });

  it('has what GitHub code scanning requires', () => {
    const log: any = renderSarif(sampleReport(), { category: 'backbone' });
    expect(log.$schema).toMatch(/sarif-2\.1\.0/);
    const run = log.runs[0];
    expect(run.tool.driver.name).toBe('netbrace');
    // category/instance: the category before the last slash, the head revision after it.
    expect(run.automationDetails.id).toMatch(/^backbone\/[0-9a-f]{7,40}$/);
    for (const rule of run.tool.driver.rules) {
      for (const text of [rule.id, rule.shortDescription.text, rule.fullDescription.text, rule.help.text]) {
        expect(typeof text).toBe('string');
        expect(text.trim().length).toBeGreaterThan(0);
      }
    }
    const ids = run.tool.driver.rules.map((r: any) => r.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const res of run.results) {
      expect(ids[res.ruleIndex]).toBe(res.ruleId);
      expect(['note', 'warning', 'error']).toContain(res.level);
      expect(res.message.text.trim().length).toBeGreaterThan(0);
      expect(res.locations.length).toBe(1);
      const loc = res.locations[0].physicalLocation;
      expect(loc.artifactLocation.uri).not.toMatch(/^\//);
      expect(loc.region.startLine).toBeGreaterThanOrEqual(1);
      expect(res.fingerprints['netbraceFinding/v1']).toMatch(/^[0-9a-f]{16}:\d+$/);
      // primaryLocationLineHash is a hash of the line's text by convention: code scanning fills it.
      expect(res.partialFingerprints).toBeUndefined();
    }
  });

  it('puts results at the element\u2019s line, worst first', () => {
    const res = results(renderSarif(sampleReport()));
    expect(res[0].level).toBe('error');
    const bridge = res.find((r) => r.ruleId === 'new-bridge');
    expect(bridge.locations[0].physicalLocation).toEqual({
      artifactLocation: { uri: 'backbone/core.net.yaml' },
      region: { startLine: 42 },
    });
    const parse = res.find((r) => r.ruleId === 'parse-error');
    expect(parse.locations[0].physicalLocation.region).toEqual({ startLine: 7, startColumn: 13 });
  });

  it('fingerprints survive moved lines but not a different element, file or rule', () => {
    const a = sampleReport();
    const b = sampleReport();
    for (const f of b.files)
      for (const x of f.findings) {
        x.line += 10;
        for (const e of x.elements) e.line += 10;
      }
    const fa = results(renderSarif(a)).map((r) => r.fingerprints['netbraceFinding/v1']);
    const fb = results(renderSarif(b)).map((r) => r.fingerprints['netbraceFinding/v1']);
    expect(fb).toEqual(fa);
    expect(new Set(fa).size).toBe(fa.length);
    const x = a.files[1].findings[0];
    const base = findingFingerprint('backbone/core.net.yaml', x);
    expect(findingFingerprint('backbone/other.net.yaml', x)).not.toBe(base);
    expect(
      findingFingerprint('backbone/core.net.yaml', { ...x, elements: [{ id: 'l-other', kind: 'link', line: 42 }] }),
    ).not.toBe(base);
    expect(findingFingerprint('backbone/core.net.yaml', { ...x, rule: 'new-cut-node' })).not.toBe(base);
  });

  it('stays valid with hostile paths and messages, and with many results', () => {
    const r = sampleReport();
    r.files[1].path = 'dir with space/<x>%20"q"#frag?.net.yaml';
    r.files[1].findings[0].message = '\u0000\u202E';
    const log = JSON.parse(JSON.stringify(renderSarif(r, { pathPrefix: 'nets' })));
    expect(validate(log)).toBe(true);
    const res = log.runs[0].results.find((x: any) => x.ruleId === 'new-bridge');
    expect(res.locations[0].physicalLocation.artifactLocation.uri).toBe(
      'nets/dir%20with%20space/%3Cx%3E%2520%22q%22%23frag%3F.net.yaml',
    );
    expect(res.message.text.length).toBeGreaterThan(0);
    const big = JSON.parse(JSON.stringify(renderSarif(hugeReport(40, 50))));
    expect(validate(big)).toBe(true);
    expect(big.runs[0].results.length).toBe(2000);
  });

  it('gives the policy change as one result on the policy file, valid against the schema', () => {
    const r = sampleReport();
    r.policy.changed = true;
    r.policy.changes = [
      {
        subject: 'n-1:node',
        key: 'severity',
        effect: 'loosens',
        base: 'fail',
        head: 'warn',
        file: 'netbrace.policy.yaml',
        line: 21,
      },
    ];
    const log = renderSarif(r);
    const policy = results(log).filter((x) => x.ruleId === 'policy-changed');
    expect(policy).toHaveLength(1);
    expect(policy[0].level).toBe('warning');
    expect(policy[0].locations[0].physicalLocation).toEqual({
      artifactLocation: { uri: 'netbrace.policy.yaml' },
      region: { startLine: 21 },
    });
    expect(policy[0].message.text).toBe(
      'This change edits the policy: the head\u2019s version would loosen the severity of n-1:node from fail to warn; the base\u2019s version judges this change, and the head\u2019s applies once merged.',
    );
    expect(validate(JSON.parse(JSON.stringify(log)))).toBe(true);
    // Rules are titled with the words every view uses.
    const rules = (log.runs[0] as any).tool.driver.rules as { id: string; shortDescription: { text: string } }[];
    expect(rules.find((x) => x.id === 'regression')?.shortDescription.text).toBe('requirement weakened');
    r.policy.changed = false;
    expect(results(renderSarif(r)).some((x) => x.ruleId === 'policy-changed')).toBe(false);
  });
});
