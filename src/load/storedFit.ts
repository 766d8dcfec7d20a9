/**
 * Reading a fit back for the pages: the site's content store keeps only a reference to the fit cache
 * (src/load/fitCache.ts), and pages ask for the fit, its order table, the previews of the other orders and the
 * data rows through this. Astro renders each route for every correlation before the next route, so a record is
 * asked for by a dozen routes far apart: records read are kept in memory for the whole build, up to KEEP_BYTES of
 * their JSON text (then the oldest are dropped and read again when asked for).
 */
import type { OrderSelection, PolynomialFit } from '../core/index.ts';
import type { OrderPreviews } from '../render/orderPreviews.ts';
import type { DataPoint } from '../schema/index.ts';
import { readCachedRecord, readCachedSummary, type CachedFit } from './fitCache.ts';

/** What the store keeps instead of the fit: where it is cached. */
export interface StoredFitReference {
  readonly fitCache: { readonly directory: string; readonly key: string };
}

const kept = new Map<string, { record: CachedFit; size: number }>();
let keptBytes = 0;
/** About 2–3 times this in memory once parsed: a few hundred MB at most, whatever the handbook's size. */
const KEEP_BYTES = 192 * 1024 * 1024;

/** Is this stored value a reference rather than the fit itself? */
export function isStoredFitReference(value: unknown): value is StoredFitReference {
  return typeof value === 'object' && value !== null && 'fitCache' in value;
}

function load(reference: StoredFitReference): CachedFit {
  const { directory, key } = reference.fitCache;
  const known = kept.get(key);
  if (known !== undefined) return known.record;
  const read = readCachedRecord(directory, key);
  if (read === undefined) throw new Error(`storedFit requires the cached fit ${key} in ${directory}; it is missing (was the cache folder removed during the build?)`);
  while (keptBytes + read.size > KEEP_BYTES && kept.size > 0) {
    const [oldest, value] = kept.entries().next().value!;
    kept.delete(oldest);
    keptBytes -= value.size;
  }
  kept.set(key, read);
  keptBytes += read.size;
  return read.record;
}

/**
 * Drop every record kept in memory (a worker that has finished with a correlation calls it, so that its memory
 * does not grow with the handbook). @example forgetStoredFits()
 */
export function forgetStoredFits(): void {
  kept.clear();
  keptBytes = 0;
}

/** The fit behind a stored reference. @example storedFit(entry.fit).order // => 2 */
export function storedFit(reference: StoredFitReference): PolynomialFit | undefined {
  return load(reference).fit;
}

/**
 * The fit behind a stored reference for lists and overlays, which need neither its per-point statistics nor the
 * other parts of the record: the kept record's fit when it is in memory, else read from the small summary file
 * (readCachedSummary: a fifth of the record's text; `points` would be read from the record only if asked for).
 * Not kept: a list reads each once. At N = 5000, where the records no longer all stay in memory, the catalogue
 * and property pages thus do not read every record again.
 * @example storedFitSummary(entry.fit)?.statistics.n // => 22
 */
export function storedFitSummary(reference: StoredFitReference): PolynomialFit | undefined {
  const { directory, key } = reference.fitCache;
  const known = kept.get(key);
  if (known !== undefined) return known.record.fit;
  const summary = readCachedSummary(directory, key);
  if (summary === undefined) throw new Error(`storedFitSummary requires the cached fit ${key} in ${directory}; it is missing (was the cache folder removed during the build?)`);
  return summary.fit;
}

/** The order selection behind a stored reference. */
export function storedSelection(reference: StoredFitReference): OrderSelection | undefined {
  return load(reference).selection;
}

/** Every data row behind a stored reference, in file order. */
export function storedPoints(reference: StoredFitReference): readonly DataPoint[] {
  return load(reference).points;
}

/** The previews of the orders not published, behind a stored reference (null when there are none). */
export function storedPreviews(reference: StoredFitReference): OrderPreviews | null {
  return load(reference).previews ?? null;
}
