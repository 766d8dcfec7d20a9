/**
 * Worker threads that fit correlations in parallel for fitHandbook when many are not in the fit cache. The worker
 * (src/load/fitWorker.ts) is bundled once per version of the sources (sourcesVersion) with esbuild (present wherever Astro is, through
 * Vite) into a folder beside the fit cache, so it runs the same way from the TypeScript sources and from an
 * installed package. When the bundle cannot be made (no esbuild, no sources), there is no pool and fitHandbook fits
 * in its own thread; the results are the same either way (the same code fits each dataset; only where it runs
 * differs), so the output does not depend on the number of workers.
 */
import os from 'node:os';
import path from 'node:path';
import type { DatasetFit } from './fitDataset.ts';
import { readCachedSummary } from './fitCache.ts';
import type { LoadedCorrelation } from './types.ts';
import { sourcesVersion } from './fitCodeVersion.ts';
import { workerBundle } from './workerBundle.ts';
import { createWorkerPool } from './workerPool.ts';

export interface FitPool {
  /** Fit one correlation in a worker, which writes its cache record under `key` in `directory`; the fit as a cache hit reads it. */
  fit(correlation: LoadedCorrelation, directory: string, key: string): Promise<DatasetFit>;
  /** Stop the workers. */
  close(): Promise<void>;
}

/** Below this many datasets to fit, starting workers (about half a second) costs more than it saves. */
export const POOL_MINIMUM_JOBS = 40;

/** How many workers to start for `jobs` datasets to fit: none below `minimum`, else one per core up to 4. */
export function poolSize(jobs: number, minimum = POOL_MINIMUM_JOBS): number {
  if (jobs < minimum || jobs < 1) return 0;
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  return Math.max(0, Math.min(cores, 4, Math.ceil(jobs / 4)));
}

/**
 * The fitting worker's bundle in `folder` (built when missing), or undefined when it cannot be built.
 * @example await fitWorkerBundle(root, '.cache/correlary-worker') // => '.cache/correlary-worker/fit-worker-….mjs'
 */
export function fitWorkerBundle(root: string, folder: string): Promise<string | undefined> {
  const { entry, prefix } = fitWorkerSource(root);
  return workerBundle(entry, prefix, sourcesVersion(root), folder);
}

/** The fitting worker's entry and bundle name. @example fitWorkerSource('.').prefix // => 'fit-worker' */
export function fitWorkerSource(root: string): { entry: string; prefix: string } {
  return { entry: path.join(root, 'src', 'load', 'fitWorker.ts'), prefix: 'fit-worker' };
}

/**
 * A pool of `size` workers, or undefined when none can be started (then the caller fits in its own thread).
 * @param root the package root holding src/load/fitWorker.ts
 * @param folder where the bundle is kept
 * @example const pool = await createFitPool(root, folder, 2); await pool?.fit(correlation, dir, key)
 */
export async function createFitPool(root: string, folder: string, size: number): Promise<FitPool | undefined> {
  if (size < 1) return undefined;
  // Named by every source it may be made of (sourcesVersion), not only by the fitting code's version: the bundle
  // also holds e.g. the message helpers fitDataset uses.
  const bundle = await fitWorkerBundle(root, folder);
  if (bundle === undefined) return undefined;
  // The worker's protocol (src/load/fitWorker.ts): { id, correlation, directory, key } in, { id } out once the
  // record is written. The fit is then read from the record's summary, exactly as a cache hit is: the large arrays
  // (per-point statistics, the order table) are read only if something asks for them, instead of being copied
  // back from the worker for every dataset.
  // Eight jobs handed to each worker at a time: while folders are still being read, the loader's thread may be busy
  // for a while before it hands out the next one, and a worker should not wait for it.
  const pool = createWorkerPool<{ correlation: LoadedCorrelation; directory: string; key: string }, object>(bundle, size, 8);
  return {
    fit: async (correlation, directory, key) => {
      await pool.run({ correlation, directory, key });
      const fitted = readCachedSummary(directory, key);
      if (fitted === undefined) throw new Error(`the fitting worker wrote no readable record ${key} in ${directory}`);
      return fitted;
    },
    close: () => pool.close(),
  };
}
