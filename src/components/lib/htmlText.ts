/**
 * Text as an Astro template writes a string expression (`{text}` between tags): Astro escapes it with html-escaper's
 * `escape` (astro/dist/runtime/server/escape.js), which replaces & < > ' " by &amp; &lt; &gt; &#39; &quot;. HTML
 * that the pages take ready-made (rows built with the downloads, pageHtml.ts) writes every text through this, so it
 * is escaped exactly as the components' own rendering would (test/components/pageHtml.test.ts compares with Astro's escapeHTML,
 * on random text; test/site's hostile handbook checks the built pages).
 * @example htmlText(`<b>"x" & 'y'</b>`) // => "&lt;b&gt;&quot;x&quot; &amp; &#39;y&#39;&lt;/b&gt;"
 */
const SPECIAL = /[&<>'"]/g;
const ENTITIES: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', "'": '&#39;', '"': '&quot;' };

export function htmlText(text: string): string {
  return text.replace(SPECIAL, (character) => ENTITIES[character]!);
}
