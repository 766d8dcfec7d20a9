/**
 * What the equation section of a correlation page shows (Equation.astro): the TeX of the fitted equation and its
 * KaTeX markup, the plain-text forms with the printed digits and at full precision, and the temperature-scale data
 * of the K/°C/°F switch (null when x is not a temperature). Built where the page is rendered, or ahead of it with
 * the downloads (pageParts.ts).
 */
import { equationPlain, equationTex, plainSymbol, transformedYText } from '../../core/index.ts';
import { temperatureScaleData } from './temperatureScaleData.ts';
import { texHtml } from './texHtml.ts';
import type { CorrelationEntry, PolynomialFit } from './entryView.ts';

export interface EquationParts {
  readonly tex: string;
  /** KaTeX markup of `tex` in display style. */
  readonly html: string;
  /** Plain text with the printed digits. */
  readonly printed: string;
  /** Plain text at full precision. */
  readonly full: string;
  /** temperatureScaleData's JSON, or null. */
  readonly scales: string | null;
}

/** @example equationParts(entry, fit).printed // => "c_p = 4217.4 - 3.0602*T + …" */
export function equationParts(entry: CorrelationEntry, fit: PolynomialFit): EquationParts {
  const tex = equationTex(fit, { x: entry.meta.variable.symbol, y: entry.meta.property.symbol });
  const symbols = { x: plainSymbol(entry.meta.variable.symbol), y: plainSymbol(entry.meta.property.symbol) };
  return {
    tex,
    html: texHtml(tex, true),
    printed: equationPlain(fit, symbols),
    full: equationPlain(fit, symbols, { digits: 'full' }),
    scales: temperatureScaleData(fit, symbols.x, transformedYText(fit.transformY, symbols.y, 'plain')),
  };
}
