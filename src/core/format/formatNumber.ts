/**
 * Number text for every reader-facing place (pages, command line, reason sentences, downloads' comment lines):
 * one rule per kind of number, so the same statistic prints the same way everywhere.
 *
 * - formatNumber: a value to a number of significant digits; missing values (null, undefined, NaN) print as an
 *   em dash, infinities as ∞ and −∞; finite values use formatCoefficient (plain decimals or "1.23e-4").
 * - formatP: a probability to two significant digits, "< 0.0001" below that (the tail is not meaningful further).
 * - formatRSquared: R² to the digits that tell it apart from 1 (two significant digits of 1 − R², at least three
 *   decimals), e.g. 0.9999928331 → "0.9999928".
 * - formatInterval: the ends of a coefficient's interval to the decimal place of the printed coefficient.
 */
import { formatCoefficient } from './formatCoefficient.ts';

/** What a missing value prints as. */
export const MISSING = '—';

/**
 * A number to `digits` significant digits (default 4).
 * @example formatNumber(0.991113, 4) // => "0.9911"
 * @example formatNumber(null) // => "—"
 */
export function formatNumber(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || Number.isNaN(value)) return MISSING;
  if (value === Infinity) return '∞';
  if (value === -Infinity) return '−∞';
  return formatCoefficient(value, digits);
}

/**
 * A probability: two significant digits, "< 0.0001" below 1e-4.
 * @example formatP(0.3812) // => "0.38"
 * @example formatP(2e-7) // => "< 0.0001"
 */
export function formatP(value: number | null | undefined): string {
  if (value === null || value === undefined || Number.isNaN(value)) return MISSING;
  return value < 1e-4 ? '< 0.0001' : formatCoefficient(value, 2);
}

/**
 * R² (or adjusted R²) to the decimals that distinguish it from 1: ⌊−log₁₀(1 − R²)⌋ + 2 decimals, at least 3,
 * at most 15. An R² of exactly 1 prints as "1".
 * @example formatRSquared(0.9999928331017757) // => "0.9999928"
 * @example formatRSquared(0.9911130919255341) // => "0.9911"
 * @example formatRSquared(0.5) // => "0.500"
 */
export function formatRSquared(value: number | null | undefined): string {
  if (value === null || value === undefined || Number.isNaN(value)) return MISSING;
  if (value === 1) return '1';
  const gap = 1 - value;
  const decimals = gap > 0 && gap < 1 ? Math.min(15, Math.max(3, Math.floor(-Math.log10(gap)) + 2)) : 3;
  return value.toFixed(decimals);
}

/**
 * The decimal place (power of ten) of the last printed digit of a coefficient printed with `digits` significant
 * digits. @example lastDigitPlace(13.88924, 7) // => -5
 */
export function lastDigitPlace(value: number, digits: number): number {
  if (value === 0 || !Number.isFinite(value)) return 0;
  const rounded = Number(value.toPrecision(Math.max(1, Math.min(100, digits))));
  return Math.floor(Math.log10(Math.abs(rounded))) - digits + 1;
}

/**
 * One end of a coefficient's interval, printed to the same decimal place as the coefficient (at least one
 * significant digit). Values of moderate size keep their trailing zeros down to that place, so both ends of an
 * interval show the same number of decimals.
 * @example formatToPlace(14.00119432, -5) // => "14.00119"
 * @example formatToPlace(1801.899, -2) // => "1801.90"
 */
export function formatToPlace(value: number | null | undefined, place: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return formatNumber(value);
  if (value === 0) return '0';
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const digits = Math.max(1, Math.min(17, exponent - place + 1));
  if (exponent >= -3 && exponent < 6 && place < 0 && exponent >= place) return value.toFixed(Math.min(20, -place));
  return formatCoefficient(value, digits);
}

/**
 * A coefficient's interval "low to high", each end to the decimal place of the printed coefficient.
 * @example formatInterval([13.7772, 14.0012], 13.88923908, 7) // => "13.77720 to 14.00120"
 * @example formatInterval([1801.899, 1813.012], 1807.4566, 6) // => "1801.90 to 1813.01"
 */
export function formatInterval(interval: readonly [number, number] | readonly number[] | undefined, coefficient: number, digits: number): string {
  if (interval === undefined) return MISSING;
  const place = lastDigitPlace(coefficient, digits);
  return `${formatToPlace(interval[0], place)} to ${formatToPlace(interval[1], place)}`;
}
