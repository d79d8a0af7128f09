// `netbrace check PATH` when the path is not there: a usage error that names it (exit 2),
// outside a git repository and inside one, never a design reported as removed.
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import { gateFixture } from '../gate/memory-repo.js';
import { recordIO } from './helpers-io.js';

const scratch: string[] = [];
afterAll(() => {
  for (const d of scratch) rmSync(d, { recursive: true, force: true });
});

function tmp(prefix: string): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), prefix));
  scratch.push(dir);
  return dir;
}

async function check(cwd: string, ...args: string[]) {
  const io = recordIO(cwd, { NO_COLOR: '1' });
  const code = await main(['check', ...args], io);
  return { code, out: io.out.join(''), err: io.err.join('') };
}

describe('check with a path that does not exist', () => {
  it('outside a git repository: exit 2, the path named, nothing judged', async () => {
    const dir = tmp('netbrace-plain-');
    writeFileSync(path.join(dir, 'ring.net.yaml'), gateFixture('ring-to-chain/base.net.yaml'));
    const r = await check(dir, 'missing.net.yaml', '--format', 'json');
    expect(r.code).toBe(2);
    expect(r.err).toContain('missing.net.yaml does not exist');
    expect(r.out).toBe('');
    // With an existing design beside it, the missing one still stops the run.
    const both = await check(dir, 'ring.net.yaml', 'sub/missing.gml');
    expect([both.code, both.out]).toEqual([2, '']);
    expect(both.err).toContain('sub/missing.gml does not exist');
    // A directory is not a design file either.
    mkdirSync(path.join(dir, 'designs'));
    expect((await check(dir, 'designs')).err).toContain('designs does not exist (or is not a file)');
    // And the existing one alone is judged as before.
    expect((await check(dir, 'ring.net.yaml')).code).toBe(0);
  });

  it('inside a git repository: a path at neither side is exit 2 and named, in the working tree and between commits', async () => {
    const dir = tmp('netbrace-git-');
    const git = (...args: string[]) => execFileSync('git', args, { cwd: dir, encoding: 'utf8' });
    git('init', '-q', '-b', 'main');
    git('config', 'user.email', 'planner@example.invalid');
    git('config', 'user.name', 'Planner');
    git('config', 'commit.gpgsign', 'false');
    writeFileSync(path.join(dir, 'ring.net.yaml'), gateFixture('ring-to-chain/base.net.yaml'));
    git('add', '-A');
    git('commit', '-q', '-m', 'base');
    git('commit', '-q', '--allow-empty', '-m', 'head');
    for (const args of [
      ['missing.net.yaml'],
      ['--head', 'HEAD', 'missing.net.yaml'],
      ['--head', 'HEAD^', 'missing.net.yaml'],
    ]) {
      const r = await check(dir, ...args);
      expect([args, r.code, r.out]).toEqual([args, 2, '']);
      // HEAD^ is the first commit: no parent to compare with, so the head alone is asked.
      expect(r.err).toMatch(
        args.includes('HEAD^')
          ? /^missing\.net\.yaml does not exist at [0-9a-f]{40} /
          : /^missing\.net\.yaml exists neither at /,
      );
    }
  });

  it('inside a repository without a commit yet: the working tree only, the same error', async () => {
    const dir = tmp('netbrace-fresh-');
    execFileSync('git', ['init', '-q', '-b', 'main'], { cwd: dir });
    const r = await check(dir, 'missing.net.yaml');
    expect(r.code).toBe(2);
    expect(r.err).toContain('missing.net.yaml does not exist');
  });
});
