// `netbrace map` and `netbrace mend` as a user runs them (main(), in scratch folders and git
// repositories made here): the files they write, their exit codes, and their usage errors.
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import { closeWorkers } from '../../src/parallel/pool.js';
import { gateFixture } from '../gate/memory-repo.js';
import { recordIO } from './helpers-io.js';

const scratch: string[] = [];
afterAll(() => {
  for (const d of scratch) rmSync(d, { recursive: true, force: true });
  return closeWorkers();
});

function folder(files: Record<string, string>): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'netbrace-map-'));
  scratch.push(dir);
  for (const [p, text] of Object.entries(files)) {
    mkdirSync(path.dirname(path.join(dir, p)), { recursive: true });
    writeFileSync(path.join(dir, p), text);
  }
  return dir;
}

function git(cwd: string, ...args: string[]): string {
  return execFileSync('git', args, {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, GIT_AUTHOR_DATE: '2001-01-01T00:00:00Z', GIT_COMMITTER_DATE: '2001-01-01T00:00:00Z' },
  }).trim();
}

/** A repository whose main holds the ring; the working tree holds the chain (one span retired). */
function ringRepo(): string {
  const dir = folder({
    '.netbrace.yaml': gateFixture('policy.yaml'),
    'net/metro.net.yaml': gateFixture('ring-to-chain/base.net.yaml'),
  });
  git(dir, 'init', '-q', '-b', 'main');
  git(dir, 'config', 'user.email', 'planner@example.invalid');
  git(dir, 'config', 'user.name', 'Planner');
  git(dir, 'add', '-A');
  git(dir, 'commit', '-q', '-m', 'ring');
  writeFileSync(path.join(dir, 'net/metro.net.yaml'), gateFixture('ring-to-chain/head.net.yaml'));
  return dir;
}

async function cli(dir: string, ...args: string[]) {
  const io = recordIO(dir, { NO_COLOR: '1' });
  const code = await main(args, io);
  return { code, out: io.out.join(''), err: io.err.join('') };
}

describe('netbrace map', () => {
  it('writes the same SVG every time and with any number of threads, outside a repository too', async () => {
    const dir = folder({ 'ring.net.yaml': gateFixture('ring-to-chain/base.net.yaml') });
    const a = await cli(dir, 'map', 'ring.net.yaml', '--svg', 'out/a.svg');
    expect(a.code, a.err).toBe(0);
    expect(a.out).toContain('map of ring.net.yaml: 6 sites, 6 links (force-directed layout); written to out/a.svg');
    const svg = readFileSync(path.join(dir, 'out/a.svg'), 'utf8');
    expect(svg.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg"')).toBe(
      true,
    );
    expect(svg).not.toMatch(/<script/i);
    expect((await cli(dir, 'map', 'ring.net.yaml', '--svg', 'b.svg', '--threads', '2')).code).toBe(0);
    expect(readFileSync(path.join(dir, 'b.svg'), 'utf8')).toBe(svg);
  });

  it('draws the change against HEAD in a repository: the retired span dashed, the new bridges marked', async () => {
    const dir = ringRepo();
    const r = await cli(dir, 'map', 'net/metro.net.yaml', '--svg', 'change.svg');
    expect(r.code, r.err).toBe(0);
    expect(r.out).toContain('1 element changed');
    const svg = readFileSync(path.join(dir, 'change.svg'), 'utf8');
    expect(svg.match(/data-el="link" data-id="[^"]*" data-side="base"/g)).toHaveLength(1);
    expect(svg.match(/new bridge: its loss alone splits the design/g)).toHaveLength(5);
    expect(svg).toContain('data-el="proposed"');
  });

  it('reports an unreadable design at its line (exit 1) and usage errors (exit 2)', async () => {
    const dir = folder({ 'bad.net.yaml': 'nodes:\n  - id: a\n  - id: a\n' });
    const bad = await cli(dir, 'map', 'bad.net.yaml', '--svg', 'x.svg');
    expect(bad.code).toBe(1);
    expect(bad.err).toMatch(/^bad\.net\.yaml:3:\d+: duplicate node id "a"/);
    expect((await cli(dir, 'map', 'bad.net.yaml')).err).toContain('map needs --svg OUT');
    expect((await cli(dir, 'map', '--svg', 'x.svg')).code).toBe(2);
    expect((await cli(dir, 'map', 'a', 'b', '--svg', 'x.svg')).code).toBe(2);
    expect((await cli(dir, 'map', 'bad.net.yaml', '--svg', 'x.svg', '--base', 'main')).err).toContain(
      '--base needs a git repository',
    );
  });
});

describe('netbrace mend', () => {
  it('prints what would mend the chain, and --apply writes it; then check holds', async () => {
    const dir = ringRepo();
    const r = await cli(dir, 'mend', 'net/metro.net.yaml');
    expect(r.code, r.err).toBe(0);
    expect(r.out).toContain('What would mend net/metro.net.yaml');
    expect(r.out).toMatch(/1\. add 1 link — holds/);
    const json = await cli(dir, 'mend', 'net/metro.net.yaml', '--json');
    const m = JSON.parse(json.out);
    expect(m.suggestions[0].links.map((l: { between: string[] }) => [...l.between].sort())).toEqual([
      ['harbour', 'orchard'],
    ]);
    const applied = await cli(dir, 'mend', 'net/metro.net.yaml', '--apply', '1', '--out', 'net/mended.net.yaml');
    expect(applied.code).toBe(0);
    const text = readFileSync(path.join(dir, 'net/mended.net.yaml'), 'utf8');
    expect(text).toContain(
      `  - id: ${m.suggestions[0].links[0].id}\n    between: [${m.suggestions[0].links[0].between.join(', ')}]\n`,
    );
    // The original stays as it was; the mended copy holds against the ring.
    expect(readFileSync(path.join(dir, 'net/metro.net.yaml'), 'utf8')).toBe(gateFixture('ring-to-chain/head.net.yaml'));
    writeFileSync(path.join(dir, 'net/metro.net.yaml'), text);
    expect((await cli(dir, 'check')).code).toBe(0);
  });

  it('says there is nothing to mend for a design that holds (exit 0), and refuses what it cannot do (exit 2)', async () => {
    const dir = folder({
      'ring.net.yaml': gateFixture('ring-to-chain/base.net.yaml'),
      'chain.csv': 'source,target\na,b\nb,c\n',
    });
    const ok = await cli(dir, 'mend', 'ring.net.yaml');
    expect(ok.code).toBe(0);
    expect(ok.out).toContain('Nothing to mend');
    const none = await cli(dir, 'mend', 'ring.net.yaml', '--apply', '1', '--out', 'x.net.yaml');
    expect(none.code).toBe(2);
    expect(none.err).toContain('there is no suggestion 1');
    expect((await cli(dir, 'mend', 'ring.net.yaml', '--apply', '1')).err).toContain(
      '--apply N and --out FILE go together',
    );
    expect((await cli(dir, 'mend')).code).toBe(2);
  });
});
