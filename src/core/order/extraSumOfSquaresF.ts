/**
 * Extra-sum-of-squares F test between two nested polynomial fits.
 *
 * Going from the lower order m (p_m coefficients) to the higher order k (p_k coefficients):
 *
 *   F = [(S_r(m) − S_r(k)) / (p_k − p_m)] / [S_r(k) / (n − p_k)]  ~  F(p_k − p_m, n − p_k)
 *
 * under the hypothesis that the extra coefficients are zero and the noise is independent and Gaussian.
 *
 * Reference: Draper & Smith, *Applied Regression Analysis*, 3rd ed. (1998), §6.1 "extra sum of squares";
 * NIST/SEMATECH e-Handbook of Statistical Methods, §4.4.4 (https://www.itl.nist.gov/div898/handbook/pmd/section4/pmd44.htm);
 * https://en.wikipedia.org/wiki/F-test#Regression_problems
 */
import { fQuantile, fUpperP } from '../distributions.ts';
import type { OrderSummary } from './criterion.ts';

export interface ExtraSumOfSquaresTest {
  readonly statistic: number;
  readonly numeratorDof: number;
  readonly denominatorDof: number;
}

/**
 * The F statistic for adding the terms of `higher` to `lower`. A non-positive reduction gives F = 0.
 * @example
 * extraSumOfSquaresF({ order: 1, parameters: 2, degreesOfFreedom: 8, residualSumOfSquares: 10, press: 0 },
 *                    { order: 2, parameters: 3, degreesOfFreedom: 7, residualSumOfSquares: 7, press: 0 })
 * // => { statistic: 3, numeratorDof: 1, denominatorDof: 7 }   since (10 − 7)/1 ÷ (7/7) = 3
 * @example extraSumOfSquaresF(order1, order2).statistic // => ((S_r1 − S_r2)/(p2 − p1)) / (S_r2/(n − p2))
 */
export function extraSumOfSquaresF(lower: OrderSummary, higher: OrderSummary): ExtraSumOfSquaresTest {
  const numeratorDof = higher.parameters - lower.parameters;
  const denominatorDof = higher.degreesOfFreedom;
  const reduction = lower.residualSumOfSquares - higher.residualSumOfSquares;
  const statistic =
    reduction > 0 && denominatorDof > 0 ? reduction / numeratorDof / (higher.residualSumOfSquares / denominatorDof) : 0;
  return { statistic, numeratorDof, denominatorDof };
}

/**
 * Upper-tail p-value of an extra-sum-of-squares test.
 * @example extraSumOfSquaresP({ statistic: 4.1028210151304, numeratorDof: 2, denominatorDof: 10, … }) // => 0.05
 */
export function extraSumOfSquaresP(test: ExtraSumOfSquaresTest): number {
  if (test.denominatorDof <= 0) return Number.NaN;
  return fUpperP(test.statistic, test.numeratorDof, test.denominatorDof);
}

const criticalValueCache = new Map<string, number>();

/**
 * Critical value F_{1−α}(d1, d2), cached because selection runs the same few (α, d1, d2) many times.
 * @example
 * fCriticalValue(0.05, 1, 10) // => 4.9646 (printed F tables give 4.96)
 * @example fCriticalValue(0.05, 2, 10) // => 4.1028210151304
 */
export function fCriticalValue(alpha: number, numeratorDof: number, denominatorDof: number): number {
  const key = `${alpha}|${numeratorDof}|${denominatorDof}`;
  let value = criticalValueCache.get(key);
  if (value === undefined) {
    value = fQuantile(1 - alpha, numeratorDof, denominatorDof);
    criticalValueCache.set(key, value);
  }
  return value;
}

/**
 * True when the test rejects "no improvement" at level α.
 * @example isSignificant(test, 0.05) // => true when F exceeds F₀.₉₅(ν₁, ν₂)
 */
export function isSignificant(test: ExtraSumOfSquaresTest, alpha: number): boolean {
  if (test.denominatorDof <= 0 || test.numeratorDof <= 0) return false;
  return test.statistic > fCriticalValue(alpha, test.numeratorDof, test.denominatorDof);
}
