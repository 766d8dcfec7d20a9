/**
 * Exact evaluation of a polynomial Σ a_k u^k with rational coefficients at a rational u = p/q, in integers:
 * with the coefficients over one denominator D (a_k = N_k/D; the certified coefficients are built that way), the
 * value is (Σ N_k p^k q^(m−k)) / (D·q^m), formed by Horner's rule on integers; otherwise by Horner's rule on
 * rationals. No rounding and no gcd (reduction of large numbers is the slow part, and nothing here needs it).
 * Cost: O(m) big-integer products.
 * @example evaluateExact([rational(1n), rational(2n), rational(3n)], rational(1n, 2n)) // => { num: 11n, den: 4n }
 */
import { add, multiply, rational, type Rational } from './rational.ts';

export function evaluateExact(coefficients: readonly Rational[], u: Rational): Rational {
  const m = coefficients.length - 1;
  if (m < 0) return rational(0n);
  const denominator = coefficients[0]!.den;
  if (coefficients.every((a) => a.den === denominator)) {
    let accumulator = coefficients[m]!.num;
    let qPower = 1n;
    for (let k = m - 1; k >= 0; k--) {
      qPower *= u.den;
      accumulator = accumulator * u.num + coefficients[k]!.num * qPower;
    }
    return rational(accumulator, denominator * u.den ** BigInt(m));
  }
  let value = rational(0n);
  for (let k = m; k >= 0; k--) value = add(multiply(value, u), coefficients[k]!);
  return value;
}
