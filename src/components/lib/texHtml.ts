/**
 * KaTeX markup of a TeX string, rendered at build time with the handbook's options (trust off, so \href, \url,
 * \includegraphics and \html* make no links, images or attributes out of content; output HTML plus MathML) and
 * remembered by TeX string: a handbook's symbols and table forms repeat on every page (a thousand pages typeset
 * the same dozen symbols thirteen thousand times), and renderToString is a pure function of the string and the
 * options, so a remembered result is the same bytes. At most MEMO_LIMIT strings are kept (then the memo starts
 * again), so a handbook of many distinct equations does not grow it without bound.
 */
import katex from 'katex';

const MEMO_LIMIT = 4096;
const memo = new Map<string, string>();

/**
 * @param display display style (a block equation) rather than inline
 * @throws katex.ParseError when the TeX does not parse (throwOnError: the build stops and names the expression)
 * @example texHtml('T').startsWith('<span class="katex">') // => true
 */
export function texHtml(tex: string, display = false): string {
  const key = `${display ? 'd' : 'i'}${tex}`;
  const known = memo.get(key);
  if (known !== undefined) return known;
  const html = katex.renderToString(tex, { displayMode: display, throwOnError: true, output: 'htmlAndMathml', trust: false, maxExpand: 1000 });
  if (memo.size >= MEMO_LIMIT) memo.clear();
  memo.set(key, html);
  return html;
}
