/**
 * Exact evaluation of a polynomial Σ a_k u^k with rational coefficients at a rational u, by Horner's rule in
 * rational arithmetic (no rounding). Used for check values: what the certified (or the printed) coefficients give.
 * Cost: O(m) rational operations; the size of the numbers grows linearly with m.
 * @example evaluateExact([rational(1n), rational(2n), rational(3n)], rational(1n, 2n)) // => 2.75 as { num: 11n, den: 4n } up to reduction
 */
import { add, multiply, rational, reduce, type Rational } from './rational.ts';

export function evaluateExact(coefficients: readonly Rational[], u: Rational): Rational {
  let value = rational(0n);
  for (let k = coefficients.length - 1; k >= 0; k--) value = reduce(add(multiply(value, u), coefficients[k]!));
  return value;
}
