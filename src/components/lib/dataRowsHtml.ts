/**
 * The rows of a page's data table (DataTable.astro) as HTML: the same bytes as the component's own row template
 * (whitespace as the Astro compiler leaves it: each run of spaces and line ends between tags is one space), built
 * once per correlation with its downloads (pageHtml.ts) rather than as hundreds of template expressions on the
 * thread that renders the pages. Every text goes through htmlText, as Astro escapes an expression.
 */
import type { DataTableView } from './dataRows.ts';
import { formatExact, formatNumber } from './formatNumber.ts';
import { htmlText } from './htmlText.ts';

/**
 * @example dataRowsHtml({ rows: [row], hasUncertainty: false, hasNote: false }) // => '<tr> <td class="num">1</td> <td class="num mono">300</td> …  </tr>'
 */
export function dataRowsHtml(view: Pick<DataTableView, 'rows' | 'hasUncertainty' | 'hasNote'>): string {
  let html = '';
  for (const row of view.rows) {
    const { point } = row;
    html +=
      `<tr${row.flagged ? ' class="flagged"' : ''}> <td class="num">${point.row}</td> <td class="num mono">${htmlText(formatExact(point.x))}</td> <td class="num mono">${htmlText(formatExact(point.y))}</td> ` +
      (view.hasUncertainty ? `<td class="num mono">${htmlText(formatExact(point.uncertainty))}</td>` : '') +
      ` <td class="num mono">${htmlText(formatNumber(row.residual, 3))}</td> <td class="num mono">${htmlText(formatNumber(row.studentized, 3))}</td>` +
      ` <td class="num mono">${htmlText(formatNumber(row.leverage, 3))}</td> <td class="num mono">${htmlText(formatNumber(row.cook, 3))}</td> ` +
      (view.hasNote ? `<td>${htmlText(point.note ?? '')}</td>` : '') +
      ' </tr>';
  }
  return html;
}
