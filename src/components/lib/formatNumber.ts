/**
 * Number text for the pages. Missing statistics (null, undefined, NaN) print as an em dash, so a table never
 * shows "NaN" or "null"; finite values use the core's coefficient format (plain decimals or "1.23e-4", which any
 * language reads back).
 * @example formatNumber(0.991113, 4) // => "0.9911"
 * @example formatNumber(null) // => "—"
 */
import { formatCoefficient } from '../../core/index.ts';

export const MISSING = '—';

export function formatNumber(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || Number.isNaN(value)) return MISSING;
  if (value === Infinity) return '∞';
  if (value === -Infinity) return '−∞';
  return formatCoefficient(value, digits);
}

/** A p-value: three significant digits, and "< 1e-6" below that (the tail is not meaningful further out). */
export function formatP(value: number | null | undefined): string {
  if (value === null || value === undefined || Number.isNaN(value)) return MISSING;
  return value < 1e-6 ? '< 1e-6' : formatCoefficient(value, 3);
}

/** A data value as written in the data file (shortest round-trip text). */
export function formatExact(value: number | null | undefined): string {
  if (value === null || value === undefined || Number.isNaN(value)) return MISSING;
  return String(value);
}
