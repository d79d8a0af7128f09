// A design deleted and added again under another file (often another format) is one design
// moved: the report carries one file, renamed from the deleted one, judged base against head.
import { afterAll, describe, expect, it } from 'vitest';
import { cleanupCases, runCase } from './harness.js';

afterAll(cleanupCases);

describe('designs moved to another file in the same change', () => {
  for (const [name, path, previousPath] of [
    ['shell-format-change', 'networks/ring.graphml', 'networks/ring.net.yaml'],
    ['shell-format-change-by-name', 'networks/metro-2027.gml', 'networks/metro.net.yaml'],
    ['shell-format-change-by-stem', 'networks/ring.gml', 'networks/ring.net.yaml'],
  ] as const) {
    it(`${name}: one file, ${previousPath} → ${path}, compared with its base`, async () => {
      const run = await runCase(name);
      const files = run.report!.files;
      expect(files.map((f) => [f.path, f.previousPath])).toEqual([[path, previousPath]]);
      const f = files[0];
      expect(f.base, 'the base side was evaluated').toBeDefined();
      // Both sides have every requirement: the paired values, not floors only.
      for (const r of f.requirements) expect([r.id, r.base !== null, r.head !== null]).toEqual([r.id, true, true]);
      // What the change did to the network, across the formats: one span retired, nothing added.
      expect(f.changes?.added).toEqual([]);
      expect(f.changes?.removed.map((e) => e.kind)).toEqual(['link']);
      expect(run.out).toContain(`(was ${previousPath})`);
    });
  }
});
