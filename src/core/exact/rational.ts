/**
 * Small exact-rational helpers over BigInt: a rational is a pair (num, den) with den > 0, not necessarily reduced
 * (the solver's denominators are determinants; reduction is left to the final conversion).
 */

export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

export function rational(num: bigint, den: bigint = 1n): Rational {
  if (den === 0n) throw new Error('rational requires a non-zero denominator');
  return den < 0n ? { num: -num, den: -den } : { num, den };
}

export function multiply(a: Rational, b: Rational): Rational {
  return rational(a.num * b.num, a.den * b.den);
}

export function divide(a: Rational, b: Rational): Rational {
  return rational(a.num * b.den, a.den * b.num);
}

export function subtract(a: Rational, b: Rational): Rational {
  return rational(a.num * b.den - b.num * a.den, a.den * b.den);
}

/** value · 10^exponent as a rational. */
export function timesPowerOfTen(value: Rational, exponent: number): Rational {
  return exponent >= 0
    ? rational(value.num * 10n ** BigInt(exponent), value.den)
    : rational(value.num, value.den * 10n ** BigInt(-exponent));
}

function bitLength(value: bigint): number {
  return value === 0n ? 0 : value.toString(2).length;
}

/**
 * Nearest double to num/den. The quotient is formed with at least 66 significant bits plus a sticky bit, so
 * the single rounding done by Number() is correct except in ties, where it is within one ulp.
 */
export function toNumber(value: Rational): number {
  let { num, den } = value;
  if (num === 0n) return 0;
  const negative = num < 0n;
  if (negative) num = -num;
  const shift = 66 - (bitLength(num) - bitLength(den));
  const scaledNum = shift > 0 ? num << BigInt(shift) : num;
  const scaledDen = shift < 0 ? den << BigInt(-shift) : den;
  let quotient = scaledNum / scaledDen;
  if (quotient * scaledDen !== scaledNum) quotient |= 1n; // sticky bit: not exact
  let result = Number(quotient);
  // Apply 2^-shift in steps that stay inside the double exponent range.
  let remaining = -shift;
  while (remaining !== 0) {
    const step = Math.max(-1000, Math.min(1000, remaining));
    result *= 2 ** step;
    remaining -= step;
  }
  return negative ? -result : result;
}

/** Exact rational value of a double (every finite double is a dyadic rational). */
export function fromDouble(value: number): Rational {
  if (!Number.isFinite(value)) throw new Error(`fromDouble requires a finite number, got ${value}`);
  if (value === 0) return rational(0n);
  let mantissa = value;
  let exponent = 0;
  while (!Number.isInteger(mantissa)) {
    mantissa *= 2;
    exponent += 1;
  }
  return rational(BigInt(mantissa), 1n << BigInt(exponent));
}
