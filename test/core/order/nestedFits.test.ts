import { SingularValueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { fitNestedOrders } from '../../../src/core/order/index.ts';

/**
 * Independent naive reference: for each order, a separate least-squares solve by the SVD (not the QR the code
 * uses), residuals from that solve, and PRESS from n explicit leave-one-out refits (each again by SVD).
 */
function naiveFit(u: readonly number[], v: readonly number[], order: number, center: number, halfWidth: number, intercept = true, weights?: readonly number[]) {
  const first = intercept ? 0 : 1;
  const row = (value: number, weight: number) => {
    const t = (value - center) / halfWidth;
    const cells: number[] = [];
    for (let k = first; k <= order; k++) cells.push(Math.sqrt(weight) * t ** k);
    return cells;
  };
  const solve = (indices: number[]) => {
    const design = new Matrix(indices.map((i) => row(u[i]!, weights?.[i] ?? 1)));
    const rhs = Matrix.columnVector(indices.map((i) => Math.sqrt(weights?.[i] ?? 1) * v[i]!));
    return new SingularValueDecomposition(design, { autoTranspose: true }).solve(rhs).to1DArray();
  };
  const predict = (coefficients: number[], i: number) => row(u[i]!, 1).reduce((sum, cell, k) => sum + cell * coefficients[k]!, 0);
  const all = u.map((_, i) => i);
  const coefficients = solve(all);
  let sumOfSquares = 0;
  let press = 0;
  for (const i of all) {
    const w = weights?.[i] ?? 1;
    sumOfSquares += w * (v[i]! - predict(coefficients, i)) ** 2;
    const loo = solve(all.filter((j) => j !== i));
    press += w * (v[i]! - predict(loo, i)) ** 2;
  }
  return { coefficients, sumOfSquares, press };
}

// A deterministic, non-polynomial data set on a temperature-like range (values invented for the test).
const u = Object.freeze([250, 290, 330, 380, 420, 470, 530, 600, 660, 720, 800, 900]);
const v = Object.freeze(u.map((x, i) => 2 + 0.4 * Math.exp(-600 / x) + 0.002 * Math.sin(3 * i)));

describe('fitNestedOrders', () => {
  it('fitNestedOrders(u, v) matches per-order SVD fits and explicit leave-one-out refits', () => {
    const nested = fitNestedOrders(u, v, { maxOrder: 6 });
    expect(nested.map.center).toBe(575);
    expect(nested.map.halfWidth).toBe(325);
    for (const fit of nested.fits) {
      const reference = naiveFit(u, v, fit.order, 575, 325);
      expect(fit.residualSumOfSquares).toBeCloseTo(reference.sumOfSquares, 12);
      expect(fit.residualSumOfSquares / reference.sumOfSquares).toBeCloseTo(1, 8);
      expect(fit.press / reference.press).toBeCloseTo(1, 8);
      fit.mappedCoefficients.forEach((c, k) => expect(c).toBeCloseTo(reference.coefficients[k]!, 9));
    }
  });

  it('fitNestedOrders(u, v, { weights }) matches weighted SVD fits', () => {
    const weights = u.map((_, i) => 1 / (0.001 * (1 + (i % 3))) ** 2);
    const nested = fitNestedOrders(u, v, { maxOrder: 4, weights });
    expect(nested.weighted).toBe(true);
    for (const fit of nested.fits) {
      const reference = naiveFit(u, v, fit.order, 575, 325, true, weights);
      expect(fit.residualSumOfSquares / reference.sumOfSquares).toBeCloseTo(1, 8);
      expect(fit.press / reference.press).toBeCloseTo(1, 8);
    }
  });

  it('fitNestedOrders(u, v, { intercept: false }) drops the constant and scales by max|u|', () => {
    const nested = fitNestedOrders(u, v, { maxOrder: 3, intercept: false });
    expect(nested.map).toEqual({ center: 0, halfWidth: 900 });
    expect(nested.fits[0]!.order).toBe(1);
    expect(nested.fits[0]!.parameters).toBe(1);
    for (const fit of nested.fits) {
      const reference = naiveFit(u, v, fit.order, 0, 900, false);
      expect(fit.residualSumOfSquares / reference.sumOfSquares).toBeCloseTo(1, 8);
      expect(fit.press / reference.press).toBeCloseTo(1, 8);
      expect(fit.mappedCoefficients[0]).toBe(0);
    }
  });

  it('fitNestedOrders floors S_r so that exactly linear data tie at every order', () => {
    // y = 1.5 + 0.25 x is exact in binary for these x, so all orders ≥ 1 reproduce it to rounding error.
    const x = [0, 1, 2, 3, 4, 5, 6, 7];
    const y = x.map((value) => 1.5 + 0.25 * value);
    const nested = fitNestedOrders(x, y, { maxOrder: 5 });
    const floor = 8 * (1e-11 * 3.25) ** 2;
    expect(nested.residualFloor).toBeCloseTo(floor, 30);
    for (const fit of nested.fits.slice(1)) {
      expect(fit.residualSumOfSquares).toBe(floor);
      expect(fit.press).toBe(floor);
    }
    expect(nested.fits[0]!.residualSumOfSquares).toBeGreaterThan(1);
  });

  it('fitNestedOrders keeps PRESS accurate for a point of leverage ≈ 1 (1 − h ≈ 5e-13, the deletion-identity path)', () => {
    // Eight points clustered within 7e-7 of 0 and one far point at 1 (invented): the far point has
    // 1 − h ≈ Sxx(cluster)/(8/9) ≈ 4.7e-13, where 1 − Σ Q² keeps only about 3 digits (measured: PRESS off by
    // 5e-4 relative with that formula, 2e-6 with the deletion identity). Reference for the
    // straight line: explicit leave-one-out refits by the centred closed form slope = Σ(x − x̄)(y − ȳ)/Σ(x − x̄)²,
    // each refit centred on its own points (well conditioned, independent of QR).
    const xs = [0, 1e-7, 2e-7, 3e-7, 4e-7, 5e-7, 6e-7, 7e-7, 1];
    const ys = xs.map((value, i) => 1 + 2 * value + 1e-3 * Math.cos(5 * i));
    let press = 0;
    for (let i = 0; i < xs.length; i++) {
      const keep = xs.map((_, j) => j).filter((j) => j !== i);
      const meanX = keep.reduce((sum, j) => sum + xs[j]!, 0) / keep.length;
      const meanY = keep.reduce((sum, j) => sum + ys[j]!, 0) / keep.length;
      const sxy = keep.reduce((sum, j) => sum + (xs[j]! - meanX) * (ys[j]! - meanY), 0);
      const sxx = keep.reduce((sum, j) => sum + (xs[j]! - meanX) ** 2, 0);
      press += (ys[i]! - (meanY + (sxy / sxx) * (xs[i]! - meanX))) ** 2;
    }
    const nested = fitNestedOrders(xs, ys, { maxOrder: 1 });
    expect(Math.abs(nested.fits[1]!.press / press - 1)).toBeLessThan(1e-5);
  });

  it('fitNestedOrders does not modify its inputs', () => {
    const x = Object.freeze([1, 2, 3, 4, 5]);
    const y = Object.freeze([2, 4.1, 5.9, 8.2, 9.9]);
    expect(() => fitNestedOrders(x, y, { maxOrder: 2 })).not.toThrow();
    expect(x).toEqual([1, 2, 3, 4, 5]);
  });
});
