/**
 * Evaluation of a fitted correlation with a range guard. The curve is evaluated from the well-conditioned mapped
 * form by Horner's rule and taken back through the y transform. Outside the fitted range it refuses unless the
 * caller asks to extrapolate, and then it says so in the result.
 */
import { FitError } from './fitError.ts';
import { forwardX, inverseY } from './transforms.ts';
import { toUnit } from './domain.ts';
import type { PolynomialFit } from './types.ts';

export interface Evaluation {
  readonly x: number;
  readonly y: number;
  /** Value in the fitted space (ln y under a log y transform). */
  readonly fittedSpace: number;
  readonly extrapolated: boolean;
}

/**
 * Powers t^0..t^m of the mapped variable at x.
 * @example basisAt(fit, 3) // => [1, 1, 1] for order 2 with center 1.5, halfWidth 1.5
 */
export function basisAt(fit: Pick<PolynomialFit, 'transformX' | 'mapped' | 'order'>, x: number): number[] {
  const t = toUnit(fit.mapped.map, forwardX(fit.transformX, x));
  const powers = [1];
  for (let k = 1; k <= fit.order; k++) powers.push(powers[k - 1]! * t);
  return powers;
}

/** Horner evaluation of Σ c_k z^k. @example horner([1, 2, 3], 2) // => 17 */
export function horner(coefficients: readonly number[], z: number): number {
  let value = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) value = value * z + coefficients[k]!;
  return value;
}

/**
 * Evaluate the fit at x.
 * @throws FitError 'outside-range' when x is outside [range.min, range.max] and `extrapolate` is not set
 * @example evaluateFit(fit, 300) // => { x: 300, y: …, fittedSpace: …, extrapolated: false }
 */
export function evaluateFit(
  fit: Pick<PolynomialFit, 'transformX' | 'transformY' | 'mapped' | 'range' | 'order'>,
  x: number,
  options: { readonly extrapolate?: boolean } = {},
): Evaluation {
  const extrapolated = x < fit.range.min || x > fit.range.max;
  if (extrapolated && !options.extrapolate) {
    throw new FitError(
      'outside-range',
      `x = ${x} is outside the fitted range [${fit.range.min}, ${fit.range.max}]; the correlation is valid only inside it`,
    );
  }
  const t = toUnit(fit.mapped.map, forwardX(fit.transformX, x));
  const fittedSpace = horner(fit.mapped.coefficients, t);
  return { x, y: inverseY(fit.transformY, fittedSpace), fittedSpace, extrapolated };
}
