import type { PolicyFile, Where } from './types.js';
/**
 * Range of a metric weight in the r-value. Only ratios matter; a million to one is already more
 * than any mix means, and the bounds keep the weighted sum far from overflow (a weight of 1e308
 * made the sum Infinity and R 0 everywhere) and from subnormal products.
 */
export declare const MIN_METRIC_WEIGHT = 0.000001;
export declare const MAX_METRIC_WEIGHT = 1000000;
/** Normalise a repository path: forward slashes, no "." segments; PolicyError if it leaves the repository. */
export declare function joinRepoPath(fromFile: string, relative: string, where: Where): string;
/** Parse and check one policy file. Throws PolicyError with file:line:col. */
export declare function parsePolicyFile(text: string, file: string): PolicyFile;
