/**
 * The floating-point least-squares fit of one order, for pictures only (the previews of the orders a page does
 * not publish): the same solve as fitPolynomial (solveFit.ts) and, for the parts it returns, the same numbers as
 * fitPolynomial with `exact: 'off'`, without what only a published fit needs (exact certification, power form,
 * printed digits and check values, per-point diagnostics, lack-of-fit and runs tests, condition numbers).
 * Nothing from it is ever printed as a result.
 *
 * @example fitCurve({ x: [0, 1, 2, 3], y: [1, 3, 5, 7] }, { order: 1 }).mapped.coefficients.length // => 2
 * @throws FitError as fitPolynomial does
 */
import { uncertaintyProfile } from './stats/localUncertainty.ts';
import { inverseY } from './transforms.ts';
import { solveFit } from './solveFit.ts';
import type { CurveFit, FitData, FitOptions } from './types.ts';

export function fitCurve(data: FitData, options: FitOptions): CurveFit {
  const solved = solveFit(data, options);
  const { weighted, weights, summary } = solved;
  return curveFitOf(data, options, {
    ...solved,
    uncertaintyProfile: weighted ? uncertaintyProfile(data.x, weights.map((w) => 1 / Math.sqrt(w))) : null,
    residualVariance: summary.residualVariance,
  });
}

/** The parts of a solved fit that a CurveFit is made of (solveFit's, or fitCurves' from a shared factorisation). */
export interface CurveParts {
  readonly order: number;
  readonly transformX: CurveFit['transformX'];
  readonly transformY: CurveFit['transformY'];
  readonly range: CurveFit['range'];
  readonly confidence: number;
  readonly uncertaintyScale: 'stated' | 'scatter';
  readonly uncertaintyProfile: CurveFit['uncertaintyProfile'];
  readonly weighted: boolean;
  readonly map: CurveFit['mapped']['map'];
  readonly mappedCoefficients: readonly number[];
  /** Unscaled covariance of the mapped coefficients (times s², or 1 with stated uncertainties). */
  readonly unscaledMapped: readonly (readonly number[])[];
  readonly residualVariance: number;
  readonly dof: number;
  /** Fitted values in the fitted (transformed) space, one per point. */
  readonly fittedV: readonly number[];
}

/**
 * fitCurve's result from its parts (also fitCurves', which must give the same numbers).
 * @example curveFitOf(data, options, parts).statistics.residualStdDev // => √(residual variance)
 */
export function curveFitOf(data: FitData, options: Pick<FitOptions, 'uncertaintyModel'>, parts: CurveParts): CurveFit {
  const factor = parts.uncertaintyScale === 'stated' ? 1 : parts.residualVariance;
  return {
    order: parts.order,
    transformX: parts.transformX,
    transformY: parts.transformY,
    range: parts.range,
    confidence: parts.confidence,
    uncertaintyScale: parts.uncertaintyScale,
    uncertaintyProfile: parts.uncertaintyProfile,
    uncertaintyModel: parts.weighted && options.uncertaintyModel ? { relative: options.uncertaintyModel.relative } : null,
    mapped: { map: parts.map, coefficients: [...parts.mappedCoefficients], covariance: parts.unscaledMapped.map((row) => row.map((value) => value * factor)) },
    statistics: { residualStdDev: Math.sqrt(parts.residualVariance), degreesOfFreedom: parts.dof },
    residualsOriginal: data.y.map((y, i) => y - inverseY(parts.transformY, parts.fittedV[i]!)),
  };
}
