import type { ErrorObject } from 'ajv';
import { type Segment, type YamlSource } from './yaml-source.js';
/** Plain words for where a value sits: "requirement 2", "challenge \"random\"", "scope 1, requirement 3". */
export declare function describePath(path: readonly Segment[]): string;
/** Throw one PolicyError for the schema errors: the first by position, the others as related lines. */
export declare function throwSchemaErrors(errors: readonly ErrorObject[], src: YamlSource): never;
