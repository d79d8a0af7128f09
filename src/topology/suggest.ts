// "Did you mean …?" for misspelt keys and ids: the closest candidate by Levenshtein
// edit distance (Levenshtein, Soviet Physics Doklady 10:707, 1966), if it is close enough.

/** Edit distance with unit costs, two-row dynamic programme, O(|a|·|b|) time. */
export function levenshtein(a: string, b: string): number {
  if (a === b) return 0;
  if (a.length === 0) return b.length;
  if (b.length === 0) return a.length;
  let prev = new Int32Array(b.length + 1);
  let cur = new Int32Array(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    const ca = a.charCodeAt(i - 1);
    for (let j = 1; j <= b.length; j++) {
      const cost = ca === b.charCodeAt(j - 1) ? 0 : 1;
      cur[j] = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost);
    }
    [prev, cur] = [cur, prev];
  }
  return prev[b.length];
}

/** Candidates compared at most; suggestions are a courtesy on the error path, not a search. */
const MAX_CANDIDATES = 5000;
/** Longest word a suggestion is looked for. */
const MAX_WORD = 64;

/**
 * The candidate closest to `word` (case-insensitive), or undefined when none is within
 * about a third of the word's length (at least 1, at most 3 edits).
 */
export function closest(word: string, candidates: Iterable<string>): string | undefined {
  // Edit distance is quadratic in the length: long words (hostile ids) get no suggestion.
  if (word.length > MAX_WORD) return undefined;
  const limit = Math.min(3, Math.max(1, Math.ceil(word.length / 3)));
  const w = word.toLowerCase();
  let best: string | undefined;
  let bestDistance = limit + 1;
  let seen = 0;
  for (const c of candidates) {
    if (++seen > MAX_CANDIDATES) break;
    if (Math.abs(c.length - word.length) > limit) continue;
    const d = levenshtein(w, c.toLowerCase());
    // Replacing a whole short word is not a typo fix ("c" is not a misspelt "a").
    if (d < bestDistance && d < word.length) {
      best = c;
      bestDistance = d;
    }
  }
  return best;
}

/** `did you mean "x"?` or the fallback text. */
export function didYouMean(word: string, candidates: Iterable<string>, fallback = ''): string {
  const c = closest(word, candidates);
  return c === undefined ? fallback : `did you mean "${c}"?`;
}
