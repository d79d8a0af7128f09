// Turns ajv's schema errors into our diagnostics: one plain sentence per problem, at the
// line and column where it was written, with a "did you mean" when a name is close to a
// known one (or is the former name of one).

import type { ErrorObject } from 'ajv';
import { PolicyError } from '../errors.js';
import { closest } from '../topology/suggest.js';
import { type Segment, pointerSegments, type YamlSource } from './yaml-source.js';
import type { Where } from './types.js';

interface Diagnosed {
  where: Where;
  message: string;
  hint: string;
}

/** Plain words for where a value sits: "requirement 2", "challenge \"random\"", "scope 1, requirement 3". */
export function describePath(path: readonly Segment[]): string {
  if (path.length === 0) return 'the policy';
  const parts: string[] = [];
  let i = 0;
  while (i < path.length) {
    const seg = path[i];
    const next = path[i + 1];
    if (seg === 'requirements' && typeof next === 'number') {
      parts.push(`requirement ${next + 1}`);
      i += 2;
    } else if (seg === 'scopes' && typeof next === 'number') {
      parts.push(`scope ${next + 1}`);
      i += 2;
    } else if (seg === 'designs' && typeof next === 'number') {
      parts.push(`designs entry ${next + 1}`);
      i += 2;
    } else if (seg === 'challenges' && next !== undefined) {
      parts.push(`challenge "${next}"`);
      i += 2;
    } else if (typeof next === 'number') {
      parts.push(`item ${next + 1} of "${seg}"`);
      i += 2;
    } else {
      parts.push(`"${seg}"`);
      i += 1;
    }
  }
  return parts.join(', ');
}

const TYPE_WORDS: Record<string, string> = {
  object: 'a mapping (key: value lines)',
  array: 'a list',
  string: 'text',
  number: 'a number',
  integer: 'a whole number',
  boolean: 'true or false',
};

function typeOf(value: unknown): string {
  if (value === null || value === undefined) return 'empty';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'a mapping';
  if (typeof value === 'string') return `the text "${value}"`;
  if (typeof value === 'number') return Number.isInteger(value) ? `the number ${value}` : `the number ${value}`;
  return String(value);
}

/**
 * Keys renamed before the first release. The old names are not accepted; the unknown-key
 * error names the new one wherever the new one is a known key.
 */
const RENAMED_KEYS: Readonly<Record<string, string>> = {
  extends: 'inherits',
  ignore: 'exclude',
  files: 'paths',
  overrides: 'scopes',
  regression: 'weakening',
  'noise-factor': 'error-multiple',
};

/** The new name of a renamed key, when it is one of the keys known where the old one was written. */
function renamedKey(key: string, known: readonly string[]): string | undefined {
  const renamed = Object.hasOwn(RENAMED_KEYS, key) ? RENAMED_KEYS[key] : undefined;
  return renamed !== undefined && known.includes(renamed) ? renamed : undefined;
}

/** "path\0new name" for each key written under its former name. */
function renamedAt(e: ErrorObject): string | undefined {
  if (e.keyword !== 'additionalProperties') return undefined;
  const known = Object.keys(
    ((e.parentSchema as Record<string, unknown> | undefined)?.properties as object | undefined) ?? {},
  );
  const renamed = renamedKey(String((e.params as Record<string, unknown>).additionalProperty), known);
  return renamed === undefined ? undefined : `${e.instancePath}\0${renamed}`;
}

function suggestion(word: unknown, candidates: readonly string[], listName: string): string {
  const c = typeof word === 'string' ? closest(word, candidates) : undefined;
  return c !== undefined ? `did you mean "${c}"?` : `${listName}: ${candidates.join(', ')}`;
}

