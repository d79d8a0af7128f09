// Command-line option parsing shared by every subcommand: node's parseArgs in strict mode,
// with its errors turned into a UsageError that points at the command's help, and the few
// value checks the commands need (whole numbers, choices).

import { parseArgs, type ParseArgsConfig } from 'node:util';
import { UsageError } from '../errors.js';
import type { SharedOption } from './common-options.js';

type Options = NonNullable<ParseArgsConfig['options']>;

/** Parse `args` strictly against `options`; unknown or malformed options are a UsageError. */
export function parseCommandArgs<const O extends Options>(
  command: string,
  args: string[],
  options: O,
  allowPositionals = true,
) {
  try {
    return parseArgs({ args, options, allowPositionals, strict: true });
  } catch (e) {
    const message = (e instanceof Error ? e.message : String(e)).split('\n')[0];
    throw new UsageError(message, `run "netbrace ${command} --help" for the options`);
  }
}

/** A whole number in [min, max] given as `--name VALUE`, or undefined when the option is absent. */
export function wholeNumber(
  name: string,
  value: string | undefined,
  min: number,
  max = Number.MAX_SAFE_INTEGER,
): number | undefined {
  if (value === undefined) return undefined;
  if (!/^[0-9]+$/.test(value) || Number(value) < min || Number(value) > max) {
    const range = max === Number.MAX_SAFE_INTEGER ? `≥ ${min}` : `from ${min} to ${max}`;
    throw new UsageError(`${name} must be a whole number ${range}, not "${value}"`);
  }
  return Number(value);
}

/** A finite number passing `check` (described by `what`), or undefined when absent. */
export function finiteNumber(
  name: string,
  value: string | undefined,
  check: (x: number) => boolean,
  what: string,
): number | undefined {
  if (value === undefined) return undefined;
  const x = Number(value);
  if (value.trim() === '' || !Number.isFinite(x) || !check(x))
    throw new UsageError(`${name} must be ${what}, not "${value}"`);
  return x;
}

/** One of `allowed`, or `fallback` when absent. */
export function choice<T extends string>(
  name: string,
  value: string | undefined,
  allowed: readonly T[],
  fallback: T,
): T {
  if (value === undefined) return fallback;
  if (!(allowed as readonly string[]).includes(value))
    throw new UsageError(`${name} must be ${allowed.join(', ')}, not "${value}"`);
  return value as T;
}

/** An option the CLI shares with the Action (common-options.ts), or undefined when absent. */
export function sharedOption<T>(
  name: string,
  value: string | undefined,
  option: SharedOption<T>,
  hint?: string,
): T | undefined {
  if (value === undefined) return undefined;
  const read = option.read(value);
  if (read === undefined) throw new UsageError(`${name} must be ${option.expected}, not "${value}"`, hint);
  return read;
}
