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

/** t = (u − center)/halfWidth. */
export function toUnit(map: DomainMap, u: number): number {
  return (u - map.center) / map.halfWidth;
}

/**
 * The map a polynomial fit uses: onto [−1, 1] with an intercept; without one, scaling only (center 0,
 * halfWidth = max|u|), because a model without intercept must keep u = 0 at t = 0.
 * @example domainMapFor([-2, 4], false) // => { center: 0, halfWidth: 4 }
 */
export function domainMapFor(values: readonly number[], intercept: boolean): DomainMap {
  if (intercept) return domainMap(values);
  let largest = 0;
  for (const value of values) largest = Math.max(largest, Math.abs(value));
  return { center: 0, halfWidth: largest > 0 ? largest : 1 };
}
