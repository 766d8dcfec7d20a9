/**
 * Polynomial least-squares fit of one order: v = Σ_k a_k u^k, with u and v the (optionally transformed) x and y.
 *
 * The solve is a Householder QR of the weighted design matrix in the mapped variable t = (u − c)/h ∈ [−1, 1]
 * (never the normal equations in floating point), with column equilibration, an SVD rank/condition guard, and
 * the null-space method for equality constraints (see leastSquares.ts). The coefficients and their statistics
 * are then certified in exact rational arithmetic (see exact/exactLeastSquares.ts) from the decimal inputs — or,
 * under a transform, from the transformed values as computed — so every printed digit is right however
 * ill-conditioned the power basis is.
 *
 * Every published form comes from the certified coefficients: the mapped form by exact conversion of basis (its
 * centre and half-width are short decimals, so the conversion is exact), the full-precision check values by exact
 * evaluation, the printed equation and its check values from the printed decimals (see checkValues.ts). The
 * floating-point QR gives the diagnostics (leverages, studentized residuals, PRESS, condition numbers).
 *
 * Weights: a standard uncertainty σ_i of y gives w_i = 1/σ_i²; under ln y it is propagated as σ_i/y_i.
 * Standard errors are scaled by the residual variance (s²·(XᵀWX)⁻¹), as in the NIST StRD certified values, except in
 * χ² mode (uncertaintyScale 'stated'), where σ is taken as known and (XᵀWX)⁻¹ is used unscaled. The digits rule and
 * the prediction band use the local uncertainty at x (stats/localUncertainty.ts).
 *
 * Cost: O(n·m²) floating point, plus the exact certification (big-integer, grows with digits and m).
 *
 * @example fitPolynomial({ x: [0, 1, 2, 3], y: [1, 3, 5, 7] }, { order: 1 }).coefficients // => [1, 2]
 * @throws FitError when the data cannot support the requested fit (too few distinct x, rank deficiency, …)
 */
import { designRow } from './designMatrix.ts';
import { scratchMatrix } from './qrSolve.ts';
import { checkPoints, fullCheckValues, printedForm } from './checkValues.ts';
import { mappedCovarianceToPower, mappedFromPowerExact, mappedToPower } from './convertBasis.ts';
import { chiSquareUpperP, normalQuantile, tQuantile } from './distributions.ts';
import { evaluateFit, horner } from './evaluate.ts';
import { fromDouble, toNumber } from './exact/rational.ts';
import { localUncertainty, uncertaintyProfile } from './stats/localUncertainty.ts';
import { exactLeastSquares } from './exact/exactLeastSquares.ts';
import { significantDigits } from './format/significantDigits.ts';
import { conditionNumber } from './leastSquares.ts';
import { lackOfFit } from './stats/lackOfFit.ts';
import { runsTest } from './stats/runsTest.ts';
import { forwardX, forwardY, inverseX, inverseY } from './transforms.ts';
import { temperatureScales } from './temperature/temperatureScales.ts';
import { solveFit } from './solveFit.ts';
import type { FitData, FitOptions, PolynomialFit } from './types.ts';

