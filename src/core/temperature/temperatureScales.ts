/**
 * The fitted polynomial re-expressed in every temperature scale, for a fit whose x is a temperature and is not
 * transformed (u = x).
 *
 * With x_native = α·x_S + β the exact affine conversion (temperatureScale.ts), the polynomial in scale S is
 * q(x_S) = p(α·x_S + β): its coefficients come from the certified (exact rational) native coefficients by exact
 * substitution (substituteAffineExact, the same expansion as the mapped form), and are rounded once to double.
 * The mapped form is the same polynomial in t, so its coefficients do not change; only its centre and half-width
 * do (c_S = (c − β)/α, h_S = h/α).
 *
 * Each scale gets what the native form has: its validity range (the native range converted exactly, rounded once),
 * its significant digits by the same digits rule (1 % of the uncertainty of a new observation at that x), its
 * printed coefficients, full-precision and printed check values at its own check points, and standard errors
 * (S·Σ·Sᵀ in floating point). A re-expressed form is shown only where its printed coefficients, evaluated by
 * Horner's rule in double precision as a designer's copy would be, stay within that 1 % over the range (checked on
 * 201 points against the certified polynomial, evaluated exactly where a double-precision screen cannot decide:
 * printedDeviation.ts) and need at most 15 significant digits; otherwise
 * `shown` is false and `reason` says why (the mapped form, with x converted to the native scale, always works).
 *
 * Cost: O(m²) big-integer operations for the substitution, O(grid·m) exact evaluations for the display check.
 */
import { checkPoints, fullCheckValues, printedForm } from '../checkValues.ts';
import { substituteAffineExact, substitutedCovariance } from '../convertBasis.ts';
import { decimalRational } from '../exact/decimal.ts';
import { multiply, toNumber, type Rational } from '../exact/rational.ts';
import { significantDigits } from '../format/significantDigits.ts';
import type { PolynomialFit, TemperatureScale, TemperatureScaleForm, TemperatureScales, TransformY } from '../types.ts';
import { printedDeviation } from './printedDeviation.ts';
import { applyMap, inverseMap, scaleConversion, TEMPERATURE_SCALES } from './temperatureScale.ts';

/** Most significant digits a shown re-expressed coefficient may need: a double carries 15 reliably. */
export const SHOWN_DIGITS_LIMIT = 15;

/** What the re-expression reads from a fit in progress. */
export interface NativeForm {
  readonly scale: TemperatureScale;
  /** Certified power-basis coefficients in the native scale (u = x). */
  readonly exactCoefficients: readonly Rational[];
  readonly fit: Pick<
    PolynomialFit,
    'coefficients' | 'covariance' | 'standardErrors' | 'significantDigits' | 'printedCoefficients' | 'checkValues' | 'printedCheckValues' | 'range' | 'mapped'
  >;
  readonly transformY: TransformY;
  /** Allowed deviation of a printed form at a native x (1 % of the uncertainty of a new observation there). */
  readonly tolerance: (xNative: number) => number;
}

function reasonNotShown(digits: readonly number[], deviation: number, nativeScale: TemperatureScale): string | null {
  const most = Math.max(...digits);
  const use = `use the mapped form with x converted to ${nativeScale}, or the ${nativeScale} form`;
  if (!Number.isFinite(deviation)) return `the coefficients leave the range of double precision; ${use}`;
  if (most > SHOWN_DIGITS_LIMIT) return `needs ${most} significant digits in a coefficient, more than a double carries reliably (${SHOWN_DIGITS_LIMIT}); ${use}`;
  if (deviation > 1) return `its printed coefficients, evaluated in double precision, miss the fit by up to ${(deviation).toPrecision(3)} % of the uncertainty of a new observation (the limit is 1 %); ${use}`;
  return null;
}

function otherScale(native: NativeForm, scale: TemperatureScale): TemperatureScaleForm {
  const toNative = scaleConversion(scale, native.scale);
  const fromNative = inverseMap(toNative);
  const exact = substituteAffineExact(native.exactCoefficients, toNative.offset, toNative.factor);
  const coefficients = exact.map(toNumber);
  const range = {
    min: toNumber(applyMap(fromNative, decimalRational(native.fit.range.min))),
    max: toNumber(applyMap(fromNative, decimalRational(native.fit.range.max))),
  };
  const factor = toNumber(toNative.factor);
  const offset = toNumber(toNative.offset);
  const tolerance = (x: number) => native.tolerance(factor * x + offset);
  const xs = checkPoints(range);
  const finite = coefficients.every(Number.isFinite);
  const asked = finite ? significantDigits(coefficients, range.min, range.max, tolerance) : coefficients.map(() => 17);
  const printed = printedForm(coefficients, asked, coefficients.map(() => false), 'identity', native.transformY, xs);
  const deviation = finite
    ? printedDeviation({ exactCoefficients: native.exactCoefficients, toNative, printed: printed.printed.map(Number), range, tolerance: native.tolerance, scaleCoefficients: exact })
    : Infinity;
  const reason = reasonNotShown(printed.digits, deviation, native.scale);
  const covariance = substitutedCovariance(native.fit.covariance, toNative.offset, toNative.factor);
  return {
    scale,
    native: false,
    range,
    coefficients,
    significantDigits: printed.digits,
    printedCoefficients: printed.printed,
    standardErrors: covariance.map((row, k) => Math.sqrt(Math.max(0, row[k]!))),
    checkValues: fullCheckValues(exact, 'identity', native.transformY, xs),
    printedCheckValues: printed.checkValues,
    mapped: {
      center: toNumber(applyMap(fromNative, decimalRational(native.fit.mapped.map.center))),
      halfWidth: toNumber(multiply(fromNative.factor, decimalRational(native.fit.mapped.map.halfWidth))),
    },
    printedDeviation: deviation,
    shown: reason === null,
    reason,
  };
}

/**
 * Every scale's form, the native one first as the fit publishes it, then the others in the order K, °C, °F.
 * @example temperatureScales(native).scales.map((form) => form.scale) // => ['°C', 'K', '°F'] for a fit in °C
 */
export function temperatureScales(native: NativeForm): TemperatureScales {
  const fit = native.fit;
  const nativeForm: TemperatureScaleForm = {
    scale: native.scale,
    native: true,
    range: { min: fit.range.min, max: fit.range.max },
    coefficients: fit.coefficients,
    significantDigits: fit.significantDigits,
    printedCoefficients: fit.printedCoefficients,
    standardErrors: fit.standardErrors,
    checkValues: fit.checkValues,
    printedCheckValues: fit.printedCheckValues,
    mapped: { center: fit.mapped.map.center, halfWidth: fit.mapped.map.halfWidth },
    printedDeviation: printedDeviation({
      exactCoefficients: native.exactCoefficients,
      toNative: scaleConversion(native.scale, native.scale),
      printed: fit.printedCoefficients.map(Number),
      range: fit.range,
      tolerance: native.tolerance,
    }),
    shown: true,
    reason: null,
  };
  const others = TEMPERATURE_SCALES.filter((scale) => scale !== native.scale).map((scale) => otherScale(native, scale));
  return { native: native.scale, scales: [nativeForm, ...others] };
}
