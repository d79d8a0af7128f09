// git through execFile, against real scratch repositories: odd file names, renames, the
// working tree with untracked files, a shallow clone missing its base, refs that look like options.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync, renameSync, mkdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { GitError, UsageError } from '../../src/errors.js';
import {
  checkRef,
  ensureCommit,
  gitDeps,
  hasCommit,
  listChanged,
  listFiles,
  parseNameStatus,
  revParse,
  showFile,
} from '../../src/shell/git.js';

const scratch: string[] = [];
afterAll(() => {
  for (const d of scratch) rmSync(d, { recursive: true, force: true });
});

const git = (cwd: string, ...args: string[]) => execFileSync('git', args, { cwd, encoding: 'utf8' }).trim();

function repo(): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'netbrace-git-'));
  scratch.push(dir);
  git(dir, 'init', '-q', '-b', 'main');
  git(dir, 'config', 'user.email', 'planner@example.invalid');
  git(dir, 'config', 'user.name', 'Planner');
  git(dir, 'config', 'commit.gpgsign', 'false');
  return dir;
}

const RING =
  'graph [\n  node [ id 1 ]\n  node [ id 2 ]\n  node [ id 3 ]\n  edge [ source 1 target 2 ]\n  edge [ source 2 target 3 ]\n  edge [ source 3 target 1 ]\n]\n';

describe('git', () => {
  it('lists changes with renames, odd names and the untracked files of the working tree', async () => {
    const dir = repo();
    mkdirSync(path.join(dir, 'net'));
    writeFileSync(path.join(dir, 'net', 'old name.gml'), RING);
    writeFileSync(
      path.join(dir, 'net', 'gone.gml'),
      RING.replace('id 3', 'id 4').replace(/target 3|source 3/g, (m) => m.replace('3', '4')),
    );
    writeFileSync(path.join(dir, 'net', 'edit.gml'), RING);
    git(dir, 'add', '-A');
    git(dir, 'commit', '-q', '-m', 'base');
    const base = git(dir, 'rev-parse', 'HEAD');
    renameSync(path.join(dir, 'net', 'old name.gml'), path.join(dir, 'net', 'ünï "quoted"\tname.gml'));
    rmSync(path.join(dir, 'net', 'gone.gml'));
    writeFileSync(path.join(dir, 'net', 'edit.gml'), RING.replace(']\n', '  edge [ source 1 target 3 ]\n]\n'));
    git(dir, 'add', '-A');
    git(dir, 'commit', '-q', '-m', 'head');
    const head = git(dir, 'rev-parse', 'HEAD');
    const changed = await listChanged(dir, base, head);
    expect(changed.sort((a, b) => a.path.localeCompare(b.path))).toEqual([
      { status: 'modified', path: 'net/edit.gml' },
      { status: 'deleted', path: 'net/gone.gml' },
      { status: 'renamed', path: 'net/ünï "quoted"\tname.gml', previousPath: 'net/old name.gml' },
    ]);
    expect(await showFile(dir, base, 'net/old name.gml')).toBe(RING);
    expect(await showFile(dir, head, 'net/old name.gml')).toBeNull();
    // The working tree: an untracked design is added; a deleted tracked file is gone from the list.
    writeFileSync(path.join(dir, 'net', 'new.gml'), RING);
    rmSync(path.join(dir, 'net', 'edit.gml'));
    const wt = await listChanged(dir, head, 'worktree');
    expect(wt).toContainEqual({ status: 'added', path: 'net/new.gml' });
    expect(wt).toContainEqual({ status: 'deleted', path: 'net/edit.gml' });
    expect(await listFiles(dir, 'worktree')).toEqual(['net/new.gml', 'net/ünï "quoted"\tname.gml']);
    const deps = gitDeps(dir);
    expect(await deps.readAt('worktree', 'net/new.gml')).toBe(RING);
    expect(await deps.readAt('worktree', 'net/edit.gml')).toBeNull();
    await expect(deps.readAt('worktree', '../outside.gml')).rejects.toBeInstanceOf(UsageError);
  });

  it('fetches the one missing base commit of a shallow clone', async () => {
    const origin = repo();
    writeFileSync(path.join(origin, 'a.gml'), RING);
    git(origin, 'add', '-A');
    git(origin, 'commit', '-q', '-m', 'base');
    const base = git(origin, 'rev-parse', 'HEAD');
    writeFileSync(path.join(origin, 'a.gml'), RING.replace('id 3 ]', 'id 3 label "x" ]'));
    git(origin, 'commit', '-q', '-am', 'head');
    const clone = mkdtempSync(path.join(os.tmpdir(), 'netbrace-shallow-'));
    scratch.push(clone);
    git(clone, 'clone', '-q', '--depth', '1', `file://${origin}`, '.');
    expect(await hasCommit(clone, base)).toBe(false);
    await ensureCommit(clone, base);
    expect(await hasCommit(clone, base)).toBe(true);
    expect(await showFile(clone, base, 'a.gml')).toBe(RING);
    const missing = 'f'.repeat(40);
    const error = await ensureCommit(clone, missing).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(GitError);
    expect((error as GitError).hint).toContain('fetch-depth: 0');
  });

  it('refuses refs that git could read as options', async () => {
    expect(() => checkRef('--output=/tmp/x')).toThrow(UsageError);
    expect(() => checkRef('main\nHEAD')).toThrow(UsageError);
    expect(checkRef('feature/x')).toBe('feature/x');
    await expect(revParse('.', '-h')).rejects.toBeInstanceOf(UsageError);
  });

  it('parses name-status output', () => {
    expect(parseNameStatus('M\0a.gml\0R087\0b.gml\0c d.gml\0A\0e.gml\0')).toEqual([
      { status: 'modified', path: 'a.gml' },
      { status: 'renamed', path: 'c d.gml', previousPath: 'b.gml' },
      { status: 'added', path: 'e.gml' },
    ]);
  });
});
