/**
 * Read, validate and fit every correlation folder of a handbook: the one pass that both `correlary check` and the
 * Astro loader make. Every message from reading and fitting is collected; a folder that could not be read or
 * fitted is kept with `fitted` undefined so callers can say so.
 */
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fitDataset, type DatasetFit } from './fitDataset.ts';
import { fitCacheKey, hasCachedFit, pruneFitCache, readCachedSummary, writeCachedFit, type FitCache } from './fitCache.ts';
import { folderRecordKey, pruneFolderRecords, readFolderRecord, writeFolderRecord, type FitFacts } from './folderRecord.ts';
import { cacheRecord } from './cacheRecord.ts';
import { createFitPool, POOL_MINIMUM_JOBS, poolSize, type FitPool } from './fitPool.ts';
import { readHandbook } from './readHandbook.ts';
import { sortDiagnostics, type Diagnostic } from './diagnostic.ts';
import type { FolderRead } from './readDataset.ts';
import type { DatasetResult, LoadedCorrelation } from './types.ts';
import { SLUG_PATTERN } from '../schema/index.ts';
import { reviewDiagnostics, reviewTrail, type ReviewTrail } from './review/reviewTrail.ts';
import { approvalState } from './review/approvalState.ts';

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
   * Milliseconds spent reading and validating, and fitting (for progress summaries and bench:build); they add up to
   * the pass's wall time. `fittingMs` is the fitting pass (cache keys and look-ups, fits, review trails, pruning)
   * less the fits that worker threads completed while folders were still being read (see fitHandbook);
   * `refittingMs` is the wall time from the start of fitting what the cache did not hold (starting workers
   * included) until the last of those fits, reading it overlapped included.
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
  /**
   * Keep a record of each folder's reading and fitting in this folder, under this version of the reading code
   * (readingCodeVersion), and take an unchanged folder from its record rather than parsing, validating and looking
   * its fit up again (src/load/folderRecord.ts). Used only with a fit cache.
   */
  readonly folderRecords?: { readonly directory: string; readonly version: string };
  /** With a fit cache: afterwards, delete the cache records (and folder records) that no folder of this handbook uses. */
  readonly prune?: boolean;
}

/**
 * Start the fitting workers before any folder is read? Yes when there are enough folders for workers and the fit
 * cache holds fewer records than that: a cold build, where (nearly) every folder will need fitting. The workers then
 * load their code while the first folders are read (a cold build of 1000 correlations: they started about half a
 * second after reading did, once 40 folders were waiting). Otherwise (a rebuild, where most folders are unchanged)
 * they start only once `minimumJobs` folders are found to need fitting, if ever.
 * @param cachedRecords how many files the fit cache folder holds
 * @example startWorkersEarly(1000, 0, 40) // => true
 * @example startWorkersEarly(1000, 1000, 40) // => false
 */
export function startWorkersEarly(folders: number, cachedRecords: number, minimumJobs: number): boolean {
  return folders >= minimumJobs && cachedRecords < minimumJobs;
}

function filesIn(directory: string): number {
  try {
    return readdirSync(directory).length;
  } catch {
    return 0;
  }
}

/** One folder's fit from the cache, or undefined when the cache does not hold its inputs. */
function fromCache(correlation: LoadedCorrelation, cache: FitCache): { key: string; fitted?: DatasetFit } {
  const key = fitCacheKey(correlation, cache.version);
  // Only the small summary: the per-point statistics and the order table are read when something asks for them.
  const hit = readCachedSummary(cache.directory, key);
  return { key, ...(hit === undefined ? {} : { fitted: { ...hit, cacheKey: key } }) };
}

/**
 * An unchanged folder's fit from its folder record: the messages and whether there is a fit are known; the fit and
 * the order selection are read from the fit cache's summary only when something asks for them.
 */
function recordedFit(directory: string, facts: FitFacts): DatasetFit {
  let summary: DatasetFit | undefined;
  const read = (): DatasetFit => {
    summary ??= readCachedSummary(directory, facts.key);
    if (summary === undefined) throw new Error(`fitHandbook requires the cached fit ${facts.key} in ${directory}; it is missing (was the cache folder removed during the build?)`);
    return summary;
  };
  const fitted = { diagnostics: facts.diagnostics, cacheKey: facts.key, outcome: { fit: facts.fit, selection: facts.selection } };
  return Object.defineProperties(fitted, {
    fit: { enumerable: true, get: () => (facts.fit ? read().fit : undefined) },
    selection: { enumerable: true, get: () => (facts.selection ? read().selection : undefined) },
  }) as DatasetFit;
}

/**
 * Write a folder's record when it was read from its files (or its record lacked the fit facts it now has): the
 * result of reading it and, when it was fitted and its review trail made, what fitting it gave.
 */