export function fitPolynomial(data: FitData, options: FitOptions): PolynomialFit {
  const solved = solveFit(data, options);
  const { order, intercept, transformX, transformY, constraints, confidence, range, n, u, v, weighted, uncertaintyScale, weights, rootWeights } = solved;
  const { powers, cu, cv, map, A, solution, parameters, fittedV, residuals, weightedResiduals, centred, total, summary, dof, unscaledMapped } = solved;
  let mappedCoefficients = solved.mappedCoefficients;
  const covarianceFactor = (variance: number) => (uncertaintyScale === 'stated' ? 1 : variance);
  // The floating-point power form and covariance are what is reported when exact certification is off or fails;
  // otherwise the certified ones replace them, so they are computed only then. (mappedToPower refuses a non-finite
  // coefficient: that refusal still comes first.)
  const floatingCoefficients = () => {
    const values = mappedToPower(solved.mappedCoefficients, map);
    if (!intercept) values[0] = 0;
    return values;
  };
  const floatingCovariance = () => mappedCovarianceToPower(unscaledMapped.map((row) => row.map((value) => value * covarianceFactor(summary.residualVariance))), map);
  let coefficients: number[] | undefined = solved.mappedCoefficients.every(Number.isFinite) ? undefined : floatingCoefficients();
  let covariance: number[][] | undefined;
  let residualStats = {
    residualSumOfSquares: summary.residualSumOfSquares,
    residualVariance: summary.residualVariance,
    residualStdDev: summary.residualStdDev,
    rSquared: summary.rSquared,
  };
  let refinement: 'exact-rational' | 'none' = 'none';
  let exactCoefficients = null;
  if (options.exact !== 'off') {
    const exact = exactLeastSquares({ u, v, weights: weighted ? weights : undefined, order, intercept, constraints: cu.map((value, i) => ({ u: value, v: cv[i]! })), covarianceScale: uncertaintyScale });
    if (exact) {
      coefficients = exact.coefficients;
      exactCoefficients = exact.exactCoefficients;
      covariance = exact.covariance;
      residualStats = {
        residualSumOfSquares: exact.residualSumOfSquares,
        residualVariance: exact.residualVariance,
        residualStdDev: exact.residualStdDev,
        rSquared: exact.rSquared,
      };
      refinement = 'exact-rational';
      // The mapped form is the certified polynomial in t, by exact change of basis (rounded once per coefficient).
      mappedCoefficients = mappedFromPowerExact(exactCoefficients, map).map(toNumber);
    }
  }
  coefficients ??= floatingCoefficients();
  covariance ??= floatingCovariance();
  const mappedCovariance = unscaledMapped.map((row) => row.map((value) => value * covarianceFactor(residualStats.residualVariance)));
  const standardErrors = covariance.map((row, k) => Math.sqrt(Math.max(0, row[k]!)));
  // With σ known (χ² mode) the coefficients are normal; with σ estimated from the scatter, Student's t.
  const quantile = uncertaintyScale === 'stated' ? normalQuantile((1 + confidence) / 2) : dof > 0 ? tQuantile((1 + confidence) / 2, dof) : NaN;
  const confidenceIntervals = coefficients.map((a, k) => [a - quantile * standardErrors[k]!, a + quantile * standardErrors[k]!] as const);

  const fittedY = fittedV.map((value) => inverseY(transformY, value));
  const residualsOriginal = data.y.map((y, i) => y - fittedY[i]!);
  const maxAbs = (values: readonly number[]) => values.reduce((m, value) => Math.max(m, Math.abs(value)), 0);
  const maxRel = (values: readonly number[], reference: readonly number[]) =>
    values.reduce((m, value, i) => (reference[i] !== 0 ? Math.max(m, Math.abs(value / reference[i]!)) : m), 0);
  const scaleV = maxAbs(v);
  const profile = weighted ? uncertaintyProfile(data.x, weights.map((w) => 1 / Math.sqrt(w))) : null;
  const unweightedSd = dof > 0 ? Math.sqrt(residuals.reduce((sum, r) => sum + r * r, 0) / dof) : 0;
  const floor = 1e-13 * scaleV || 1e-300;
  // Digits rule: rounding the printed coefficients may move the curve by at most 1 % of the uncertainty of a new
  // observation at each x — the local stated σ (scaled as the band is) for a weighted fit, s otherwise.
  const uncertaintyModel = weighted && options.uncertaintyModel ? { relative: options.uncertaintyModel.relative } : null;
  const mappedForm = { map, coefficients: mappedCoefficients, covariance: mappedCovariance };
  // The fit as localUncertainty reads it, made once (the digits rule and the scales' checks ask at many x).
  const localFit = { uncertaintyProfile: profile, uncertaintyScale, uncertaintyModel, transformX, transformY, mapped: mappedForm, range, order, statistics: { residualStdDev: residualStats.residualStdDev } as PolynomialFit['statistics'] };
  const localAt = (x: number) => (profile === null ? unweightedSd : localUncertainty(localFit, x));
  const digitTolerance = (uValue: number) => Math.max(0.01 * (localAt(inverseX(transformX, uValue)) || 0), floor);

  const partial = { transformX, transformY, mapped: { map, coefficients: mappedCoefficients, covariance: mappedCovariance }, range, order };
  // Seven check points: both range ends exactly, interior points rounded to a short decimal (easy to type).
  const xs = checkPoints(range);
  const uLow = forwardX(transformX, range.min);
  const uHigh = forwardX(transformX, range.max);
  const checkValues = exactCoefficients
    ? fullCheckValues(exactCoefficients, transformX, transformY, xs)
    : xs.map((x) => ({ x, y: evaluateFit(partial, x).y }));
  const askedDigits = significantDigits(coefficients, Math.min(uLow, uHigh), Math.max(uLow, uHigh), digitTolerance);
  const fixed = coefficients.map((_, k) => k === 0 && !intercept);
  const printed = printedForm(coefficients, askedDigits, fixed, transformX, transformY, xs);
  // Kept for older readers: a new observation carries the RMS of the stated uncertainties (in the fitted space).
  const meanSquareSigma = weighted ? weights.reduce((sum, w) => sum + 1 / w, 0) / n : 1;

  const warnings: string[] = [];
  if (dof < 2) warnings.push(`only ${dof} residual degree${dof === 1 ? '' : 's'} of freedom: the fit nearly interpolates the data`);
  if (solution.condition > 1e10) warnings.push(`the mapped design matrix is ill-conditioned (condition number ${solution.condition.toPrecision(3)})`);
  // The power form is what designers copy: make sure it reproduces the fit (it cannot when u^k or a_k leave the
  // double range, e.g. x ≈ 1e-200 in an order-2 fit). The mapped form is always usable.
  const powerFormWorst = checkValues.reduce((worst, check) => {
    const viaPowers = horner(coefficients, forwardX(transformX, check.x));
    const viaMapped = forwardY(transformY, check.y);
    return Math.max(worst, Math.abs(viaPowers - viaMapped) / Math.max(Math.abs(viaMapped), digitTolerance(forwardX(transformX, check.x))));
  }, 0);
  if (!(powerFormWorst < 1e-6)) {
    warnings.push('the power-basis coefficients do not reproduce the fit in double precision (x is too large or too small for its powers); use the mapped form, or change the unit of x');
  }
  if (refinement === 'none' && options.exact !== 'off') {
    warnings.push('exact certification failed; the floating-point solution is reported');
  }
  // x is a temperature and untransformed: the same polynomial in every scale, by exact substitution.
  const scales =
    options.temperatureScale !== undefined && transformX === 'identity'
      ? temperatureScales({
          scale: options.temperatureScale,
          exactCoefficients: exactCoefficients ?? coefficients.map(fromDouble),
          fit: { coefficients, covariance, standardErrors, significantDigits: printed.digits, printedCoefficients: printed.printed, checkValues, printedCheckValues: printed.checkValues, range, mapped: partial.mapped },
          transformY,
          tolerance: digitTolerance,
        })
      : null;

  return {
    order,
    intercept,
    transformX,
    transformY,
    weighted,
    constraints: constraints.map((c) => ({ x: c.x, y: c.y })),
    range,
    coefficients,
    standardErrors,
    confidenceIntervals,
    covariance,
    mapped: partial.mapped,
    significantDigits: printed.digits,
    printedCoefficients: printed.printed,
    checkValues,
    printedCheckValues: printed.checkValues,
    uncertaintyScale,
    uncertaintyProfile: profile,
    uncertaintyModel,
    confidence,
    predictionScale: meanSquareSigma,
    statistics: {
      n,
      parameters,
      degreesOfFreedom: dof,
      ...residualStats,
      rSquaredCentred: centred,
      adjustedRSquared: dof > 0 ? 1 - residualStats.residualVariance / (total / (centred ? n - 1 : n)) : NaN,
      rmse: Math.sqrt(residualStats.residualSumOfSquares / n),
      maxAbsResidual: maxAbs(residuals),
      maxRelResidual: maxRel(residuals, v),
      maxAbsResidualOriginal: maxAbs(residualsOriginal),
      maxRelResidualOriginal: maxRel(residualsOriginal, data.y),
      press: summary.press,
      looRmse: summary.looRmse,
      aicc: summary.aicc,
      bic: summary.bic,
      // The raw design (designMatrix's entries, as rows) is made only to be factored: in place (scratchMatrix).
      conditionRaw: conditionNumber(scratchMatrix(u.map((value, i) => designRow(value, powers, rootWeights[i])), powers.length)),
      conditionMapped: conditionNumber(A),
      // Weighted by 1/σ², S_r is the χ² statistic and s² the reduced χ²: the same certified numbers as above.
      reducedChiSquare: weighted && dof > 0 ? residualStats.residualVariance : null,
      chiSquareP: weighted && dof > 0 ? chiSquareUpperP(residualStats.residualSumOfSquares, dof) : null,
    },
    lackOfFit: lackOfFit(u, v, weights, summary.residualSumOfSquares, parameters),
    runsTest: runsTest(u, residuals, 1e-14 * (scaleV || 1)),
    points: {
      x: data.x.slice(),
      y: data.y.slice(),
      fitted: fittedY,
      residuals,
      residualsOriginal,
      leverage: solution.leverage,
      // In χ² mode σ is known: the residual in units of its own standard deviation σ_i·√(1 − h_ii), no estimated s.
      studentized:
        uncertaintyScale === 'stated'
          ? weightedResiduals.map((e, i) => (1 - solution.leverage[i]! > 1e-12 ? e / Math.sqrt(1 - solution.leverage[i]!) : NaN))
          : summary.studentized,
      cooksDistance: summary.cooksDistance,
    },
    method: { solver: 'householder-qr', refinement, rank: parameters },
    warnings,
    temperatureScales: scales,
  };
}
