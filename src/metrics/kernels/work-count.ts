// Operations the kernels actually perform, counted as they run: a deterministic measure of
// work (no clock) that tests hold the engine's work estimate against (envelope/cost.ts).
// Plain visits are nodes and adjacency entries touched once (a queue search, a renumbering, a
// survivor build, a union–find pass); word visits are the same touched by a bit-parallel level
// sweep, counted once per 32-bit word of sources it carries. Counting adds one addition per
// search or level, never per inner step, so it costs nothing measurable; nothing reads the
// counts but tests and benchmarks.
export const kernelWork = { visits: 0, wordVisits: 0 };

/** Sets both counts back to zero. */
export function resetKernelWork(): void {
  kernelWork.visits = 0;
  kernelWork.wordVisits = 0;
}
