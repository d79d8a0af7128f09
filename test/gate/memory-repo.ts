// An in-memory two-revision repository for gate tests: the GateDeps the orchestrator needs,
// with no git and no disk.
import type { ChangedFile, GateDeps } from '../../src/run-gate.js';

export interface MemoryRepo {
  base: Record<string, string>;
  head: Record<string, string>;
  /** head path → base path, for files git would report as renamed. */
  renames?: Record<string, string>;
}

export function memoryDeps(repo: MemoryRepo, extra: Partial<GateDeps> = {}): GateDeps & { reads: string[] } {
  const reads: string[] = [];
  const side = (rev: string) => (rev === 'base' ? repo.base : repo.head);
  return {
    reads,
    listChanged(base, head) {
      const b = side(base);
      const h = side(head);
      const renamedFrom = new Set(Object.values(repo.renames ?? {}));
      const out: ChangedFile[] = [];
      for (const path of Object.keys(h)) {
        const from = repo.renames?.[path];
        if (from !== undefined) out.push({ status: 'renamed', path, previousPath: from });
        else if (!(path in b)) out.push({ status: 'added', path });
        else if (b[path] !== h[path]) out.push({ status: 'modified', path });
      }
      for (const path of Object.keys(b))
        if (!(path in h) && !renamedFrom.has(path)) out.push({ status: 'deleted', path });
      return out;
    },
    readAt(rev, path) {
      reads.push(`${rev}:${path}`);
      return side(rev)[path] ?? null;
    },
    listAll(rev) {
      return Object.keys(side(rev)).sort();
    },
    ...extra,
  };
}

import { readFileSync } from 'node:fs';
import path from 'node:path';

export const repoRoot = path.resolve(import.meta.dirname, '..', '..');

/** A file under fixtures/gate/. */
export function gateFixture(name: string): string {
  return readFileSync(path.join(repoRoot, 'fixtures', 'gate', name), 'utf8');
}

/** 1-based line of the first line containing `needle`. */
export function lineOf(text: string, needle: string): number {
  const i = text.split('\n').findIndex((l) => l.includes(needle));
  if (i < 0) throw new Error(`"${needle}" is not in the text`);
  return i + 1;
}

/** Base and head of a fixture pair as one design file, with the fixtures' policy on both sides. */
export function pairRepo(
  pair: string,
  file = 'networks/site.net.yaml',
  policy = gateFixture('policy.yaml'),
): MemoryRepo {
  return {
    base: { '.netbrace.yaml': policy, [file]: gateFixture(`${pair}/base.net.yaml`) },
    head: { '.netbrace.yaml': policy, [file]: gateFixture(`${pair}/head.net.yaml`) },
  };
}