function recordFolder(directory: string, item: Item, version: string, fitted: DatasetFit | undefined, review: ReviewTrail | undefined): void {
  const sources = item.folderRead?.sources;
  if (sources === undefined || item.recordKey === undefined || item.facts !== undefined) return;
  const facts: FitFacts | undefined =
    fitted === undefined || review === undefined || item.key === undefined
      ? undefined
      : { version, key: item.key, diagnostics: fitted.diagnostics, fit: fitted.fit !== undefined, selection: fitted.selection !== undefined, fingerprint: review.fingerprint };
  if (item.folderRead!.reused && facts === undefined) return; // the record holds nothing more
  try {
    writeFolderRecord(directory, item.recordKey, { ...sources, result: item.read, ...(facts === undefined ? {} : { fit: facts }) });
  } catch {
    // a read-only cache: the next build reads the folder afresh
  }
}

/** Fit in this thread, writing the cache record when there is a cache. */
function fitHere(correlation: LoadedCorrelation, cache: FitCache | undefined, key: string | undefined): DatasetFit {
  const fitted = fitDataset(correlation);
  if (cache === undefined || key === undefined) return fitted;
  writeCachedFit(cache.directory, key, cacheRecord(correlation, fitted));
  return { ...fitted, cacheKey: key };
}

interface Item {
  readonly read: DatasetResult;
  /** The folder's correlation when it was read without errors of its own (folder-wide errors come later). */
  readonly correlation: LoadedCorrelation | undefined;
  readonly key: string | undefined;
  /** Read from the fit cache rather than fitted. */
  readonly cached: boolean;
  /** How the folder was read, and its record's key, when folder records are kept. */
  readonly folderRead: FolderRead | undefined;
  readonly recordKey: string | undefined;
  /** The folder record's fit facts, when they stood for the fit (an unchanged folder). */
  readonly facts: FitFacts | undefined;
  fitted: DatasetFit | undefined;
  /** The fit under way in a worker (or here, when no worker could start). */
  work?: Promise<void>;
}

/**
 * Read, validate and fit every folder. Fitting starts while the other folders are still being read: each folder is
 * looked up in the cache as soon as it is read, and once POOL_MINIMUM_JOBS (or `workers.minimumJobs`) folders need
 * fitting, worker threads start and fit them while reading goes on (on a cold cache with that many folders, before
 * the first folder is read: startWorkersEarly); fewer are fitted here after reading. Which
 * thread fits a dataset never changes its fit (the same code runs), so the result does not depend on timing.
 *
 * Timing: `readingMs` and `fittingMs` add up to the pass's wall time. The time this thread spends on the fitting
 * pass while folders are still being read (cache keys, look-ups, starting workers) counts as fitting; fits that
 * worker threads complete meanwhile are hidden behind reading and count in neither, so `fittingMs` is the fitting
 * that reading could not hide.
 * @example (await fitHandbook('content')).datasets.length // => 13 for the demo handbook
 */
