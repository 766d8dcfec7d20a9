/**
 * Read, validate and fit every correlation folder of a handbook: the one pass that both `correlary check` and the
 * Astro loader make. Every message from reading and fitting is collected; a folder that could not be read or
 * fitted is kept with `fitted` undefined so callers can say so.
 */
import { fitDataset, type DatasetFit } from './fitDataset.ts';
import { fitCacheKey, readCachedFit, writeCachedFit, type CachedFit, type FitCache } from './fitCache.ts';
import { orderPreviews } from '../render/orderPreviews.ts';
import { readHandbook } from './readHandbook.ts';
import { sortDiagnostics, type Diagnostic } from './diagnostic.ts';
import type { DatasetResult } from './types.ts';
import { reviewDiagnostics, reviewTrail, type ReviewTrail } from './review/reviewTrail.ts';

export interface FittedDataset {
  readonly dataset: DatasetResult;
  /** The fit, when the folder was read without errors (the fit itself may still have failed). */
  readonly fitted: DatasetFit | undefined;
  /** Fingerprint and approval state, when the folder was read without errors. */
  readonly review: ReviewTrail | undefined;
}

export interface FittedHandbook {
  readonly datasets: readonly FittedDataset[];
  /** Every error and warning, in file and line order. */
  readonly diagnostics: readonly Diagnostic[];
  /** Milliseconds spent reading and validating, and fitting (for progress summaries and bench:build). */
  readonly timing: { readonly readingMs: number; readonly fittingMs: number };
  /** How many fits came from the fit cache, when one was given. */
  readonly cachedFits: number;
}

export interface FitHandbookOptions {
  /** Read unchanged fits from, and write new ones to, this cache (src/load/fitCache.ts). */
  readonly fitCache?: FitCache;
  /** Called after each folder is read and fitted: done of total (for progress output). */
  readonly onFitted?: (done: number, total: number) => void;
}

/**
 * A folder's cache record: the fit, the previews of the orders not published (computed here once, not on every
 * page render) and every data row.
 */
export function cacheRecord(correlation: Parameters<typeof fitDataset>[0], fitted: DatasetFit): CachedFit {
  const previews = fitted.fit === undefined ? null : orderPreviews({ settings: correlation.meta.fit, used: correlation.used, range: correlation.range }, fitted.fit, fitted.selection);
  return { fit: fitted.fit, selection: fitted.selection, diagnostics: fitted.diagnostics, points: correlation.points, previews };
}

/** One folder's fit, from the cache when it holds the same inputs, else fitted (and then cached with its previews). */
function fitWithCache(correlation: Parameters<typeof fitDataset>[0], cache: FitCache | undefined): { fitted: DatasetFit; cached: boolean } {
  if (cache === undefined) return { fitted: fitDataset(correlation), cached: false };
  const key = fitCacheKey(correlation, cache.version);
  const hit = readCachedFit(cache.directory, key);
  if (hit !== undefined) return { fitted: { fit: hit.fit, selection: hit.selection, diagnostics: hit.diagnostics, cacheKey: key }, cached: true };
  const fitted = fitDataset(correlation);
  writeCachedFit(cache.directory, key, cacheRecord(correlation, fitted));
  return { fitted: { ...fitted, cacheKey: key }, cached: false };
}

/** @example (await fitHandbook('content')).datasets.length // => 13 for the demo handbook */
export async function fitHandbook(directory: string, options: FitHandbookOptions = {}): Promise<FittedHandbook> {
  const started = performance.now();
  const handbook = await readHandbook(directory);
  const readingMs = performance.now() - started;
  const diagnostics: Diagnostic[] = [...handbook.diagnostics];
  const datasets: FittedDataset[] = [];
  const slugs = new Set(handbook.datasets.map((read) => read.slug));
  let cachedFits = 0;
  for (const read of handbook.datasets) {
    diagnostics.push(...read.diagnostics);
    // Errors about the folder as a whole (an invalid or duplicate slug) belong to it too: such a folder is not fitted.
    const folderErrors = handbook.diagnostics.filter(
      (diagnostic) => diagnostic.severity === 'error' && (diagnostic.file === read.folder || diagnostic.file === read.metadataPath),
    );
    const dataset = folderErrors.length ? { ...read, diagnostics: [...read.diagnostics, ...folderErrors] } : read;
    const outcome = dataset.correlation === undefined || folderErrors.length ? undefined : fitWithCache(dataset.correlation, options.fitCache);
    if (outcome?.cached) cachedFits++;
    const fitted = outcome?.fitted;
    if (fitted) diagnostics.push(...fitted.diagnostics);
    const review = fitted === undefined || dataset.correlation === undefined ? undefined : reviewTrail(dataset.correlation, fitted.fit);
    if (review !== undefined && dataset.correlation !== undefined) diagnostics.push(...reviewDiagnostics(dataset.correlation, review, slugs));
    datasets.push({ dataset, fitted, review });
    options.onFitted?.(datasets.length, handbook.datasets.length);
  }
  const fittingMs = performance.now() - started - readingMs;
  return { datasets, diagnostics: sortDiagnostics(diagnostics), timing: { readingMs, fittingMs }, cachedFits };
}
