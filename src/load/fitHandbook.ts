/**
 * Read, validate and fit every correlation folder of a handbook: the one pass that both `correlary check` and the
 * Astro loader make. Every message from reading and fitting is collected; a folder that could not be read or
 * fitted is kept with `fitted` undefined so callers can say so.
 */
import path from 'node:path';
import { fitDataset, type DatasetFit } from './fitDataset.ts';
import { fitCacheKey, pruneFitCache, readCachedSummary, writeCachedFit, type FitCache } from './fitCache.ts';
import { cacheRecord } from './cacheRecord.ts';
import { createFitPool, poolSize } from './fitPool.ts';
import { readHandbook } from './readHandbook.ts';
import { sortDiagnostics, type Diagnostic } from './diagnostic.ts';
import type { DatasetResult, LoadedCorrelation } from './types.ts';
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
  /**
   * Milliseconds spent reading and validating, and fitting (for progress summaries and bench:build). `fittingMs` is
   * the whole fitting pass (cache keys and look-ups, fits, review trails, pruning); `refittingMs`, part of it, is the
   * time spent fitting what the cache did not hold (starting workers included).
   */
  readonly timing: { readonly readingMs: number; readonly fittingMs: number; readonly refittingMs: number };
  /** How many fits came from the fit cache, when one was given. */
  readonly cachedFits: number;
}

export interface FitHandbookOptions {
  /** Read unchanged fits from, and write new ones to, this cache (src/load/fitCache.ts). */
  readonly fitCache?: FitCache;
  /** Called after each folder is read and fitted: done of total (for progress output). */
  readonly onFitted?: (done: number, total: number) => void;
  /**
   * With a fit cache: fit what is not cached in worker threads when there are many (src/load/fitPool.ts); `root` is
   * the package root holding src/; `minimumJobs` (default POOL_MINIMUM_JOBS) the fewest datasets to fit that start
   * workers. Without it, or when no worker can start, everything is fitted in this thread.
   */
  readonly workers?: { readonly root: string; readonly minimumJobs?: number };
  /** With a fit cache: afterwards, delete the cache records of this cache that no folder of this handbook uses. */
  readonly prune?: boolean;
}

/** One folder's fit from the cache, or undefined when the cache does not hold its inputs. */
function fromCache(correlation: LoadedCorrelation, cache: FitCache): { key: string; fitted?: DatasetFit } {
  const key = fitCacheKey(correlation, cache.version);
  // Only the small summary: the per-point statistics and the order table are read when something asks for them.
  const hit = readCachedSummary(cache.directory, key);
  return { key, ...(hit === undefined ? {} : { fitted: { ...hit, cacheKey: key } }) };
}

/** Fit in this thread, writing the cache record when there is a cache. */
function fitHere(correlation: LoadedCorrelation, cache: FitCache | undefined, key: string | undefined): DatasetFit {
  const fitted = fitDataset(correlation);
  if (cache === undefined || key === undefined) return fitted;
  writeCachedFit(cache.directory, key, cacheRecord(correlation, fitted));
  return { ...fitted, cacheKey: key };
}

/** @example (await fitHandbook('content')).datasets.length // => 13 for the demo handbook */
export async function fitHandbook(directory: string, options: FitHandbookOptions = {}): Promise<FittedHandbook> {
  const started = performance.now();
  const handbook = await readHandbook(directory);
  const readingMs = performance.now() - started;
  const diagnostics: Diagnostic[] = [...handbook.diagnostics];
  const datasets: FittedDataset[] = [];
  const slugs = new Set(handbook.datasets.map((read) => read.slug));
  const total = handbook.datasets.length;
  let done = 0;
  const progress = () => options.onFitted?.(++done, total);
  // First what the cache holds, then the rest: in worker threads when there are many, else here.
  const cache = options.fitCache;
  const prepared = handbook.datasets.map((read) => {
    // Errors about the folder as a whole (an invalid or duplicate slug) belong to it too: such a folder is not fitted.
    const folderErrors = handbook.diagnostics.filter(
      (diagnostic) => diagnostic.severity === 'error' && (diagnostic.file === read.folder || diagnostic.file === read.metadataPath),
    );
    const dataset = folderErrors.length ? { ...read, diagnostics: [...read.diagnostics, ...folderErrors] } : read;
    const correlation = folderErrors.length ? undefined : dataset.correlation;
    const cached = correlation === undefined || cache === undefined ? undefined : fromCache(correlation, cache);
    if (cached?.fitted !== undefined) progress();
    return { read, dataset, correlation, key: cached?.key, fitted: cached?.fitted };
  });
  const cachedFits = prepared.filter((item) => item.fitted !== undefined).length;
  const missing = prepared.filter((item) => item.correlation !== undefined && item.fitted === undefined);
  const refitStarted = performance.now();
  const pool = cache !== undefined && options.workers !== undefined ? await createFitPool(options.workers.root, path.join(cache.directory, '..', 'correlary-worker'), poolSize(missing.length, options.workers.minimumJobs)) : undefined;
  try {
    await Promise.all(
      missing.map(async (item) => {
        const correlation = item.correlation!;
        let fitted: DatasetFit | undefined;
        if (pool !== undefined) {
          try {
            fitted = { ...(await pool.fit(correlation, cache!.directory, item.key!)), cacheKey: item.key! };
          } catch {
            fitted = undefined; // a worker that failed: fit here instead
          }
        }
        item.fitted = fitted ?? fitHere(correlation, cache, item.key);
        progress();
      }),
    );
  } finally {
    await pool?.close();
  }
  const refittingMs = performance.now() - refitStarted;
  for (const { read, dataset, correlation, fitted } of prepared) {
    diagnostics.push(...read.diagnostics);
    if (fitted) diagnostics.push(...fitted.diagnostics);
    const review = fitted === undefined || correlation === undefined ? undefined : reviewTrail(correlation, fitted.fit);
    if (review !== undefined && correlation !== undefined) diagnostics.push(...reviewDiagnostics(correlation, review, slugs));
    datasets.push({ dataset, fitted, review });
  }
  if (cache !== undefined && options.prune) pruneFitCache(cache.directory, new Set(prepared.flatMap((item) => (item.key === undefined ? [] : [item.key]))));
  const fittingMs = performance.now() - started - readingMs;
  return { datasets, diagnostics: sortDiagnostics(diagnostics), timing: { readingMs, fittingMs, refittingMs }, cachedFits };
}
