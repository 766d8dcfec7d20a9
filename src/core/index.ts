/**
 * The numerical core's only public door. Pure: no Astro, no DOM, no file I/O. Results are plain JSON data.
 */

// Types
export type * from './types.ts';

// Fitting
export { fitPolynomial } from './fitPolynomial.ts';
export { fitCurve } from './fitCurve.ts';
export { fitCurves } from './fitCurves.ts';
export { fitOrders, type OrderFit } from './fitOrders.ts';
export { FitError } from './fitError.ts';
export { validateFitData } from './validateFitInput.ts';
export { transformDomainProblem } from './transformDomainProblem.ts';
export { domainMap, domainMapFor, roundToPlace, roundUpShort, shortDecimal, toUnit } from './domain.ts';
export { mappedToPower, mappedCovarianceToPower, mappedFromPowerExact, powerFromMappedExact, substituteAffineExact, substitutedCovariance } from './convertBasis.ts';

// Temperature scales (exact re-expression of a fit in K, °C and °F)
export { applyMap, inverseMap, scaleConversion, temperatureScaleOf, TEMPERATURE_SCALES, type AffineMap } from './temperature/temperatureScale.ts';
export { temperatureScales, SHOWN_DIGITS_LIMIT, type NativeForm } from './temperature/temperatureScales.ts';

// Exact arithmetic (certification)
export { add, compare, divide, fromDouble, gcd, multiply, rational, reduce, subtract, timesPowerOfTen, toNumber, type Rational } from './exact/rational.ts';
export { decimalParts, decimalRational, minExponent, parseDecimal, scaleToIntegers } from './exact/decimal.ts';
export { solveExact, type ExactSolution } from './exact/bareiss.ts';
export { exactLeastSquares, type ExactProblem, type ExactResult } from './exact/exactLeastSquares.ts';
export { evaluateExact } from './exact/evaluateExact.ts';
export { fittedSpaceWeights, forwardX, forwardY, inverseX, inverseY, transformData } from './transforms.ts';

// Order selection (criteria, the default rule, the candidate-order table)
export * from './order/index.ts';

// Evaluation and bands
export { evaluateFit, basisAt, horner, type Evaluation } from './evaluate.ts';
export { bands, type BandPoint } from './stats/bands.ts';
export { localUncertainty, profileAt, uncertaintyProfile } from './stats/localUncertainty.ts';
export { publishedEstimate, intervalHalfWidths, type PublishedEstimate, type PublishedModel } from './stats/publishedEstimate.ts';
export { runsTest } from './stats/runsTest.ts';
export { checkPoints, exactU, fullCheckValues, lastPrintedPlace, printedForm, type PrintedForm } from './checkValues.ts';

// Formatting for publication
export { CAUTIONS, cautionsFor } from './format/cautions.ts';
export { equationTex, equationPlain, type EquationSymbols, type EquationPlainOptions } from './format/equation.ts';
export { formatCoefficient } from './format/formatCoefficient.ts';
export { formatNumber, formatP, formatRSquared, formatInterval, formatToPlace, lastDigitPlace, MISSING } from './format/formatNumber.ts';
export { transformedXText, transformedYText } from './format/transformText.ts';
export { plainSymbol } from './format/plainSymbol.ts';
export { printedCoefficients } from './format/printedCoefficients.ts';
export { statisticUnit, withStatisticUnit } from './format/statisticUnit.ts';
export { roundSignificant } from './format/roundSignificant.ts';
export { significantDigits } from './format/significantDigits.ts';

// Distributions (thin wrapper over @stdlib)
export { tQuantile, tTwoSidedP, fQuantile, fUpperP, chiSquareQuantile, chiSquareUpperP, normalQuantile } from './distributions.ts';
