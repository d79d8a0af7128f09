// `netbrace envelope` end to end through main(), on the committed fixtures.
import { describe, expect, it } from 'vitest';
import { main } from '../../src/shell/dispatch.js';
import { challenges } from '../../src/challenges/registry.js';
import { recordIO } from '../shell/helpers-io.js';

const root = new URL('../..', import.meta.url).pathname;
const design = 'fixtures/demo/base/designs/lunmere-backbone.net.yaml';

async function run(...args: string[]) {
  const io = recordIO(root);
  const code = await main(['envelope', ...args], io);
  return { code, out: io.out.join(''), err: io.err.join('') };
}

describe('netbrace envelope', () => {
  it('--help lists every challenge with one line', async () => {
    const { code, out } = await run('--help');
    expect(code).toBe(0);
    for (const c of challenges) expect(out).toMatch(new RegExp(`^  ${c.name} +\\S.*$`, 'm'));
  });

  it('prints the envelope JSON fields, worst case included when asked', async () => {
    const { code, out } = await run(
      design,
      '--challenge',
      'random-links',
      '--metric',
      'largest_component',
      '--realizations',
      '30',
      '--worst-case',
      '2',
      '--json',
      '--threads',
      '1',
    );
    expect(code).toBe(0);
    const j = JSON.parse(out);
    for (const key of ['challenge', 'x', 'min', 'max', 'mean', 'quantiles', 'area', 'spread', 'weakest', 'worst_case'])
      expect(j).toHaveProperty(key);
    expect(j.challenge).toBe('random-links');
    expect(Object.keys(j.quantiles)).toEqual(['0.1', '0.5', '0.9']);
    expect(j.quantiles['0.1']).toHaveProperty('lo');
    expect(j.weakest).toHaveLength(3);
    expect(j.weakest[0].elements.length).toBe(j.weakest[0].values.length);
    expect(j.worst_case.method).toBe('exact');
    expect(j.worst_case.elements).toHaveLength(2);
    expect(j.caution).toMatch(/engineering judgement/);
  });

  it('gives a targeted attack its curve at every removal step and its sequence', async () => {
    const { code, out } = await run(
      design,
      '--challenge',
      'degree',
      '--metric',
      'largest_component',
      '--until',
      '0.2',
      '--json',
    );
    expect(code).toBe(0);
    const j = JSON.parse(out);
    expect(j.values.length).toBe(j.sequence.length + 1);
    expect(j.x[0]).toBe(0);
    expect(j.values[0]).toBe(1);
  });

  it('prints byte-identical JSON for 1 and 2 threads', async () => {
    const args = [design, '--challenge', 'random-nodes', '--metric', 'efficiency', '--realizations', '40', '--json'];
    const one = await run(...args, '--threads', '1');
    const two = await run(...args, '--threads', '2');
    expect(one.code).toBe(0);
    expect(two.out).toBe(one.out);
  });

  it('accepts a weighted score and reports N−1 on links', async () => {
    const { code, out } = await run(
      design,
      '--challenge',
      'n-1',
      '--element',
      'link',
      '--score',
      'efficiency=2,largest_component=1',
      '--json',
    );
    expect(code).toBe(0);
    const j = JSON.parse(out);
    expect(j.r.metrics).toEqual([
      { id: 'efficiency', weight: 2 },
      { id: 'largest_component', weight: 1 },
    ]);
    expect(j.evaluated).toBe(j.total);
    expect(j.worst[0].elements).toHaveLength(1);
  });

  it('refuses bad usage with exit code 2', async () => {
    expect((await run(design)).code).toBe(2);
    expect((await run(design, '--challenge', 'bogus')).code).toBe(2);
    expect((await run(design, '--challenge', 'degree', '--metric', 'nope')).code).toBe(2);
    expect((await run(design, '--challenge', 'random-nodes', '--band', '0.9,0.1')).code).toBe(2);
    expect((await run(design, '--challenge', 'random-nodes', '--until', '2')).code).toBe(2);
    const noCoords = await run('fixtures/designs/ring.csv', '--challenge', 'regional');
    expect(noCoords.code).toBe(2);
    expect(noCoords.err).toMatch(/no site has coordinates/);
  });

  it('says when the design cannot be read (exit 1)', async () => {
    const { code, err } = await run('fixtures/designs/missing.yaml', '--challenge', 'degree');
    expect(code).toBe(1);
    expect(err).toMatch(/no such file/);
  });
});
