/**
 * Number text for the pages: the core's one set of rules (src/core/format/formatNumber.ts), re-exported here so
 * components keep one import, plus the text of a data value as written in the data file.
 * @example formatNumber(0.991113, 4) // => "0.9911"
 * @example formatNumber(null) // => "—"
 */
import { MISSING } from '../../core/index.ts';

export { formatNumber, formatP, formatRSquared, formatInterval, MISSING } from '../../core/index.ts';

/** A data value as written in the data file (shortest round-trip text). */
export function formatExact(value: number | null | undefined): string {
  if (value === null || value === undefined || Number.isNaN(value)) return MISSING;
  return String(value);
}
