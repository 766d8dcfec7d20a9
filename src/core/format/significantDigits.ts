/**
 * How many significant digits each power-basis coefficient needs so that a polynomial evaluated with all
 * coefficients rounded stays within a tolerance of the full-precision one over the fitted range.
 *
 * First guess per coefficient: rounding a_k to d digits moves it by at most ½·10^(e−d+1) (e = ⌊log₁₀|a_k|⌋),
 * which moves the curve by at most that times max|u^k| over the range; each of the p coefficients gets 1/p of the
 * tolerance. The guess is then checked by evaluating the fully rounded polynomial on a dense grid against the
 * full one, and all digit counts are raised together until the check passes (capped at 17, a double's full width).
 *
 * Cost: O(p·grid) per check.
 */
import { horner } from '../evaluate.ts';
import { roundSignificant } from './roundSignificant.ts';

/**
 * Digits per coefficient. The tolerance is a number, or a function of u for a tolerance that varies over the range
 * (1 % of the local uncertainty of a weighted fit); the first guess then uses its smallest value on the grid.
 * @example significantDigits([1.234567, 2.5e-3], 0, 10, 1e-3) // => [4, 2]
 */
export function significantDigits(
  coefficients: readonly number[],
  uMin: number,
  uMax: number,
  tolerance: number | ((u: number) => number),
): number[] {
  const p = coefficients.length;
  const grid = Array.from({ length: 201 }, (_, i) => uMin + ((uMax - uMin) * i) / 200);
  const allowedAt = grid.map((u) => (typeof tolerance === 'number' ? tolerance : tolerance(u)));
  const smallest = Math.min(...allowedAt);
  const uAbsMax = Math.max(Math.abs(uMin), Math.abs(uMax));
  const digits = coefficients.map((a, k) => {
    if (a === 0) return 1;
    const exponent = Math.floor(Math.log10(Math.abs(a)));
    const allowed = smallest / p / Math.max(uAbsMax ** k, Number.MIN_VALUE);
    // ½·10^(exponent − d + 1) ≤ allowed  ⇒  d ≥ exponent + 1 − log₁₀(2·allowed)
    const needed = Math.ceil(exponent + 1 - Math.log10(2 * allowed));
    return Math.min(17, Math.max(1, needed));
  });
  const reference = grid.map((u) => horner(coefficients, u));
  for (let extra = 0; extra <= 17; extra++) {
    const trial = digits.map((d) => Math.min(17, d + extra));
    const rounded = coefficients.map((a, k) => roundSignificant(a, trial[k]!));
    const fits = grid.every((u, i) => Math.abs(horner(rounded, u) - reference[i]!) <= allowedAt[i]!);
    if (fits || trial.every((d) => d === 17)) return trial;
  }
  return digits.map(() => 17);
}
