// Paths named by a user, a policy or an event never reach outside the workspace: `../x`,
// absolute paths, and symbolic links that point out (at the file or at a directory on the
// way). First the one module that decides (src/shell/workspace.ts), then every caller: the
// Action's inputs, the names the REST API returns, part report folders, `netbrace check`
// paths and --policy, a policy's `inherits` and design globs, and designs that are links.

import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  rmSync,
  symlinkSync,
  truncateSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isNetbraceError } from '../../src/errors.js';
import { joinReports } from '../../src/gate/join.js';
import type { Report } from '../../src/report/report.js';
import type { ActionDeps, GitResult } from '../../src/shell/action-deps.js';
import { run } from '../../src/shell/action-run.js';
import { createClient } from '../../src/shell/github.js';
import {
  prepareWrite,
  readInside,
  readInsideSync,
  repositoryPath,
  resolveInWorkspace,
  WorkspacePathError,
} from '../../src/shell/workspace.js';
import { startFakeApi, type FakeApi } from '../action/fake-api.js';
import { sampleReport } from '../report/sample-report.js';
import { cli, commitFiles, fakeGit, fixtureText, reportCount, scratchRepo } from './support.js';

let tmp: string;
let ws: string;
let outside: string;
const SECRET = 'SECRET-OUTSIDE-4c1d';

beforeAll(() => {
  tmp = mkdtempSync(path.join(tmpdir(), 'nb-paths-'));
  ws = path.join(tmp, 'ws');
  outside = path.join(tmp, 'outside');
  mkdirSync(ws);
  mkdirSync(outside);
  writeFileSync(path.join(outside, 'secret.net.yaml'), `# ${SECRET}\nnodes: [{id: ${SECRET}}]\n`);
  writeFileSync(path.join(outside, 'policy.yaml'), `# ${SECRET}\nseed: 1\n`);
  mkdirSync(path.join(ws, 'inner'));
  writeFileSync(path.join(ws, 'inner', 'ok.txt'), 'inside');
  symlinkSync(outside, path.join(ws, 'escape')); // a directory link out
  symlinkSync(path.join(outside, 'secret.net.yaml'), path.join(ws, 'secret-link.net.yaml')); // a file link out
  symlinkSync(path.join(ws, 'inner'), path.join(ws, 'inner-link')); // a link that stays inside
});
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

let refusals = 0;
function refusedWith(fn: () => unknown, pattern: RegExp): void {
  refusals++;
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(WorkspacePathError);
    expect(isNetbraceError(e) && e.kind).toBe('usage');
    expect((e as Error).message).toMatch(pattern);
    return;
  }
  expect.fail('expected a WorkspacePathError');
}

