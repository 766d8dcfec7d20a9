/**
 * Exact decimal reading of floating-point inputs.
 *
 * Every input double is taken as the shortest decimal that reads back to it (what `String(value)` prints,
 * ECMAScript Number::toString). For a value parsed from text with at most 15 significant digits that decimal is
 * the text itself, so the exact solution is the solution for the data as the user wrote them; for any other
 * double it differs from the binary value by less than half an ulp.
 *
 * A set of values is returned as integers sharing one power-of-ten scale: value_i = ints_i · 10^exponent.
 */

/** Integers with a common decimal exponent: value_i = ints[i] · 10^exponent. */
export interface ScaledIntegers {
  readonly ints: bigint[];
  readonly exponent: number;
}

export interface DecimalParts {
  readonly digits: bigint;
  readonly exponent: number;
}

import { rational, type Rational } from './rational.ts';

const DECIMAL = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]\d+))?$/;

/** Split a finite double into signed integer digits and a power-of-ten exponent. @example decimalParts(-12.5) // => { digits: -125n, exponent: -1 } */
export function decimalParts(value: number): DecimalParts {
  if (!Number.isFinite(value)) throw new Error(`decimalParts requires a finite number, got ${value}`);
  // A safe integer prints as its plain digits (below 1e21 String uses no exponent): the same parts, without the text.
  if (Number.isSafeInteger(value)) return { digits: BigInt(value), exponent: 0 };
  const text = String(value);
  // Without an exponent (the usual case) the text is [-]digits[.digits]: its digits without the point, and the
  // number of digits after it (BigInt reads the sign and ignores leading zeros). Otherwise the full pattern below.
  if (!text.includes('e')) {
    const point = text.indexOf('.');
    return point < 0 ? { digits: BigInt(text), exponent: 0 } : { digits: BigInt(text.slice(0, point) + text.slice(point + 1)), exponent: point + 1 - text.length };
  }
  const match = DECIMAL.exec(text);
  if (match === null) throw new Error(`decimalParts cannot read ${String(value)}`);
  const [, sign, whole, fraction = '', exp = '0'] = match;
  const digits = BigInt((sign ?? '') + (whole ?? '') + fraction);
  return { digits, exponent: Number(exp) - fraction.length };
}

/** Bring values to one decimal exponent (the smallest among them). @example scaleToIntegers([1.5, 20]) // => { ints: [15n, 200n], exponent: -1 } */
export function scaleToIntegers(values: readonly number[], extraExponents: readonly number[] = []): ScaledIntegers {
  return scalePartsToIntegers(values.map(decimalParts), extraExponents);
}

/** scaleToIntegers for values already split by decimalParts (each value is read once). @example scalePartsToIntegers([decimalParts(1.5)]) // => { ints: [15n], exponent: -1 } */
export function scalePartsToIntegers(parts: readonly DecimalParts[], extraExponents: readonly number[] = []): ScaledIntegers {
  let exponent = Math.min(0, ...extraExponents);
  for (const part of parts) if (part.digits !== 0n && part.exponent < exponent) exponent = part.exponent;
  const ints = parts.map((part) => (part.digits === 0n ? 0n : part.digits * 10n ** BigInt(part.exponent - exponent)));
  return { ints, exponent };
}

/** Smallest decimal exponent among values (0 if all are integers). @example minExponent([1.25, 3, 0.5]) // => -2 */
export function minExponent(values: readonly number[]): number {
  return minPartsExponent(values.map(decimalParts));
}

/** minExponent for values already split by decimalParts. @example minPartsExponent([decimalParts(1.25)]) // => -2 */
export function minPartsExponent(parts: readonly DecimalParts[]): number {
  let exponent = 0;
  for (const part of parts) if (part.digits !== 0n && part.exponent < exponent) exponent = part.exponent;
  return exponent;
}

/**
 * The decimal a double prints as (String(value)), as an exact rational: the value the user wrote, for a number
 * read from text with at most 15 significant digits. @example decimalRational(0.1) // => { num: 1n, den: 10n }
 */
export function decimalRational(value: number): Rational {
  const { digits, exponent } = decimalParts(value);
  return exponent >= 0 ? rational(digits * 10n ** BigInt(exponent)) : rational(digits, 10n ** BigInt(-exponent));
}

/**
 * A decimal text as written ("-1.4674896e+3", "5e-4", "60") as an exact rational.
 * @throws Error when the text is not a plain decimal number
 * @example parseDecimal('-2422.701') // => { num: -2422701n, den: 1000n }
 */
export function parseDecimal(text: string): Rational {
  const match = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text.trim());
  if (match === null || (match[2] === '' && (match[3] ?? '') === '')) throw new Error(`parseDecimal cannot read '${text}'`);
  const [, sign, whole = '', fraction = '', exp = '0'] = match;
  const digits = BigInt(`${sign === '-' ? '-' : ''}${whole}${fraction}` || '0');
  const exponent = Number(exp) - fraction.length;
  return exponent >= 0 ? rational(digits * 10n ** BigInt(exponent)) : rational(digits, 10n ** BigInt(-exponent));
}
