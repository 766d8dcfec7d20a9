/**
 * The display rule of a temperature scale's printed form (temperatureScales.ts): the largest deviation of the printed
 * coefficients, evaluated by Horner's rule in double precision as a designer's copy would be, from the certified
 * polynomial evaluated exactly, in units of the allowed deviation (1 % of the uncertainty of a new observation),
 * over GRID points of the scale's range:
 *
 *   D = max_i r_i,   r_i = |horner(printed, x_i) − E_i| / a_i,   E_i = the certified value at x_i rounded once to double,
 *
 * every operation as printedDeviationExact writes it. The exact value E_i is a big-integer evaluation; most points
 * cannot be the maximum, and printedDeviation finds which from a double-precision screen, then evaluates exactly only
 * those, so that D is the same double (not merely close), and so is every decision taken from it.
 *
 * The screen. The polynomial in the scale, q(x) = p(α·x + β), has exact rational coefficients c_j (the exact
 * substitution of the certified ones); c̃_j is c_j rounded to double (|c_j − c̃_j| ≤ 2u·|c̃_j|, u = 2⁻⁵³, one ulp;
 * toNumber is correct to within one ulp). Ẽ = Horner's rule on c̃ at x in double differs from q(x) by at most
 * γ_2m·S with S = Σ|c̃_j||x|^j (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed., §5.1, eq. (5.3);
 * γ_2m = 2m·u/(1 − 2m·u)), plus 2u·S from rounding the coefficients, plus what underflow can add (at most 2⁻¹⁰⁷⁴ per
 * operation or subnormal coefficient, carried by |x|^j):
 *
 *   |Ẽ − q(x)| ≤ b = 16·(m + 2)·u·S + 8·(m + 1)·2⁻¹⁰⁷⁴·Σ_j max(1, |x|)^j,
 *
 * generous by a factor of more than two, which also covers the rounding of the sums themselves. E = q(x) rounded to
 * double is within 2u·|q(x)| ≤ 2u·(|Ẽ| + b) of q(x) (one ulp; 2⁻¹⁰⁷⁴ more if subnormal). The printed form's value h
 * and the allowance a are computed exactly as the exact rule computes them. The rule's difference h − E rounded
 * (relative error ≤ u) and the screen's h − Ẽ rounded then differ by at most B = 2b + 8u·(|h| + |Ẽ|) + 2⁻¹⁰⁷⁰, and
 * each quotient by a adds one more rounding (relative u, or 2⁻¹⁰⁷⁵ absolute when subnormal), so
 *
 *   lo_i = max(0, (|h − Ẽ| − B)/a·(1 − 10⁻¹²) − 2⁻¹⁰⁷⁰) ≤ r_i ≤ hi_i = (|h − Ẽ| + B)/a·(1 + 10⁻¹²) + 2⁻¹⁰⁷⁰
 *
 * (the factors 1 ± 10⁻¹² cover the few roundings in computing lo and hi, each ≤ u). A point where anything here is
 * not finite, or a ≤ 0, gets lo = 0 and hi = ∞ (always evaluated exactly). Let L = max_i lo_i, reached at some k.
 * Every point with hi_i < L has r_i ≤ hi_i < L = lo_k ≤ r_k, so it is not the maximum; the maximum of r over the
 * other points (which include k, since hi_k ≥ lo_k) is D. A NaN r_i makes D NaN in the exact rule; such a point has a
 * non-finite value or a ≤ 0 in the screen, so it is among those evaluated, and D is NaN here too.
 *
 * test/core/temperature/printedDeviation.test.ts compares both on the demo fits, on a refused form and on random fits.
 *
 * Cost: O(GRID·m) double operations plus one exact evaluation per point that could be the maximum (usually one or two),
 * against GRID exact evaluations.
 */
import { substituteAffineExact } from '../convertBasis.ts';
import { horner } from '../evaluate.ts';
import { evaluateExact } from '../exact/evaluateExact.ts';
import { fromDouble, toNumber, type Rational } from '../exact/rational.ts';
import { applyMap, type AffineMap } from './temperatureScale.ts';

/** Number of points of the range at which the printed form is checked. */
export const DEVIATION_GRID = 201;

const UNIT_ROUNDOFF = 2 ** -53;
/** The smallest subnormal double, 2⁻¹⁰⁷⁴, and a slack of 2⁻¹⁰⁷⁰ for absolute errors near underflow. */
const TINY = 2 ** -1074;
const SLACK = 2 ** -1070;

