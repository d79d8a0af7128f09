// Policy globs are checked when the policy loads (policy/globs.ts): what shells and picomatch
// accept as glob syntax passes (common practice); what could select no repository file is refused.
import picomatch from 'picomatch';
import { describe, expect, it } from 'vitest';
import { globProblem } from '../../src/policy/globs.js';
import { DEFAULT_DESIGN_GLOBS } from '../../src/policy/defaults.js';

describe('globProblem', () => {
  it('accepts the built-in globs and the usual glob syntax, each matching the file it is meant for', () => {
    const ok: [string, string][] = [
      ...DEFAULT_DESIGN_GLOBS.map((g): [string, string] => [g, `networks/core${g.slice(g.lastIndexOf('*') + 1)}`]),
      ['**/*.{graphml,gml}', 'a/b.gml'],
      ['core/[ab]*.gml', 'core/a1.gml'],
      ['core/[^x]*.gml', 'core/a1.gml'],
      ['core/[]]x.gml', 'core/]x.gml'],
      ['./networks/*.net.yaml', 'networks/a.net.yaml'],
      ['drafts/\\[old\\]/*.gml', 'drafts/[old]/a.gml'],
      ['@(core|edge)/*.gml', 'edge/a.gml'],
      ['!(archive)/*.gml', 'core/a.gml'],
      ['networks/**', 'networks/x/y.graphml'],
    ];
    for (const [g, file] of ok) {
      expect([g, globProblem(g)]).toEqual([g, undefined]);
      expect([g, picomatch(g, { dot: true })(file)]).toEqual([g, true]);
    }
  });

  it('refuses globs that would select no file, each with a reason and a hint', () => {
    const bad: [string, RegExp][] = [
      ['**/*.{net.yaml', /"\{" that is never closed/],
      ['**/*.net.yaml}', /"\}" without its "\{"/],
      ['core/[ab', /"\[" that is never closed/],
      ['core/[!x]*.gml', /"\[!"/],
      ['@(core|edge/*.gml', /"\(" that is never closed/],
      ['core)/*.gml', /"\)" without its "\("/],
      ['/networks/*.gml', /absolute path/],
      ['C:\\net\\*.gml', /absolute path/],
      ['networks\\core.gml', /backslash/],
      ['networks/*.gml\\', /backslash/],
      ['!archive/**', /starts with "!"/],
      ['../net/*.gml', /"\.\." segment/],
      ['net/./a.gml', /"\." segment/],
      ['net//a.gml', /empty segment/],
      ['networks/', /matches directories/],
      [' networks/*.gml', /white space/],
    ];
    for (const [g, why] of bad) {
      const p = globProblem(g);
      expect(p?.message, g).toMatch(why);
      expect(p?.hint.length, g).toBeGreaterThan(0);
    }
  });
});
