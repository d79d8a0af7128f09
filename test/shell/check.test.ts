// `netbrace check` and `netbrace init` in scratch git repositories made here (git init, commit
// the base, commit the head), through the CLI's main() as a user runs it.
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { Ajv } from 'ajv';
import { main } from '../../src/shell/dispatch.js';
import { STARTER_POLICY } from '../../src/policy/defaults.js';
import schema from '../../src/report/report.schema.json' with { type: 'json' };
import type { Report } from '../../src/report/report.js';
import { gateFixture } from '../gate/memory-repo.js';
import { recordIO } from './helpers-io.js';

const scratch: string[] = [];
afterAll(() => {
  for (const d of scratch) rmSync(d, { recursive: true, force: true });
});

function git(cwd: string, ...args: string[]): string {
  return execFileSync('git', args, {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, GIT_AUTHOR_DATE: '2001-01-01T00:00:00Z', GIT_COMMITTER_DATE: '2001-01-01T00:00:00Z' },
  }).trim();
}

function newRepo(files: Record<string, string>): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'netbrace-check-'));
  scratch.push(dir);
  git(dir, 'init', '-q', '-b', 'main');
  git(dir, 'config', 'user.email', 'planner@example.invalid');
  git(dir, 'config', 'user.name', 'Planner');
  git(dir, 'config', 'commit.gpgsign', 'false');
  commit(dir, files, 'base');
  return dir;
}

function put(dir: string, files: Record<string, string | null>): void {
  for (const [p, text] of Object.entries(files)) {
    const full = path.join(dir, p);
    if (text === null) rmSync(full);
    else {
      mkdirSync(path.dirname(full), { recursive: true });
      writeFileSync(full, text);
    }
  }
}

function commit(dir: string, files: Record<string, string | null>, message: string): string {
  put(dir, files);
  git(dir, 'add', '-A');
  git(dir, 'commit', '-q', '--allow-empty', '-m', message);
  return git(dir, 'rev-parse', 'HEAD');
}

async function check(cwd: string, ...args: string[]) {
  const io = recordIO(cwd, { NO_COLOR: '1' });
  const code = await main(args, io);
  return { code, out: io.out.join(''), err: io.err.join('') };
}

const DESIGN = 'networks/metro.net.yaml';
const validate = new Ajv({ strict: false }).compile(schema);

