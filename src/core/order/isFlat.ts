/**
 * Flat data: order 0 (the mean) is chosen instead of a line when the default rule, started at order 0 instead
 * of 1, stops at 0, i.e. neither order 1 nor order 2 improves on the mean significantly by the
 * extra-sum-of-squares F test
 *
 *   F = [(S_r(0) − S_r(k))/k] / [S_r(k)/(n − k − 1)],  k = 1, 2,  each at 5 %/2 (10 %/2 below 10 residual dof).
 *
 * So "flat" means "the data justify no trend", by the same test that justifies every other order. It needs an
 * intercept and at least one order ≥ 1 that keeps 2 residual dof (4 points); otherwise the data are not called
 * flat. Constant data (S_r(0) at the floating-point floor) are flat. The same definition is used whatever
 * criterion is chosen, so that order 0 means one thing on every page.
 *
 * Reference: Draper & Smith, *Applied Regression Analysis*, 3rd ed., §6.1; see lowestJustifiedCriterion.
 *
 * @example
 * isFlat(tableOfConstantData) // => true
 */
import { fitOfOrder, type CandidateTable } from './criterion.ts';
import { lowestJustifiedCriterion } from './lowestJustifiedCriterion.ts';

/**
 * @example isFlat(candidateTable(fitNestedOrders([1, 2, 3, 4, 5, 6], [2, 2.1, 1.9, 2, 2.05, 1.95], { maxOrder: 3 }), { maxCandidate: 3, uncertaintyGiven: false })) // => true
 */
export function isFlat(table: CandidateTable): boolean {
  if (!table.intercept || table.fits[0]?.order !== 0) return false;
  let testable = false;
  for (let order = 1; order <= table.maxCandidate; order++) {
    if (fitOfOrder(table, order).degreesOfFreedom >= 2) testable = true;
  }
  if (!testable) return false;
  return lowestJustifiedCriterion.choose({ ...table, minCandidate: 0 }) === 0;
}
