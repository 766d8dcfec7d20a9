/**
 * Pure-error lack-of-fit F-test. When some x values repeat, the scatter within groups of equal x estimates the
 * error variance without any model; the rest of the residual sum of squares is lack of fit:
 *   SS_pe = Σ_groups Σ w (v − v̄_group)²,  dof_pe = n − g;   SS_lof = S_r − SS_pe,  dof_lof = g − p
 *   F = (SS_lof/dof_lof) / (SS_pe/dof_pe) ~ F(dof_lof, dof_pe) when the model is adequate.
 * Reference: NIST/SEMATECH e-Handbook of Statistical Methods, §4.4.4.3 "Lack-of-fit test"
 * (https://www.itl.nist.gov/div898/handbook/pmd/section4/pmd443.htm).
 */
import { fUpperP } from '../distributions.ts';
import type { LackOfFitTest } from '../types.ts';

/**
 * The test, or null when no x repeats or no lack-of-fit degrees of freedom remain.
 * @example lackOfFit([1, 1, 2, 2, 3, 3], [1, 1.2, 2.1, 1.9, 3.2, 2.8], [1, 1, 1, 1, 1, 1], 0.1, 2)?.pureErrorDof // => 3
 */
export function lackOfFit(
  u: readonly number[],
  v: readonly number[],
  weights: readonly number[],
  residualSumOfSquares: number,
  parameters: number,
): LackOfFitTest | null {
  const groups = new Map<number, number[]>();
  u.forEach((value, i) => {
    const members = groups.get(value);
    if (members) members.push(i);
    else groups.set(value, [i]);
  });
  const n = u.length;
  const pureErrorDof = n - groups.size;
  const lackOfFitDof = groups.size - parameters;
  if (pureErrorDof <= 0 || lackOfFitDof <= 0) return null;
  let pureErrorSumOfSquares = 0;
  for (const members of groups.values()) {
    let sumW = 0;
    let sumWV = 0;
    for (const i of members) {
      sumW += weights[i]!;
      sumWV += weights[i]! * v[i]!;
    }
    const mean = sumWV / sumW;
    for (const i of members) pureErrorSumOfSquares += weights[i]! * (v[i]! - mean) ** 2;
  }
  const lackOfFitSumOfSquares = Math.max(0, residualSumOfSquares - pureErrorSumOfSquares);
  const f = pureErrorSumOfSquares > 0 ? lackOfFitSumOfSquares / lackOfFitDof / (pureErrorSumOfSquares / pureErrorDof) : Infinity;
  return {
    pureErrorSumOfSquares,
    pureErrorDof,
    lackOfFitSumOfSquares,
    lackOfFitDof,
    f,
    p: Number.isFinite(f) ? fUpperP(f, lackOfFitDof, pureErrorDof) : 0,
  };
}
