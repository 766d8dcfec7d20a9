/**
 * Reading a fit back for the pages: the site's content store keeps only a reference to the fit cache
 * (src/load/fitCache.ts), and pages ask for the fit, its order table, the previews of the other orders and the
 * data rows through this. Two kinds of read:
 * - the summary (the fit without its per-point statistics, and the order selection), which a correlation page, the
 *   lists and the exports need: read once and kept in memory for the whole build, up to KEEP_BYTES of JSON text
 *   (then the oldest are dropped and read again when asked for), because Astro renders every correlation page
 *   before the lists and exports that ask for the same summaries again;
 * - the full record (per-point statistics, data rows, previews), which only the writing of a correlation's
 *   downloads and page parts needs: each of its functions asks in turn for the same correlation's record, so the
 *   last few records read are kept (RECENT_RECORDS), not every record of the handbook.
 */
import type { OrderSelection, PolynomialFit } from '../core/index.ts';
import type { OrderPreviews } from '../render/orderPreviews.ts';
import type { DataPoint } from '../schema/index.ts';
import { readCachedRecord, readCachedSummary, type CachedFit } from './fitCache.ts';
import type { DatasetFit } from './fitDataset.ts';

/** What the store keeps instead of the fit: where it is cached. */
export interface StoredFitReference {
  readonly fitCache: { readonly directory: string; readonly key: string };
}

const summaries = new Map<string, { summary: DatasetFit; size: number }>();
let summaryBytes = 0;
/** About 2–3 times this in memory once parsed. */
const KEEP_BYTES = 192 * 1024 * 1024;
/** What a summary is counted as: its text is about 15 KB (median of the N = 1000 bench handbook), larger ones are rare. */
const SUMMARY_BYTES = 16 * 1024;

const records = new Map<string, CachedFit>();
/** Full records kept: the one being written and a few before it. */
const RECENT_RECORDS = 4;

/** Is this stored value a reference rather than the fit itself? */
export function isStoredFitReference(value: unknown): value is StoredFitReference {
  return typeof value === 'object' && value !== null && 'fitCache' in value;
}

function missing(what: string, key: string, directory: string): Error {
  return new Error(`${what} requires the cached fit ${key} in ${directory}; it is missing (was the cache folder removed during the build?)`);
}

function record(reference: StoredFitReference): CachedFit {
  const { directory, key } = reference.fitCache;
  const known = records.get(key);
  if (known !== undefined) return known;
  const read = readCachedRecord(directory, key);
  if (read === undefined) throw missing('storedFit', key, directory);
  if (records.size >= RECENT_RECORDS) records.delete(records.keys().next().value!);
  records.set(key, read.record);
  return read.record;
}

function summary(reference: StoredFitReference): DatasetFit {
  const { directory, key } = reference.fitCache;
  const recent = records.get(key);
  if (recent !== undefined) return recent;
  const known = summaries.get(key);
  if (known !== undefined) return known.summary;
  const read = readCachedSummary(directory, key);
  if (read === undefined) throw missing('storedFitSummary', key, directory);
  const size = SUMMARY_BYTES;
  while (summaryBytes + size > KEEP_BYTES && summaries.size > 0) {
    const [oldest, value] = summaries.entries().next().value!;
    summaries.delete(oldest);
    summaryBytes -= value.size;
  }
  summaries.set(key, { summary: read, size });
  summaryBytes += size;
  return read;
}

/**
 * Drop every record and summary kept in memory (a worker that has finished with a correlation calls it, so that
 * its memory does not grow with the handbook). @example forgetStoredFits()
 */
export function forgetStoredFits(): void {
  summaries.clear();
  summaryBytes = 0;
  records.clear();
}

/** The fit behind a stored reference, with its per-point statistics. @example storedFit(entry.fit).order // => 2 */
export function storedFit(reference: StoredFitReference): PolynomialFit | undefined {
  return record(reference).fit;
}

/**
 * The fit behind a stored reference for the pages, lists and exports, which do not need its per-point statistics:
 * from the summary file (readCachedSummary: about a third of the record's text; `points` would be read from the
 * record only if asked for), kept for the build, or from a full record read just before.
 * @example storedFitSummary(entry.fit)?.statistics.n // => 22
 */
export function storedFitSummary(reference: StoredFitReference): PolynomialFit | undefined {
  return summary(reference).fit;
}

/** The order selection behind a stored reference, with its order table (from the summary). */
export function storedSelection(reference: StoredFitReference): OrderSelection | undefined {
  return summary(reference).selection;
}

/** Every data row behind a stored reference, in file order. */
export function storedPoints(reference: StoredFitReference): readonly DataPoint[] {
  return record(reference).points;
}

/** The previews of the orders not published, behind a stored reference (null when there are none). */
export function storedPreviews(reference: StoredFitReference): OrderPreviews | null {
  return record(reference).previews ?? null;
}
