/**
 * The costly pieces of a correlation page, built ahead of the page with its downloads: in a build, the content
 * loader writes each correlation's folder of downloads (src/loaders/correlationFolder.ts, in worker threads when
 * many change, and kept from the last build while the entry and the code are unchanged) and this record beside
 * them as PAGE_PARTS_FILE, which is not published. The page then inserts these strings instead of typesetting the
 * equation, computing the chart data and the order statistics and building the code snippets on the one thread
 * that renders pages (builtPageParts.ts). They are the same functions' results, so the page's bytes are the same.
 * They also hold what the page shows of the fit record's large parts (its data table, the previews' statistics,
 * whether any point states an uncertainty), so that a page reads only the fit's summary (src/load/storedFit.ts).
 */
import katex from 'katex';
import { dataTableView, type DataTableView } from './dataRows.ts';
import { embeddedChartJson } from './embeddedChartJson.ts';
import { equationParts, type EquationParts } from './equationParts.ts';
import { fitOf, pointsOf, previewsOf, selectionOf, type CorrelationEntry } from './entryView.ts';
import { orderStatsParts } from './orderStatsParts.ts';
import { previewView, type PreviewView } from './previewView.ts';

/** File name in a correlation's folder of downloads; the leading dot keeps it out of the output. */
export const PAGE_PARTS_FILE = '.page.json';

export interface PageParts {
  /** KaTeX version that typeset `equation.html` (a record from another version is not used). */
  readonly katex: string;
  readonly equation: EquationParts;
  /** embeddedChartJson. */
  readonly chartJson: string | null;
  /** orderStatsParts. */
  readonly orderStats: { readonly svg: string; readonly json: string } | null;
  /** Snippet text by kind (entrySnippets), for the kinds the page shows. */
  readonly snippets: Readonly<Record<string, string>>;
  /** dataTableView. */
  readonly dataTable: DataTableView;
  /** previewView. */
  readonly previews: PreviewView | null;
  /** Whether any data row states an uncertainty (the chart's legend says so). */
  readonly uncertainty: boolean;
}

/** The KaTeX version of this build. */
export const KATEX_VERSION: string = katex.version;

/**
 * @param snippets the entry's snippets by kind (from the downloads being written, so they are built once)
 * @throws Error when the entry has no fit
 * @example pageParts(entry, { python: '…' }).equation.html.includes('katex-display') // => true
 */
export function pageParts(entry: CorrelationEntry, snippets: Readonly<Record<string, string>>): PageParts {
  const fit = fitOf(entry);
  if (fit === null) throw new Error(`pageParts requires a fit; ${entry.slug} has none`);
  const selection = selectionOf(entry);
  const previews = previewsOf(entry, fit, selection);
  return {
    katex: KATEX_VERSION,
    equation: equationParts(entry, fit),
    chartJson: embeddedChartJson(entry, fit),
    orderStats: orderStatsParts(fit, selection, previews),
    snippets,
    dataTable: dataTableView(entry, fit),
    previews: previewView(previews),
    uncertainty: pointsOf(entry).some((point) => point.uncertainty !== undefined),
  };
}
