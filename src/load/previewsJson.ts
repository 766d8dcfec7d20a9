/**
 * The JSON text of a correlation's previews (src/render/orderPreviews.ts), as JSON.stringify writes it, without
 * writing it again when it is already known: a fit cache record keeps its previews on a line of their own
 * (fitCache.ts), and when that line is plain JSON (no NaN, ±Infinity or −0 tagged in it, so it is exactly
 * JSON.stringify's text of the previews it parses to), the reader remembers the text for the object it made. A page's
 * previews JSON (src/components/lib/orderStatsParts.ts) then costs nothing in the files worker instead of a
 * stringify of ~10 KB per correlation. JSON.stringify's text parses back to the same values and keys in the same
 * order, and the same values stringify to the same text, so the remembered text is the one a new stringify gives.
 */

const known = new WeakMap<object, string>();

/**
 * Remember `text` as the JSON.stringify text of `previews` (the value parsed from it, not changed since).
 * @example rememberPreviewsJson(JSON.parse(line), line)
 */
export function rememberPreviewsJson(previews: object, text: string): void {
  known.set(previews, text);
}

/**
 * JSON.stringify(previews), remembered or written now.
 * @example previewsJson({ published: 2 }) // => '{"published":2}'
 */
export function previewsJson(previews: object): string {
  return known.get(previews) ?? JSON.stringify(previews);
}
