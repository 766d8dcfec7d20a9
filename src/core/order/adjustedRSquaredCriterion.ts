/**
 * Maximum adjusted R²: choose the order m that maximises R²_adj = 1 − s²(m) / (S_t / (n − 1)).
 *
 * S_t is the centred total sum of squares (uncentred Σv² with n in place of n − 1 for a fit without intercept).
 * Since S_t is the same for every order, this is the minimum-residual-variance rule in another form; both are
 * reported because reviewers know both.
 *
 * Reference: Draper & Smith, *Applied Regression Analysis*, 3rd ed., §2.6; https://en.wikipedia.org/wiki/Coefficient_of_determination#Adjusted_R2
 *
 * @example
 * adjustedRSquaredOf(table, 2) // => 1 − (S_r(2)/(n − 3)) / (S_t/(n − 1))
 */
import { argminOrder } from './argminOrder.ts';
import { fitOfOrder, residualVarianceOf, type CandidateTable, type OrderCriterion } from './criterion.ts';

/**
 * Adjusted R² of one fitted order (NaN without residual degrees of freedom or with S_t = 0).
 * @example adjustedRSquaredOf(table, table.fits[1]) // => 1 − (S_r/(n − p))/(S_t/(n − 1)) of that order
 */
export function adjustedRSquaredOf(table: CandidateTable, order: number): number {
  const totalDof = table.intercept ? table.n - 1 : table.n;
  if (!(table.totalSumOfSquares > 0)) return Number.NaN;
  return 1 - residualVarianceOf(fitOfOrder(table, order)) / (table.totalSumOfSquares / totalDof);
}

export const adjustedRSquaredCriterion: OrderCriterion = {
  name: 'adjustedRSquared',
  label: 'adj-R² max',
  rule: 'Choose the order with the largest adjusted R².',
  requiresUncertainty: false,
  choose(table: CandidateTable): number {
    return argminOrder(table, (order) => -adjustedRSquaredOf(table, order));
  },
  explain(table: CandidateTable, order: number): string {
    const value = adjustedRSquaredOf(table, order);
    return `Order ${order} has the largest adjusted R² = ${value.toPrecision(8)} among orders ${table.minCandidate} to ${table.maxCandidate}.`;
  },
};
