// Pairing a deleted design with the added one that replaces it (gate/pair-designs.ts): by the
// network's name first, then by base name in one directory, never when either is ambiguous.
import { describe, expect, it } from 'vitest';
import { designStem, pairDesigns } from '../../src/gate/pair-designs.js';

describe('pairDesigns', () => {
  it('pairs by the network name when exactly one deleted and one added design carry it', () => {
    expect(
      pairDesigns(
        [
          { path: 'old/metro.net.yaml', name: 'Metro' },
          { path: 'lab.gml', name: 'Lab' },
        ],
        [{ path: 'new/metro-2027.graphml', name: ' Metro ' }],
      ),
    ).toEqual([{ previousPath: 'old/metro.net.yaml', path: 'new/metro-2027.graphml', by: 'network name' }]);
  });

  it('falls back to the base name without extension, in the same directory only', () => {
    expect(pairDesigns([{ path: 'net/ring.net.yaml', name: 'A' }], [{ path: 'net/ring.graphml', name: 'B' }])).toEqual([
      { previousPath: 'net/ring.net.yaml', path: 'net/ring.graphml', by: 'base name' },
    ]);
    expect(pairDesigns([{ path: 'net/ring.net.yaml' }], [{ path: 'other/ring.graphml' }])).toEqual([]);
  });

  it('leaves an ambiguous name to the base name, and an ambiguous base name unpaired', () => {
    // Two deletions named "Ring": the name says nothing; the base name pairs b.
    expect(
      pairDesigns(
        [
          { path: 'n/a.net.yaml', name: 'Ring' },
          { path: 'n/b.net.yaml', name: 'Ring' },
        ],
        [{ path: 'n/b.gml', name: 'Ring' }],
      ).map((p) => [p.previousPath, p.by]),
    ).toEqual([['n/b.net.yaml', 'base name']]);
    // ring.net.yaml and ring.net.json both deleted, ring.gml added: which one it replaces is a guess.
    expect(pairDesigns([{ path: 'n/ring.net.yaml' }, { path: 'n/ring.net.json' }], [{ path: 'n/ring.gml' }])).toEqual(
      [],
    );
    // Two added with one name, one deleted: unpaired too.
    expect(
      pairDesigns(
        [{ path: 'x.gml', name: 'N' }],
        [
          { path: 'y.gml', name: 'N' },
          { path: 'z.gml', name: 'N' },
        ],
      ),
    ).toEqual([]);
  });

  it('pairs each file once: a name pair is not paired again by base name', () => {
    const pairs = pairDesigns(
      [
        { path: 'n/ring.net.yaml', name: 'East' },
        { path: 'n/west.net.yaml', name: 'West' },
      ],
      [
        { path: 'n/ring.graphml', name: 'West' },
        { path: 'n/east.gml', name: 'East' },
      ],
    );
    expect(pairs.map((p) => [p.previousPath, p.path])).toEqual([
      ['n/ring.net.yaml', 'n/east.gml'],
      ['n/west.net.yaml', 'n/ring.graphml'],
    ]);
  });

  it('knows the stems of every design extension', () => {
    expect(
      [
        'a/ring.net.yaml',
        'a/ring.net.yml',
        'a/ring.net.json',
        'a/ring.graphml',
        'a/ring.GML',
        'a/ring.csv',
        'a/ring.yaml',
        'a/ring.xml',
      ].map(designStem),
    ).toEqual(Array(8).fill('a/ring'));
    expect(designStem('a/.hidden')).toBe('a/.hidden');
  });
});