describe('workspace.ts: the one place that decides', () => {
  it('resolveInWorkspace refuses ../, absolute paths, NUL and links out, and accepts what stays inside', () => {
    for (const bad of ['../x.json', 'inner/../../x.json', path.join(outside, 'x.json'), '/etc/passwd'])
      refusedWith(() => resolveInWorkspace(ws, ws, bad, 'report'), /input "report" .*points outside the workspace/);
    for (const bad of ['escape/x.json', 'escape/new/dir/x.json', 'secret-link.net.yaml'])
      refusedWith(() => resolveInWorkspace(ws, ws, bad, 'sarif'), /input "sarif" .*through a symbolic link/);
    refusedWith(() => resolveInWorkspace(ws, ws, 'a\0b', 'html'), /NUL/);
    expect(resolveInWorkspace(ws, ws, 'inner-link/ok.txt', 'report')).toBe(path.join(ws, 'inner', 'ok.txt'));
    expect(resolveInWorkspace(ws, path.join(ws, 'inner'), '../out/r.json', 'report')).toBe(
      path.join(ws, 'out', 'r.json'),
    );
  });

  it('prepareWrite never writes through a link, not even one that points inside', () => {
    symlinkSync(path.join(ws, 'inner', 'ok.txt'), path.join(ws, 'link-inside.json'));
    refusedWith(() => prepareWrite(ws, ws, 'link-inside.json', 'report'), /is a symbolic link/);
    refusedWith(() => prepareWrite(ws, ws, 'inner', 'report'), /is a directory/);
    refusedWith(() => prepareWrite(ws, ws, 'escape/made/r.json', 'report'), /symbolic link/);
    expect(existsSync(path.join(outside, 'made'))).toBe(false);
    expect(prepareWrite(ws, ws, 'deep/er/r.json', 'report')).toBe(path.join(ws, 'deep', 'er', 'r.json'));
  });

  it('repositoryPath normalises repository paths and refuses the rest (no file system)', () => {
    expect(repositoryPath('./designs//core.net.yaml', 'x')).toBe('designs/core.net.yaml');
    expect(repositoryPath('a\\b\\..\\c.gml', 'x')).toBe('a/c.gml');
    for (const bad of ['/etc/passwd', 'C:/Windows/x', 'C:\\Windows\\x'])
      refusedWith(() => repositoryPath(bad, 'input "policy"'), /input "policy" .*absolute path/);
    for (const bad of ['..', '../x.yaml', 'a/../../x.yaml', '..\\x'])
      refusedWith(() => repositoryPath(bad, 'input "policy"'), /points outside the repository/);
  });

  it('readInside: null for what is absent, refusal for what is outside or too large (before reading)', async () => {
    expect(await readInside(ws, 'inner/ok.txt')).toBe('inside');
    expect(await readInside(ws, 'inner-link/ok.txt')).toBe('inside');
    expect(await readInside(ws, 'missing.gml')).toBeNull();
    expect(await readInside(ws, 'inner')).toBeNull();
    expect(await readInside(ws, 'inner/ok.txt/below')).toBeNull();
    for (const bad of ['../outside/secret.net.yaml', path.join(outside, 'secret.net.yaml')]) {
      refusals++;
      await expect(readInside(ws, bad)).rejects.toThrow(/outside the repository/);
    }
    for (const bad of ['secret-link.net.yaml', 'escape/secret.net.yaml']) {
      refusals++;
      await expect(readInside(ws, bad)).rejects.toThrow(/leads outside the repository through a symbolic link/);
      expect(() => readInsideSync(ws, bad)).toThrow(/symbolic link/);
    }
    writeFileSync(path.join(ws, 'huge.gml'), '');
    truncateSync(path.join(ws, 'huge.gml'), 2 ** 40); // 1 TiB, sparse: reading it is impossible
    refusals++;
    await expect(readInside(ws, 'huge.gml', 1024)).rejects.toThrow(
      `the file is larger than netbrace reads (${2 ** 40} bytes > 1024)`,
    );
    rmSync(path.join(ws, 'huge.gml'));
  });
});

// ---------------------------------------------------------------------------------------------
// The Action

const BASE = 'a'.repeat(40);
const HEAD = 'b'.repeat(40);

interface Recorded {
  failed: string[];
  warnings: string[];
  gateCalls: number;
}

function actionDeps(git: (args: string[]) => GitResult = fakeGit(ws)): { d: ActionDeps; rec: Recorded } {
  const rec: Recorded = { failed: [], warnings: [], gateCalls: 0 };
  const d: ActionDeps = {
    gate: async (request) => {
      rec.gateCalls++;
      const r: Report = sampleReport();
      r.mode = request.mode;
      return { report: r, exitCode: 1 };
    },
    join: joinReports,
    git: async (args) => git(args),
    github: (o) => createClient(o),
    renderHtml: () => '<!doctype html><title>r</title>',
    out: {
      annotate: () => {},
      info: () => {},
      warning: (m) => rec.warnings.push(m),
      setOutput: () => {},
      setFailed: (m) => rec.failed.push(m),
      appendSummary: () => {},
    },
  };
  return { d, rec };
}

let api: FakeApi;
beforeAll(async () => {
  api = await startFakeApi();
});
afterAll(() => api.close());

function actionEnv(over: Record<string, string> = {}): Record<string, string> {
  const event = path.join(tmp, 'event.json');
  writeFileSync(
    event,
    JSON.stringify({
      number: 3,
      pull_request: {
        number: 3,
        base: { sha: BASE, repo: { full_name: 'acme/net' } },
        head: { sha: HEAD, repo: { full_name: 'acme/net', fork: false } },
      },
    }),
  );
  return {
    GITHUB_WORKSPACE: ws,
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_EVENT_PATH: event,
    GITHUB_REPOSITORY: 'acme/net',
    GITHUB_API_URL: api.url,
    INPUT_TOKEN: 'tok',
    INPUT_COMMENT: 'off',
    NETBRACE_HTTP_RETRIES: '0',
    NETBRACE_HTTP_TIMEOUT_MS: '500',
    ...over,
  };
}

