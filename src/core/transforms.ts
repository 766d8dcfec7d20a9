/**
 * Variable transforms applied before fitting: u = x, 1/x or ln x; v = y or ln y.
 * A reciprocal x suits Arrhenius-like data (ln y linear in 1/T); ln y suits quantities spanning decades.
 */
import { FitError } from './fitError.ts';
import type { TransformX, TransformY } from './types.ts';

/**
 * Apply the x transform to one value.
 * @example forwardX('reciprocal', 250) // => 0.004
 */
export function forwardX(transform: TransformX, x: number): number {
  if (transform === 'reciprocal') return 1 / x;
  if (transform === 'log') return Math.log(x);
  return x;
}

/** Undo the x transform. @example inverseX('reciprocal', 0.004) // => 250 */
export function inverseX(transform: TransformX, u: number): number {
  if (transform === 'reciprocal') return 1 / u;
  if (transform === 'log') return Math.exp(u);
  return u;
}

/**
 * Apply the y transform to one value.
 * @example forwardY('log', Math.E) // => 1
 */
export function forwardY(transform: TransformY, y: number): number {
  return transform === 'log' ? Math.log(y) : y;
}

/**
 * Undo the y transform.
 * @example inverseY('log', 0) // => 1
 */
export function inverseY(transform: TransformY, v: number): number {
  return transform === 'log' ? Math.exp(v) : v;
}

/**
 * Transform a whole data set, checking the domain of each transform.
 * @throws FitError 'log-domain' or 'reciprocal-domain' naming the first offending point
 * @example transformData([1, 2], [1, Math.E], 'reciprocal', 'log') // => { u: [1, 0.5], v: [0, 1] }
 */
export function transformData(
  x: readonly number[],
  y: readonly number[],
  transformX: TransformX,
  transformY: TransformY,
): { u: number[]; v: number[] } {
  const u: number[] = [];
  const v: number[] = [];
  for (let i = 0; i < x.length; i++) {
    const xi = x[i]!;
    const yi = y[i]!;
    if (transformX === 'log' && !(xi > 0)) {
      throw new FitError('log-domain', `x = ${xi} is not positive, so ln x is undefined`, i);
    }
    if (transformX === 'reciprocal' && xi === 0) {
      throw new FitError('reciprocal-domain', 'x = 0 has no reciprocal', i);
    }
    if (transformY === 'log' && !(yi > 0)) {
      throw new FitError('log-domain', `y = ${yi} is not positive, so ln y is undefined`, i);
    }
    u.push(forwardX(transformX, xi));
    v.push(forwardY(transformY, yi));
  }
  return { u, v };
}

/**
 * Weights w_i = 1/σ_v² in the fitted space from standard uncertainties σ of y. Under ln y the uncertainty is
 * propagated to first order, σ_v = σ/|y| (GUM, JCGM 100:2008, §5.1.2).
 * @throws FitError 'bad-uncertainty' naming the first point whose σ_v is not positive and finite
 * @example fittedSpaceWeights([2, 4], [0.1, 0.2], 'log') // => [400, 400] (up to rounding)
 */
export function fittedSpaceWeights(y: readonly number[], uncertainty: readonly number[], transformY: TransformY): number[] {
  return uncertainty.map((sigma, i) => {
    const sigmaV = transformY === 'log' ? sigma / Math.abs(y[i]!) : sigma;
    if (!(sigmaV > 0 && Number.isFinite(sigmaV))) {
      throw new FitError('bad-uncertainty', `uncertainty ${sigma} is not a positive finite number`, i);
    }
    return 1 / (sigmaV * sigmaV);
  });
}
