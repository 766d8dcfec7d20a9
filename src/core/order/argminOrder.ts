/**
 * The candidate order with the smallest score; ties (within 1e-12 relative) go to the lowest order.
 * Orders whose score is NaN (undefined for that order) are skipped.
 */
import type { CandidateTable } from './criterion.ts';

/**
 * @param score the criterion value of one order (smaller is better), NaN when undefined
 * @returns the best order, or minCandidate when every score is NaN
 * @example
 * argminOrder(table, (order) => [5, 2, 2, 3][order - 1]!) // => 2 with minCandidate 1 (tie at 2 goes low)
 */
export function argminOrder(table: CandidateTable, score: (order: number) => number): number {
  let bestOrder = table.minCandidate;
  let bestScore = Number.NaN;
  for (let order = table.minCandidate; order <= table.maxCandidate; order++) {
    const value = score(order);
    if (Number.isNaN(value)) continue;
    if (Number.isNaN(bestScore) || value < bestScore - 1e-12 * Math.abs(bestScore)) {
      bestScore = value;
      bestOrder = order;
    }
  }
  return bestOrder;
}
