/**
 * Thin wrapper over the @stdlib distribution functions, so the rest of the core names one module for
 * its t, F, χ² and normal quantiles and tail probabilities. No special functions are written here.
 *
 * Reference: stdlib (https://stdlib.io), packages @stdlib/stats-base-dists-*.
 */
import tQuantileImpl from '@stdlib/stats-base-dists-t-quantile';
import tCdfImpl from '@stdlib/stats-base-dists-t-cdf';
import fQuantileImpl from '@stdlib/stats-base-dists-f-quantile';
import fCdfImpl from '@stdlib/stats-base-dists-f-cdf';
import chiSquareQuantileImpl from '@stdlib/stats-base-dists-chisquare-quantile';
import chiSquareCdfImpl from '@stdlib/stats-base-dists-chisquare-cdf';
import normalQuantileImpl from '@stdlib/stats-base-dists-normal-quantile';

/**
 * Quantiles already computed, by their arguments. A handbook asks for the same few again and again (the t quantile of
 * 95 % for each fit's degrees of freedom, for every candidate order and every preview's band), and each costs
 * stdlib's iterative inversion (about 17 µs for t); the function is pure, so the remembered value is the one a new
 * call returns. Arguments of zero or not finite are not remembered (−0 and 0 would share a key). Cleared when it
 * holds QUANTILE_MEMO_LIMIT values, so memory stays bounded.
 */
const quantileMemo = new Map<string, number>();
const QUANTILE_MEMO_LIMIT = 4096;

function remembered(kind: string, a: number, b: number, c: number, compute: () => number): number {
  if (!(Number.isFinite(a) && Number.isFinite(b) && Number.isFinite(c)) || a === 0 || b === 0 || c === 0) return compute();
  const key = `${kind}|${a}|${b}|${c}`;
  const known = quantileMemo.get(key);
  if (known !== undefined) return known;
  const value = compute();
  if (quantileMemo.size >= QUANTILE_MEMO_LIMIT) quantileMemo.clear();
  quantileMemo.set(key, value);
  return value;
}

/** Quantile of Student's t with `dof` degrees of freedom. @example tQuantile(0.975, 10) // => 2.228139 (printed t tables give 2.228) */
export function tQuantile(probability: number, dof: number): number {
  return remembered('t', probability, dof, 1, () => tQuantileImpl(probability, dof));
}

/**
 * Two-sided tail probability P(|T| ≥ |t|) for Student's t with `dof` degrees of freedom.
 * @example tTwoSidedP(2.228138851986274, 10) // => 0.05
 */
export function tTwoSidedP(t: number, dof: number): number {
  return 2 * (1 - tCdfImpl(Math.abs(t), dof));
}

/**
 * Quantile of the F distribution with (d1, d2) degrees of freedom.
 * @example fQuantile(0.95, 2, 10) // => 4.1028210151304
 */
export function fQuantile(probability: number, d1: number, d2: number): number {
  return remembered('F', probability, d1, d2, () => fQuantileImpl(probability, d1, d2));
}

/**
 * Upper-tail probability P(F ≥ f) of the F distribution with (d1, d2) degrees of freedom.
 * @example fUpperP(4.1028210151304, 2, 10) // => 0.05
 */
export function fUpperP(f: number, d1: number, d2: number): number {
  if (!(f > 0)) return 1;
  return 1 - fCdfImpl(f, d1, d2);
}

/**
 * Quantile of χ² with `dof` degrees of freedom.
 * @example chiSquareQuantile(0.95, 10) // => 18.307038053275143
 */
export function chiSquareQuantile(probability: number, dof: number): number {
  return remembered('chi2', probability, dof, 1, () => chiSquareQuantileImpl(probability, dof));
}

/**
 * Upper-tail probability P(X ≥ x) of χ² with `dof` degrees of freedom.
 * @example chiSquareUpperP(18.307038053275146, 10) // => 0.05
 */
export function chiSquareUpperP(x: number, dof: number): number {
  return 1 - chiSquareCdfImpl(x, dof);
}

/**
 * Quantile of the standard normal distribution.
 * @example normalQuantile(0.975) // => 1.9599639845400538
 */
export function normalQuantile(probability: number): number {
  return normalQuantileImpl(probability, 0, 1);
}
