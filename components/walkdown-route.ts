/**
 * A site's route, pure: the order of its tanks for the walk, and one move of one stop.
 */

/**
 * The route's tanks that still exist, in the route's order, then every other tank in the order
 * given (the board's): a tank added later joins the end, a deleted one drops out.
 */
export function routeOrder(ids: readonly string[], route?: readonly string[]): string[] {
  if (!route?.length) return [...ids];
  const present = new Set(ids);
  const first = [...new Set(route)].filter((id) => present.has(id));
  const seen = new Set(first);
  return [...first, ...ids.filter((id) => !seen.has(id))];
}

/** The order with stop `from` moved one place up (−1) or down (+1); the same array at an end. */
export function moveStop(ids: string[], from: number, by: -1 | 1): string[] {
  const to = from + by;
  if (from < 0 || from >= ids.length || to < 0 || to >= ids.length) return ids;
  const next = [...ids];
  [next[from], next[to]] = [next[to]!, next[from]!];
  return next;
}
