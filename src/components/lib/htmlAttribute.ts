/**
 * An attribute as an Astro template writes `key={value}` for a string or number value (addAttribute in
 * astro/dist/runtime/server/render/util.js): nothing for null or undefined; the bare key for an empty string; else
 * the value with & and " written as &#38; and &#34;. One deliberate difference: Astro 5.18 writes an http(s) address
 * that holds "&" unescaped, so such a value holding a quote would end the attribute (a material named
 * `https://x/?a&b="><img src=x onerror=…>` would add an element to the catalogue); here it is escaped like any other
 * value, which a browser reads back as the same text. For rows that the pages take ready-made (catalogueRowsHtml.ts);
 * not for class:list, style, boolean attributes, popover or download, which Astro treats otherwise.
 * @example htmlAttribute('data-tags', '["a","b"]') // => ' data-tags="[&#34;a&#34;,&#34;b&#34;]"'
 */
export function htmlAttribute(key: string, value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (value === '') return ` ${key}`;
  return ` ${key}="${String(value).replace(/&/g, '&#38;').replace(/"/g, '&#34;')}"`;
}
