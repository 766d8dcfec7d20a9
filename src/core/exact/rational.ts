/**
 * Small exact-rational helpers over BigInt: a rational is a pair (num, den) with den > 0, not necessarily reduced
 * (the solver's denominators are determinants; reduction is left to the final conversion).
 */

export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

/** num/den with a positive denominator. @example rational(1n, -2n) // => { num: -1n, den: 2n } */
export function rational(num: bigint, den: bigint = 1n): Rational {
  if (den === 0n) throw new Error('rational requires a non-zero denominator');
  return den < 0n ? { num: -num, den: -den } : { num, den };
}

/** a + b. @example add(rational(1n, 2n), rational(1n, 3n)) // => { num: 5n, den: 6n } */
export function add(a: Rational, b: Rational): Rational {
  if (a.den === b.den) return rational(a.num + b.num, a.den);
  return rational(a.num * b.den + b.num * a.den, a.den * b.den);
}

/** a·b. @example multiply(rational(2n, 3n), rational(3n, 4n)) // => { num: 6n, den: 12n } */
export function multiply(a: Rational, b: Rational): Rational {
  return rational(a.num * b.num, a.den * b.den);
}

/** a / b (b ≠ 0). @example divide(rational(1n), rational(4n)) // => { num: 1n, den: 4n } */
export function divide(a: Rational, b: Rational): Rational {
  return rational(a.num * b.den, a.den * b.num);
}

/** a − b. @example subtract(rational(1n), rational(1n, 4n)) // => { num: 3n, den: 4n } */
export function subtract(a: Rational, b: Rational): Rational {
  return rational(a.num * b.den - b.num * a.den, a.den * b.den);
}

/** Greatest common divisor of two non-negative big integers (Euclid). @example gcd(12n, 18n) // => 6n */
export function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/** The same rational in lowest terms (den > 0). @example reduce(rational(6n, 12n)) // => { num: 1n, den: 2n } */
export function reduce(value: Rational): Rational {
  const divisor = gcd(value.num, value.den);
  return divisor > 1n ? rational(value.num / divisor, value.den / divisor) : value;
}

/** Sign of a − b: −1, 0 or 1. @example compare(rational(1n, 3n), rational(1n, 2n)) // => -1 */
export function compare(a: Rational, b: Rational): number {
  const difference = a.num * b.den - b.num * a.den;
  return difference < 0n ? -1 : difference > 0n ? 1 : 0;
}

/** value · 10^exponent as a rational. @example timesPowerOfTen(rational(15n), -1) // => { num: 15n, den: 10n } */
export function timesPowerOfTen(value: Rational, exponent: number): Rational {
  return exponent >= 0
    ? rational(value.num * 10n ** BigInt(exponent), value.den)
    : rational(value.num, value.den * 10n ** BigInt(-exponent));
}

const EXPONENT_VIEW = new DataView(new ArrayBuffer(8));
const BIG_STEP = 1n << 1000n;

/**
 * Number of binary digits of a positive integer, without building its text: e = the binary exponent of Number(value)
 * (read from the double's bits) is ⌊log₂ value⌋, except where Number rounds up to the power of two 2^e (value just
 * below it), which the comparison value < 2^e detects. Values of 2^1000 or more are first shifted down in steps.
 */
function bitLength(value: bigint): number {
  if (value === 0n) return 0;
  if (value < 0n) return value.toString(2).length;
  let rest = value;
  let offset = 0;
  while (rest >= BIG_STEP) {
    rest >>= 1000n;
    offset += 1000;
  }
  EXPONENT_VIEW.setFloat64(0, Number(rest));
  const exponent = ((EXPONENT_VIEW.getUint16(0) & 0x7ff0) >> 4) - 1023;
  return offset + (exponent > 0 && rest < 1n << BigInt(exponent) ? exponent : exponent + 1);
}

/**
 * Nearest double to num/den. @example toNumber(rational(1n, 3n)) // => 0.3333333333333333 The quotient is formed with at least 66 significant bits plus a sticky bit, so
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

/** Exact rational value of a double (every finite double is a dyadic rational). @example fromDouble(0.1) // => { num: 3602879701896397n, den: 36028797018963968n } */
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
