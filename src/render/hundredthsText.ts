/**
 * A coordinate rounded to hundredths as text: the same text as `String(Math.round(value * 100) / 100)` (how the
 * charts and d3-path with digits(2) write coordinates), written from the integer number of hundredths rather than
 * by converting a double to its shortest text, which costs several times more and is done thousands of times per
 * chart.
 *
 * Why it is the same text: with k = Math.round(value · 100) and |k| < 10^15, doubles near k/100 are less than 0.002
 * apart, so no other decimal of at most as many digits (any such differs from k/100 by 0.01 or more) reads back as
 * the double nearest to k/100, and its shortest round-trip text (ECMA-262 Number::toString) is k/100 itself,
 * without trailing zeros and, at these sizes, without an exponent. Larger and non-finite values take the String path; −0 is written "0", as String does.
 * test/render/hundredthsText.test.ts compares both on random values.
 * @example hundredthsText(12.3456) // => "12.35"; hundredthsText(-0.004) // => "0"
 */
export function hundredthsText(value: number): string {
  const k = Math.round(value * 100);
  if (!(k > -1e15 && k < 1e15)) return String(k / 100);
  const magnitude = k < 0 ? -k : k;
  const rest = magnitude % 100;
  const whole = (magnitude - rest) / 100;
  const sign = k < 0 ? '-' : '';
  if (rest === 0) return `${sign}${whole}`;
  if (rest % 10 === 0) return `${sign}${whole}.${rest / 10}`;
  return `${sign}${whole}.${rest < 10 ? '0' : ''}${rest}`;
}
