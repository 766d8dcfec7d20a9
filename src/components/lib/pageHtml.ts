/**
 * The rows of a correlation page's tables as HTML, built once per correlation by the files workers beside its
 * downloads (src/loaders/correlationFolder.ts, through folderExtras.ts) and written as PAGE_HTML_FILE (pageHtmlText),
 * which is not published. A page inserts them (builtPageHtml.ts) instead of rendering some hundreds of template expressions and
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
export const PAGE_HTML_FILE = '.page-html.txt';

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

const KEYS = ['dataRows', 'coefficientRows', 'mappedRows', 'checkValueRows', 'statisticsRows', 'orderRows'] as const;

/**
 * The file's text: a first line with the length of each piece (in UTF-16 units, -1 for null), then the pieces one
 * after another. Reading it takes one decoding of the bytes and slices, not JSON's parsing of quoted strings (the
 * rows are mostly attribute quotes, which JSON would escape).
 * @example pageHtmlText(html).split('\n', 1)[0] // => '[9120,820,310,1210,1450,2760]'
 */
export function pageHtmlText(html: PageHtml): string {
  return `${JSON.stringify(KEYS.map((key) => html[key]?.length ?? -1))}\n${KEYS.map((key) => html[key] ?? '').join('')}`;
}

/**
 * The pieces of a file written by pageHtmlText, or undefined when it is not one.
 * @example readPageHtml(pageHtmlText(html)) // => html
 */
export function readPageHtml(text: string): PageHtml | undefined {
  const line = text.indexOf('\n');
  let lengths: unknown;
  try {
    lengths = JSON.parse(text.slice(0, line));
  } catch {
    return undefined;
  }
  if (line < 0 || !Array.isArray(lengths) || lengths.length !== KEYS.length) return undefined;
  const html: Record<string, string | null> = {};
  let at = line + 1;
  KEYS.forEach((key, i) => {
    const length = lengths[i] as number;
    html[key] = length < 0 ? null : text.slice(at, (at += length));
  });
  return at === text.length && typeof html.dataRows === 'string' ? (html as unknown as PageHtml) : undefined;
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
