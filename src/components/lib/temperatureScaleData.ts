/**
 * What a correlation page carries for its temperature-scale switch (src/client/temperatureScale.ts): for each scale
 * other than the fitted one, the published form as the core computed it (exact re-expression of the certified
 * coefficients): range, mapped centre and half-width, printed coefficients, digits and standard errors (3 digits,
 * for display), or the reason the form is not shown; plus the plain symbols and the interval quantile. As compact
 * JSON, with `<` escaped so that it cannot end its script element. Null when x is not a temperature.
 *
 * @example temperatureScaleData(fit, 'T', 'c_p') // => '{"n":"K","x":"T","y":"c_p","q":2.06,"o":[{"s":"°C",…}]}'
 */
import { normalQuantile, temperatureScaleOf, tQuantile, type PolynomialFit } from '../../core/index.ts';

export function temperatureScaleData(fit: PolynomialFit, x: string, y: string): string | null {
  const scales = fit.temperatureScales;
  if (scales === undefined || scales === null) return null;
  const level = (1 + fit.confidence) / 2;
  const dof = fit.statistics.degreesOfFreedom;
  const q = fit.uncertaintyScale === 'stated' ? normalQuantile(level) : dof > 0 ? tQuantile(level, dof) : NaN;
  const data = {
    n: scales.native,
    x,
    y,
    q: Number.isFinite(q) ? Number(q.toPrecision(6)) : null,
    o: scales.scales
      .filter((form) => !form.native)
      .map((form) => ({
        s: form.scale,
        r: [form.range.min, form.range.max],
        c: form.mapped.center,
        h: form.mapped.halfWidth,
        ...(form.shown
          ? { a: form.printedCoefficients, d: form.significantDigits, e: form.standardErrors.map((value) => (Number.isFinite(value) ? Number(value.toPrecision(3)) : null)) }
          : { n: form.reason }),
      })),
  };
  return JSON.stringify(data).replace(/</g, '\\u003c');
}

/**
 * The sentence the code section adds when x is a temperature: the snippets take the scale of x as an option.
 * @example scaleNote(entry) // => ' Where x is a temperature each takes its scale: Python evaluate(x, scale="°F"), …'
 */
export function scaleNote(entry: { readonly meta: { readonly variable: { readonly unit: string }; readonly fit: { readonly transform: { readonly x: string } } } }): string {
  return temperatureScaleOf(entry.meta.variable.unit) === null || entry.meta.fit.transform.x !== 'identity'

    ? ''
    : ' Each also takes x in K, °C or °F: Python evaluate(x, scale="°F"), JavaScript evaluate(x, { scale: "°F" }), C <name>_evaluate_in(x, <NAME>_FAHRENHEIT, &y), and a formula per scale (default: the scale of the fit).';
}
