// Schema validators compiled ahead of time. src/policy/policy-validator.ts and
// src/topology/design-validator.ts compile their JSON schema with ajv when first asked for,
// which costs a bundled run a noticeable part of its start; this esbuild plugin gives the
// bundles ajv's standalone code of the same schema and options instead (the sources, run by
// tsx and the tests, keep compiling). test/policy/validators.test.ts holds both to the same
// answers and these options to the modules' own.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

const require = createRequire(import.meta.url);

/** By module (path under src/): its schema, ajv's options, and the function it exports. */
export const VALIDATORS = {
  'policy/policy-validator.ts': {
    schema: 'policy/policy.schema.json',
    options: { allErrors: true, verbose: true, discriminator: true, strict: false },
    exported: 'policyValidator',
  },
  'topology/design-validator.ts': {
    schema: 'topology/design.schema.json',
    options: { allErrors: true, verbose: true, strict: true, allowUnionTypes: true },
    exported: 'designValidator',
  },
};

/** The replacement module for `srcDir/module`: ajv's standalone ESM code plus the module's export. */
export function standaloneModule(srcDir, module) {
  const { schema, options, exported } = VALIDATORS[module];
  const Ajv = require('ajv').default;
  const standalone = require('ajv/dist/standalone').default;
  const ajv = new Ajv({ ...options, code: { source: true, esm: true } });
  const validate = ajv.compile(JSON.parse(readFileSync(path.join(srcDir, schema), 'utf8')));
  return `${standalone(ajv, validate)}\nexport function ${exported}() { return validate; }\n`;
}

/** esbuild plugin: the validator modules of the bundled sources, precompiled. */
export function precompiledValidators() {
  return {
    name: 'precompiled-validators',
    setup(build) {
      build.onLoad({ filter: /[\\/]src[\\/](policy[\\/]policy|topology[\\/]design)-validator\.ts$/ }, (args) => {
        const srcDir = path.dirname(path.dirname(args.path));
        const module = path.relative(srcDir, args.path).split(path.sep).join('/');
        return { contents: standaloneModule(srcDir, module), loader: 'js', resolveDir: path.dirname(args.path) };
      });
    },
  };
}
