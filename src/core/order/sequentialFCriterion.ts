/**
 * Sequential (forward) extra-sum-of-squares F test: starting from the lowest candidate, step from m to m + 1
 * while the step is significant,
 *
 *   F = (S_r(m) − S_r(m+1)) / (S_r(m+1) / (n − p − 1))  ~  F(1, n − p − 1),
 *
 * and stop at the first step with p ≥ α (0.05), returning m; every step significant returns the highest order.
 * It stops at the first small intermediate coefficient, which smooth property curves do have, so its tail on
 * non-polynomial data is poor.
 *
 * Reference: Draper & Smith, *Applied Regression Analysis*, 3rd ed., §12 (polynomial models, forward
 * selection); NIST/SEMATECH e-Handbook §4.4.4 (https://www.itl.nist.gov/div898/handbook/pmd/section4/pmd44.htm)
 *
 * @example
 * sequentialFCriterion.choose(table) // => first m whose step to m + 1 has p ≥ 0.05
 */
import { fitOfOrder, reasonNumber, formatP, pText, residualVarianceOf, type CandidateTable, type OrderCriterion } from './criterion.ts';
import { extraSumOfSquaresF, extraSumOfSquaresP, isSignificant } from './extraSumOfSquaresF.ts';

/** Significance level of each forward step. */
export const SEQUENTIAL_F_ALPHA = 0.05;

export const sequentialFCriterion: OrderCriterion = {
  name: 'sequentialF',
  label: 'sequential F (α=.05)',
  rule: 'Starting from order 1, add one order at a time while the extra-sum-of-squares F test of that step is significant at 5 %.',
  requiresUncertainty: false,
  choose(table: CandidateTable): number {
    for (let order = table.minCandidate; order < table.maxCandidate; order++) {
      const test = extraSumOfSquaresF(fitOfOrder(table, order), fitOfOrder(table, order + 1));
      if (test.denominatorDof <= 0 || !isSignificant(test, SEQUENTIAL_F_ALPHA)) return order;
    }
    return table.maxCandidate;
  },
  explain(table: CandidateTable, order: number): string {
    if (order >= table.maxCandidate) {
      return `Order ${order}: every step up to the highest candidate order ${table.maxCandidate} was significant at 5 %.`;
    }
    const lower = fitOfOrder(table, order);
    const higher = fitOfOrder(table, order + 1);
    const test = extraSumOfSquaresF(lower, higher);
    const change = 1 - residualVarianceOf(higher) / residualVarianceOf(lower);
    const direction = change >= 0 ? `lowers the residual variance by ${reasonNumber(100 * change)} %` : `raises the residual variance by ${reasonNumber(-100 * change)} %`;
    return `Order ${order}: going to order ${order + 1} ${direction}, not significant (F = ${reasonNumber(test.statistic)}, ${pText(extraSumOfSquaresP(test))} ≥ 0.05).`;
  },
};
