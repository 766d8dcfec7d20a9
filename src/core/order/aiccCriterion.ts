/**
 * Corrected Akaike information criterion (AICc) of Hurvich and Tsai: choose the order minimising
 *
 *   AICc(m) = n ln(S_r/n) + n (n + p) / (n − p − 2)
 *
 * This equals n ln(S_r/n) + 2K + 2K(K + 1)/(n − K − 1) with K = p + 1 (σ counted as a parameter), up to a
 * constant. It is undefined for n − p − 2 ≤ 0, so those orders are skipped (with 8 points it can never choose
 * m ≥ 5). With stated uncertainties S_r is the weighted sum of squares.
 *
 * Reference: Hurvich, C. M. & Tsai, C.-L. (1989), "Regression and time series model selection in small samples",
 * Biometrika 76(2), 297–307; https://en.wikipedia.org/wiki/Akaike_information_criterion#Modification_for_small_sample_size
 *
 * @example
 * aiccOf(10, { order: 1, parameters: 2, degreesOfFreedom: 8, residualSumOfSquares: 10, press: 0 })
 * // => 10·ln(1) + 10·12/6 = 20
 */
import { argminOrder } from './argminOrder.ts';
import { fitOfOrder, reasonNumber, type CandidateTable, type OrderCriterion, type OrderSummary } from './criterion.ts';

/**
 * AICc of one fit (NaN when n − p − 2 ≤ 0).
 * @example aiccOf({ residualSumOfSquares: 8, n: 8, parameters: 2, … }) // => 8·ln(1) + 8·10/4 = 20
 */
export function aiccOf(n: number, fit: OrderSummary): number {
  const denominator = n - fit.parameters - 2;
  if (denominator <= 0) return Number.NaN;
  return n * Math.log(fit.residualSumOfSquares / n) + (n * (n + fit.parameters)) / denominator;
}

export const aiccCriterion: OrderCriterion = {
  name: 'aicc',
  label: 'AICc min',
  rule: 'Choose the order with the smallest corrected Akaike information criterion (Hurvich–Tsai).',
  requiresUncertainty: false,
  choose(table: CandidateTable): number {
    return argminOrder(table, (order) => aiccOf(table.n, fitOfOrder(table, order)));
  },
  explain(table: CandidateTable, order: number): string {
    return `Order ${order} has the smallest AICc = ${reasonNumber(aiccOf(table.n, fitOfOrder(table, order)))} among the orders where AICc is defined (n − p − 2 > 0).`;
  },
};
