/**
 * publishedEstimate: y with its confidence and prediction intervals from a published model (the numbers the
 * snippets carry). Expected values computed by hand from the formulas in the file's comment.
 */
import { describe, expect, it } from 'vitest';
import { FitError, intervalHalfWidths, publishedEstimate, type PublishedModel } from '../../src/core/index.ts';

const linear: PublishedModel = Object.freeze({
  transformX: 'identity',
  transformY: 'identity',
  min: 0,
  max: 2,
  center: 1,
  halfWidth: 1,
  coefficients: Object.freeze([3, 2]),
  covariance: Object.freeze([Object.freeze([0.25, 0]), Object.freeze([0, 0.16])]),
  quantile: 2,
  noiseX: Object.freeze([0, 2]),
  noiseSd: Object.freeze([0.3, 0.5]),
}) as PublishedModel;

describe('publishedEstimate', () => {
  it('publishedEstimate(linear, 2): y = 3 + 2·1 = 5; var_fit = 0.25 + 0.16 = 0.41; σ_new = 0.5 (profile end)', () => {
    // Computed by hand: confidence half-width 2·√0.41, prediction half-width 2·√(0.41 + 0.25) = 2·√0.66.
    const estimate = publishedEstimate(linear, 2);
    expect(estimate.y).toBe(5);
    expect(estimate.confidenceHigh - 5).toBeCloseTo(2 * Math.sqrt(0.41), 14);
    expect(5 - estimate.predictionLow).toBeCloseTo(2 * Math.sqrt(0.66), 14);
    expect(estimate.extrapolated).toBe(false);
  });

  it('publishedEstimate(linear, 0.5) interpolates σ_new linearly: 0.3 + 0.25·0.2 = 0.35', () => {
    // Computed by hand: t = -0.5, y = 2, var_fit = 0.25 + 0.25·0.16 = 0.29, var_new = 0.29 + 0.1225 = 0.4125.
    const estimate = publishedEstimate(linear, 0.5);
    expect(estimate.y).toBe(2);
    expect(estimate.predictionHigh - 2).toBeCloseTo(2 * Math.sqrt(0.4125), 14);
    expect(estimate.confidenceHigh - 2).toBeCloseTo(2 * Math.sqrt(0.29), 14);
  });

  it('publishedEstimate under 1/x and ln y takes x through 1/x and the interval ends through exp (asymmetric)', () => {
    // Computed by hand: u = 1/4 = 0.25, t = (0.25 − 0.5)/0.25 = −1, v = 1 + 0.5·(−1) = 0.5, half-width 2·√0.01 = 0.2.
    const model: PublishedModel = { ...linear, transformX: 'reciprocal', transformY: 'log', min: 1, max: 4, center: 0.5, halfWidth: 0.25, coefficients: [1, 0.5], covariance: [[0.01, 0], [0, 0]], noiseX: [1], noiseSd: [0] };
    const estimate = publishedEstimate(model, 4);
    expect(estimate.y).toBeCloseTo(Math.exp(0.5), 15);
    expect(estimate.confidenceLow).toBeCloseTo(Math.exp(0.5 - 0.2), 15);
    expect(estimate.confidenceHigh).toBeCloseTo(Math.exp(0.5 + 0.2), 15);
  });

  it('publishedEstimate refuses x outside the range unless asked to extrapolate, and NaN always', () => {
    expect(() => publishedEstimate(linear, 2.5)).toThrow(FitError);
    expect(() => publishedEstimate(linear, -0.1)).toThrow('x = -0.1 lies outside the validity range [0, 2]');
    const outside = publishedEstimate(linear, 3, { extrapolate: true });
    expect(outside.extrapolated).toBe(true);
    expect(outside.y).toBe(7);
    expect(() => publishedEstimate(linear, NaN, { extrapolate: true })).toThrow('publishedEstimate requires a number for x');
  });

  it('intervalHalfWidths gives NaN intervals without a quantile (no residual degrees of freedom)', () => {
    expect(intervalHalfWidths([1, 0], [[4, 0], [0, 1]], 2, 0)).toEqual({ confidence: 4, prediction: 4 });
    expect(intervalHalfWidths([1], [[1]], NaN, 1).prediction).toBeNaN();
  });
});