describe('Action inputs never reach outside the workspace', () => {
  const cases: [string, string, RegExp][] = [
    [
      'POLICY',
      '../outside/policy.yaml',
      /input "policy" \(\.\.\/outside\/policy\.yaml\) points outside the repository/,
    ],
    ['POLICY', '@outside/policy.yaml', /input "policy" .* is an absolute path/],
    ['REPORT', '../outside/r.json', /input "report" .* points outside the workspace/],
    ['REPORT', 'escape/r.json', /input "report" .* through a symbolic link/],
    ['SARIF', '@outside/r.sarif', /input "sarif" .* points outside the workspace/],
    ['SARIF', 'escape/deep/r.sarif', /input "sarif" .* through a symbolic link/],
    ['HTML', '../outside/r.html', /input "html" .* points outside the workspace/],
    ['HTML', 'escape/r.html', /input "html" .* through a symbolic link/],
    ['JOIN-PARTS', '../outside', /input "join-parts" .* points outside the workspace/],
    ['JOIN-PARTS', 'escape', /input "join-parts" .* through a symbolic link/],
    ['WORKING-DIRECTORY', '..', /input "working-directory" .* points outside the workspace/],
    ['WORKING-DIRECTORY', 'escape', /input "working-directory" .* through a symbolic link/],
  ];
  for (const [input, value, message] of cases) {
    it(`${input.toLowerCase()}: ${value.startsWith('@') ? '(absolute)' : value} → one clear failure, exit 2, nothing written outside`, async () => {
      refusals++;
      const given = value.replace('@outside', outside);
      const before = readdirSync(outside).sort();
      const { d, rec } = actionDeps();
      const outcome = await run(actionEnv({ [`INPUT_${input}`]: given }), d);
      expect(outcome.exitCode).toBe(2);
      expect(rec.failed).toHaveLength(1);
      expect(rec.failed[0]).toMatch(message);
      expect(rec.failed[0]).not.toMatch(/internal error|\n\s+at /);
      expect(readdirSync(outside).sort()).toEqual(before);
    });
  }

  it('file names from the REST API are data: one that climbs out makes the list untrusted (no pass on it)', async () => {
    refusals++;
    api.prFiles.length = 0;
    api.prFiles.push(
      { filename: 'README.md', status: 'modified' },
      { filename: '../../outside/secret.net.yaml', status: 'added' },
    );
    const missingBase = fakeGit(ws, BASE);
    const { d, rec } = actionDeps(missingBase);
    const outcome = await run(actionEnv({ INPUT_COMMENT: 'off' }), d);
    // Not "no design changed, pass": the base is needed, and the message says how to get it.
    expect(outcome.exitCode).toBe(2);
    expect(rec.gateCalls).toBe(0);
    expect(rec.failed[0]).toContain('fetch-depth: 0');
    // Without the hostile name, the same list would have been trusted: nothing to judge, a pass.
    api.prFiles.pop();
    const again = actionDeps(missingBase);
    expect((await run(actionEnv(), again.d)).exitCode).toBe(0);
  });

  it('a part report that is a link out of the join folder is never read', async () => {
    refusals++;
    const parts = path.join(ws, 'parts');
    mkdirSync(parts);
    const r = sampleReport();
    writeFileSync(path.join(parts, 'a.json'), JSON.stringify(r));
    writeFileSync(
      path.join(outside, 'b.json'),
      JSON.stringify({ ...r, files: [{ path: SECRET, status: 'unreadable', findings: [], requirements: [] }] }),
    );
    symlinkSync(path.join(outside, 'b.json'), path.join(parts, 'b.json'));
    symlinkSync(outside, path.join(parts, 'more'));
    const summaries: string[] = [];
    const { d } = actionDeps();
    d.out.appendSummary = (m) => void summaries.push(m);
    const outcome = await run(actionEnv({ 'INPUT_JOIN-PARTS': 'parts' }), d);
    expect(outcome.verdict).toBe('fail');
    expect(summaries.join('')).not.toContain(SECRET);
    expect(summaries.join('')).toContain('Joined from 1 part report');
  });
});

// ---------------------------------------------------------------------------------------------
// netbrace check, policies and designs that are links

