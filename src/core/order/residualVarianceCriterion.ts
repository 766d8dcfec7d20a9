/**
 * Minimum residual variance: choose the order m that minimises s²(m) = S_r(m) / (n − m − 1).
 *
 * The classic textbook rule: add terms while they lower the variance per residual degree of freedom. It adds a
 * term whenever that term's F ratio exceeds about 1 (roughly α ≈ 0.3 per step), so it over-fits; it is kept for
 * comparison and for readers who expect it. It ranks orders exactly like adjusted R² (same ordering).
 *
 * Reference: the residual mean square s² = S_r/(n − p) as the estimate of σ² in any linear least-squares
 * regression text, e.g. N. R. Draper & H. Smith, *Applied Regression Analysis*, 3rd ed., Wiley 1998 (cited from
 * memory); https://en.wikipedia.org/wiki/Reduced_chi-squared_statistic
 *
 * @example
 * residualVarianceCriterion.choose(table) // => the order with the smallest S_r/(n − p)
 */
import { argminOrder } from './argminOrder.ts';
import { fitOfOrder, reasonNumber, residualVarianceOf, type CandidateTable, type OrderCriterion } from './criterion.ts';

export const residualVarianceCriterion: OrderCriterion = {
  name: 'residualVariance',
  label: 's² min',
  rule: 'Choose the order with the smallest residual variance S_r/(n − p).',
  requiresUncertainty: false,
  choose(table: CandidateTable): number {
    return argminOrder(table, (order) => residualVarianceOf(fitOfOrder(table, order)));
  },
  explain(table: CandidateTable, order: number): string {
    const value = residualVarianceOf(fitOfOrder(table, order));
    return `Order ${order} has the smallest residual variance S_r/(n − p) = ${reasonNumber(value)} among orders ${table.minCandidate} to ${table.maxCandidate}.`;
  },
};
