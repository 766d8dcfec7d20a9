/**
 * How far apart two correlations are where their validity ranges overlap, relative to what their prediction
 * uncertainties allow: on a grid over the overlap, d(x) = y₁(x) − y₂(x) and u(x) = √(h₁(x)² + h₂(x)²), with hᵢ the
 * half-width of correlation i's prediction band (root-sum-square of two independent uncertainties, common practice).
 * The largest |d|/u says whether the two agree: ≤ 1 means within the combined band everywhere on the overlap.
 * O(grid).
 */
import type { CurveRow } from './chartTypes.ts';

export interface OverlapComparison {
  readonly overlap: { readonly min: number; readonly max: number };
  /** Largest |y₁ − y₂| over the overlap, and where. */
  readonly maxDifference: number;
  readonly atMaxDifference: number;
  /** Largest |y₁ − y₂| / u over the overlap, and where. */
  readonly maxRatio: number;
  readonly atMaxRatio: number;
}

/** Linear interpolation of column `column` of curve rows at x (rows sorted by x); null outside or undefined. */
function interpolate(curve: readonly CurveRow[], x: number, column: number): number | null {
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
}

/**
 * Compare two curves (rows [x, fit, conf. low, conf. high, pred. low, pred. high]); null when the ranges do not overlap.
 * @example overlapComparison(a, b, 101)?.maxRatio // => 0.4 (agree) or 3.2 (differ)
 */
export function overlapComparison(a: readonly CurveRow[], b: readonly CurveRow[], count = 101): OverlapComparison | null {
  if (a.length < 2 || b.length < 2) return null;
  const min = Math.max(a[0]![0], b[0]![0]);
  const max = Math.min(a.at(-1)![0], b.at(-1)![0]);
  if (!(min < max)) return null;
  let maxDifference = -1;
  let atMaxDifference = min;
  let maxRatio = -1;
  let atMaxRatio = min;
  for (let i = 0; i < count; i++) {
    const x = i === count - 1 ? max : min + ((max - min) * i) / (count - 1);
    const ya = interpolate(a, x, 1);
    const yb = interpolate(b, x, 1);
    const ha = [interpolate(a, x, 4), interpolate(a, x, 5)];
    const hb = [interpolate(b, x, 4), interpolate(b, x, 5)];
    if (ya === null || yb === null || ha.includes(null) || hb.includes(null)) continue;
    const difference = Math.abs(ya - yb);
    const u = Math.hypot((ha[1]! - ha[0]!) / 2, (hb[1]! - hb[0]!) / 2);
    if (difference > maxDifference) [maxDifference, atMaxDifference] = [difference, x];
    const ratio = u > 0 ? difference / u : difference === 0 ? 0 : Infinity;
    if (ratio > maxRatio) [maxRatio, atMaxRatio] = [ratio, x];
  }
  if (maxDifference < 0) return null;
  return { overlap: { min, max }, maxDifference, atMaxDifference, maxRatio, atMaxRatio };
}
