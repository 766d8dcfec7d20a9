/**
 * Boundary checks for fitPolynomial: array lengths, finite numbers, positive uncertainties, a sensible order and
 * confidence level. Messages follow one grammar ("fitPolynomial requires …") and name the offending point.
 */
import { transformDomainProblem } from './transformDomainProblem.ts';
import { FitError } from './fitError.ts';
import type { FitData, FitOptions, PointConstraint, TransformX, TransformY } from './types.ts';

/** Largest |x| or |y| accepted: squares and sums of squares of such values stay finite in double precision. */
export const MAX_MAGNITUDE = 1e150;

export interface ValidatedOptions {
  readonly order: number;
  readonly intercept: boolean;
  readonly transformX: TransformX;
  readonly transformY: TransformY;
  readonly constraints: readonly PointConstraint[];
  readonly confidence: number;
  readonly range: { readonly min: number; readonly max: number };
}

/**
 * Checks that do not depend on the order: equal lengths, finite values, positive uncertainties, x not constant.
 * @throws FitError naming the first offending point
 * @example validateFitData({ x: [1, 1], y: [3, 4] }) // throws FitError 'constant-x'
 */
export function validateFitData(data: FitData): void {
  const n = data.x.length;
  if (data.y.length !== n) throw new FitError('length-mismatch', `fitPolynomial requires as many y values (${data.y.length}) as x values (${n})`);
  if (data.uncertainty && data.uncertainty.length !== n) {
    throw new FitError('length-mismatch', `fitPolynomial requires one uncertainty per point (${data.uncertainty.length} for ${n} points)`);
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(data.x[i])) throw new FitError('not-finite', `x = ${data.x[i]} is not a finite number`, i);
    if (!Number.isFinite(data.y[i])) throw new FitError('not-finite', `y = ${data.y[i]} is not a finite number`, i);
    const sigma = data.uncertainty?.[i];
    if (sigma !== undefined && !(sigma > 0 && Number.isFinite(sigma))) {
      throw new FitError('bad-uncertainty', `uncertainty ${sigma} is not a positive finite number`, i);
    }
  }
  if (n === 0) throw new FitError('too-few-points', 'the data have no points');
  if (new Set(data.x).size < 2) {
    throw new FitError('constant-x', n === 1 ? 'the data have one point; a correlation needs at least two different x values' : 'all x values are equal, so no curve in x can be fitted');
  }
  // Sums of squares of values beyond 1e150 overflow double precision: ask for other units instead of printing Infinity.
  const tooLarge = (name: 'x' | 'y', value: number, i: number) =>
    new FitError('out-of-range', `${name} = ${value} is too large to fit in double precision (limit ${MAX_MAGNITUDE}); change its unit`, i);
  for (let i = 0; i < n; i++) {
    if (Math.abs(data.x[i]!) > MAX_MAGNITUDE) throw tooLarge('x', data.x[i]!, i);
    if (Math.abs(data.y[i]!) > MAX_MAGNITUDE) throw tooLarge('y', data.y[i]!, i);
  }
}

/**
 * @example validateFitInput({ x: [1, 2, 3], y: [1, 2, 4] }, { order: 1 }).range // => { min: 1, max: 3 }
 */
export function validateFitInput(data: FitData, options: FitOptions): ValidatedOptions {
  validateFitData(data);
  const n = data.x.length;
  const order = options.order;
  if (!Number.isInteger(order) || order < 0) throw new FitError('bad-order', `fitPolynomial requires a whole order ≥ 0, got ${order}`);
  const intercept = options.intercept ?? true;
  if (!intercept && order === 0) throw new FitError('bad-order', 'fitPolynomial requires order ≥ 1 for a fit without intercept');
  const confidence = options.confidence ?? 0.95;
  if (!(confidence > 0 && confidence < 1)) throw new FitError('bad-confidence', `confidence must be in (0, 1), got ${confidence}`);
  const constraints = options.constraints ?? [];
  for (const c of constraints) {
    if (!Number.isFinite(c.x) || !Number.isFinite(c.y)) throw new FitError('not-finite', `constraint (${c.x}, ${c.y}) is not finite`);
  }
  const coefficients = order + (intercept ? 1 : 0);
  if (constraints.length >= coefficients) {
    throw new FitError(
      'constraints-fix-all',
      `${constraints.length} pass-through point${constraints.length === 1 ? '' : 's'} fix every coefficient of an order-${order} curve; nothing is left to fit`,
    );
  }
  const needed = coefficients - constraints.length;
  if (n < Math.max(1, needed)) throw new FitError('too-few-points', `order ${order} needs at least ${needed} points, the data have ${n}`);
  let xMin = Infinity;
  let xMax = -Infinity;
  for (const value of data.x) {
    xMin = Math.min(xMin, value);
    xMax = Math.max(xMax, value);
  }
  const range = options.range ?? { min: xMin, max: xMax };
  if (!(range.min < range.max) || range.min < xMin || range.max > xMax) {
    throw new FitError(
      'range-widened',
      `the validity range [${range.min}, ${range.max}] must be a non-empty part of the data's x range [${xMin}, ${xMax}]; it can be narrowed, never widened`,
    );
  }
  const transformX = options.transformX ?? 'identity';
  const domainProblem = transformDomainProblem(transformX, xMin, xMax);
  if (domainProblem !== null) throw new FitError(transformX === 'log' ? 'log-domain' : 'reciprocal-domain', domainProblem);
  return {
    range: { min: range.min, max: range.max },
    order,
    intercept,
    transformX,
    transformY: options.transformY ?? 'identity',
    constraints,
    confidence,
  };
}
