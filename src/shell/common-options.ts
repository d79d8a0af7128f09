// The options the command line and the Action share — seed, threads, part, mode — read by one
// parser, so both accept the same values. Each caller words a refusal its own way: the CLI
// as `--seed must be …, not "x"`, the Action as `input "seed" is "x"; use …`.

export const MODES = ['block', 'inform'] as const;
export type Mode = (typeof MODES)[number];

/** Parts are at most this many (a matrix of jobs larger than this is a mistake). */
export const MAX_PARTS = 256;

export interface SharedOption<T> {
  /** The value the text stands for, or undefined when it stands for none. */
  read(text: string): T | undefined;
  /** What a valid value looks like, for the message. */
  expected: string;
}

function whole(min: number, max: number): SharedOption<number> {
  return {
    read: (text) => (/^[0-9]+$/.test(text) && Number(text) >= min && Number(text) <= max ? Number(text) : undefined),
    expected: `a whole number from ${min} to ${max}`,
  };
}

/** The seed of every random challenge (what the policy's `seed` holds). */
export const SEED = whole(0, 0xffffffff);

/** Worker threads; results do not depend on the count. */
export const THREADS = whole(1, 256);

/** Part k of n (1-based): the gate judges only the designs whose path hash falls in that slice. */
export const PART: SharedOption<{ index: number; total: number }> = {
  read(text) {
    const m = /^\s*([0-9]+)\s*\/\s*([0-9]+)\s*$/.exec(text);
    if (!m) return undefined;
    const [index, total] = [Number(m[1]), Number(m[2])];
    return index >= 1 && index <= total && total <= MAX_PARTS ? { index, total } : undefined;
  },
  expected: `K/N with 1 \u2264 K \u2264 N \u2264 ${MAX_PARTS}`,
};

/** block: the step (or command) fails when the gate does; inform: it reports and passes. */
export const MODE: SharedOption<Mode> = {
  read: (text) => ((MODES as readonly string[]).includes(text) ? (text as Mode) : undefined),
  expected: `one of: ${MODES.join(', ')}`,
};