describe('the gate on the command line', () => {
  let repo: string;
  beforeAll(() => {
    repo = scratchRepo(tmp, { 'designs/ring.net.yaml': fixtureText('designs', 'ring.net.yaml') });
  });

  it('PATH and --policy arguments outside the repository are refused (exit 2)', async () => {
    for (const args of [
      ['check', '../outside/secret.net.yaml'],
      ['check', path.join(outside, 'secret.net.yaml')],
      ['check', '--policy', '../outside/policy.yaml'],
    ]) {
      refusals++;
      const r = await cli(repo, ...args);
      expect(r.code, r.err).toBe(2);
      expect(r.err).toMatch(/is not inside the repository/);
      expect(r.out + r.err).not.toContain(SECRET);
    }
  });

  it('a design in the working tree that is a link out is refused, its target never read', async () => {
    refusals++;
    symlinkSync(path.join(outside, 'secret.net.yaml'), path.join(repo, 'designs', 'evil.net.yaml'));
    const r = await cli(repo, 'check', '--worktree');
    rmSync(path.join(repo, 'designs', 'evil.net.yaml'));
    expect(r.code).toBe(2);
    expect(r.err).toBe('designs/evil.net.yaml leads outside the repository through a symbolic link\n');
    expect(r.out + r.err).not.toContain(SECRET);
  });

  it('a committed link is judged as what git stores (the link text), never its target', async () => {
    refusals++;
    symlinkSync(path.join(outside, 'secret.net.yaml'), path.join(repo, 'designs', 'committed.net.yaml'));
    const head = commitFiles(repo, {}, 'add a link');
    const r = await cli(repo, 'check', '--head', head, '--format', 'json');
    const report = JSON.parse(r.out) as Report;
    const f = report.files.find((x) => x.path === 'designs/committed.net.yaml')!;
    expect(f.status).toBe('unreadable');
    expect(r.out + r.err).not.toContain(SECRET);
    commitFiles(repo, { 'designs/committed.net.yaml': null }, 'remove the link');
  });

  it('a policy whose inherits climbs out, or that is itself a link out, is refused', async () => {
    refusals += 2;
    commitFiles(repo, { '.netbrace.yaml': 'inherits: ../../outside/policy.yaml\n' }, 'policy inherits out');
    let r = await cli(repo, 'check', '--worktree', '--policy-source', 'head');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^\.netbrace\.yaml:1:\d+: "inherits" leaves the repository/);
    rmSync(path.join(repo, '.netbrace.yaml'));
    symlinkSync(path.join(outside, 'policy.yaml'), path.join(repo, '.netbrace.yaml'));
    r = await cli(repo, 'check', '--worktree', '--policy-source', 'head');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/\.netbrace\.yaml leads outside the repository through a symbolic link/);
    expect(r.out + r.err).not.toContain(SECRET);
    rmSync(path.join(repo, '.netbrace.yaml'));
    commitFiles(repo, { '.netbrace.yaml': null }, 'no policy');
  });

  it('design globs that name ../ or absolute paths are refused where they are written; only repository files are judged', async () => {
    refusals++;
    // Such a glob can match no repository path: it is a policy error at its line (policy/globs.ts).
    for (const glob of ['../**', `${outside}/**`, '/**/*.net.yaml']) {
      commitFiles(repo, { '.netbrace.yaml': `designs:\n  - paths: ["**/*.net.yaml", "${glob}"]\n` }, 'globs');
      const r = await cli(
        repo,
        'check',
        '--worktree',
        '--policy-source',
        'head',
        '--format',
        'json',
        'designs/ring.net.yaml',
      );
      expect([glob, r.code, r.out]).toEqual([glob, 2, '']);
      expect(r.err).toMatch(/^\.netbrace\.yaml:2:30: designs entry 1, glob "/);
      expect(r.err).not.toContain(SECRET);
    }
    commitFiles(repo, { '.netbrace.yaml': 'designs:\n  - paths: ["**/*.net.yaml"]\n' }, 'globs');
    const r = await cli(
      repo,
      'check',
      '--worktree',
      '--policy-source',
      'head',
      '--format',
      'json',
      'designs/ring.net.yaml',
    );
    expect(r.code, r.err).toBeLessThan(2);
    // (the base's policy is the refused one: the head's judges)
    const all = await cli(
      repo,
      'check',
      '--head',
      'HEAD',
      '--base',
      'HEAD~1',
      '--policy-source',
      'head',
      '--format',
      'json',
    );
    for (const out of [r.out, all.out]) {
      const report = JSON.parse(out) as Report;
      for (const f of report.files) expect(f.path.startsWith('..') || path.isAbsolute(f.path)).toBe(false);
      expect(out).not.toContain(SECRET);
    }
  });

  it('outside a git repository, paths are held to the working directory the same way', async () => {
    refusals++;
    const plain = mkdtempSync(path.join(tmp, 'plain-'));
    writeFileSync(path.join(plain, 'ring.net.yaml'), fixtureText('designs', 'ring.net.yaml'));
    symlinkSync(path.join(outside, 'secret.net.yaml'), path.join(plain, 'evil.net.yaml'));
    expect((await cli(plain, 'check', 'ring.net.yaml')).code).toBeLessThan(2);
    const up = await cli(plain, 'check', '../outside/secret.net.yaml');
    expect(up.code).toBe(2);
    expect(up.err).toMatch(/outside the repository/);
    const link = await cli(plain, 'check', 'evil.net.yaml');
    expect(link.code).toBe(2);
    expect(link.err).toMatch(/symbolic link/);
    expect(up.out + up.err + link.out + link.err).not.toContain(SECRET);
  });
});

afterAll(() => reportCount('paths', 'refusals', refusals));
