// Shared test helpers for the topology parsers.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import { isNetbraceError, type NetbraceError } from '../../src/errors.js';

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

export function fixture(name: string): string {
  return readFileSync(path.join(repoRoot, 'fixtures', 'designs', name), 'utf8');
}

/** Runs `fn`, expects a NetbraceError, and returns it for further checks. */
export function caught(fn: () => unknown): NetbraceError {
  try {
    fn();
  } catch (e) {
    if (isNetbraceError(e)) return e;
    throw e;
  }
  expect.fail('expected a NetbraceError, but nothing was thrown');
}