describe('netbrace check in a git repository', () => {
  it('a committed change that makes a chain of a ring fails, with the bridges and their lines in the JSON report', async () => {
    const dir = newRepo({
      [DESIGN]: gateFixture('ring-to-chain/base.net.yaml'),
      '.netbrace.yaml': gateFixture('policy.yaml'),
    });
    const base = git(dir, 'rev-parse', 'HEAD');
    const head = commit(dir, { [DESIGN]: gateFixture('ring-to-chain/head.net.yaml') }, 'retire the orchard span');
    const r = await check(dir, 'check', '--head', 'HEAD', '--json', 'out/report.json');
    expect(r.code).toBe(1);
    expect(r.out).toContain('networks/metro.net.yaml');
    const report = JSON.parse(readFileSync(path.join(dir, 'out/report.json'), 'utf8')) as Report;
    expect(validate(report)).toBe(true);
    expect([report.base, report.head, report.verdict]).toEqual([base, head, 'fail']);
    expect(report.policy).toMatchObject({ source: 'file', path: '.netbrace.yaml', revision: base });
    const f = report.files[0];
    expect([f.path, f.status]).toEqual([DESIGN, 'weakened']);
    expect(f.findings.filter((x) => x.rule === 'new-bridge').map((x) => x.line)).toEqual([12, 13, 14, 15, 16]);
  });

  it('judges the working tree against HEAD by default; a redundant link passes', async () => {
    const dir = newRepo({ [DESIGN]: gateFixture('redundant-link/base.net.yaml') });
    put(dir, { [DESIGN]: gateFixture('redundant-link/head.net.yaml') });
    const r = await check(dir, 'check', '--format', 'json');
    expect(r.code).toBe(0);
    const report = JSON.parse(r.out) as Report;
    expect(report.head).toBe('worktree');
    expect(report.policy.source).toBe('builtin');
    expect(report.files.map((f) => [f.path, f.status])).toEqual([[DESIGN, 'holds']]);
    expect(report.files[0].requirements.find((x) => x.id === 'area-floor:node-failures')!.delta).toBeGreaterThan(0);
  });

  it('the same run twice writes byte-identical reports', async () => {
    const dir = newRepo({ [DESIGN]: gateFixture('removed-node/base.net.yaml') });
    put(dir, { [DESIGN]: gateFixture('removed-node/head.net.yaml') });
    const a = await check(dir, 'check', '--format', 'json', '--seed', '5');
    const b = await check(dir, 'check', '--format', 'json', '--seed', '5', '--threads', '2');
    expect(a.out).toBe(b.out);
    expect(JSON.parse(a.out).seed).toBe(5);
  });

  it('--base BRANCH compares with where the branch left it; renames are followed', async () => {
    const dir = newRepo({ 'old/metro.net.yaml': gateFixture('unchanged/base.net.yaml') });
    git(dir, 'checkout', '-q', '-b', 'feature');
    renameSync(path.join(dir, 'old'), path.join(dir, 'networks'));
    commit(dir, {}, 'move the designs');
    // main moves on with an unrelated design the branch does not have: not part of this change.
    git(dir, 'checkout', '-q', 'main');
    commit(dir, { 'other/lab.gml': 'graph [\n  node [ id 1 ]\n]\n' }, 'lab');
    git(dir, 'checkout', '-q', 'feature');
    const r = await check(dir, 'check', '--base', 'main', '--head', 'HEAD', '--format', 'json');
    expect(r.code).toBe(0);
    const report = JSON.parse(r.out) as Report;
    expect(report.files.map((f) => [f.path, f.status, f.previousPath])).toEqual([
      [DESIGN, 'renamed', 'old/metro.net.yaml'],
    ]);
    for (const x of report.files[0].requirements) expect(x.delta).toBe(0);
  });

  it('a policy loosened by the change itself is reported and not applied', async () => {
    const dir = newRepo({
      [DESIGN]: gateFixture('ring-to-chain/base.net.yaml'),
      '.netbrace.yaml': gateFixture('policy.yaml'),
    });
    commit(
      dir,
      { [DESIGN]: gateFixture('ring-to-chain/head.net.yaml'), '.netbrace.yaml': 'requirements: []\n' },
      'sneaky',
    );
    const r = await check(dir, 'check', '--head', 'HEAD', '--format', 'json');
    expect(r.code).toBe(1);
    expect((JSON.parse(r.out) as Report).policy.changed).toBe(true);
    const trusting = await check(dir, 'check', '--head', 'HEAD', '--policy-source', 'head', '--format', 'json');
    expect(trusting.code).toBe(0);
  });

  it('inform mode reports the failure and exits 0; markdown goes to stdout; files are written', async () => {
    const dir = newRepo({ [DESIGN]: gateFixture('ring-to-chain/base.net.yaml') });
    put(dir, { [DESIGN]: gateFixture('ring-to-chain/head.net.yaml') });
    const r = await check(
      dir,
      'check',
      '--mode',
      'inform',
      '--format',
      'markdown',
      '--summary',
      's.md',
      '--sarif',
      'r.sarif',
      '--html',
      'r.html',
    );
    expect(r.code).toBe(0);
    expect(r.out).toContain('metro.net.yaml');
    expect(readFileSync(path.join(dir, 's.md'), 'utf8')).toBe(r.out);
    expect(JSON.parse(readFileSync(path.join(dir, 'r.sarif'), 'utf8')).version).toBe('2.1.0');
    expect(readFileSync(path.join(dir, 'r.html'), 'utf8')).toMatch(/^<!DOCTYPE html>/i);
  });

  it('a design given as a path is judged against HEAD, from a subfolder too', async () => {
    const dir = newRepo({ [DESIGN]: gateFixture('unchanged/base.net.yaml') });
    const r = await check(path.join(dir, 'networks'), 'check', 'metro.net.yaml', '--format', 'json');
    const report = JSON.parse(r.out) as Report;
    expect([r.code, report.scope, report.files[0].path]).toEqual([0, 'paths', DESIGN]);
    expect(report.files[0].findings).toEqual([]);
  });

  it('a broken policy stops with file:line:col and exit 2 before anything is judged', async () => {
    const dir = newRepo({
      [DESIGN]: gateFixture('unchanged/base.net.yaml'),
      '.netbrace.yaml': 'requirements:\n  - kind: n-1\n    min: 2\n',
    });
    put(dir, { [DESIGN]: gateFixture('ring-to-chain/head.net.yaml') });
    const r = await check(dir, 'check', '--json', 'never.json');
    expect(r.code).toBe(2);
    expect(r.err).toBe('.netbrace.yaml:3:10: requirement 1, "min" must be ≤ 1 (it is 2)\n');
    expect(existsSync(path.join(dir, 'never.json'))).toBe(false);
  });

  it('usage errors exit 2 with a message', async () => {
    const dir = newRepo({ [DESIGN]: gateFixture('unchanged/base.net.yaml') });
    for (const args of [
      ['--bogus'],
      ['--mode', 'strict'],
      ['--head', 'HEAD', '--worktree'],
      ['--part', '3/2'],
      ['--base', 'no-such-branch'],
      ['--seed', '-1'],
      ['../outside.net.yaml'],
      ['--base', '--upload-pack=evil'],
    ]) {
      const r = await check(dir, 'check', ...args);
      expect([args, r.code]).toEqual([args, 2]);
      expect(r.err.length).toBeGreaterThan(0);
    }
  });

  it('the former option names and mode values are refused, naming what to use', async () => {
    const dir = newRepo({ [DESIGN]: gateFixture('unchanged/base.net.yaml') });
    for (const [args, message] of [
      [['--mode', 'enforce'], '--mode must be one of: block, inform, not "enforce"'],
      [['--mode', 'advise'], '--mode must be one of: block, inform, not "advise"'],
      [['--shard', '1/2'], "Unknown option '--shard'"],
    ] as const) {
      const r = await check(dir, 'check', ...args);
      expect([args, r.code]).toEqual([args, 2]);
      expect(r.err).toContain(message);
    }
    expect((await check(dir, 'check', '--help')).out).toContain('--part K/N');
  });

  it('outside a git repository it judges the given files on thresholds only', async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'netbrace-plain-'));
    scratch.push(dir);
    writeFileSync(path.join(dir, 'chain.net.yaml'), gateFixture('ring-to-chain/head.net.yaml'));
    const r = await check(dir, 'check', 'chain.net.yaml', '--format', 'json');
    const report = JSON.parse(r.out) as Report;
    expect([r.code, report.base, report.files[0].status]).toEqual([0, undefined, 'holds']);
    expect((await check(dir, 'check')).code).toBe(2);
  });
});