function diagnose(e: ErrorObject, src: YamlSource): Diagnosed | undefined {
  const path = pointerSegments(e.instancePath);
  const subject = describePath(path);
  const parentSchema = e.parentSchema as Record<string, unknown> | undefined;
  const params = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'additionalProperties': {
      const key = String(params.additionalProperty);
      const known = Object.keys((parentSchema?.properties as object | undefined) ?? {});
      const where = src.where([...path, key], true);
      if (path.length === 2 && path[0] === 'r-value' && path[1] === 'metrics') {
        return { where, message: `unknown metric "${key}"`, hint: suggestion(key, known, 'known metrics') };
      }
      const renamed = renamedKey(key, known);
      const hint = renamed !== undefined ? `did you mean "${renamed}"?` : suggestion(key, known, 'known keys');
      return { where, message: `unknown key "${key}" in ${subject}`, hint };
    }
    case 'required': {
      const key = String(params.missingProperty);
      return { where: src.where(path), message: `${subject} is missing "${key}"`, hint: `add a "${key}:" line` };
    }
    case 'type': {
      const want = String(params.type)
        .split(',')
        .map((t) => TYPE_WORDS[t] ?? t)
        .join(' or ');
      return { where: src.where(path), message: `${subject} must be ${want}, not ${typeOf(e.data)}`, hint: '' };
    }
    case 'enum': {
      const allowed = (params.allowedValues as unknown[]).map(String);
      return {
        where: src.where(path),
        message: `${subject} cannot be ${typeOf(e.data)}; it is one of ${allowed.join(', ')}`,
        hint: suggestion(e.data, allowed, 'allowed'),
      };
    }
    case 'const':
      return { where: src.where(path), message: `${subject} must be ${JSON.stringify(params.allowedValue)}`, hint: '' };
    case 'minimum':
    case 'maximum':
    case 'exclusiveMinimum':
    case 'exclusiveMaximum': {
      const op = { minimum: '≥', maximum: '≤', exclusiveMinimum: '>', exclusiveMaximum: '<' }[e.keyword];
      return {
        where: src.where(path),
        message: `${subject} must be ${op} ${String(params.limit)} (it is ${String(e.data)})`,
        hint: '',
      };
    }
    case 'minItems':
    case 'maxItems': {
      const exact = parentSchema?.minItems !== undefined && parentSchema.minItems === parentSchema.maxItems;
      const n = String(params.limit);
      const message = exact
        ? `${subject} must have exactly ${n} items`
        : e.keyword === 'minItems'
          ? `${subject} needs at least ${n} item${n === '1' ? '' : 's'}`
          : `${subject} may have at most ${n} items`;
      return { where: src.where(path), message, hint: '' };
    }
    case 'minProperties':
      return { where: src.where(path), message: `${subject} needs at least one entry`, hint: '' };
    case 'minLength':
      return { where: src.where(path), message: `${subject} must not be empty`, hint: '' };
    case 'uniqueItems':
      return {
        where: src.where(path),
        message: `${subject} lists the same item twice`,
        hint: 'remove the repeated item',
      };
    case 'propertyNames':
      return {
        where: src.where([...path, String(params.propertyName)], true),
        message: `the name "${String(params.propertyName)}" in ${subject} may use only letters, digits, "-", "_" and "."`,
        hint: '',
      };
    case 'anyOf':
      return {
        where: src.where(path),
        message: `${subject} must be a glob or a list of globs`,
        hint: 'e.g. "networks/**/*.graphml"',
      };
    case 'discriminator': {
      if (params.error === 'mapping') {
        const kinds = requirementKinds(parentSchema);
        return {
          where: src.where([...path, 'kind']),
          message: `unknown requirement kind "${String(params.tagValue)}"`,
          hint: suggestion(params.tagValue, kinds, 'kinds'),
        };
      }
      // A missing "kind" is reported by the "required" error.
      const data = e.data as Record<string, unknown> | null;
      if (data === null || typeof data !== 'object' || data.kind === undefined) return undefined;
      return { where: src.where([...path, 'kind']), message: `${subject}: "kind" must be text`, hint: '' };
    }
    // Sub-errors of propertyNames and anyOf are reported through their parent error.
    case 'pattern':
      return undefined;
    default:
      return { where: src.where(path), message: `${subject}: ${e.message ?? 'is not valid'}`, hint: '' };
  }
}

function requirementKinds(schema: Record<string, unknown> | undefined): string[] {
  const branches = (schema?.oneOf as { properties?: { kind?: { const?: string } } }[] | undefined) ?? [];
  return branches.map((b) => b.properties?.kind?.const ?? '').filter((k) => k !== '');
}

/** Throw one PolicyError for the schema errors: the first by position, the others as related lines. */
export function throwSchemaErrors(errors: readonly ErrorObject[], src: YamlSource): never {
  // An anyOf error explains its branches' failures; drop those.
  const anyOfPaths = errors.filter((e) => e.keyword === 'anyOf').map((e) => e.instancePath);
  // A required key written under its former name is missing too: say only that it was renamed.
  const renamed = new Set(errors.map(renamedAt).filter((r) => r !== undefined));
  const kept = errors.filter(
    (e) =>
      (e.keyword === 'anyOf' || !anyOfPaths.some((p) => e.instancePath === p || e.instancePath.startsWith(`${p}/`))) &&
      !(
        e.keyword === 'required' &&
        renamed.has(`${e.instancePath}\0${String((e.params as Record<string, unknown>).missingProperty)}`)
      ),
  );
  const seen = new Set<string>();
  const list: Diagnosed[] = [];
  for (const e of kept) {
    const d = diagnose(e, src);
    if (!d) continue;
    const key = `${d.where.line}:${d.where.column}:${d.message}`;
    if (seen.has(key)) continue;
    seen.add(key);
    list.push(d);
  }
  list.sort((a, b) => a.where.line - b.where.line || a.where.column - b.where.column);
  const [first, ...rest] = list;
  throw new PolicyError(
    first.message,
    first.where,
    first.hint,
    rest.slice(0, 20).map((d) => ({ ...d.where, message: d.hint ? `${d.message} — ${d.hint}` : d.message })),
  );
}
