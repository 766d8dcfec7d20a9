/**
 * The file a files worker writes beside a correlation's downloads for handbook.json (HANDBOOK_ENTRY_FILE, not
 * published: names starting with a dot stay out of the output): the handbook identity the record was made with,
 * as one JSON line, then the record's part of the correlation's text in handbook.json (handbookEntryText.ts). The
 * route that writes handbook.json uses it only when that identity is the one it would give the record itself.
 */
import type { HandbookIdentity } from '../../export/index.ts';
import { handbookEntryHead } from './handbookEntryText.ts';

export const HANDBOOK_ENTRY_FILE = '.handbook-entry.json';

/**
 * The identity line of the file, as the route compares it (the same key order as identityOf and handbookExport).
 * @example handbookEntryIdentity({ title: 'T', organisation: null, notice: null, url: 'https://x/c/a/' }) // => '{"title":"T","organisation":null,"notice":null,"url":"https://x/c/a/"}'
 */
export function handbookEntryIdentity(handbook: HandbookIdentity): string {
  return JSON.stringify({ title: handbook.title, organisation: handbook.organisation, notice: handbook.notice, url: handbook.url });
}

/**
 * @param coefficientsJson the text of the coefficients.json download: `JSON.stringify(record, null, 2)` and a line end
 * @param handbook the identity the record was made with
 * @example handbookEntryFile('{\n  "slug": "a"\n}\n', identity) // => '{"title":…}\n    {\n      "slug": "a"'
 */
export function handbookEntryFile(coefficientsJson: string, handbook: HandbookIdentity): string {
  return `${handbookEntryIdentity(handbook)}\n${handbookEntryHead(coefficientsJson.replace(/\n$/, ''))}`;
}
