/**
 * Leave-one-out cross-validation (PRESS) minimum: choose the order minimising
 *
 *   PRESS(m) = Σ_i (r_i / (1 − h_ii))²,   LOO RMSE = √(PRESS / n)
 *
 * where r_i are the residuals and h_ii the leverages of the order-m fit; r_i/(1 − h_ii) is exactly the error
 * in predicting point i from a fit to the other n − 1 points, so no refitting is needed.
 *
 * Reference: Allen, D. M. (1974), "The relationship between variable selection and data augmentation and a
 * method for prediction", Technometrics 16(1), 125–127; https://en.wikipedia.org/wiki/PRESS_statistic
 *
 * @example
 * looRmseOf(table.n, fitOfOrder(table, 2)) // => √(PRESS(2)/n)
 */
import { argminOrder } from './argminOrder.ts';
import { fitOfOrder, reasonNumber, type CandidateTable, type OrderCriterion, type OrderSummary } from './criterion.ts';

/**
 * Leave-one-out RMSE √(PRESS/n).
 * @example looRmseOf({ press: 8, n: 8, … }) // => 1
 */
export function looRmseOf(n: number, fit: OrderSummary): number {
  return Math.sqrt(fit.press / n);
}

export const pressCriterion: OrderCriterion = {
  name: 'press',
  label: 'LOOCV (PRESS) min',
  rule: 'Choose the order with the smallest leave-one-out prediction error (PRESS).',
  requiresUncertainty: false,
  choose(table: CandidateTable): number {
    return argminOrder(table, (order) => fitOfOrder(table, order).press);
  },
  explain(table: CandidateTable, order: number): string {
    return `Order ${order} has the smallest leave-one-out RMSE = ${reasonNumber(looRmseOf(table.n, fitOfOrder(table, order)))} among orders ${table.minCandidate} to ${table.maxCandidate}.`;
  },
};
