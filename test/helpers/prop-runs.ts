/**
 * How many cases a fast-check property runs: the test's own figure, or fewer when the
 * environment variable PROP_RUNS is set (the mutation-testing config sets it so a mutant does not
 * rerun hundreds of random cases; `npm test` leaves it unset and runs the full count).
 */
export function propRuns(full: number): number {
  const cap = Number(process.env.PROP_RUNS);
  return Number.isInteger(cap) && cap > 0 ? Math.min(full, cap) : full;
}

/**
 * A floor on how many of a property's cases reached some state, scaled to the cases actually run:
 * `floor` out of `full` when the count is not capped.
 */
export function propShare(full: number, floor: number): number {
  return (floor * propRuns(full)) / full;
}
