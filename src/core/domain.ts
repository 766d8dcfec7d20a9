/**
 * Domain map: the affine change of variable t = (u − center)/halfWidth that takes the data's range onto [−1, 1].
 * Powers of t on [−1, 1] stay of order one, so the mapped Vandermonde matrix is far better conditioned than powers
 * of a variable far from zero (a temperature of 250–900 K, say), whose columns are nearly parallel.
 *
 * Reference: L. N. Trefethen, Approximation Theory and Approximation Practice, SIAM 2013, ch. 2 (mapping to [−1, 1]).
 */
import type { DomainMap } from './types.ts';

/** Map for values spanning [min, max]. @example domainMap([250, 900]) // => { center: 575, halfWidth: 325 } */
export function domainMap(values: readonly number[]): DomainMap {
  let min = Infinity;
  let max = -Infinity;
  for (const value of values) {
    if (value < min) min = value;
    if (value > max) max = value;
  }
  const halfWidth = (max - min) / 2;
  return { center: min + halfWidth, halfWidth: halfWidth > 0 ? halfWidth : 1 };
}

/**
 * t = (u − center)/halfWidth.
 * @example toUnit({ center: 575, halfWidth: 325 }, 900) // => 1
 */
export function toUnit(map: DomainMap, u: number): number {
  return (u - map.center) / map.halfWidth;
}

/**
 * The shortest decimal within a relative 1e-13 of a value (at most 8 significant digits), so that a value that is
 * a short decimal up to floating-point noise prints as that decimal (59.999999999999986 → 60); null when there is
 * none. @example shortDecimal(59.999999999999986) // => 60
 */
export function shortDecimal(value: number): number | null {
  if (value === 0) return 0;
  for (let digits = 1; digits <= 8; digits++) {
    const candidate = Number(value.toPrecision(digits));
    if (Math.abs(candidate - value) <= 1e-13 * Math.abs(value)) return candidate;
  }
  return null;
}

/**
 * A positive value rounded up to two significant digits, or its short decimal when it is one (shortDecimal).
 * @example roundUpShort(1 / 1560) // => 0.00065
 */
export function roundUpShort(value: number): number {
  const short = shortDecimal(value);
  if (short !== null) return short;
  const exponent = Math.floor(Math.log10(value)) - 1;
  return Number(`${Math.ceil(Number((value / 10 ** exponent).toPrecision(15)))}e${exponent}`);
}

/**
 * A value rounded to the nearest multiple of 10^place, as a short decimal (through its text, so no binary noise),
 * unless it already is a short decimal. @example roundToPlace(Math.PI, -2) // => 3.14
 */
export function roundToPlace(value: number, place: number): number {
  const short = shortDecimal(value);
  if (short !== null) return short;
  return Number(`${Math.round(value / 10 ** place)}e${place}`);
}

/**
 * The map a polynomial fit uses, with a centre and half-width that are short decimals (so that the mapped form
 * can be typed, and the conversion between the mapped form and the power basis is exact in rational arithmetic).
 * With an intercept: the centre is the middle of the data rounded to two decimal places below the half-width's
 * leading digit (or the exact middle when it is a short decimal), and the half-width the larger distance from it
 * to either end, rounded up to two significant digits (or exact when a short decimal), so t stays within [−1, 1]
 * up to floating-point noise. Without an intercept: scaling only (center 0, halfWidth from max|u|), because a
 * model without intercept must keep u = 0 at t = 0.
 * @example domainMapFor([250, 900], true) // => { center: 575, halfWidth: 325 }
 * @example domainMapFor([-2, 4], false) // => { center: 0, halfWidth: 4 }
 * @example domainMapFor([1 / 373.15, 1 / 253.15], true) // => { center: 0.003315, halfWidth: 0.00064 }
 */
export function domainMapFor(values: readonly number[], intercept: boolean): DomainMap {
  let min = Infinity;
  let max = -Infinity;
  let largest = 0;
  for (const value of values) {
    if (value < min) min = value;
    if (value > max) max = value;
    largest = Math.max(largest, Math.abs(value));
  }
  if (!intercept) return { center: 0, halfWidth: largest > 0 ? roundUpShort(largest) : 1 };
  const half = (max - min) / 2;
  if (!(half > 0)) return { center: roundToPlace(min, Math.floor(Math.log10(Math.abs(min) || 1)) - 2), halfWidth: 1 };
  const center = roundToPlace(min + half, Math.floor(Math.log10(half)) - 2);
  const halfWidth = roundUpShort(Math.max(max - center, center - min));
  return { center, halfWidth };
}
