/**
 * overlapComparison: the largest difference of two curves over the overlap of their ranges, relative to the
 * root-sum-square of their prediction half-widths. Expected values computed by hand for straight lines.
 */
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
});
