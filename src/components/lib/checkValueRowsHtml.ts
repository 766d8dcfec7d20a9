/**
 * The rows of a page's check-value table (CheckValues.astro) as HTML: the same bytes as the component's row
 * template would give (each run of whitespace between tags one space), every text escaped as Astro escapes an
 * expression (htmlText.ts). Built with the downloads (pageHtml.ts) or, without them, by the component.
 */
import { formatExact, formatNumber } from './formatNumber.ts';
import { htmlText } from './htmlText.ts';
import type { PolynomialFit } from './entryView.ts';

/** @example checkValueRowsHtml(fit).startsWith('<tr> <td class="num mono">') // => true */
export function checkValueRowsHtml(fit: Pick<PolynomialFit, 'checkValues' | 'printedCheckValues'>): string {
  const printed = fit.printedCheckValues ?? [];
  let html = '';
  fit.checkValues.forEach((check, i) => {
    const copy = printed[i];
    html +=
      `<tr> <td class="num mono">${htmlText(formatExact(check.x))}</td> <td class="num mono">${htmlText(String(copy?.y ?? '—'))}</td>` +
      ` <td class="num mono">${htmlText(copy ? `± ${formatNumber(copy.tolerance, 1)}` : '—')}</td> <td class="num mono">${htmlText(formatExact(check.y))}</td>` +
      ` <td class="num mono">${htmlText(check.tolerance === undefined ? '—' : `± ${formatNumber(check.tolerance, 1)}`)}</td> </tr>`;
  });
  return html;
}
