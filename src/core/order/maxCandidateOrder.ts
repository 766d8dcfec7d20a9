/**
 * Highest candidate order for automatic selection: min(maxOrder, n − 2, distinct x − 1).
 *
 * n − 2 keeps at least one residual degree of freedom for every candidate (the default rule further keeps two);
 * distinct x − 1 is the highest order the points can identify (repeated x values add no new column rank).
 * Orders above 10 are rarely meaningful for property data and grow ill-conditioned even on [−1, 1].
 *
 * @param n number of points
 * @param distinctCount number of distinct x values
 * @param maxOrder configured cap (default 10)
 * @example
 * maxCandidateOrder(8, 8) // => 6
 * maxCandidateOrder(50, 50) // => 10
 * maxCandidateOrder(12, 4) // => 3
 */
export const DEFAULT_MAX_ORDER = 10;

/**
 * @example maxCandidateOrder(8, 8, 10) // => 6
 */
export function maxCandidateOrder(n: number, distinctCount: number, maxOrder: number = DEFAULT_MAX_ORDER): number {
  return Math.min(maxOrder, n - 2, distinctCount - 1);
}
