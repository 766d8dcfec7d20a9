/**
 * KaTeX markup of a TeX string (texHtml.ts) as a value an Astro template writes as it is, for `{texMarkup(tex)}` in
 * a template: the same bytes as `<Tex tex={tex} />` (Tex.astro, whose template is that markup alone), without an
 * Astro component rendered for each symbol (a correlation page has about a dozen). `unescapeHTML` is what the
 * compiler turns `set:html` into (astro/runtime/server/index.js, which every compiled component imports).
 * @example texMarkup('T').toString().startsWith('<span class="katex">') // => true
 */
import { unescapeHTML } from 'astro/runtime/server/index.js';
import { texHtml } from './texHtml.ts';

export function texMarkup(tex: string, display = false): ReturnType<typeof unescapeHTML> {
  return unescapeHTML(texHtml(tex, display));
}
