/**
 * The quantile functions remember what they computed (distributions.ts): a remembered value is exactly what stdlib
 * computes for the same arguments (the independent computation: the stdlib packages called directly), however often
 * and in whatever order they are asked, and they still agree with printed tables.
 */
import tQuantileStdlib from '@stdlib/stats-base-dists-t-quantile';
import fQuantileStdlib from '@stdlib/stats-base-dists-f-quantile';
import chiSquareQuantileStdlib from '@stdlib/stats-base-dists-chisquare-quantile';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { chiSquareQuantile, fQuantile, tQuantile } from '../../src/core/index.ts';

describe('quantiles', () => {
  it('tQuantile, fQuantile and chiSquareQuantile equal stdlib bit for bit, asked once or many times', () => {
    const probability = fc.oneof(fc.constantFrom(0.975, 0.95, 0.995, 0.5, 0, 1), fc.double({ min: 0, max: 1, noNaN: true }));
    const dof = fc.oneof(fc.integer({ min: 1, max: 3000 }), fc.constantFrom(0, -0, 0.5, Infinity, NaN));
    fc.assert(
      fc.property(probability, dof, dof, (p, d1, d2) => {
        for (let again = 0; again < 2; again++) {
          expect(Object.is(tQuantile(p, d1), tQuantileStdlib(p, d1))).toBe(true);
          expect(Object.is(fQuantile(p, d1, d2), fQuantileStdlib(p, d1, d2))).toBe(true);
          expect(Object.is(chiSquareQuantile(p, d1), chiSquareQuantileStdlib(p, d1))).toBe(true);
        }
      }),
      { numRuns: 300, seed: 3 },
    );
    // More arguments than the memory keeps (it is cleared and filled again): still stdlib's values.
    for (let dof = 1; dof <= 5000; dof++) expect(tQuantile(0.975, dof)).toBe(tQuantileStdlib(0.975, dof));
    for (let dof = 1; dof <= 50; dof++) expect(tQuantile(0.975, dof)).toBe(tQuantileStdlib(0.975, dof));
  });

  it('quantiles agree with printed tables', () => {
    // Printed statistical tables (common practice, three decimals): t(0.975; 10) = 2.228, F(0.95; 2, 10) = 4.10,
    // χ²(0.95; 10) = 18.307.
    expect(tQuantile(0.975, 10).toFixed(3)).toBe('2.228');
    expect(tQuantile(0.975, 10).toFixed(3)).toBe('2.228');
    expect(fQuantile(0.95, 2, 10).toFixed(2)).toBe('4.10');
    expect(chiSquareQuantile(0.95, 10).toFixed(3)).toBe('18.307');
  });
});
