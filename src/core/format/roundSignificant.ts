/** Round to `digits` significant digits through the decimal string, so the result is the printed value. @example roundSignificant(123.456, 4) // => 123.5 */
export function roundSignificant(value: number, digits: number): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  return Number(value.toPrecision(Math.max(1, Math.min(100, digits))));
}
