/** Edit distance with unit costs, two-row dynamic programme, O(|a|·|b|) time. */
export declare function levenshtein(a: string, b: string): number;
/**
 * The candidate closest to `word` (case-insensitive), or undefined when none is within
 * about a third of the word's length (at least 1, at most 3 edits).
 */
export declare function closest(word: string, candidates: Iterable<string>): string | undefined;
/** `did you mean "x"?` or the fallback text. */
export declare function didYouMean(word: string, candidates: Iterable<string>, fallback?: string): string;
