/**
 * Coefficient text with a given number of significant digits, in plain scientific notation that any
 * programming language reads back (e.g. "-1.4674896142298e+3"). Values of moderate size are printed without
 * an exponent. Trailing zeros of the mantissa are dropped: they do not change the value, which is what matters
 * when the digit count comes from significantDigits. @example formatCoefficient(-1467.48961422980, 8) // => "-1467.4896"
 */
export function formatCoefficient(value: number, digits: number): string {
  if (value === 0) return '0';
  if (!Number.isFinite(value)) return String(value);
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const trim = (text: string) => text.replace(/(\.\d*?)0+(e|$)/, '$1$2').replace(/\.(e|$)/, '$1');
  if (exponent >= -3 && exponent < 6) {
    const text = value.toPrecision(digits);
    return trim(text.includes('e') ? value.toExponential(digits - 1) : text);
  }
  return trim(value.toExponential(digits - 1));
}
