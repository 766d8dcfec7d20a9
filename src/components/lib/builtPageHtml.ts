/**
 * The rows HTML (pageHtml.ts) the files workers wrote for this entry in this build, or undefined: under
 * `astro dev` (which writes no files, so a file left by an earlier build could be stale), for an entry that holds
 * its fit itself (tests), or when the file is missing or unreadable. The components then build their rows themselves.
 */
import { isStoredFitReference } from '../../load/storedFit.ts';
import { writtenBytes } from '../../loaders/writtenBytes.ts';
import { PAGE_HTML_FILE, readPageHtml, type PageHtml } from './pageHtml.ts';
import type { CorrelationEntry } from './entryView.ts';

/** The last file read: a page's components ask for the same one in turn. */
let last: { key: string; html: PageHtml | undefined } | undefined;

/** @example builtPageHtml(entry)?.dataRows // => '<tr> <td class="num">1</td> …', in a build */
export function builtPageHtml(entry: CorrelationEntry): PageHtml | undefined {
  if (!import.meta.env.PROD || !isStoredFitReference(entry.fit)) return undefined;
  const key = `${entry.fit.fitCache.directory}\0${entry.slug}`;
  if (last?.key === key) return last.html;
  const bytes = writtenBytes(entry.fit, entry.slug, PAGE_HTML_FILE);
  const html = bytes === undefined ? undefined : readPageHtml(bytes.toString('utf8'));
  last = { key, html };
  return html;
}
