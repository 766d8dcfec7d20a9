/**
 * fittedChartData: a transformed fit's chart data in the coordinates where it was fitted. Checked against the
 * core's own fitted-space quantities (a separate code path: the core computes v − v̂ from its QR solve, the chart
 * derives it from y and the measured residual y − ŷ) and against the polynomial Σ aₖ uᵏ evaluated here.
 * The data are invented (an Antoine-like curve with a fixed ripple), not a measurement.
 */
import { describe, expect, it } from 'vitest';
import { fitPolynomial, forwardX, forwardY } from '../../src/core/index.ts';
import { buildChartData, fittedChartData, fittedPreview, fittedX, fittedY, type FitChartData } from '../../src/render/index.ts';

const T = Array.from({ length: 13 }, (_, i) => 220 + 10 * i);
const p = T.map((t, i) => Math.exp(14 - 2400 / t - 1.4e5 / (t * t)) * (1 + 0.004 * Math.sin(1.7 * i)));
const fit = fitPolynomial({ x: T, y: p }, { order: 2, transformX: 'reciprocal', transformY: 'log' });
const measured: FitChartData = {
  ...buildChartData({ fit, points: T.map((x, i) => ({ row: i + 1, x, y: p[i]! })), xLabel: 'temperature, T (K)', yLabel: 'vapour pressure, p (kPa)' }),
  fitted: { x: 'reciprocal', y: 'log', xLabel: 'reciprocal temperature, 1/T (1/K)', yLabel: 'ln of vapour pressure, ln(p / kPa)', residualLabel: 'ln y − ln ŷ' },
};
const polynomial = (u: number) => fit.coefficients.reduce((sum, a, k) => sum + a * u ** k, 0);

describe('fittedChartData', () => {
  it('fittedX and fittedY are the core transforms (core/transforms.ts forwardX, forwardY), bit for bit', () => {
    for (const value of [0.5, 1, 273.15, 1e-7, 6.02e23]) {
      for (const transform of ['identity', 'reciprocal', 'log'] as const) expect(fittedX(transform, value)).toBe(forwardX(transform, value));
      for (const transform of ['identity', 'log'] as const) expect(fittedY(transform, value)).toBe(forwardY(transform, value));
    }
    expect(fittedY('log', -1)).toBeNaN();
  });

  it('fittedChartData(data) puts the points at (1/T, ln p) with the core\'s fitted-space residuals v − v̂', () => {
    const fitted = fittedChartData(measured)!;
    const largest = Math.max(...fit.points.residuals.map(Math.abs));
    fitted.points.forEach((row, i) => {
      expect(row[1]).toBe(1 / T[i]!);
      expect(row[2]).toBe(Math.log(p[i]!));
      // The chart's residual comes from y and the 6-digit rounded y − ŷ; the core's from its solve.
      expect(Math.abs(row[3] - fit.points.residuals[i]!)).toBeLessThan(1e-5 * largest);
    });
    expect(fitted.xLabel).toBe('reciprocal temperature, 1/T (1/K)');
    expect(fitted.yLabel).toBe('ln of vapour pressure, ln(p / kPa)');
    expect(fitted.residualLabel).toBe('ln y − ln ŷ');
    expect(fitted.range).toEqual({ min: 1 / 340, max: 1 / 220 });
  });

  it('fittedChartData(data) draws the curve as Σ aₖ uᵏ with bands symmetric about it, u increasing', () => {
    const fitted = fittedChartData(measured)!;
    for (let i = 1; i < fitted.curve.length; i++) expect(fitted.curve[i]![0]).toBeGreaterThan(fitted.curve[i - 1]![0]);
    for (const [u, v, cl, ch, pl, ph] of fitted.curve) {
      // 6 significant digits of p and T in the chart data: each ln p within 5e-6, u within 5e-6 relative.
      expect(Math.abs(v! - polynomial(u))).toBeLessThan(1e-5 + 5e-6 * Math.abs(u * (fit.coefficients[1]! + 2 * fit.coefficients[2]! * u)));
      expect(Math.abs(v! - cl! - (ch! - v!))).toBeLessThan(2e-5);
      expect(Math.abs(v! - pl! - (ph! - v!))).toBeLessThan(2e-5);
      expect(ph! - pl!).toBeGreaterThan(ch! - cl!);
    }
  });

  it('fittedChartData(data) is null for an untransformed fit (no fitted coordinates named)', () => {
    const { fitted: _, ...plain } = measured;
    expect(fittedChartData(plain)).toBeNull();
  });

  it('fittedPreview(preview, data) maps a previewed order\'s curve and residuals, every point or an even sample', () => {
    const other = fitPolynomial({ x: T, y: p }, { order: 1, transformX: 'reciprocal', transformY: 'log' });
    const curve = [[T[0]!, Math.exp(other.coefficients[0]! + other.coefficients[1]! / T[0]!), null, null]] as const;
    const every = fittedPreview({ curve, residuals: T.map((x, i) => [x, other.points.residualsOriginal[i]!] as const) }, measured);
    expect(every.curve[0]![0]).toBe(1 / T[0]!);
    expect(every.curve[0]![1]).toBeCloseTo(other.coefficients[0]! + other.coefficients[1]! / T[0]!, 10);
    every.residuals.forEach(([u, r], i) => {
      expect(u).toBe(1 / T[i]!);
      expect(r).toBeCloseTo(other.points.residuals[i]!, 10);
    });
    // Five of thirteen points, as render/orderPreviews.ts samples them: 0, 3, 6, 9, 12.
    const sample = [0, 3, 6, 9, 12];
    const sampled = fittedPreview({ curve, residuals: sample.map((i) => [T[i]!, other.points.residualsOriginal[i]!] as const) }, measured);
    expect(sampled.residuals.map(([u]) => u)).toEqual(sample.map((i) => 1 / T[i]!));
    sampled.residuals.forEach(([, r], j) => expect(r).toBeCloseTo(other.points.residuals[sample[j]!]!, 10));
  });
});
