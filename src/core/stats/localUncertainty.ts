/**
 * The uncertainty of a new observation at x, in the fitted space: what the prediction band, the digits rule and the
 * flagged residuals use for a weighted fit instead of one global figure.
 *
 * For a weighted fit the stated standard uncertainties σ_i (taken to the fitted space: σ/|y| under ln y) are
 * combined per distinct x as their root mean square, and σ(x) is interpolated linearly between the neighbouring
 * distinct x (held constant beyond the outermost points) — or, when the metadata states a relative uncertainty,
 * relative·|ŷ(x)| (relative itself under ln y). In χ² mode ('stated') σ(x) is used as it is; otherwise
 * ('scatter') it is scaled by s = √(reduced χ²), as the coefficient covariance is. For an unweighted fit the
 * uncertainty is s at every x.
 *
 * Cost: O(log n) per x after an O(n log n) profile.
 */
import { evaluateFit } from '../evaluate.ts';
import type { PolynomialFit } from '../types.ts';

/**
 * The profile of stated σ per distinct x (sorted), replicates combined as root mean square.
 * @example uncertaintyProfile([2, 1, 2], [0.3, 0.1, 0.4]) // => { x: [1, 2], sigma: [0.1, 0.3535533905932738] }
 */
export function uncertaintyProfile(x: readonly number[], sigma: readonly number[]): { x: number[]; sigma: number[] } {
  const groups = new Map<number, { sum: number; count: number }>();
  x.forEach((value, i) => {
    const group = groups.get(value) ?? { sum: 0, count: 0 };
    group.sum += sigma[i]! ** 2;
    group.count += 1;
    groups.set(value, group);
  });
  const xs = [...groups.keys()].sort((a, b) => a - b);
  return { x: xs, sigma: xs.map((value) => Math.sqrt(groups.get(value)!.sum / groups.get(value)!.count)) };
}

/**
 * Stated σ at x from a profile: linear between neighbours, constant beyond the ends.
 * @example profileAt({ x: [1, 3], sigma: [0.1, 0.3] }, 2) // => 0.2
 */
export function profileAt(profile: { readonly x: readonly number[]; readonly sigma: readonly number[] }, x: number): number {
  const xs = profile.x;
  const n = xs.length;
  if (x <= xs[0]!) return profile.sigma[0]!;
  if (x >= xs[n - 1]!) return profile.sigma[n - 1]!;
  let low = 0;
  let high = n - 1;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if (xs[middle]! <= x) low = middle;
    else high = middle;
  }
  const fraction = (x - xs[low]!) / (xs[high]! - xs[low]!);
  return profile.sigma[low]! + fraction * (profile.sigma[high]! - profile.sigma[low]!);
}

/**
 * Standard deviation of a new observation at x, in the fitted space (see the file comment).
 * @example localUncertainty(unweightedFit, 300) // => unweightedFit.statistics.residualStdDev
 */
export function localUncertainty(
  fit: Pick<PolynomialFit, 'uncertaintyProfile' | 'uncertaintyScale'> & { readonly statistics: Pick<PolynomialFit['statistics'], 'residualStdDev'> } &
    Partial<Pick<PolynomialFit, 'uncertaintyModel' | 'transformX' | 'transformY' | 'mapped' | 'range' | 'order'>>,
  x: number,
): number {
  const s = fit.statistics.residualStdDev;
  if (fit.uncertaintyProfile === null || fit.uncertaintyProfile === undefined) return s;
  const model = fit.uncertaintyModel;
  let sigma: number;
  if (model && fit.mapped && fit.transformX && fit.transformY && fit.range && fit.order !== undefined) {
    const evaluation = evaluateFit(fit as Pick<PolynomialFit, 'transformX' | 'transformY' | 'mapped' | 'range' | 'order'>, x, { extrapolate: true });
    sigma = fit.transformY === 'log' ? model.relative : model.relative * Math.abs(evaluation.y);
  } else {
    sigma = profileAt(fit.uncertaintyProfile, x);
  }
  return fit.uncertaintyScale === 'stated' ? sigma : sigma * s;
}
