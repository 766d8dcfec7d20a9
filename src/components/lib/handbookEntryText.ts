/**
 * One correlation's text inside handbook.json, made from its record's JSON rather than by stringifying the whole
 * handbook at once. handbook.json is `JSON.stringify(handbookJson(…), null, 2)` (src/export/handbookJson.ts), and
 * each correlation in it is `{ ...record, url, downloads }` at depth two: JSON.stringify's layout is structural
 * (strings hold no raw line ends), so that text is the record's own `JSON.stringify(record, null, 2)` (the
 * coefficients.json download) without its closing brace, with `url` and `downloads` appended and every line
 * indented by four spaces. The files workers write the head (the record's part) beside the downloads
 * (handbookEntryFile.ts), so that the thread rendering the pages only joins bytes (handbookJsonBytes.ts).
 */

/** What every line of a correlation is indented by in handbook.json (two levels of two spaces). */
const INDENT = '\n    ';

/**
 * The record's part of a correlation in handbook.json: everything up to its closing brace, indented.
 * @param recordJson `JSON.stringify(record, null, 2)`, without a final line end
 * @example handbookEntryHead('{\n  "slug": "a"\n}') // => '    {\n      "slug": "a"'
 */
export function handbookEntryHead(recordJson: string): string {
  if (!recordJson.startsWith('{\n') || !recordJson.endsWith('\n}')) throw new Error('handbookEntryHead requires the JSON of a record with at least one property');
  return `    ${recordJson.slice(0, -2).replace(/\n/g, INDENT)}`;
}

/**
 * The rest of a correlation in handbook.json after its head: its `url` and `downloads`, and the closing brace.
 * @example handbookEntryTail('/correlations/a/', { json: '/correlations/a/coefficients.json' }) // => ',\n      "url": "/correlations/a/",\n      "downloads": {\n        "json": …\n      }\n    }'
 */
export function handbookEntryTail(url: string, downloads: Readonly<Record<string, string>>): string {
  const text = `,\n  "url": ${JSON.stringify(url)},\n  "downloads": ${JSON.stringify({ ...downloads }, null, 2).replace(/\n/g, '\n  ')}\n}`;
  return text.replace(/\n/g, INDENT);
}
