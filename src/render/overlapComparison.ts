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

/**
 * Index i of the first segment [curve[i − 1][0], curve[i][0]] that holds x, searching from `from` (≥ 1), or −1.
 * The first segment from 1 on is the one meant: a caller may start later only past segments that cannot hold x.
 */
function segmentAt(curve: readonly CurveRow[], x: number, from: number): number {
  for (let i = from; i < curve.length; i++) {
    if (x < curve[i - 1]![0] || x > curve[i]![0]) continue;
    return i;
  }
  return -1;
}

/** Linear interpolation of column `column` of curve rows on segment i (segmentAt) at x; null when undefined there. */
function interpolate(curve: readonly CurveRow[], i: number, x: number, column: number): number | null {
  const a = curve[i - 1]!;
  const b = curve[i]!;
  const va = a[column];
  const vb = b[column];
  if (va == null || vb == null) return null;
  const t = b[0] === a[0] ? 0 : (x - a[0]) / (b[0] - a[0]);
  return va + t * (vb - va);
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
  // Each grid x's segment is searched once per curve (not once per column), from the last one found: no segment
  // before it can hold a larger x, whatever the order of the rows. The rows before the first segment holding x all lie
  // at or below x (the grid starts at or above the first row, and rows can rise past x only by a segment holding x),
  // so those segments end at or below x, below any larger x. The same segments, so the same numbers (a test compares
  // with the plain search on random curves, sorted or not).
  let lastA = 1;
  let lastB = 1;
  for (let i = 0; i < count; i++) {
    const x = i === count - 1 ? max : min + ((max - min) * i) / (count - 1);
    const sa = segmentAt(a, x, lastA);
    const sb = segmentAt(b, x, lastB);
    if (sa < 0 || sb < 0) continue;
    lastA = sa;
    lastB = sb;
    const ya = interpolate(a, sa, x, 1);
    const yb = interpolate(b, sb, x, 1);
    const ha = [interpolate(a, sa, x, 4), interpolate(a, sa, x, 5)];
    const hb = [interpolate(b, sb, x, 4), interpolate(b, sb, x, 5)];
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