describe('netbrace init', () => {
  it('writes the starter policy at the repository root and refuses to overwrite it', async () => {
    const dir = newRepo({ 'README.md': 'x' });
    mkdirSync(path.join(dir, 'sub'));
    const first = await check(path.join(dir, 'sub'), 'init');
    expect(first.code).toBe(0);
    expect(readFileSync(path.join(dir, '.netbrace.yaml'), 'utf8')).toBe(STARTER_POLICY);
    writeFileSync(path.join(dir, '.netbrace.yaml'), '# mine\n');
    const again = await check(dir, 'init');
    expect(again.code).toBe(2);
    expect(again.err).toContain('exists already');
    expect(readFileSync(path.join(dir, '.netbrace.yaml'), 'utf8')).toBe('# mine\n');
  });

  it('the starter policy is what applies without one: the same report', async () => {
    const dir = newRepo({ [DESIGN]: gateFixture('ring-to-chain/base.net.yaml') });
    put(dir, { [DESIGN]: gateFixture('ring-to-chain/head.net.yaml') });
    const without = JSON.parse((await check(dir, 'check', '--format', 'json')).out) as Report;
    await check(dir, 'init');
    git(dir, 'add', '.netbrace.yaml');
    git(dir, 'commit', '-q', '-m', 'add the starter policy');
    const withIt = JSON.parse((await check(dir, 'check', '--format', 'json')).out) as Report;
    expect(withIt.policy.source).toBe('file');
    expect(withIt.files.map((f) => f.requirements)).toEqual(without.files.map((f) => f.requirements));
    expect(withIt.files.map((f) => f.findings)).toEqual(without.files.map((f) => f.findings));
  });
});
