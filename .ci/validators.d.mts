// Types of validators.mjs for the TypeScript that imports it (the benchmarks, the tests).
import type { Plugin } from 'esbuild';

export const VALIDATORS: Record<string, { schema: string; options: Record<string, unknown>; exported: string }>;
export function standaloneModule(srcDir: string, module: string): string;
export function precompiledValidators(): Plugin;