export async function fitHandbook(directory: string, options: FitHandbookOptions = {}): Promise<FittedHandbook> {
  const started = performance.now();
  const cache = options.fitCache;
  const workers = options.workers;
  const minimumJobs = workers?.minimumJobs ?? POOL_MINIMUM_JOBS;
  const items = new Map<string, Item>();
  let total = 0;
  let done = 0;
  const progress = () => options.onFitted?.(++done, total);
  let fittingWhileReading = 0;
  let refitStarted: number | undefined;
  let pool: Promise<FitPool | undefined> | undefined;
  const waiting: Item[] = [];
  const records = cache === undefined ? undefined : options.folderRecords;
  const recordKeys = new Map<string, string>();
  const known =
    records === undefined
      ? undefined
      : (folder: string) => {
          const key = folderRecordKey(records.version, folder);
          recordKeys.set(folder, key);
          const record = readFolderRecord(records.directory, key);
          if (record?.fit !== undefined) recordedFacts.set(folder, record.fit);
          return record;
        };
  const recordedFacts = new Map<string, FitFacts>();
  const fitInPool = (item: Item) => {
    item.work = pool!.then(async (ready) => {
      let fitted: DatasetFit | undefined;
      if (ready !== undefined) {
        try {
          fitted = { ...(await ready.fit(item.correlation!, cache!.directory, item.key!)), cacheKey: item.key! };
        } catch {
          fitted = undefined; // a worker that failed: fit here instead
        }
      }
      item.fitted = fitted ?? fitHere(item.correlation!, cache, item.key);
      progress();
    });
  };
  const startPool = (jobs: number) => {
    refitStarted = performance.now();
    pool = createFitPool(workers!.root, path.join(cache!.directory, '..', 'correlary-worker'), poolSize(jobs, minimumJobs)).catch(() => undefined);
  };
  const onFolders = (folders: number) => {
    if (cache !== undefined && workers !== undefined && startWorkersEarly(folders, filesIn(cache.directory), minimumJobs)) startPool(folders);
  };
  const onDataset = (read: DatasetResult, folders: number, folderRead: FolderRead) => {
    const begun = performance.now();
    total = folders;
    // A folder with errors of its own is not fitted; neither is one whose name is not a slug (readHandbook says so).
    const correlation = SLUG_PATTERN.test(read.slug) ? read.correlation : undefined;
    // An unchanged folder whose record holds its fit under this fitting code: neither a cache key nor a look-up.
    const recorded = folderRead.reused && records !== undefined ? recordedFacts.get(read.folder) : undefined;
    const facts = recorded !== undefined && correlation !== undefined && recorded.version === cache!.version && hasCachedFit(cache!.directory, recorded.key) ? recorded : undefined;
    const cached = facts !== undefined ? { key: facts.key, fitted: recordedFit(cache!.directory, facts) } : correlation === undefined || cache === undefined ? undefined : fromCache(correlation, cache);
    const item: Item = {
      read,
      correlation,
      key: cached?.key,
      cached: cached?.fitted !== undefined,
      fitted: cached?.fitted,
      folderRead: records === undefined ? undefined : folderRead,
      recordKey: recordKeys.get(read.folder),
      facts,
    };
    items.set(read.folder, item);
    if (item.fitted !== undefined) progress();
    else if (correlation !== undefined) {
      if (pool !== undefined) fitInPool(item);
      else {
        waiting.push(item);
        if (cache !== undefined && workers !== undefined && waiting.length >= minimumJobs) {
          // Sized for the folders that may still need fitting: those waiting and those not read yet.
          startPool(waiting.length + folders - items.size);
          for (const queued of waiting.splice(0)) fitInPool(queued);
        }
      }
    }
    fittingWhileReading += performance.now() - begun;
  };
  let handbook: Awaited<ReturnType<typeof readHandbook>>;
  let readEnded: number;
  try {
    handbook = await readHandbook(directory, { onFolders, onDataset, ...(known === undefined ? {} : { known }) });
    readEnded = performance.now();
    // Fewer folders to fit than it takes to start workers: here.
    if (waiting.length > 0) refitStarted ??= performance.now();
    for (const item of waiting.splice(0)) {
      item.fitted = fitHere(item.correlation!, cache, item.key);
      progress();
    }
    await Promise.all([...items.values()].map((item) => item.work));
  } finally {
    // Also when reading failed part way: workers already started would keep the process alive.
    await Promise.allSettled([...items.values()].map((item) => item.work));
    await (await pool)?.close();
  }
  const refittingMs = refitStarted === undefined ? 0 : performance.now() - refitStarted;

  const diagnostics: Diagnostic[] = [...handbook.diagnostics];
  const datasets: FittedDataset[] = [];
  const slugs = new Set(handbook.datasets.map((read) => read.slug));
  const keys = new Set<string>();
  let cachedFits = 0;
  for (const read of handbook.datasets) {
    // Errors about the folder as a whole (an invalid or duplicate slug) belong to it too: such a folder's fit, if
    // one was made while reading, is not used.
    const folderErrors = handbook.diagnostics.filter(
      (diagnostic) => diagnostic.severity === 'error' && (diagnostic.file === read.folder || diagnostic.file === read.metadataPath),
    );
    const item = items.get(read.folder)!;
    const dataset = folderErrors.length ? { ...read, diagnostics: [...read.diagnostics, ...folderErrors] } : read;
    const correlation = folderErrors.length ? undefined : item.correlation;
    const fitted = correlation === undefined ? undefined : item.fitted;
    if (correlation !== undefined && item.key !== undefined) keys.add(item.key);
    if (correlation !== undefined && item.cached) cachedFits++;
    diagnostics.push(...read.diagnostics);
    if (fitted) diagnostics.push(...fitted.diagnostics);
    // An unchanged folder's fingerprint is the recorded one (the same correlation and fit make the same one).
    const review =
      fitted === undefined || correlation === undefined
        ? undefined
        : item.facts !== undefined
          ? { fingerprint: item.facts.fingerprint, approval: approvalState(correlation.meta.review, item.facts.fingerprint) }
          : reviewTrail(correlation, fitted.fit);
    if (review !== undefined && correlation !== undefined) diagnostics.push(...reviewDiagnostics(correlation, review, slugs));
    datasets.push({ dataset, fitted, review });
    if (records !== undefined) recordFolder(records.directory, item, cache!.version, fitted, review);
  }
  if (cache !== undefined && options.prune) {
    pruneFitCache(cache.directory, keys);
    if (records !== undefined) pruneFolderRecords(records.directory, new Set(recordKeys.values()));
  }
  const ended = performance.now();
  const readingMs = readEnded - started - fittingWhileReading;
  return { datasets, diagnostics: sortDiagnostics(diagnostics), timing: { readingMs, fittingMs: ended - started - readingMs, refittingMs }, cachedFits };
}
