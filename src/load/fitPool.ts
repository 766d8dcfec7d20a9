/**
 * Worker threads that fit correlations in parallel for fitHandbook when many are not in the fit cache. The worker
 * (src/load/fitWorker.ts) is bundled once per fitting-code version with esbuild (present wherever Astro is, through
 * Vite) into a folder beside the fit cache, so it runs the same way from the TypeScript sources and from an
 * installed package. When the bundle cannot be made (no esbuild, no sources), there is no pool and fitHandbook fits
 * in its own thread; the results are the same either way (the same code fits each dataset; only where it runs
 * differs), so the output does not depend on the number of workers.
 */
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { DatasetFit } from './fitDataset.ts';
import type { LoadedCorrelation } from './types.ts';

export interface FitPool {
  /** Fit one correlation in a worker, which also writes its cache record under `key` in `directory`. */
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

/** The worker's bundle for this version, built when missing; undefined when it cannot be built. */
async function workerBundle(root: string, version: string, folder: string): Promise<string | undefined> {
  const target = path.join(folder, `fit-worker-${version.slice(0, 16)}.mjs`);
  if (existsSync(target)) return target;
  const entry = path.join(root, 'src', 'load', 'fitWorker.ts');
  if (!existsSync(entry)) return undefined;
  try {
    // Required, not imported: inside Vite's module runner (Astro's content loading) a dynamic import goes through
    // the runner, which may be closed by then.
    const { build } = createRequire(import.meta.url)('esbuild') as typeof import('esbuild');
    mkdirSync(folder, { recursive: true });
    const temporary = `${target}.${process.pid}.tmp.mjs`;
    await build({
      entryPoints: [entry],
      outfile: temporary,
      bundle: true,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      // The bundled CommonJS statistics packages call require; an ES module has none of its own.
      banner: { js: "import { createRequire as __correlaryRequire } from 'node:module'; const require = __correlaryRequire(import.meta.url);" },
      logLevel: 'silent',
    });
    renameSync(temporary, target);
    // Bundles of older fitting code are never used again.
    for (const name of readdirSync(folder)) {
      if (/^fit-worker-[0-9a-f]{16}\.mjs$/.test(name) && path.join(folder, name) !== target) rmSync(path.join(folder, name), { force: true });
    }
    return target;
  } catch {
    return undefined;
  }
}

/**
 * A pool of `size` workers, or undefined when none can be started (then the caller fits in its own thread).
 * @param root the package root holding src/load/fitWorker.ts
 * @param version the fitting code's version (fitCodeVersion), naming the bundle
 * @param folder where the bundle is kept
 * @example const pool = await createFitPool(root, version, folder, 2); await pool?.fit(correlation, dir, key)
 */
export async function createFitPool(root: string, version: string, folder: string, size: number): Promise<FitPool | undefined> {
  if (size < 1) return undefined;
  const bundle = await workerBundle(root, version, folder);
  if (bundle === undefined) return undefined;
  const workers = Array.from({ length: size }, () => new Worker(bundle));
  const idle = [...workers];
  const queue: { job: { id: number; correlation: LoadedCorrelation; directory: string; key: string }; resolve: (fit: DatasetFit) => void; reject: (error: Error) => void }[] = [];
  const pending = new Map<number, { worker: Worker; resolve: (fit: DatasetFit) => void; reject: (error: Error) => void }>();
  let nextId = 0;
  let live = workers.length;
  const dispatch = () => {
    while (idle.length > 0 && queue.length > 0) {
      const worker = idle.pop()!;
      const { job, resolve, reject } = queue.shift()!;
      pending.set(job.id, { worker, resolve, reject });
      worker.postMessage(job);
    }
  };
  for (const worker of workers) {
    worker.on('message', (message: { id: number; fitted?: DatasetFit; failure?: string }) => {
      const waiting = pending.get(message.id);
      if (waiting === undefined) return;
      pending.delete(message.id);
      idle.push(worker);
      if (message.fitted !== undefined) waiting.resolve(message.fitted);
      else waiting.reject(new Error(`fitting worker failed: ${message.failure ?? 'no result'}`));
      dispatch();
    });
    worker.on('error', (error) => {
      for (const [id, waiting] of pending) {
        if (waiting.worker !== worker) continue;
        pending.delete(id);
        waiting.reject(error);
      }
      // A worker that failed is gone: with none left, nothing queued would ever run.
      if (--live === 0) for (const { reject } of queue.splice(0)) reject(error);
    });
  }
  return {
    fit: (correlation, directory, key) =>
      new Promise<DatasetFit>((resolve, reject) => {
        queue.push({ job: { id: nextId++, correlation, directory, key }, resolve, reject });
        dispatch();
      }),
    close: async () => {
      await Promise.all(workers.map((worker) => worker.terminate()));
    },
  };
}
