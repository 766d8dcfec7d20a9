/**
 * The rows of a correlation page's tables as HTML, built once per correlation by the files workers beside its
 * downloads (src/loaders/correlationFolder.ts, through folderExtras.ts) and written as PAGE_HTML_FILE, which is not
 * published. A page inserts them (builtPageHtml.ts) instead of rendering some hundreds of template expressions and
 * formatting their numbers on the one thread that renders pages; without them (`astro dev`, entries holding their
 * fit) each component builds its rows with the same function, so the bytes are the same either way.
 */
import { checkValueRowsHtml } from './checkValueRowsHtml.ts';
import { coefficientRowsHtml } from './coefficientRowsHtml.ts';
import { dataRowsHtml } from './dataRowsHtml.ts';
import { dataTableView } from './dataRows.ts';
import { fitOf, selectionOf, type CorrelationEntry } from './entryView.ts';
import { orderRowsHtml } from './orderRowsHtml.ts';
import { statisticsRowsHtml } from './statisticsRowsHtml.ts';

/** File name in a correlation's folder of downloads; the leading dot keeps it out of the output. */
export const PAGE_HTML_FILE = '.page-html.json';

export interface PageHtml {
  /** DataTable.astro: dataRowsHtml. */
  readonly dataRows: string;
  /** CoefficientTable.astro: coefficientRowsHtml. */
  readonly coefficientRows: string;
  readonly mappedRows: string;
  /** CheckValues.astro: checkValueRowsHtml. */
  readonly checkValueRows: string;
  /** StatisticsTable.astro: statisticsRowsHtml, with the unit of y. */
  readonly statisticsRows: string;
  /** OrderTable.astro: orderRowsHtml, or null when no order table was kept. */
  readonly orderRows: string | null;
}

/**
 * @throws Error when the entry has no fit
 * @example pageHtml(entry).dataRows.startsWith('<tr') // => true
 */
export function pageHtml(entry: CorrelationEntry): PageHtml {
  const fit = fitOf(entry);
  if (fit === null) throw new Error(`pageHtml requires a fit; ${entry.slug} has none`);
  const selection = selectionOf(entry);
  const coefficients = coefficientRowsHtml(fit);
  return {
    dataRows: dataRowsHtml(dataTableView(entry, fit)),
    coefficientRows: coefficients.powers,
    mappedRows: coefficients.mapped,
    checkValueRows: checkValueRowsHtml(fit),
    statisticsRows: statisticsRowsHtml(fit, entry.meta.property.unit),
    orderRows: selection ? orderRowsHtml(selection, fit.order) : null,
  };
}
