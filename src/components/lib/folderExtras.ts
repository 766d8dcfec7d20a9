/**
 * What a files worker writes into a correlation's folder for routes other than its page, besides the downloads
 * and the page parts (src/loaders/correlationFolder.ts): made once per correlation, off the thread that renders the
 * pages, and kept with the folder while the entry and the code are unchanged. Names start with a dot, so they stay
 * out of the output: the rows of the page's tables as HTML (pageHtml.ts), its curve on the property pages
 * (propertyCurve.ts) and the correlation's record as handbook.json carries it (handbookEntryFile.ts).
 */
import type { HandbookIdentity } from '../../export/index.ts';
import type { CorrelationEntry } from './entryView.ts';
import { HANDBOOK_ENTRY_FILE, handbookEntryFile } from './handbookEntryFile.ts';
import { fitOf } from './entryView.ts';
import { PAGE_HTML_FILE, pageHtml, pageHtmlText } from './pageHtml.ts';
import { PROPERTY_CURVE_FILE, propertyCurve, propertyCurveText } from './propertyCurve.ts';

/**
 * @param entry a fitted entry
 * @param downloads the folder's downloads, file name → text (correlationFiles)
 * @param handbook the handbook identity the downloads were made with
 * @example folderExtras(entry, new Map([['coefficients.json', text]]), identity).map((file) => file.file) // => ['.page-html.txt', '.property-curve.txt', '.handbook-entry.json']
 */
export function folderExtras(entry: CorrelationEntry, downloads: ReadonlyMap<string, string>, handbook: HandbookIdentity): { file: string; text: string }[] {
  const coefficients = downloads.get('coefficients.json');
  return [
    { file: PAGE_HTML_FILE, text: pageHtmlText(pageHtml(entry)) },
    { file: PROPERTY_CURVE_FILE, text: propertyCurveText(propertyCurve(fitOf(entry)!, entry.range)) },
    ...(coefficients === undefined ? [] : [{ file: HANDBOOK_ENTRY_FILE, text: handbookEntryFile(coefficients, handbook) }]),
  ];
}
