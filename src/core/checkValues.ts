/**
 * Check values: numbers that let a designer verify a copied implementation of a correlation.
 *
 * Two sets are published:
 *   - full-precision check values: y at each check x from the certified coefficients, evaluated exactly in rational
 *     arithmetic and rounded once to double, for implementations that use the downloaded full coefficients;
 *   - printed check values: y from the PRINTED coefficients (the decimals of the equation, read exactly), printed
 *     to the digits a correct double-precision copy reproduces, with a stated tolerance of one unit in the last
 *     printed digit. The digits are chosen so that the floating-point noise of a correct copy stays within half a
 *     unit, and the printed coefficients' digits so that changing the last printed digit of any single coefficient
 *     by ±1 moves at least one printed check value by more than the tolerance: a copy error is always caught.
 *
 * Noise of a correct copy at x (Horner's rule in double, plus the transform of x and of y): at most
 * (3m + 4)·2⁻⁵³·Σ_k |ã_k|·|u|^k in the fitted space (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed.,
 * §5.1, Horner's rule error bound, with the rounding of u propagated through k·ã_k·u^k), times |y| under ln y
 * plus 2⁻⁵¹ for exp (ours and the copy's). A correct copy then agrees within ½ unit (rounding of the printed value) + ½ unit (noise) = the
 * tolerance; a last-digit change δ of a coefficient that moves y by more than 2 units at some x stays more than
 * one unit away there.
 *
 * Cost: O(p · checks · m) exact evaluations with small decimals; a few passes when digits must be adjusted.
 */
import { decimalRational, parseDecimal } from './exact/decimal.ts';
import { evaluateExact } from './exact/evaluateExact.ts';
import { add, divide, multiply, rational, timesPowerOfTen, toNumber, type Rational } from './exact/rational.ts';
import { formatCoefficient } from './format/formatCoefficient.ts';
import { roundSignificant } from './format/roundSignificant.ts';
import type { CheckValue, PrintedCheckValue, TransformX, TransformY } from './types.ts';

const EPSILON = 2 ** -53;

/**
 * The check abscissae: both range ends exactly and five interior points rounded to a short decimal (easy to type).
 * @example checkPoints({ min: 220, max: 340 }) // => [220, 240, 260, 280, 300, 320, 340]
 */
export function checkPoints(range: { readonly min: number; readonly max: number }): number[] {
  const span = range.max - range.min;
  const unit = 10 ** (Math.floor(Math.log10(span)) - 2);
  return Array.from({ length: 7 }, (_, i) =>
    i === 0 ? range.min : i === 6 ? range.max : roundSignificant(Math.round((range.min + (span * i) / 6) / unit) * unit, 15),
  );
}

/**
 * u at x as an exact rational: x as written, 1/x exactly, or ln x as the decimal of its double.
 * @example exactU('reciprocal', 250) // => { num: 1n, den: 250n }
 */
export function exactU(transform: TransformX, x: number): Rational {
  if (transform === 'reciprocal') return divide(rational(1n), decimalRational(x));
  if (transform === 'log') return decimalRational(Math.log(x));
  return decimalRational(x);
}

function yOf(transform: TransformY, v: Rational): number {
  return transform === 'log' ? Math.exp(toNumber(v)) : toNumber(v);
}

/**
 * Full-precision check values from exact coefficients; tolerance is the noise bound of a double implementation.
 * @example fullCheckValues([rational(1n), rational(2n)], 'identity', 'identity', [0, 1]) // => [{ x: 0, y: 1, tolerance: … }, { x: 1, y: 3, tolerance: … }]
 */
export function fullCheckValues(coefficients: readonly Rational[], transformX: TransformX, transformY: TransformY, xs: readonly number[]): CheckValue[] {
  const doubles = coefficients.map(toNumber);
  return xs.map((x) => {
    const y = yOf(transformY, evaluateExact(coefficients, exactU(transformX, x)));
    return { x, y, tolerance: copyNoise(doubles, transformX, transformY, x, y) };
  });
}

/** Bound on the error of a correct double-precision copy at x (see the file comment). */
function copyNoise(coefficients: readonly number[], transformX: TransformX, transformY: TransformY, x: number, y: number): number {
  const u = Math.abs(transformX === 'reciprocal' ? 1 / x : transformX === 'log' ? Math.log(x) : x);
  let terms = 0;
  coefficients.forEach((a, k) => (terms += Math.abs(a) * u ** k));
  const m = coefficients.length - 1;
  const noiseV = (3 * m + 4) * EPSILON * terms;
  return transformY === 'log' ? Math.abs(y) * (noiseV + 4 * EPSILON) : noiseV;
}

