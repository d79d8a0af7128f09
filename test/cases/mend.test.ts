// End to end, through the command line, as a planner would: the demo's first change fails the
// gate (fixtures/cases/mend-demo-change-1); `netbrace mend --apply 1` writes the first
// suggestion into the design; `netbrace check` then holds. The suggestion the JSON report of
// the failing check carries is the one `mend` prints and applies.
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import type { MendReport } from '../../src/mend/types.js';
import type { Report } from '../../src/report/report.js';
import { recordIO } from '../shell/helpers-io.js';
import { cleanupCases, runCase } from './harness.js';

afterAll(cleanupCases);

const DESIGN = 'designs/lunmere-backbone.net.yaml';

describe('mending the demo change 1 through the CLI', () => {
  it('applies the first suggestion and the check holds', async () => {
    const run = await runCase('mend-demo-change-1');
    expect(run.code, run.out + run.err).toBe(1);
    const failing = run.report!.files[0];
    expect(failing.status).toBe('weakened');
    const mend = failing.mend!;
    expect(mend.suggestions.length).toBeGreaterThan(0);
    const first = mend.suggestions[0];
    expect(first.holds).toBe(true);
    expect(first.kind).toBe('links');
    // The east loop became two chains ending at Ibberlin and Tarnquist: one link between those
    // two leaves of the bridge tree closes it (Eswaran–Tarjan bound 1). Its generated length is
    // great circle × 1.3, the rule the demo's generator used for the span that was retired.
    expect(mend.bounds.newBridges?.links).toBe(1);
    expect(first.links.map((l) => [...l.between].sort())).toEqual([['ibberlin', 'tarnquist']]);
    expect(first.links[0].lengthKm).toBe(47.8);

    // `mend` prints the same suggestions as the check's report (same gate, same inputs).
    const git = (...args: string[]) => execFileSync('git', args, { cwd: run.dir, encoding: 'utf8' }).trim();
    expect(git('rev-parse', '--abbrev-ref', 'HEAD')).toBe('change');
    const asJson = recordIO(run.dir, { NO_COLOR: '1' });
    expect(await main(['mend', DESIGN, '--base', 'main', '--json'], asJson)).toBe(0);
    const printed = JSON.parse(asJson.out.join('')) as MendReport;
    expect(printed.suggestions).toEqual(mend.suggestions);

    // Apply it, as the planner would, and look at the edit: one link appended, nothing else.
    const apply = recordIO(run.dir, { NO_COLOR: '1' });
    expect(await main(['mend', DESIGN, '--base', 'main', '--apply', '1', '--out', DESIGN], apply)).toBe(0);
    expect(apply.err.join('')).toContain('suggestion 1 applied');
    const diff = git('diff', '--unified=0', '--', DESIGN);
    const added = diff.split('\n').filter((l) => l.startsWith('+') && !l.startsWith('+++'));
    const removed = diff.split('\n').filter((l) => l.startsWith('-') && !l.startsWith('---'));
    expect(removed).toEqual([]);
    expect(added).toEqual([
      `+  - id: ${first.links[0].id}`,
      `+    between: [${first.links[0].between.join(', ')}]`,
      '+    length_km: 47.8',
      `+    latency_ms: ${first.links[0].latencyMs}`,
    ]);

    // The check again, on the edited working tree and on the commit: it holds.
    const again = recordIO(run.dir, { NO_COLOR: '1' });
    const code = await main(['check', '--base', 'main', '--json', '.out/after.json'], again);
    expect(code, again.out.join('') + again.err.join('')).toBe(0);
    const after = JSON.parse(readFileSync(path.join(run.dir, '.out', 'after.json'), 'utf8')) as Report;
    expect(after.verdict).toBe('pass');
    expect(after.files[0].status).toBe('holds');
    expect(after.files[0].findings.filter((f) => f.severity !== 'notice')).toEqual([]);
    // What the search promised is what the check found: the requirement values match.
    for (const r of first.requirements) {
      const row = after.files[0].requirements.find((x) => x.id === r.id)!;
      expect(row.head, r.id).toBe(r.after);
    }
    git('commit', '-q', '-am', 'close the east loop again');
    const committed = recordIO(run.dir, { NO_COLOR: '1' });
    expect(await main(['check', '--base', 'main', '--head', 'HEAD'], committed)).toBe(0);
    expect(committed.out.join('')).toContain('netbrace: no design weakened');
  }, 240_000);
});
