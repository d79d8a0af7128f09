import type { Requirement } from './types.js';
export declare function requirementId(r: Requirement): string;
