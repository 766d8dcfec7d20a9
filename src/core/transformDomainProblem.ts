/**
 * The one rule for a transform of x against the x range it is used on (the content check and fitPolynomial share
 * it): 1/x is singular at x = 0, ln x undefined for x ≤ 0. A range that contains or touches the singular point is
 * refused even when no data point sits on it, because the fitted curve would have a pole (or no value) inside the
 * published range: data from −40 to 100 with u = 1/x fit a curve that is infinite at 0.
 * Returns the problem as a message (without file or line), or null.
 * @example transformDomainProblem('reciprocal', -40, 100) // => "the x range -40 to 100 contains x = 0, where 1/x is infinite"
 * @example transformDomainProblem('reciprocal', 250, 400) // => null
 */
import type { TransformX } from './types.ts';

export function transformDomainProblem(transform: TransformX, min: number, max: number): string | null {
  if (transform === 'reciprocal' && min <= 0 && max >= 0) {
    return `the x range ${min} to ${max} ${min === 0 || max === 0 ? 'touches' : 'contains'} x = 0, where 1/x is infinite`;
  }
  if (transform === 'log' && min <= 0) {
    return `the x range ${min} to ${max} reaches x ≤ 0, where ln x is undefined`;
  }
  return null;
}
