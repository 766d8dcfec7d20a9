/**
 * The rows of a page's two coefficient tables (CoefficientTable.astro) as HTML: the power-basis coefficients with
 * their digits, standard errors and intervals, and the mapped form's coefficients. The same bytes as the
 * component's row templates would give (each run of whitespace between tags one space; the mapped rows are written
 * on one line), every text escaped as Astro escapes an expression (htmlText.ts). Built with the downloads
 * (pageHtml.ts) or, without them, by the component.
 */
import { formatCoefficient } from '../../core/index.ts';
import { formatExact, formatInterval, formatNumber } from './formatNumber.ts';
import { htmlText } from './htmlText.ts';
import type { PolynomialFit } from './entryView.ts';

type CoefficientFit = Pick<PolynomialFit, 'coefficients' | 'printedCoefficients' | 'significantDigits' | 'intercept' | 'standardErrors' | 'confidenceIntervals' | 'mapped'>;

/** @example coefficientRowsHtml(fit).mapped // => '<tr><td class="num">0</td><td class="num mono">12.5</td></tr>…' */
export function coefficientRowsHtml(fit: CoefficientFit): { readonly powers: string; readonly mapped: string } {
  const digitsFor = (k: number) => fit.significantDigits[k] ?? 6;
  // Without an intercept, a₀ is fixed at 0 (the component's `fixed` set).
  const fixed = (k: number) => !fit.intercept && k === 0;
  let powers = '';
  fit.coefficients.forEach((a, k) => {
    powers +=
      `<tr> <td class="num">${k}</td> <td class="num mono">${htmlText(fit.printedCoefficients?.[k] ?? formatCoefficient(a, digitsFor(k)))}</td> <td class="num">${digitsFor(k)}</td>` +
      ` <td class="num mono">${htmlText(fixed(k) ? 'fixed' : formatNumber(fit.standardErrors[k], 3))}</td>` +
      ` <td class="num mono">${htmlText(fixed(k) ? '—' : formatInterval(fit.confidenceIntervals[k], a, digitsFor(k)))}</td> </tr>`;
  });
  let mapped = '';
  fit.mapped.coefficients.forEach((b, k) => {
    mapped += `<tr><td class="num">${k}</td><td class="num mono">${htmlText(formatExact(b))}</td></tr>`;
  });
  return { powers, mapped };
}
