/**
 * The rows of a page's table of every order fitted (OrderTable.astro) as HTML: the same bytes as the component's
 * row template would give (each run of whitespace between tags one space; attributes as Astro writes them), every
 * text escaped as Astro escapes an expression (htmlText.ts). Built with the downloads (pageHtml.ts) or, without
 * them, by the component.
 */
import { formatNumber, formatP, formatRSquared } from './formatNumber.ts';
import { htmlText } from './htmlText.ts';
import type { OrderSelection } from './entryView.ts';

/** The text of the "candidate" cell: order 0, the mean, is taken only when the data are flat (OrderTable.astro). */
function candidateCell(row: Pick<OrderSelection['orders'][number], 'candidate' | 'order'>, hasMean: boolean): string {
  return row.candidate ? 'yes' : row.order === 0 && hasMean ? 'if flat' : 'no';
}

/**
 * @param order the order fitted (its row is marked chosen)
 * @example orderRowsHtml(selection, 3).includes('<tr class="chosen" aria-current="true" data-order="3">') // => true
 */
export function orderRowsHtml(selection: Pick<OrderSelection, 'orders' | 'weighted' | 'intercept'>, order: number): string {
  const hasMean = selection.intercept && selection.orders.some((row) => row.order === 0);
  let html = '';
  for (const row of selection.orders) {
    const chosen = row.order === order;
    html +=
      `<tr${chosen ? ' class="chosen" aria-current="true"' : ''} data-order="${row.order}"> <td class="num">${row.order}${chosen ? ' (chosen)' : ''}</td> <td class="num">${row.degreesOfFreedom}</td>` +
      ` <td>${htmlText(candidateCell(row, hasMean))}</td> <td class="num mono">${htmlText(formatNumber(row.residualStdDev))}</td>` +
      ` <td class="num mono">${htmlText(formatRSquared(row.rSquared))}</td> <td class="num mono">${htmlText(formatRSquared(row.adjustedRSquared))}</td>` +
      ` <td class="num mono">${htmlText(formatNumber(row.aicc, 5))}</td> <td class="num mono">${htmlText(formatNumber(row.bic, 5))}</td>` +
      ` <td class="num mono">${htmlText(formatNumber(row.looRmse))}</td> <td class="num mono">${htmlText(formatNumber(row.fToNext, 3))}</td>` +
      ` <td class="num mono">${htmlText(formatP(row.pToNext))}</td> ` +
      (selection.weighted ? `<td class="num mono">${htmlText(formatNumber(row.reducedChiSquare))}</td> <td class="num mono">${htmlText(formatP(row.chiSquareP))}</td>` : ' ') +
      ' </tr>';
  }
  return html;
}