/** What the rule reads: the certified native coefficients, the map to the native scale and the allowance. */
export interface DeviationInput {
  /** Certified power-basis coefficients in the native scale. */
  readonly exactCoefficients: readonly Rational[];
  /** x_native = factor·x + offset, exact. */
  readonly toNative: AffineMap;
  /** The printed coefficients (as doubles) of the form in this scale. */
  readonly printed: readonly number[];
  /** The range of this scale. */
  readonly range: { readonly min: number; readonly max: number };
  /** Allowed deviation at a native x. */
  readonly tolerance: (xNative: number) => number;
  /** The exact coefficients in this scale, when the caller has them (else substituted here). */
  readonly scaleCoefficients?: readonly Rational[] | undefined;
}

function gridPoint(range: { readonly min: number; readonly max: number }, i: number): number {
  return i === DEVIATION_GRID - 1 ? range.max : range.min + ((range.max - range.min) * i) / (DEVIATION_GRID - 1);
}

/** r_i of the exact rule at x with allowance `allowed`. */
function exactRatio(input: DeviationInput, x: number, allowed: number): number {
  const exact = toNumber(evaluateExact(input.exactCoefficients, applyMap(input.toNative, fromDouble(x))));
  return Math.abs(horner(input.printed, x) - exact) / allowed;
}

/**
 * The exact rule as written: every point evaluated exactly. The reference printedDeviation must equal.
 * @example printedDeviationExact({ exactCoefficients: [rational(1n), rational(2n)], toNative: scaleConversion('K', 'K'), printed: [1, 2], range: { min: 0, max: 1 }, tolerance: () => 1 }) // => 0
 */
export function printedDeviationExact(input: DeviationInput): number {
  const factor = toNumber(input.toNative.factor);
  const offset = toNumber(input.toNative.offset);
  let worst = 0;
  for (let i = 0; i < DEVIATION_GRID; i++) {
    const x = gridPoint(input.range, i);
    worst = Math.max(worst, exactRatio(input, x, input.tolerance(factor * x + offset)));
  }
  return worst;
}

/**
 * Largest |printed form in double − certified fit| / allowance over the range: the same double as
 * printedDeviationExact, with exact evaluations only where the double-precision screen cannot rule a point out.
 * @example printedDeviation({ exactCoefficients: [rational(1n), rational(2n)], toNative: scaleConversion('K', 'K'), printed: [1, 2], range: { min: 0, max: 1 }, tolerance: () => 1 }) // => 0
 */
export function printedDeviation(input: DeviationInput): number {
  const factor = toNumber(input.toNative.factor);
  const offset = toNumber(input.toNative.offset);
  const exactInScale = input.scaleCoefficients ?? substituteAffineExact(input.exactCoefficients, input.toNative.offset, input.toNative.factor);
  const approximate = exactInScale.map(toNumber);
  const m = Math.max(0, approximate.length - 1);
  const xs: number[] = [];
  const allowances: number[] = [];
  const low: number[] = [];
  const high: number[] = [];
  let floor = 0;
  for (let i = 0; i < DEVIATION_GRID; i++) {
    const x = gridPoint(input.range, i);
    const allowed = input.tolerance(factor * x + offset);
    const h = horner(input.printed, x);
    const estimate = horner(approximate, x);
    let sum = 0;
    let underflow = 0;
    let power = 1;
    let powerOfOne = 1;
    const size = Math.abs(x);
    for (let j = 0; j <= m; j++) {
      sum += Math.abs(approximate[j]!) * power;
      underflow += powerOfOne;
      power *= size;
      powerOfOne *= Math.max(1, size);
    }
    const b = 16 * (m + 2) * UNIT_ROUNDOFF * sum + 8 * (m + 1) * TINY * underflow;
    const bound = 2 * b + 8 * UNIT_ROUNDOFF * (Math.abs(h) + Math.abs(estimate)) + SLACK;
    const difference = Math.abs(h - estimate);
    let lo = Math.max(0, ((difference - bound) / allowed) * (1 - 1e-12) - SLACK);
    let hi = ((difference + bound) / allowed) * (1 + 1e-12) + SLACK;
    if (!(allowed > 0 && Number.isFinite(allowed) && Number.isFinite(h) && Number.isFinite(estimate) && Number.isFinite(bound) && Number.isFinite(hi) && lo >= 0)) {
      lo = 0;
      hi = Infinity;
    }
    xs.push(x);
    allowances.push(allowed);
    low.push(lo);
    high.push(hi);
    if (lo > floor) floor = lo;
  }
  let worst = 0;
  for (let i = 0; i < DEVIATION_GRID; i++) {
    if (high[i]! >= floor) worst = Math.max(worst, exactRatio(input, xs[i]!, allowances[i]!));
  }
  return worst;
}