/**
 * Decimal place of the last printed digit of a coefficient's text ("13.88924" → −5, "5e-4" → −4, "145306" → 0).
 * @example lastPrintedPlace('13.88924') // => -5
 */
export function lastPrintedPlace(text: string): number {
  const match = /^[+-]?(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text);
  if (match === null) throw new Error(`lastPrintedPlace cannot read '${text}'`);
  return Number(match[3] ?? 0) - (match[2] ?? '').length;
}

/** y printed to the digits whose unit is at least twice the noise (at most 15), and that unit. */
function printedValue(y: number, noise: number): { text: string; tolerance: number } {
  if (y === 0) return { text: '0', tolerance: Math.max(2 * noise, Number.MIN_VALUE) };
  for (let digits = 15; digits >= 1; digits--) {
    const text = y.toPrecision(digits);
    const unit = 10 ** (Math.floor(Math.log10(Math.abs(Number(text)))) - digits + 1);
    if (unit >= 2 * noise || digits === 1) return { text, tolerance: unit };
  }
  return { text: y.toPrecision(1), tolerance: 10 ** Math.floor(Math.log10(Math.abs(y))) };
}

export interface PrintedForm {
  /** Significant digits per coefficient, possibly fewer than asked where a last-digit change would be invisible. */
  readonly digits: number[];
  /** The printed coefficients. */
  readonly printed: string[];
  readonly checkValues: PrintedCheckValue[];
}

/**
 * Printed coefficients and their check values, with the digits of any coefficient whose last printed digit no check
 * value could resolve lowered until one does (this happens only where the fit is already at floating-point noise).
 * @param fixed coefficients fixed by the model (a₀ without intercept), which are not printed
 * @example printedForm([1.5, 2.25], [3, 3], [false, false], 'identity', 'identity', [0, 1]).checkValues[1] // => { x: 1, y: '3.75', tolerance: 0.01 } (y to the digits a copy reproduces)
 */
export function printedForm(
  coefficients: readonly number[],
  digits: readonly number[],
  fixed: readonly boolean[],
  transformX: TransformX,
  transformY: TransformY,
  xs: readonly number[],
): PrintedForm {
  let current = digits.slice();
  if (!coefficients.every(Number.isFinite)) {
    // The power form leaves the double range (the fit warns); there is no printed equation to check.
    return { digits: current, printed: coefficients.map((a, k) => formatCoefficient(a, current[k]!)), checkValues: [] };
  }
  // Each pass either returns or lowers one coefficient's digits by one (never below 1), so the loop ends within
  // Σ(digits − 1) + 1 passes.
  const passes = current.reduce((sum, d) => sum + Math.max(0, d - 1), 0) + 1;
  for (let pass = 0; pass < passes; pass++) {
    const printed = coefficients.map((a, k) => formatCoefficient(a, current[k]!));
    const exact = printed.map((text, k) => (fixed[k] ? rational(0n) : parseDecimal(text)));
    const doubles = exact.map(toNumber);
    const us = xs.map((x) => exactU(transformX, x));
    const values = us.map((u) => evaluateExact(exact, u));
    const checkValues = xs.map((x, i) => {
      const y = yOf(transformY, values[i]!);
      const { text, tolerance } = printedValue(y, copyNoise(doubles, transformX, transformY, x, y));
      return { x, y: text, tolerance };
    });
    // A copy error in coefficient k (±1 in its last printed digit) must move some check value by more than
    // two units of its last digit (then it lies more than one unit away even after rounding and noise). The changed
    // polynomial's value at u is the printed one's plus δ·u^k, exactly (no need to evaluate it afresh).
    const blind = exact.findIndex((value, k) => {
      if (fixed[k] || value.num === 0n) return false;
      const step = timesPowerOfTen(rational(1n), lastPrintedPlace(printed[k]!));
      return [step, rational(-step.num, step.den)].some((delta) => {
        return !xs.some((_, i) => {
          const changed = add(values[i]!, multiply(delta, rational(us[i]!.num ** BigInt(k), us[i]!.den ** BigInt(k))));
          return Math.abs(yOf(transformY, changed) - Number(checkValues[i]!.y)) > 2 * checkValues[i]!.tolerance;
        });
      });
    });
    if (blind < 0 || current[blind]! <= 1) return { digits: current, printed, checkValues };
    current = current.map((d, k) => (k === blind ? d - 1 : d));
  }
  throw new Error('printedForm: the digit-lowering loop did not end (a bug: every pass lowers a digit)');
}
