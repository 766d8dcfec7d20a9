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
  const { order, transformX, transformY, confidence, range, weighted, uncertaintyScale, weights, map, fittedV, summary, dof, unscaledMapped } = solved;
  const factor = uncertaintyScale === 'stated' ? 1 : summary.residualVariance;
  return {
    order,
    transformX,
    transformY,
    range,
    confidence,
    uncertaintyScale,
    uncertaintyProfile: weighted ? uncertaintyProfile(data.x, weights.map((w) => 1 / Math.sqrt(w))) : null,
    uncertaintyModel: weighted && options.uncertaintyModel ? { relative: options.uncertaintyModel.relative } : null,
    mapped: { map, coefficients: solved.mappedCoefficients, covariance: unscaledMapped.map((row) => row.map((value) => value * factor)) },
    statistics: { residualStdDev: summary.residualStdDev, degreesOfFreedom: dof },
    residualsOriginal: data.y.map((y, i) => y - inverseY(transformY, fittedV[i]!)),
  };
}
