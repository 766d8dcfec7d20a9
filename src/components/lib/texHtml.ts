/**
 * KaTeX markup of a TeX string, rendered at build time with the handbook's options (trust off, so \href, \url,
 * \includegraphics and \html* make no links, images or attributes out of content; output HTML plus MathML) and
 * remembered by TeX string: a handbook's symbols and table forms repeat on every page (a thousand pages typeset
 * the same dozen symbols thirteen thousand times), and renderToString is a pure function of the string and the
 * options, so a remembered result is the same bytes. At most MEMO_LIMIT strings are kept (then the memo starts
 * again), so a handbook of many distinct equations does not grow it without bound. An equation that differs from
 * ones typeset before only in its digits is filled into their markup instead (digitTemplate.ts: the same bytes).
 */
import katex from 'katex';
import { digitForm, digitTemplate, fillDigits, type DigitTemplate } from './digitTemplate.ts';

const MEMO_LIMIT = 4096;
const memo = new Map<string, string>();
/**
 * Digit forms typeset before (digitTemplate.ts): `seen` when typeset once (a form met only once is typeset only
 * once), its template from the second time, `no` when it has none. At most MEMO_LIMIT, as the memo.
 */
const forms = new Map<string, DigitTemplate | 'seen' | 'no'>();

function typeset(tex: string, display: boolean): string {
  return katex.renderToString(tex, { displayMode: display, throwOnError: true, output: 'htmlAndMathml', trust: false, maxExpand: 1000 });
}

/** The markup of `tex`: filled into its digit form's template when there is one, else typeset. */
function markup(tex: string, display: boolean): string {
  const digits = digitForm(tex);
  if (digits === undefined || digits.runs.length === 0) return typeset(tex, display);
  const key = `${display ? 'd' : 'i'}${digits.form}`;
  let known = forms.get(key);
  if (known === 'seen') {
    known = digitTemplate(digits.form, (form) => typeset(form, display)) ?? 'no';
    forms.set(key, known);
  }
  if (known !== undefined && known !== 'no') return fillDigits(known, digits.runs);
  // Typeset first: TeX that does not parse throws here, naming itself, and its form is not remembered.
  const html = typeset(tex, display);
  if (known === undefined) {
    if (forms.size >= MEMO_LIMIT) forms.clear();
    forms.set(key, 'seen');
  }
  return html;
}

/**
 * @param display display style (a block equation) rather than inline
 * @throws katex.ParseError when the TeX does not parse (throwOnError: the build stops and names the expression)
 * @example texHtml('T').startsWith('<span class="katex">') // => true
 */
export function texHtml(tex: string, display = false): string {
  const key = `${display ? 'd' : 'i'}${tex}`;
  const known = memo.get(key);
  if (known !== undefined) return known;
  const html = markup(tex, display);
  if (memo.size >= MEMO_LIMIT) memo.clear();
  memo.set(key, html);
  return html;
}
