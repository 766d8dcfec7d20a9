/**
 * fitCurve, the floating-point fit the order previews draw: on NIST StRD problems (test/fixtures/nist-strd) its
 * curve reproduces the certified polynomial and its s the certified residual standard deviation, and for every
 * part it returns it gives exactly the numbers fitPolynomial gives with exact certification off (its contract:
 * the same solve, so a preview drawn from it is the picture a full fit would give).
 */
import { describe, expect, it } from 'vitest';
import { bands, evaluateFit, fitCurve, fitPolynomial } from '../../src/core/index.ts';
import { lre } from '../helpers/lre.ts';
import { nistDatasets, powerOf } from '../helpers/nist.ts';

describe('fitCurve', () => {
  for (const name of ['Norris', 'Pontius', 'NoInt1', 'Wampler1', 'Wampler2']) {
    const dataset = nistDatasets[name];
    if (dataset === undefined) continue;
    it(`${name}: the curve at every x agrees with the certified polynomial (LRE ≥ 9) and s with the certified residual standard deviation`, () => {
      const data = { x: [...dataset.data.x], y: [...dataset.data.y] };
      const curve = fitCurve(data, { order: dataset.model.degree, intercept: dataset.model.intercept });
      // Certified values: NIST StRD (test/fixtures/nist-strd/certified.json).
      const certified = (x: number) => dataset.certified.parameters.reduce((sum, p) => sum + p.estimate.value! * x ** powerOf(p.name), 0);
      for (const x of data.x) {
        const y = certified(x);
        const got = evaluateFit(curve, x).y;
        if (Math.abs(y) > 1e-300) expect(lre(got, y)).toBeGreaterThanOrEqual(9);
      }
      const s = dataset.certified.residualStandardDeviation.value!;
      if (s > 0) expect(lre(curve.statistics.residualStdDev, s)).toBeGreaterThanOrEqual(9);
    });
  }

  it('gives the same mapped form, s, bands and residuals as fitPolynomial with exact off (weighted, transformed and constrained too)', () => {
    const x = [250, 275, 300, 325, 350, 375, 400, 425, 450, 475, 500];
    const y = x.map((value, i) => 2 + 3e-3 * value + 4e-6 * value * value + (i % 3 === 0 ? 0.01 : -0.007));
    const uncertainty = x.map((_, i) => 0.005 + 0.001 * (i % 4));
    const cases = [
      { data: { x, y }, options: { order: 2 } },
      { data: { x, y, uncertainty }, options: { order: 3, uncertaintyScale: 'stated' as const } },
      { data: { x, y, uncertainty }, options: { order: 2, uncertaintyModel: { relative: 0.002 } } },
      { data: { x, y }, options: { order: 2, transformX: 'reciprocal' as const, transformY: 'log' as const } },
      { data: { x, y }, options: { order: 3, constraints: [{ x: 300, y: 3.26 }] } },
    ];
    for (const { data, options } of cases) {
      const full = fitPolynomial(data, { ...options, exact: 'off' });
      const curve = fitCurve(data, options);
      expect(curve.mapped).toEqual(full.mapped);
      expect(curve.statistics.residualStdDev).toBe(full.statistics.residualStdDev);
      expect(curve.statistics.degreesOfFreedom).toBe(full.statistics.degreesOfFreedom);
      expect(curve.residualsOriginal).toEqual(full.points.residualsOriginal);
      const grid = [250, 301.5, 377.25, 500];
      expect(bands(curve, grid)).toEqual(bands(full, grid));
    }
  });
});
