/**
 * The power-basis coefficients as printed (equation, coefficient table, downloads): each a_k rounded to its
 * significant digits by formatCoefficient. A coefficient fixed at zero by a fit without intercept prints "0".
 * This is the text the printed check values are computed from, so every place must print exactly this.
 * @example printedCoefficients({ coefficients: [13.88923908187224, -2422.7009638645936], significantDigits: [7, 7] })
 * // => ["13.88924", "-2422.701"]
 */
import { formatCoefficient } from './formatCoefficient.ts';
import type { PolynomialFit } from '../types.ts';

export function printedCoefficients(fit: Pick<PolynomialFit, 'coefficients' | 'significantDigits'>): string[] {
  return fit.coefficients.map((a, k) => formatCoefficient(a, fit.significantDigits[k] ?? 17));
}
