/**
 * Flat data: order 0 (the mean) is chosen instead of a line when no order k ≥ 1 that keeps at least two
 * residual degrees of freedom improves on the mean significantly, by the extra-sum-of-squares F test
 *
 *   F = [(S_r(0) − S_r(k))/k] / [S_r(k)/(n − k − 1)]  at level 0.05/K (Bonferroni over the K orders compared).
 *
 * "Flat" thus means "the data justify no trend at all": no order, near or far, beats the mean at a familywise 5 %.
 * It needs an intercept and at least 4 points (otherwise there is nothing to test and the data are not called
 * flat). Constant data (S_r(0) at the floating-point floor) are flat.
 *
 * Reference: Draper & Smith, *Applied Regression Analysis*, 3rd ed., §6.1; https://en.wikipedia.org/wiki/Bonferroni_correction
 *
 * @example
 * isFlat(tableOfConstantData) // => true
 */
import { fitOfOrder, type CandidateTable } from './criterion.ts';
import { extraSumOfSquaresF, isSignificant } from './extraSumOfSquaresF.ts';

/** Familywise level of the flatness test. */
export const FLAT_ALPHA = 0.05;

export function isFlat(table: CandidateTable): boolean {
  if (!table.intercept || table.fits[0]?.order !== 0) return false;
  let highest = 0;
  for (let order = 1; order <= table.maxCandidate; order++) {
    if (fitOfOrder(table, order).degreesOfFreedom >= 2) highest = order;
  }
  if (highest < 1) return false;
  const mean = fitOfOrder(table, 0);
  const level = FLAT_ALPHA / highest;
  for (let order = 1; order <= highest; order++) {
    if (isSignificant(extraSumOfSquaresF(mean, fitOfOrder(table, order)), level)) return false;
  }
  return true;
}
