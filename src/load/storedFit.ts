/**
 * Reading a fit back for the pages: the site's content store keeps only a reference to the fit cache
 * (src/load/fitCache.ts), and pages ask for the fit and its order table through this. The last few are kept in
 * memory, since one correlation's page and downloads are rendered from the same fit.
 */
import type { OrderSelection, PolynomialFit } from '../core/index.ts';
import { readCachedFit } from './fitCache.ts';
import type { DatasetFit } from './fitDataset.ts';

/** What the store keeps instead of the fit: where it is cached. */
export interface StoredFitReference {
  readonly fitCache: { readonly directory: string; readonly key: string };
}

const recent = new Map<string, DatasetFit>();
const KEEP = 32;

/** Is this stored value a reference rather than the fit itself? */
export function isStoredFitReference(value: unknown): value is StoredFitReference {
  return typeof value === 'object' && value !== null && 'fitCache' in value;
}

function load(reference: StoredFitReference): DatasetFit {
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
