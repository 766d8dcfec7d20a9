/**
 * Property-based checks of fitPolynomial (fast-check, fixed seed so failures reproduce). These are invariants of
 * least squares itself (common practice), not values from a source: predictions do not depend on the units or
 * origin of x, on the order of the points, or on a common factor in the weights; exact polynomial data are
 * recovered; coefficients printed with the digits asked for reproduce the curve within 1 % of s.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateFit, fitPolynomial, roundSignificant } from '../../src/core/index.ts';

const SEED = 20261202;
const settings = { seed: SEED, numRuns: 60 };

/** Distinct x values on a temperature-like range, with noisy smooth y. */
const dataset = fc
  .record({
    n: fc.integer({ min: 8, max: 40 }),
    start: fc.double({ min: 200, max: 600, noNaN: true }),
    span: fc.double({ min: 50, max: 900, noNaN: true }),
    order: fc.integer({ min: 1, max: 5 }),
    noise: fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 40, maxLength: 40 }),
  })
  .map(({ n, start, span, order, noise }) => {
    const x = Array.from({ length: n }, (_, i) => start + (span * i) / (n - 1));
    const y = x.map((t, i) => 3 + Math.log(t) + 0.02 * noise[i]!);
    return { x, y, order };
  });

const close = (a: number, b: number, tolerance: number) => Math.abs(a - b) <= tolerance * Math.max(1, Math.abs(b));

describe('fitPolynomial invariants', () => {
  it('fitPolynomial predictions are invariant under shifting and scaling x', () => {
    fc.assert(
      fc.property(dataset, fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), ({ x, y, order }, shift, scale) => {
        const original = fitPolynomial({ x, y }, { order });
        const moved = x.map((v) => scale * v + shift);
        const refit = fitPolynomial({ x: moved, y }, { order });
        x.forEach((v, i) => {
          const a = evaluateFit(original, v).y;
          const b = evaluateFit(refit, Math.min(refit.range.max, Math.max(refit.range.min, moved[i]!))).y;
          expect(close(a, b, 1e-8)).toBe(true);
        });
      }),
      settings,
    );
  });

  it('fitPolynomial recovers exact polynomial data', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 6 }),
        fc.array(fc.integer({ min: -9, max: 9 }), { minLength: 7, maxLength: 7 }),
        fc.integer({ min: 250, max: 600 }),
        (order, digits, start) => {
          // Coefficients of the mapped-scale polynomial in (x − 575)/325 keep values moderate; truth is exact.
          const x = Array.from({ length: order + 6 }, (_, i) => start + 40 * i);
          const truth = (v: number) => digits.slice(0, order + 1).reduce((sum, c, k) => sum + c * ((v - 575) / 325) ** k, 0);
          const y = x.map(truth);
          const fit = fitPolynomial({ x, y }, { order });
          x.forEach((v) => expect(close(evaluateFit(fit, v).y, truth(v), 1e-10)).toBe(true));
          expect(fit.statistics.maxAbsResidual).toBeLessThan(1e-9 * Math.max(1, ...y.map(Math.abs)));
        },
      ),
      settings,
    );
  });

  it('fitPolynomial does not depend on the order of the points', () => {
    fc.assert(
      fc.property(dataset, fc.integer({ min: 1, max: 1_000_000 }), ({ x, y, order }, salt) => {
        const permutation = x.map((_, i) => i).sort((a, b) => ((a * 7919 + salt) % 104729) - ((b * 7919 + salt) % 104729));
        const fit = fitPolynomial({ x, y }, { order });
        const shuffled = fitPolynomial({ x: permutation.map((i) => x[i]!), y: permutation.map((i) => y[i]!) }, { order });
        fit.coefficients.forEach((a, k) => expect(close(shuffled.coefficients[k]!, a, 1e-9)).toBe(true));
        expect(close(shuffled.statistics.residualStdDev, fit.statistics.residualStdDev, 1e-9)).toBe(true);
      }),
      settings,
    );
  });

  it('fitPolynomial with uniform weights equals the unweighted fit', () => {
    fc.assert(
      fc.property(dataset, fc.double({ min: 1e-3, max: 1e3, noNaN: true }), ({ x, y, order }, sigma) => {
        const plain = fitPolynomial({ x, y }, { order });
        const weighted = fitPolynomial({ x, y, uncertainty: x.map(() => sigma) }, { order });
        plain.coefficients.forEach((a, k) => expect(close(weighted.coefficients[k]!, a, 1e-9)).toBe(true));
        plain.standardErrors.forEach((se, k) => expect(close(weighted.standardErrors[k]!, se, 1e-8)).toBe(true));
      }),
      settings,
    );
  });

  it('coefficients rounded to significantDigits stay within 1 % of s of the full fit over the range', () => {
    fc.assert(
      fc.property(dataset, ({ x, y, order }) => {
        const fit = fitPolynomial({ x, y }, { order });
        const rounded = fit.coefficients.map((a, k) => roundSignificant(a, fit.significantDigits[k]!));
        const s = fit.statistics.residualStdDev;
        for (let i = 0; i <= 500; i++) {
          const v = fit.range.min + ((fit.range.max - fit.range.min) * i) / 500;
          let full = 0;
          let short = 0;
          for (let k = order; k >= 0; k--) {
            full = full * v + fit.coefficients[k]!;
            short = short * v + rounded[k]!;
          }
          expect(Math.abs(full - short)).toBeLessThanOrEqual(0.01 * s);
        }
      }),
      settings,
    );
  });
});
