import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import type { CommandIO } from '../../src/shell/io.js';
import { repoRoot } from '../topology/helpers.js';

const dir = mkdtempSync(path.join(tmpdir(), 'netbrace-inspect-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function write(name: string, text: string): string {
  const file = path.join(dir, name);
  writeFileSync(file, text);
  return file;
}

async function run(...argv: string[]) {
  let stdout = '';
  let stderr = '';
  const io: CommandIO = {
    stdout: (t) => (stdout += t),
    stderr: (t) => (stderr += t),
    cwd: repoRoot,
    env: {},
    stdoutIsTTY: false,
    stderrIsTTY: false,
  };
  const code = await main(argv, io);
  return { code, stdout, stderr };
}

// A spur: a–b–c is a path (two bridges, cut node b), c–d–e–c a triangle (cut node c), f isolated.
// Bridges and cut nodes follow from the definitions (common practice); networkx agrees (test/reference).
const SPUR = `nodes:
  - id: a
  - id: b
  - id: c
  - id: d
  - id: e
  - id: f
links:
  - {id: ab, between: [a, b]}
  - {id: bc, between: [b, c]}
  - {between: [c, d]}
  - {between: [d, e]}
  - {between: [e, c]}
  - {between: [e, e]}
`;

describe('netbrace inspect', () => {
  it('--json prints exactly one JSON object with the structure of the design', async () => {
    const file = write('spur.net.yaml', SPUR);
    const { code, stdout, stderr } = await run('inspect', '--json', file);
    expect([code, stderr]).toEqual([0, '']);
    const out = JSON.parse(stdout);
    expect(out).toMatchObject({
      file,
      format: 'native-yaml',
      nodes: 6,
      links: 5,
      components: 2,
      component_sizes: [5, 1],
      bridges: ['ab', 'bc'],
      cut_nodes: ['b', 'c'],
      isolated: ['f'],
      degree: { min: 0, mean: 1.667, max: 3 },
    });
    expect(out.warnings).toEqual([
      { line: 14, column: 5, message: 'self-loop on node "e" dropped', hint: expect.any(String) },
    ]);
  });

  it('prints a readable summary with the caution note', async () => {
    const { code, stdout } = await run('inspect', write('spur2.net.yaml', SPUR));
    expect(code).toBe(0);
    expect(stdout).toContain('  nodes 6, links 5\n  components 2 (sizes 5, 1)\n  degree min 0, mean 1.67, max 3\n');
    expect(stdout).toContain('  bridges 2: ab, bc\n  cut nodes 2: b, c\n  isolated nodes 1: f\n  warnings 1\n');
    expect(stdout).toContain('licensed practice decide');
  });

  it('reads every fixture format, relative to the working directory', async () => {
    for (const f of ['ring.net.yaml', 'ring.net.json', 'ring.gml', 'ring.graphml', 'ring.csv']) {
      const { code, stdout } = await run('inspect', '--json', `fixtures/designs/${f}`);
      expect(code, f).toBe(0);
      expect(JSON.parse(stdout), f).toMatchObject({
        nodes: 4,
        links: 5,
        parallel_links: 2,
        components: 1,
        bridges: [],
        cut_nodes: [],
      });
    }
  });

  it('several files: a bad one is reported and does not stop the others; exit 1', async () => {
    const bad = write('bad.gml', 'graph [\n  node [ id 1 ]\n');
    const { code, stdout, stderr } = await run(
      'inspect',
      '--json',
      'fixtures/designs/ring.csv',
      bad,
      'no/such.gml',
      'fixtures/designs/ring.gml',
    );
    expect(code).toBe(1);
    const out = JSON.parse(stdout);
    expect(
      out.files.map((f: { nodes?: number; error?: { line: number } }) => f.nodes ?? `error@${f.error?.line}`),
    ).toEqual([4, 'error@1', 'error@0', 4]);
    expect(out.files[1].error).toMatchObject({
      kind: 'design',
      message: 'unclosed "[": the list is never closed with "]"',
    });
    expect(stderr).toBe(
      `${bad}:1:7: unclosed "[": the list is never closed with "]" — add the missing "]" (check the brackets above the end of the file)\n` +
        'no/such.gml:1:1: no such file — check the path (it is read relative to the working directory)\n',
    );
  });

  it('--format forces a reader; --max-bytes refuses a large file before reading it', async () => {
    const txt = write('links.txt', 'source,target\nx,y\n');
    expect(JSON.parse((await run('inspect', '--json', '--format', 'csv', txt)).stdout)).toMatchObject({
      format: 'csv',
      nodes: 2,
    });
    const big = await run('inspect', '--max-bytes', '10', txt);
    expect(big.code).toBe(1);
    expect(big.stderr).toBe(
      `${txt}:1:1: the design file is larger than the limit (18 bytes > 10) — raise the limit (for the CLI: --max-bytes) if a file this large is intended\n`,
    );
  });

  it('the default 20 MB limit refuses a larger file from its size alone', async () => {
    const big = write('huge.gml', '');
    truncateSync(big, 25 * 1024 * 1024); // sparse: no 25 MB is written or read
    const { code, stderr } = await run('inspect', big);
    expect(code).toBe(1);
    expect(stderr).toContain(`${big}:1:1: the design file is larger than the limit (26214400 bytes > 20971520)`);
  });

  it('usage errors exit 2', async () => {
    expect((await run('inspect')).code).toBe(2);
    expect((await run('inspect', '--format', 'dot', 'x.gml')).stderr).toBe(
      'unknown design format "dot" — use one of yaml, json, graphml, gml, csv, geojson\n',
    );
    expect((await run('inspect', '--max-bytes', 'lots', 'x.gml')).code).toBe(2);
    expect((await run('inspect', '--colour', 'x.gml')).code).toBe(2);
  });

  it('--help describes the options', async () => {
    const { code, stdout } = await run('inspect', '--help');
    expect(code).toBe(0);
    expect(stdout).toMatch(/--max-bytes N/);
  });
});
