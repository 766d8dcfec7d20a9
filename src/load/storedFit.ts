/**
 * Reading a fit back for the pages: the site's content store keeps only a reference to the fit cache
 * (src/load/fitCache.ts), and pages ask for the fit, its order table, the previews of the other orders and the
 * data rows through this. The last few are kept in memory, since one page reads the same record several times.
 */
import type { OrderSelection, PolynomialFit } from '../core/index.ts';
import type { OrderPreviews } from '../render/orderPreviews.ts';
import type { DataPoint } from '../schema/index.ts';
import { readCachedFit, type CachedFit } from './fitCache.ts';

/** What the store keeps instead of the fit: where it is cached. */
export interface StoredFitReference {
  readonly fitCache: { readonly directory: string; readonly key: string };
}

const recent = new Map<string, CachedFit>();
const KEEP = 32;

/** Is this stored value a reference rather than the fit itself? */
export function isStoredFitReference(value: unknown): value is StoredFitReference {
  return typeof value === 'object' && value !== null && 'fitCache' in value;
}

function load(reference: StoredFitReference): CachedFit {
  const { directory, key } = reference.fitCache;
  const kept = recent.get(key);
  if (kept !== undefined) return kept;
  const fitted = readCachedFit(directory, key);
  if (fitted === undefined) throw new Error(`storedFit requires the cached fit ${key} in ${directory}; it is missing (was the cache folder removed during the build?)`);
  if (recent.size >= KEEP) recent.delete(recent.keys().next().value!);
  recent.set(key, fitted);
  return fitted;
}

/** The fit behind a stored reference. @example storedFit(entry.fit).order // => 2 */
export function storedFit(reference: StoredFitReference): PolynomialFit | undefined {
  return load(reference).fit;
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
