/**
 * overlapComparison: the largest difference of two curves over the overlap of their ranges, relative to the
 * root-sum-square of their prediction half-widths. Expected values computed by hand for straight lines; on random
 * curves (sorted or not, with missing values), the result is exactly that of the plain definition below, which
 * searches every column's segment from the start (an independent computation: the code before the search was shared).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { overlapComparison, type CurveRow } from '../../src/render/index.ts';

/** y = a + b·x with a constant prediction half-width h, sampled on [min, max]. */
function line(a: number, b: number, h: number, min: number, max: number, count = 11): CurveRow[] {
  return Array.from({ length: count }, (_, i) => {
    const x = min + ((max - min) * i) / (count - 1);
    const y = a + b * x;
    return [x, y, y - h / 2, y + h / 2, y - h, y + h] as const;
  });
}

describe('overlapComparison', () => {
  it('overlapComparison(a, b) finds the overlap and the largest difference at its end (computed by hand)', () => {
    // y₁ = x on [0, 10], y₂ = 1 + 0.5x on [4, 20]: overlap [4, 10]; d = |0.5x − 1| is largest at x = 10: 4.
    // Half-widths 3 and 4 → u = 5, so the largest ratio is 4/5 = 0.8, also at x = 10.
    const result = overlapComparison(line(0, 1, 3, 0, 10), line(1, 0.5, 4, 4, 20))!;
    expect(result.overlap).toEqual({ min: 4, max: 10 });
    expect(result.maxDifference).toBeCloseTo(4, 12);
    expect(result.atMaxDifference).toBe(10);
    expect(result.maxRatio).toBeCloseTo(0.8, 12);
    expect(result.atMaxRatio).toBe(10);
  });

  it('overlapComparison(a, b) is null when the ranges do not overlap, and symmetric otherwise', () => {
    expect(overlapComparison(line(0, 1, 1, 0, 10), line(0, 1, 1, 11, 20))).toBeNull();
    const ab = overlapComparison(line(0, 1, 1, 0, 10), line(2, 1, 1, 5, 15))!;
    const ba = overlapComparison(line(2, 1, 1, 5, 15), line(0, 1, 1, 0, 10))!;
    // Parallel lines 2 apart, half-widths 1 and 1: ratio 2/√2 = √2 everywhere on [5, 10].
    expect(ab.maxRatio).toBeCloseTo(Math.SQRT2, 12);
    expect(ba.maxRatio).toBeCloseTo(Math.SQRT2, 12);
    expect(ab.maxDifference).toBeCloseTo(2, 12);
  });

  it('overlapComparison(a, b) equals the plain definition exactly on random curves, sorted or not, with missing values', () => {
    /** Linear interpolation of one column at x on the first segment that holds x; null outside or undefined. */
    const interpolate = (curve: readonly CurveRow[], x: number, column: number): number | null => {
      for (let i = 1; i < curve.length; i++) {
        const a = curve[i - 1]!;
        const b = curve[i]!;
        if (x < a[0] || x > b[0]) continue;
        const va = a[column];
        const vb = b[column];
        if (va == null || vb == null) return null;
        const t = b[0] === a[0] ? 0 : (x - a[0]) / (b[0] - a[0]);
        return va + t * (vb - va);
      }
      return null;
    };
    const plain = (a: readonly CurveRow[], b: readonly CurveRow[], count = 101) => {
      if (a.length < 2 || b.length < 2) return null;
      const min = Math.max(a[0]![0], b[0]![0]);
      const max = Math.min(a.at(-1)![0], b.at(-1)![0]);
      if (!(min < max)) return null;
      let best = { maxDifference: -1, atMaxDifference: min, maxRatio: -1, atMaxRatio: min };
      for (let i = 0; i < count; i++) {
        const x = i === count - 1 ? max : min + ((max - min) * i) / (count - 1);
        const values = [interpolate(a, x, 1), interpolate(b, x, 1), interpolate(a, x, 4), interpolate(a, x, 5), interpolate(b, x, 4), interpolate(b, x, 5)];
        if (values.includes(null)) continue;
        const [ya, yb, la, ha, lb, hb] = values as number[];
        const difference = Math.abs(ya! - yb!);
        const u = Math.hypot((ha! - la!) / 2, (hb! - lb!) / 2);
        const ratio = u > 0 ? difference / u : difference === 0 ? 0 : Infinity;
        if (difference > best.maxDifference) best = { ...best, maxDifference: difference, atMaxDifference: x };
        if (ratio > best.maxRatio) best = { ...best, maxRatio: ratio, atMaxRatio: x };
      }
      return best.maxDifference < 0 ? null : { overlap: { min, max }, ...best };
    };
    const value = fc.option(fc.double({ min: -100, max: 100, noNaN: true }), { nil: null, freq: 8 });
    const row = fc.tuple(fc.double({ min: -10, max: 10, noNaN: true }), value, value, value, value, value);
    const curve = fc.oneof(
      fc.array(row, { minLength: 0, maxLength: 12 }),
      fc.array(row, { minLength: 2, maxLength: 12 }).map((rows) => [...rows].sort((p, q) => p[0] - q[0])),
    );
    fc.assert(
      fc.property(curve, curve, fc.integer({ min: 2, max: 40 }), (a, b, count) => {
        expect(overlapComparison(a, b, count)).toEqual(plain(a, b, count));
      }),
      { numRuns: 2000 },
    );
  });
});
