/**
 * What the evaluator says for one input: y with its 95 % confidence and prediction intervals, a refusal outside the
 * validity range (with the caution), or a request for a number. Pure (no DOM), so it is tested in Node; the numbers
 * come from the core's publishedEstimate on the snippet's published model (evaluatorModel.ts).
 *
 * Printed digits: y and the interval ends to the decimal place of the second significant digit of the narrower
 * half of the confidence interval (a digit further would be noise); the full-precision y is given as well.
 */
import { formatNumber, formatToPlace, lastDigitPlace, publishedEstimate, type PublishedEstimate } from '../core/browser.ts';
import type { EvaluatorSubject } from './evaluatorModel.ts';

export type EvaluatorResult =
  | { readonly kind: 'invalid'; readonly message: string }
  | { readonly kind: 'refused'; readonly message: string; readonly cautions: readonly string[] }
  | {
      readonly kind: 'value';
      readonly estimate: PublishedEstimate;
      /** Loud warning when x is outside the validity range (extrapolation asked for); null inside. */
      readonly warning: string | null;
      readonly lines: readonly string[];
    };

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A value with its unit, e.g. "300 K"; no unit for dimensionless quantities. */
function withUnit(text: string, unit: string): string {
  return unit ? `${text} ${unit}` : text;
}

/** The range caution (as src/core/format/cautions.ts words it) and the design caution. */
export function evaluatorCautions(subject: EvaluatorSubject): string[] {
  const { model, xName, xUnit } = subject;
  return [
    `Valid only for ${withUnit(String(model.min), xUnit)} ≤ ${xName} ≤ ${withUnit(String(model.max), xUnit)} (the fitted range); outside it the correlation is an extrapolation and may be badly wrong.`,
    'Not for design use without checking against the applicable codes and standards and the judgement of a qualified engineer.',
  ];
}

/**
 * The evaluator's answer for the text typed as x.
 * @example evaluatorResult(subject, '300', false).kind // => 'value' inside the range, 'refused' outside it
 */
export function evaluatorResult(subject: EvaluatorSubject, input: string, extrapolate: boolean): EvaluatorResult {
  const { model, xName, xUnit, yName, yUnit } = subject;
  const text = input.trim().replace(/\u2212/g, '-');
  if (!NUMBER.test(text)) return { kind: 'invalid', message: `Enter ${xName} as a number${xUnit ? ` in ${xUnit}` : ''}, e.g. ${model.min}.` };
  const x = Number(text);
  const outside = x < model.min || x > model.max;
  const where = `${xName} = ${withUnit(String(x), xUnit)} is outside the validity range ${withUnit(String(model.min), xUnit)} to ${withUnit(String(model.max), xUnit)}`;
  if (outside && !extrapolate) {
    return {
      kind: 'refused',
      message: `Not evaluated: ${where}. Tick “Evaluate outside the validity range” to see an extrapolated value anyway.`,
      cautions: evaluatorCautions(subject),
    };
  }
  const estimate = publishedEstimate(model, x, { extrapolate: true });
  const narrower = Math.min(estimate.y - estimate.confidenceLow, estimate.confidenceHigh - estimate.y);
  const format = Number.isFinite(narrower) && narrower > 0 ? (value: number) => formatToPlace(value, lastDigitPlace(narrower, 2)) : (value: number) => formatNumber(value, 6);
  const interval = (low: number, high: number) =>
    Number.isFinite(low) && Number.isFinite(high) ? withUnit(`${format(low)} to ${format(high)}`, yUnit) : 'not defined (the fit has no residual degrees of freedom)';
  return {
    kind: 'value',
    estimate,
    warning: outside
      ? `EXTRAPOLATION — NOT VALID. ${where}. This value extends the fitted polynomial beyond its data and may be badly wrong; the intervals assume the fit still holds there, which nothing supports. Do not use it for design.`
      : null,
    lines: [
      `${yName} = ${withUnit(format(estimate.y), yUnit)} at ${xName} = ${withUnit(String(x), xUnit)}`,
      `95 % confidence interval of the correlation: ${interval(estimate.confidenceLow, estimate.confidenceHigh)}`,
      `95 % prediction interval for a new measurement: ${interval(estimate.predictionLow, estimate.predictionHigh)}`,
      `Full precision: ${String(estimate.y)}`,
    ],
  };
}
