/**
 * fitCurves, the previews' fits of several orders from one factorisation: for every order it must give exactly,
 * bit for bit, what fitCurve gives when it refits that order on its own (the independent computation checked here:
 * one ml-matrix QR per order), including null where fitCurve throws. Data: NIST StRD problems
 * (test/fixtures/nist-strd) and seeded random tables, unweighted and weighted, with transforms, without intercept,
 * with a narrowed range, with pass-through points, and with orders too high for the data.
 */
import { describe, expect, it } from 'vitest';
import { fitCurve, fitCurves, type CurveFit, type FitData, type FitOptions } from '../../src/core/index.ts';
import { nistDatasets } from '../helpers/nist.ts';
import { createRandom } from '../../scripts/demo/random.ts';

/** fitCurve for one order, null where it throws (what the previews skip). */
function oneByOne(data: FitData, options: Omit<FitOptions, 'order'>, order: number): CurveFit | null {
  try {
    return fitCurve(data, { ...options, order });
  } catch {
    return null;
  }
}

function expectSameAsRefits(data: FitData, options: Omit<FitOptions, 'order'>, orders: readonly number[]): number {
  const together = fitCurves(data, options, orders);
  const separate = orders.map((order) => oneByOne(data, options, order));
  // toStrictEqual: NaN equals NaN, but 0 and −0 differ, and every number must be the same double.
  expect(together).toStrictEqual(separate);
  return separate.filter((fit) => fit !== null).length;
}

describe('fitCurves', () => {
  for (const name of ['Norris', 'Pontius', 'NoInt1', 'NoInt2', 'Wampler1', 'Wampler2', 'Wampler3']) {
    const dataset = nistDatasets[name];
    if (dataset === undefined) continue;
    it(`${name} (NIST StRD): every order 1–10 equals its own refit by fitCurve`, () => {
      const data = { x: [...dataset.data.x], y: [...dataset.data.y] };
      expectSameAsRefits(data, { intercept: dataset.model.intercept }, [1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    });
  }

  it('equals fitCurve order by order on 300 random tables (weighted, transformed, no intercept, narrowed range, constraints)', () => {
    const random = createRandom(20261202);
    let fitted = 0;
    for (let trial = 0; trial < 300; trial++) {
      const n = 3 + Math.floor(random.uniform() * (trial % 10 === 0 ? 400 : 40));
      const low = trial % 7 === 0 ? 0.001 + random.uniform() : 100 + 500 * random.uniform();
      const high = low * (1.2 + 3 * random.uniform());
      const degree = 1 + Math.floor(random.uniform() * 6);
      const coefficients = Array.from({ length: degree + 1 }, () => random.normal(0, 1));
      const x = Array.from({ length: n }, (_, i) => Number((low + ((high - low) * (trial % 3 === 0 ? random.uniform() : i / (n - 1)))).toPrecision(6)));
      if (trial % 5 === 0 && n > 4) x[1] = x[0]!; // a repeated x
      const truth = (value: number) => coefficients.reduceRight((sum, c) => sum * ((2 * (value - low)) / (high - low) - 1) + c, 0);
      const logY = trial % 4 === 1;
      const y = x.map((value) => Number((logY ? Math.exp(truth(value) / 4) : 10 + truth(value) + random.normal(0, 0.01)).toPrecision(6)));
      const weighted = trial % 3 === 1;
      const data: FitData = { x, y, uncertainty: weighted ? y.map(() => Number((0.005 * (1 + random.uniform())).toPrecision(3))) : undefined };
      const sorted = [...x].sort((a, b) => a - b);
      const options: Omit<FitOptions, 'order'> = {
        intercept: trial % 6 !== 5,
        transformX: logY ? 'reciprocal' : trial % 8 === 2 ? 'log' : 'identity',
        transformY: logY ? 'log' : 'identity',
        ...(weighted && trial % 2 === 0 ? { uncertaintyScale: 'stated' as const } : {}),
        ...(weighted && trial % 9 === 4 ? { uncertaintyModel: { relative: 0.01 } } : {}),
        ...(trial % 11 === 3 ? { range: { min: sorted[0]!, max: sorted[sorted.length - 1]! - (sorted[sorted.length - 1]! - sorted[0]!) / 10 } } : {}),
        ...(trial % 13 === 6 ? { constraints: [{ x: x[Math.floor(n / 2)]!, y: y[Math.floor(n / 2)]! }] } : {}),
      };
      fitted += expectSameAsRefits(data, options, [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12].filter(() => random.uniform() < 0.8));
    }
    // Most orders could be fitted (the comparison is not only of nulls). Computed by hand: about 300·0.8·12·(share fitted).
    expect(fitted).toBeGreaterThan(1000);
  });

  it('gives null for every order when the data cannot be fitted at all, as fitCurve throws for each', () => {
    expect(fitCurves({ x: [1, 1, 1], y: [1, 2, 3] }, {}, [1, 2])).toStrictEqual([null, null]);
    expect(fitCurves({ x: [1, 2, 3], y: [1, Number.NaN, 3] }, {}, [1])).toStrictEqual([null]);
  });

  it('does not modify its inputs', () => {
    const data = Object.freeze({ x: Object.freeze([1, 2, 3, 4, 5]), y: Object.freeze([2, 4.1, 5.9, 8.2, 9.9]) });
    expect(() => fitCurves(data, Object.freeze({}), Object.freeze([1, 2]))).not.toThrow();
  });
});
