/**
 * Exact evaluation of a polynomial Σ a_k u^k with rational coefficients at a rational u = p/q, in integers:
 * with the coefficients over one denominator D (a_k = N_k/D; the certified coefficients are built that way), the
 * value is (Σ N_k p^k q^(m−k)) / (D·q^m), formed by Horner's rule on integers. Coefficients over different
 * denominators that all divide the largest one (printed decimals, 10^e; a change of temperature scale, D·c^(m−j)·h^j
 * with h | c) are first brought over that one; otherwise Horner's rule runs on rationals. No rounding and no gcd (reduction of large numbers is the slow part, and nothing here needs it).
 * Cost: O(m) big-integer products.
 * @example evaluateExact([rational(1n), rational(2n), rational(3n)], rational(1n, 2n)) // => { num: 11n, den: 4n }
 */
import { add, multiply, rational, type Rational } from './rational.ts';

export function evaluateExact(coefficients: readonly Rational[], u: Rational): Rational {
  const m = coefficients.length - 1;
  if (m < 0) return rational(0n);
  const common = overCommonDenominator(coefficients);
  if (common !== null) {
    const { numerators, denominator } = common;
    let accumulator = numerators[m]!;
    let qPower = 1n;
    for (let k = m - 1; k >= 0; k--) {
      qPower *= u.den;
      accumulator = accumulator * u.num + numerators[k]! * qPower;
    }
    return rational(accumulator, denominator * u.den ** BigInt(m));
  }
  let value = rational(0n);
  for (let k = m; k >= 0; k--) value = add(multiply(value, u), coefficients[k]!);
  return value;
}

/** The numerators over the largest denominator, when every denominator divides it (else null). */
function overCommonDenominator(coefficients: readonly Rational[]): { numerators: bigint[]; denominator: bigint } | null {
  let largest = coefficients[0]!.den;
  let same = true;
  for (const a of coefficients) {
    if (a.den !== largest) same = false;
    if (a.den > largest) largest = a.den;
  }
  if (same) return { numerators: coefficients.map((a) => a.num), denominator: largest };
  const numerators: bigint[] = [];
  for (const a of coefficients) {
    if (largest % a.den !== 0n) return null;
    numerators.push(a.den === largest ? a.num : a.num * (largest / a.den));
  }
  return { numerators, denominator: largest };
}
