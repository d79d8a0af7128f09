import type { PolicyFile, Where } from './types.js';
/** Normalise a repository path: forward slashes, no "." segments; PolicyError if it leaves the repository. */
export declare function joinRepoPath(fromFile: string, relative: string, where: Where): string;
/** Parse and check one policy file. Throws PolicyError with file:line:col. */
export declare function parsePolicyFile(text: string, file: string): PolicyFile;
