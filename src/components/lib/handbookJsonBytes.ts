/**
 * handbook.json's bytes from the handbook's own part and each correlation's text (handbookEntryText.ts): the
 * same bytes as `${JSON.stringify(handbookJson(…), null, 2)}\n`, joined from pieces most of which the files
 * workers wrote (a correlation's head is bytes read from its folder), so that the thread rendering the pages
 * neither stringifies nor encodes the whole export (27 MB at N = 1000).
 */

const EMPTY = '"correlations": []\n}';

/**
 * @param handbookText `JSON.stringify(handbookJson({ …, correlations: [] }), null, 2)`: correlations come last
 * @param correlations each correlation's head (handbookEntryHead, as text or its UTF-8 bytes) and tail (handbookEntryTail), in order
 * @example handbookJsonBytes('{\n  "correlations": []\n}', [['    {\n      "slug": "a"', '\n    }']]).toString() // => '{\n  "correlations": [\n    {\n      "slug": "a"\n    }\n  ]\n}\n'
 */
export function handbookJsonBytes(handbookText: string, correlations: readonly (readonly [head: string | Uint8Array, tail: string])[]): Uint8Array<ArrayBuffer> {
  if (!handbookText.endsWith(EMPTY)) throw new Error('handbookJsonBytes requires the handbook text with an empty correlations list, last');
  if (correlations.length === 0) return new TextEncoder().encode(`${handbookText}\n`);
  const chunks: Uint8Array[] = [Buffer.from(`${handbookText.slice(0, -EMPTY.length)}"correlations": [\n`)];
  correlations.forEach(([head, tail], index) => {
    chunks.push(typeof head === 'string' ? Buffer.from(head) : head);
    chunks.push(Buffer.from(index < correlations.length - 1 ? `${tail},\n` : `${tail}\n  ]\n}\n`));
  });
  // A Buffer is a Uint8Array; the cast only names its backing store, which Buffer.concat allocates.
  return Buffer.concat(chunks) as Uint8Array<ArrayBuffer>;
}
