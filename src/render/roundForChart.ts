/**
 * Round a number for drawing: `digits` significant digits, shortest text, non-finite values become null.
 * Six digits keep every plotted feature below a thousandth of a pixel on a 760-pixel chart while cutting the
 * JSON to a third of 17-digit text.
 *
 * The result is the double nearest to the decimal that `value.toPrecision(digits)` writes, i.e.
 * `Number(value.toPrecision(digits))`; that text round trip is the definition, and the slow path. Most values take
 * a fast path with the same result: with m = |value| · 10^k scaled to [10^(digits−1), 10^digits), k an exponent
 * whose power of ten is exact (|k| ≤ 22), the product or quotient m is within half a unit in its last place of the
 * exact scaled value (one correctly rounded operation, m < 10^8, so within 10^−8), so Math.round(m) is the integer
 * toPrecision rounds to unless m is within 10^−7 of a half (then the slow path decides); that integer times or
 * over the exact power of ten is again one correctly rounded operation, which is what reading the decimal gives.
 * test/render/roundForChart.test.ts compares both on random values, halves and powers of ten.
 * @example roundForChart(0.123456789) // => 0.123457; roundForChart(NaN) // => null
 */
export function roundForChart(value: number, digits = 6): number | null {
  if (!Number.isFinite(value)) return null;
  const fast = scaledRound(value, digits);
  return fast ?? Number(value.toPrecision(digits));
}

/** Exact powers of ten as doubles: 10^0 … 10^22. */
const POWERS = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/** Number(value.toPrecision(digits)) by arithmetic, or undefined when the slow path must decide. */
function scaledRound(value: number, digits: number): number | undefined {
  if (value === 0) return 0; // toPrecision writes "0" for −0 too
  if (!(digits >= 1 && digits <= 8) || !Number.isInteger(digits)) return undefined;
  const magnitude = Math.abs(value);
  const low = POWERS[digits - 1]!;
  const high = POWERS[digits]!;
  // k: the exponent that brings |value| into [10^(digits−1), 10^digits); log10 may be one off near a power of ten.
  let k = digits - 1 - Math.floor(Math.log10(magnitude));
  let m = scaled(magnitude, k);
  if (m !== undefined && m < low) m = scaled(magnitude, ++k);
  else if (m !== undefined && m >= high) m = scaled(magnitude, --k);
  if (m === undefined || m < low || m >= high) return undefined;
  const fraction = m - Math.floor(m);
  if (Math.abs(fraction - 0.5) < 1e-7) return undefined;
  const n = Math.round(m);
  const rounded = k >= 0 ? n / POWERS[k]! : n * POWERS[-k]!;
  return value < 0 ? -rounded : rounded;
}

/** |value| · 10^k with one rounding, or undefined when 10^|k| is not an exact double. */
function scaled(magnitude: number, k: number): number | undefined {
  if (k > 22 || k < -22) return undefined;
  return k >= 0 ? magnitude * POWERS[k]! : magnitude / POWERS[-k]!;
}
