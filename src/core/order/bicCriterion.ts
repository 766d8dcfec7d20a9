/**
 * Bayesian (Schwarz) information criterion: choose the order minimising BIC(m) = n ln(S_r/n) + p ln n.
 *
 * Consistent for large n, but with few points ln S_r → −∞ near interpolation outweighs p ln n, so it can pick
 * the near-interpolating order; kept for comparison.
 *
 * Reference: Schwarz, G. (1978), "Estimating the dimension of a model", Annals of Statistics 6(2), 461–464;
 * https://en.wikipedia.org/wiki/Bayesian_information_criterion
 *
 * @example
 * bicOf(10, { order: 1, parameters: 2, degreesOfFreedom: 8, residualSumOfSquares: 10, press: 0 }) // => 2·ln 10 = 4.605
 */
import { argminOrder } from './argminOrder.ts';
import { fitOfOrder, reasonNumber, type CandidateTable, type OrderCriterion, type OrderSummary } from './criterion.ts';

/**
 * BIC of one fit.
 * @example bicOf({ residualSumOfSquares: 8, n: 8, parameters: 2, … }) // => 8·ln(1) + 2·ln 8 = 4.1588830833596715
 */
export function bicOf(n: number, fit: OrderSummary): number {
  return n * Math.log(fit.residualSumOfSquares / n) + fit.parameters * Math.log(n);
}

export const bicCriterion: OrderCriterion = {
  name: 'bic',
  label: 'BIC min',
  rule: 'Choose the order with the smallest Bayesian information criterion.',
  requiresUncertainty: false,
  choose(table: CandidateTable): number {
    return argminOrder(table, (order) => bicOf(table.n, fitOfOrder(table, order)));
  },
  explain(table: CandidateTable, order: number): string {
    return `Order ${order} has the smallest BIC = ${reasonNumber(bicOf(table.n, fitOfOrder(table, order)))} among orders ${table.minCandidate} to ${table.maxCandidate}.`;
  },
};
