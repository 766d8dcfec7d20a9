/**
 * Wald–Wolfowitz runs test on the signs of the residuals taken in order of x, with the replicates at one x
 * combined into their mean first, so the row order of the file cannot matter. Too few runs means the residuals
 * come in long same-sign stretches: the curve misses a systematic trend (under-fit).
 *   R = number of runs, n₊ and n₋ the counts of positive and negative residuals (zeros skipped),
 *   E[R] = 2n₊n₋/(n₊+n₋) + 1,  Var[R] = 2n₊n₋(2n₊n₋ − n₊ − n₋) / ((n₊+n₋)²(n₊+n₋−1)),  z = (R − E[R])/√Var[R].
 * Reference: NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.5.13 "Runs Test for Detecting Non-randomness"
 * (https://www.itl.nist.gov/div898/handbook/eda/section3/eda35d.htm).
 */
import normalCdf from '@stdlib/stats-base-dists-normal-cdf';
import type { RunsTest } from '../types.ts';

/**
 * The test on one residual per distinct x (the mean of the replicates' residuals), taken in order of x, so the
 * result does not depend on the order of rows with the same x. Residuals within ±tolerance count as zero and are
 * skipped. Returns null when there are fewer than two residuals of each sign.
 * @param x the x (or the transformed u, which orders the same points) of each residual
 * @example runsTest([1, 2, 3, 4, 5, 6], [1, -1, 1, -1, 1, -1], 0)?.runs // => 6
 */
export function runsTest(x: readonly number[], residuals: readonly number[], tolerance: number): RunsTest | null {
  const groups = new Map<number, { sum: number; count: number }>();
  x.forEach((value, i) => {
    const group = groups.get(value) ?? { sum: 0, count: 0 };
    group.sum += residuals[i]!;
    group.count += 1;
    groups.set(value, group);
  });
  const signs: number[] = [];
  for (const value of [...groups.keys()].sort((a, b) => a - b)) {
    const group = groups.get(value)!;
    const mean = group.sum / group.count;
    if (Math.abs(mean) > tolerance) signs.push(Math.sign(mean));
  }
  const positive = signs.filter((s) => s > 0).length;
  const negative = signs.length - positive;
  if (positive < 2 || negative < 2) return null;
  let runs = 1;
  for (let i = 1; i < signs.length; i++) if (signs[i] !== signs[i - 1]) runs++;
  const total = positive + negative;
  const product = 2 * positive * negative;
  const expectedRuns = product / total + 1;
  const variance = (product * (product - total)) / (total * total * (total - 1));
  const z = (runs - expectedRuns) / Math.sqrt(variance);
  return { runs, positive, negative, expectedRuns, z, p: 2 * (1 - normalCdf(Math.abs(z), 0, 1)) };
}
