/**
 * y at x with its confidence and prediction intervals, from a correlation's *published model*: the mapped form at
 * full precision with its covariance, the quantile of the intervals and the profile of the uncertainty of a new
 * observation. These are the numbers every code snippet carries (src/export/snippets), so whatever evaluates from
 * them — the page's evaluator in the browser — gives what the snippets give; the bands of the charts use the same
 * interval arithmetic (intervalHalfWidths, shared with stats/bands.ts).
 *
 * With t = (u − center)/halfWidth, u the transformed x, φ = (t^0..t^m) and Σ the covariance of the mapped
 * coefficients b:
 *   v = Σ b_k t^k (Horner),   var_fit = φᵀ Σ φ,   var_new = var_fit + σ_new(x)²,
 *   confidence half-width = q·√var_fit,   prediction half-width = q·√var_new,
 * taken back through the y transform (asymmetric under ln y). σ_new(x) is the published profile interpolated
 * linearly in x and held constant beyond its ends (profileAt). Reference: NIST/SEMATECH e-Handbook of Statistical
 * Methods, §4.5.2.1–2 (https://www.itl.nist.gov/div898/handbook/).
 *
 * Pure and dependency-free (no ml-matrix, no @stdlib), so the browser can load it through src/core/browser.ts.
 * Cost: O(m²) per x, plus O(log n) for the profile.
 */
import { FitError } from '../fitError.ts';
import { horner } from '../evaluate.ts';
import { forwardX, inverseY } from '../transforms.ts';
import type { TransformX, TransformY } from '../types.ts';
import { profileAt } from './localUncertainty.ts';

/** A correlation as published for evaluation: plain numbers, as the snippets and the page carry them. */
export interface PublishedModel {
  readonly transformX: TransformX;
  readonly transformY: TransformY;
  /** Validity range of x. */
  readonly min: number;
  readonly max: number;
  /** Mapping t = (u − center)/halfWidth of the transformed x. */
  readonly center: number;
  readonly halfWidth: number;
  /** Mapped coefficients b_0..b_m (ascending powers of t), full precision. */
  readonly coefficients: readonly number[];
  /** Covariance of the mapped coefficients. */
  readonly covariance: readonly (readonly number[])[];
  /** Two-sided quantile of the intervals (Student's t or normal); NaN without residual degrees of freedom. */
  readonly quantile: number;
  /** Standard deviation of a new observation in the fitted space, at x values (linear between, constant beyond). */
  readonly noiseX: readonly number[];
  readonly noiseSd: readonly number[];
}

export interface PublishedEstimate {
  readonly x: number;
  readonly y: number;
  /** Whether x lies outside [min, max] (only possible with `extrapolate`). */
  readonly extrapolated: boolean;
  readonly confidenceLow: number;
  readonly confidenceHigh: number;
  readonly predictionLow: number;
  readonly predictionHigh: number;
}

/**
 * Half-widths q·√(φᵀΣφ) and q·√(φᵀΣφ + σ_new²) of the confidence and prediction intervals in the fitted space.
 * @example intervalHalfWidths([1, 0], [[4, 0], [0, 1]], 2, 0) // => { confidence: 4, prediction: 4 }
 */
export function intervalHalfWidths(
  phi: readonly number[],
  covariance: readonly (readonly number[])[],
  quantile: number,
  newSd: number,
): { confidence: number; prediction: number } {
  let varFit = 0;
  for (let j = 0; j < phi.length; j++) for (let k = 0; k < phi.length; k++) varFit += phi[j]! * covariance[j]![k]! * phi[k]!;
  return { confidence: quantile * Math.sqrt(Math.max(0, varFit)), prediction: quantile * Math.sqrt(Math.max(0, varFit) + newSd * newSd) };
}

/**
 * Evaluate a published model at x.
 * @throws FitError 'outside-range' when x is outside [min, max] and `extrapolate` is not set; 'not-a-number' for NaN
 * @example publishedEstimate({ transformX: 'identity', transformY: 'identity', min: 0, max: 2, center: 1, halfWidth: 1,
 *   coefficients: [3, 2], covariance: [[0.25, 0], [0, 0]], quantile: 2, noiseX: [0], noiseSd: [0] }, 1)
 *   // => { x: 1, y: 3, extrapolated: false, confidenceLow: 2, confidenceHigh: 4, predictionLow: 2, predictionHigh: 4 }
 */
export function publishedEstimate(model: PublishedModel, x: number, options: { readonly extrapolate?: boolean } = {}): PublishedEstimate {
  if (Number.isNaN(x)) throw new FitError('not-a-number', 'publishedEstimate requires a number for x');
  const extrapolated = x < model.min || x > model.max;
  if (extrapolated && !options.extrapolate) {
    throw new FitError('outside-range', `x = ${x} lies outside the validity range [${model.min}, ${model.max}]; the correlation holds only inside it`);
  }
  const t = (forwardX(model.transformX, x) - model.center) / model.halfWidth;
  const phi = [1];
  for (let k = 1; k < model.coefficients.length; k++) phi.push(phi[k - 1]! * t);
  const v = horner(model.coefficients, t);
  const half = intervalHalfWidths(phi, model.covariance, model.quantile, profileAt({ x: model.noiseX, sigma: model.noiseSd }, x));
  const back = (value: number) => inverseY(model.transformY, value);
  return {
    x,
    y: back(v),
    extrapolated,
    confidenceLow: back(v - half.confidence),
    confidenceHigh: back(v + half.confidence),
    predictionLow: back(v - half.prediction),
    predictionHigh: back(v + half.prediction),
  };
}
