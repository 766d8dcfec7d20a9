/**
 * Confidence and prediction bands of a fitted polynomial at chosen x values.
 *
 * With φ(x) the mapped basis (t^0..t^m) and Σ_b the covariance of the mapped coefficients,
 *   var_fit(x) = φᵀ Σ_b φ,                  confidence half-width = t_{(1+c)/2, dof} · √var_fit
 *   var_new(x) = var_fit(x) + σ_new(x)²,   prediction half-width = t_{(1+c)/2, dof} · √var_new
 * where σ_new(x) is the uncertainty of a new observation at x (stats/localUncertainty.ts): s for an unweighted fit;
 * for a weighted fit the stated σ interpolated at x, scaled by s outside χ² mode — so the band narrows where σ is
 * small. In χ² mode (σ known) Σ_b is unscaled and the quantile is the normal one instead of Student's t.
 * Bands are computed in the fitted space and taken back through the y transform (so they are asymmetric under ln y).
 * Reference: NIST/SEMATECH e-Handbook of Statistical Methods, §4.5.2.1–2 (https://www.itl.nist.gov/div898/handbook/).
 */
import { normalQuantile, tQuantile } from '../distributions.ts';
import { localUncertainty } from './localUncertainty.ts';
import { intervalHalfWidths } from './publishedEstimate.ts';
import { basisAt, evaluateFit } from '../evaluate.ts';
import { inverseY } from '../transforms.ts';
import type { BandFit } from '../types.ts';

export interface BandPoint {
  readonly x: number;
  readonly y: number;
  readonly confidenceLow: number;
  readonly confidenceHigh: number;
  readonly predictionLow: number;
  readonly predictionHigh: number;
}

/**
 * Bands at each x (inside the range unless `extrapolate`). NaN bands when the fit has no residual dof.
 * @example bands(fit, [300])[0] // => { x: 300, y: …, confidenceLow: …, confidenceHigh: …, predictionLow: …, predictionHigh: … }
 */
export function bands(
  fit: BandFit,
  xs: readonly number[],
  options: { readonly confidence?: number; readonly extrapolate?: boolean } = {},
): BandPoint[] {
  const confidence = options.confidence ?? fit.confidence;
  const dof = fit.statistics.degreesOfFreedom;
  const quantile = fit.uncertaintyScale === 'stated' ? normalQuantile((1 + confidence) / 2) : dof > 0 ? tQuantile((1 + confidence) / 2, dof) : NaN;
  return xs.map((x) => {
    const newPointSd = localUncertainty(fit, x);
    const evaluation = evaluateFit(fit, x, { extrapolate: options.extrapolate ?? false });
    const { confidence: ci, prediction: pi } = intervalHalfWidths(basisAt(fit, x), fit.mapped.covariance, quantile, newPointSd);
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
