/**
 * Confidence and prediction bands of a fitted polynomial at chosen x values.
 *
 * With φ(x) the mapped basis (t^0..t^m) and Σ_b the covariance of the mapped coefficients,
 *   var_fit(x) = φᵀ Σ_b φ,                  confidence half-width = t_{(1+c)/2, dof} · √var_fit
 *   var_new(x) = var_fit(x) + s²/w_new,     prediction half-width = t_{(1+c)/2, dof} · √var_new
 * where w_new is the weight of a new observation: 1 for an unweighted fit, and for a weighted fit the weight of a
 * point with the root-mean-square of the stated uncertainties. Bands are computed in the fitted space and taken
 * back through the y transform (so they are asymmetric under ln y).
 * Reference: NIST/SEMATECH e-Handbook of Statistical Methods, §4.5.2.1–2 (https://www.itl.nist.gov/div898/handbook/).
 */
import { tQuantile } from '../distributions.ts';
import { basisAt, evaluateFit } from '../evaluate.ts';
import { inverseY } from '../transforms.ts';
import type { PolynomialFit } from '../types.ts';

export interface BandPoint {
  readonly x: number;
  readonly y: number;
  readonly confidenceLow: number;
  readonly confidenceHigh: number;
  readonly predictionLow: number;
  readonly predictionHigh: number;
}

/** Bands at each x (inside the range unless `extrapolate`). NaN bands when the fit has no residual dof. */
export function bands(
  fit: PolynomialFit,
  xs: readonly number[],
  options: { readonly confidence?: number; readonly extrapolate?: boolean } = {},
): BandPoint[] {
  const confidence = options.confidence ?? fit.confidence;
  const dof = fit.statistics.degreesOfFreedom;
  const quantile = dof > 0 ? tQuantile((1 + confidence) / 2, dof) : NaN;
  const variance = fit.statistics.residualVariance;
  const newPointVariance = variance * fit.predictionScale;
  return xs.map((x) => {
    const evaluation = evaluateFit(fit, x, { extrapolate: options.extrapolate ?? false });
    const phi = basisAt(fit, x);
    let varFit = 0;
    const cov = fit.mapped.covariance;
    for (let j = 0; j < phi.length; j++) for (let k = 0; k < phi.length; k++) varFit += phi[j]! * cov[j]![k]! * phi[k]!;
    const ci = quantile * Math.sqrt(Math.max(0, varFit));
    const pi = quantile * Math.sqrt(Math.max(0, varFit) + newPointVariance);
    const v = evaluation.fittedSpace;
    return {
      x,
      y: evaluation.y,
      confidenceLow: inverseY(fit.transformY, v - ci),
      confidenceHigh: inverseY(fit.transformY, v + ci),
      predictionLow: inverseY(fit.transformY, v - pi),
      predictionHigh: inverseY(fit.transformY, v + pi),
    };
  });
}
