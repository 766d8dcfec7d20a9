/**
 * KaTeX markup of TeX that differs from TeX seen before only in its digits, without typesetting it again: a
 * handbook's equations repeat a few forms (symbols, signs, powers, ×10^k) with other coefficients, and typesetting
 * is most of the cost of a correlation's page parts.
 *
 * Why the markup can be filled in: in KaTeX's main font the ten digits have the same height, depth, italic
 * correction and skew (fontMetricsData, Main-Regular, code points 48–57), and a digit is an ordinary symbol
 * whatever its value, so typesetting another digit writes the same markup with that digit in its place, three times
 * (the TeX annotation, the MathML, the HTML). How many digits a run has does not matter either, outside constructs
 * whose width counts (wide accents, dimensions): adjacent digits are merged into one text (an `mn`, a `mord`); only
 * the last digit of a run can carry a script (as in 10^{-4}), so a run of two or more digits is typeset as two:
 * its head (all but the last digit) and its last digit. The markup of a form is found from two typesettings, with
 * every digit 0 and with every digit 1: where they differ are the digits' places.
 *
 * Only TeX made of letters, digits, spaces, + - = ( ) / ' . , _ ^ { } and the commands \, \times \ln and the Greek
 * letters is filled in (what equationTex writes for the symbols a handbook uses); anything else is typeset.
 * test/components/texHtml.test.ts compares the result with KaTeX's own on random equations.
 */

/** A form's markup: literal text between digit places, and for each place which part of which digit run. */
export interface DigitTemplate {
  readonly pieces: readonly string[];
  /** pieces[i] is followed by the run part slots[i] (none after the last piece). */
  readonly slots: readonly number[];
}

/** TeX with its digit runs replaced: `form` with 0 or 00 for each run, and the runs in order. */
export interface DigitForm {
  readonly form: string;
  readonly runs: readonly string[];
}

const GREEK = new Set(
  'alpha beta gamma delta epsilon varepsilon zeta eta theta vartheta iota kappa lambda mu nu xi pi varpi rho varrho sigma varsigma tau upsilon phi varphi chi psi omega Gamma Delta Theta Lambda Xi Pi Sigma Upsilon Phi Psi Omega'.split(' '),
);
const COMMANDS = new Set([...GREEK, 'times', 'ln']);
const PLAIN = /^[A-Za-z0-9 +\-=()/'.,_^{}]$/;

/**
 * The digit form of `tex`, or undefined when it holds anything besides what can be filled in.
 * @example digitForm('c_p = 12.5\\times10^{-3}') // => { form: 'c_p = 00.0\\times00^{-0}', runs: ['12', '5', '10', '3'] }
 */
export function digitForm(tex: string): DigitForm | undefined {
  let form = '';
  const runs: string[] = [];
  for (let i = 0; i < tex.length; ) {
    const char = tex[i]!;
    if (char >= '0' && char <= '9') {
      let end = i + 1;
      while (end < tex.length && tex[end]! >= '0' && tex[end]! <= '9') end++;
      runs.push(tex.slice(i, end));
      form += end - i === 1 ? '0' : '00';
      i = end;
    } else if (char === '\\') {
      // A command is a backslash and its letters, or a backslash and one other character (TeX's rule).
      let end = i + 1;
      while (end < tex.length && /[A-Za-z]/.test(tex[end]!)) end++;
      const name = end === i + 1 ? tex.slice(i + 1, i + 2) : tex.slice(i + 1, end);
      if (!(name === ',' || COMMANDS.has(name))) return undefined;
      form += `\\${name}`;
      i = end === i + 1 ? i + 2 : end;
    } else if (PLAIN.test(char)) {
      form += char;
      i++;
    } else {
      return undefined;
    }
  }
  return { form, runs };
}

/** The form with every digit `digit` (the runs' parts as typeset: one digit, or a head and a last digit). */
function filled(form: string, digit: string): string {
  return form.replace(/0/g, digit);
}

/**
 * The template of a form from its markup typeset with every digit 0 and with every digit 1, or undefined when the
 * two do not differ exactly at the digits' places, in order, three times (then the TeX is typeset each time).
 * @param typeset KaTeX with the handbook's options
 * @example digitTemplate('x = 0', (tex) => katex.renderToString(tex))?.slots // => [0, 0, 0]
 */
export function digitTemplate(form: string, typeset: (tex: string) => string): DigitTemplate | undefined {
  const zeros = typeset(form);
  const ones = typeset(filled(form, '1'));
  if (zeros.length !== ones.length) return undefined;
  // The parts in the order of the form: a run of one digit is one part, a longer run two (head, last digit).
  const parts: number[] = [];
  for (let i = 0; i < form.length; i++) {
    if (form[i] !== '0') continue;
    if (form[i + 1] === '0') {
      parts.push(parts.length, parts.length + 1);
      i++;
    } else {
      parts.push(parts.length);
    }
  }
  const pieces: string[] = [];
  const slots: number[] = [];
  let start = 0;
  for (let i = 0; i < zeros.length; i++) {
    if (zeros[i] === ones[i]) continue;
    if (zeros[i] !== '0' || ones[i] !== '1') return undefined;
    pieces.push(zeros.slice(start, i));
    slots.push(parts[slots.length % parts.length]!);
    start = i + 1;
  }
  pieces.push(zeros.slice(start));
  return slots.length === 3 * parts.length ? { pieces, slots } : undefined;
}

/**
 * The markup of the TeX whose digit form made `template`, from its digit runs.
 * @example fillDigits(template, ['12', '5']) // => the markup with 1 2 and 5 in the digits' places
 */
export function fillDigits(template: DigitTemplate, runs: readonly string[]): string {
  const parts: string[] = [];
  for (const run of runs) {
    if (run.length === 1) parts.push(run);
    else parts.push(run.slice(0, -1), run.slice(-1));
  }
  let out = template.pieces[0]!;
  for (let i = 0; i < template.slots.length; i++) out += parts[template.slots[i]!]! + template.pieces[i + 1]!;
  return out;
}
