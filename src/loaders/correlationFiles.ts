/**
 * The per-correlation files of a build (coefficients, data, plot, chart data, snippets: see
 * src/components/lib/correlationFiles.ts), written by the content loader into a folder of Astro's cache, one
 * sub-folder per correlation, and copied into the output when the build is done (copyCorrelationFiles, from the
 * integration in src/loaders/correlationFilesIntegration.ts). Thousands of small files are thus written once each,
 * not rendered as thousands of Astro routes. A correlation whose stored entry and code are unchanged keeps its
 * folder from the last build (its parts file holds the digest it was written from); folders of correlations no longer
 * in the handbook are deleted. Same input, same bytes: nothing here depends on time or machine.
 *
 * The output gets hard links to the cache's files where the file system allows (copies otherwise), so a file of
 * the cache is never written to in place: a folder to rewrite is deleted and its files are created anew, and a
 * file linked into an earlier build's output keeps its bytes.
 */
import { createHash } from 'node:crypto';
import { mkdir, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { toCacheJson } from '../load/fitCache.ts';
import { sourcesVersion } from '../load/fitCodeVersion.ts';
import { poolSize } from '../load/fitPool.ts';
import { forgetStoredFits } from '../load/storedFit.ts';
import { mapLimited } from '../load/mapLimited.ts';
import { workerBundle } from '../load/workerBundle.ts';
import { createWorkerPool, type WorkerPool } from '../load/workerPool.ts';
import { writeCorrelationFolder } from './correlationFolder.ts';
import { PARTS_FILE, partsDigest } from './folderParts.ts';
import { linkOrCopy, type LinkFile } from './linkOrCopy.ts';
import type { HandbookIdentity } from '../export/index.ts';
import type { CorrelationEntry } from '../schema/index.ts';

const MANIFEST = 'manifest.json';

export interface WriteFilesOptions {
  /**
   * Write the folders in worker threads (src/loaders/filesWorker.ts) when many are to be written: `root` is the
   * package root holding src/, `folder` where the worker's bundle is kept, `minimumJobs` (default
   * POOL_MINIMUM_JOBS) the fewest folders to write that start workers. Without it, or when no worker can start,
   * every folder is written in this thread. The files are the same either way.
   */
  readonly workers?: { readonly root: string; readonly folder: string; readonly minimumJobs?: number };
  /**
   * Called with a correlation's slug as soon as its folder is complete: written, or found unchanged. Folders are
   * written in slug order, the order in which Astro renders the pages that wait for them (pendingFiles.ts).
   */
  readonly onFolder?: (slug: string) => void;
}

type FolderJob = { target: string; entry: CorrelationEntry; handbook: HandbookIdentity; digest: string };

/**
 * The files worker's bundle in `folder` (built when missing), or undefined when it cannot be built.
 * @example await filesWorkerBundle(root, '.cache/correlary-worker') // => '.cache/correlary-worker/files-worker-….mjs'
 */
export function filesWorkerBundle(root: string, folder: string): Promise<string | undefined> {
  const { entry, prefix } = filesWorkerSource(root);
  return workerBundle(entry, prefix, sourcesVersion(root), folder);
}

/** The files worker's entry and bundle name. @example filesWorkerSource('.').prefix // => 'files-worker' */
export function filesWorkerSource(root: string): { entry: string; prefix: string } {
  return { entry: path.join(root, 'src', 'loaders', 'filesWorker.ts'), prefix: 'files-worker' };
}

/** A pool of files workers for `jobs` folders to write, or undefined (then they are written in this thread). */
async function filesPool(jobs: number, options: WriteFilesOptions): Promise<WorkerPool<FolderJob, { files: number }> | undefined> {
  const workers = options.workers;
  if (workers === undefined) return undefined;
  // One worker fewer than fitting uses (at least one): the files are written while Astro's own thread bundles the
  // code and renders the pages, the work every page waits for, and on a 2-core machine a second files worker took
  // CPU from it (N = 1000 cold build, two runs each, alternating: 22.6 and 22.1 s with two, 20.7 and 20.9 s with one;
  // Rollup 5.1–5.4 s against 3.7–3.9 s).
  const fitting = poolSize(jobs, workers.minimumJobs);
  const size = Math.max(Math.min(1, fitting), fitting - 1);
  if (size < 1) return undefined;
  const bundle = await filesWorkerBundle(workers.root, workers.folder);
  // Every folder is handed out at once, alternately to each worker, so both go through them in slug order (the
  // order the pages are rendered in). This thread is busy with Rollup for seconds while the files are written, and
  // a worker handed eight at a time waited for it: N = 1000 cold build, CPU profiles of the two files workers, idle
  // 10–55 % of each second while Rollup ran.
  return bundle === undefined ? undefined : createWorkerPool<FolderJob, { files: number }>(bundle, size, Math.ceil(jobs / size));
}

/** The digest a folder was last written from, or undefined when it has none (never written, or being rewritten). */
function previousDigest(target: string): string | undefined {
  return partsDigest(path.join(target, PARTS_FILE));
}

/**
 * Write the files of every fitted entry into `folder`/<slug>/ (unless unchanged) and the list of slugs.
 * @param version the files code version (filesCodeVersion), part of each folder's digest
 * @param identity the handbook identity of each correlation's files (handbookIdentity.ts identityOf)
 * @returns how many folders were written, and how many of them by worker threads
 * @example await writeCorrelationFiles(folder, entries, version, (slug) => identityOf(slug, settings, base, site)) // => { written: 13, byWorkers: 0 }
 */
export async function writeCorrelationFiles(
  folder: string,
  entries: readonly CorrelationEntry[],
  version: string,
  identity: (slug: string) => HandbookIdentity,
  options: WriteFilesOptions = {},
): Promise<{ written: number; byWorkers: number }> {
  await mkdir(folder, { recursive: true });
  const fitted = entries.filter((entry) => entry.fit !== null);
  const jobs: FolderJob[] = [];
  // Which folders to write, found in one synchronous pass (about 0.1 ms a folder): this starts while Astro bundles
  // the code on this thread, and a read per folder through the event loop waited behind that work each time (N =
  // 1000 cold build: the workers started 2.9 s after the build did).
  for (const entry of fitted) {
    const target = path.join(folder, entry.slug);
    const handbook = identity(entry.slug);
    const digest = createHash('sha256').update(version).update('\0').update(toCacheJson([entry, handbook])).digest('hex');
    if (previousDigest(target) !== digest) jobs.push({ target, entry, handbook, digest });
    else options.onFolder?.(entry.slug);
  }
  jobs.sort((a, b) => (a.target < b.target ? -1 : 1));
  const pool = await filesPool(jobs.length, options);
  let byWorkers = 0;
  try {
    // In this thread a few at a time: the file writes of one overlap the next one's computing.
    await mapLimited(jobs, pool === undefined ? 4 : jobs.length, async (job) => {
      if (pool !== undefined) {
        try {
          await pool.run(job);
          byWorkers++;
          options.onFolder?.(job.entry.slug);
          return;
        } catch {
          // a worker that failed: write here instead
        }
      }
      await writeCorrelationFolder(job.target, job.entry, job.handbook, job.digest);
      options.onFolder?.(job.entry.slug);
    });
  } finally {
    await pool?.close();
  }
  // The fit records read here are not needed again by this thread.
  forgetStoredFits();
  const slugs = fitted.map((entry) => entry.slug).sort();
  const keep = new Set([...slugs, MANIFEST]);
  for (const name of await readdir(folder)) {
    if (!keep.has(name)) await rm(path.join(folder, name), { recursive: true, force: true });
  }
  await writeFile(path.join(folder, MANIFEST), `${JSON.stringify({ slugs })}\n`);
  return { written: jobs.length, byWorkers };
}

/**
 * Put the files written by writeCorrelationFiles into the built site's correlations/<slug>/ folders: hard links
 * to the cache's files where the file system allows, copies otherwise (linkOrCopy).
 * @param link how to link a file (node:fs link; a test passes one that fails, to exercise the copies)
 * @example await copyCorrelationFiles(folder, 'dist') // => { files: 5100, copied: 0 }
 */
export async function copyCorrelationFiles(folder: string, outDir: string, link?: LinkFile): Promise<{ files: number; copied: number }> {
  let manifest: { slugs: string[] };
  try {
    manifest = JSON.parse(await readFile(path.join(folder, MANIFEST), 'utf8')) as { slugs: string[] };
  } catch {
    return { files: 0, copied: 0 }; // nothing was written (no correlation was fitted)
  }
  let files = 0;
  let copied = 0;
  for (const slug of manifest.slugs) {
    const source = path.join(folder, slug);
    const target = path.join(outDir, 'correlations', slug);
    await mkdir(target, { recursive: true });
    // Not the parts file: names starting with a dot are the cache's own (correlationFolder.ts).
    const names = (await readdir(source)).filter((name) => !name.startsWith('.'));
    // Once a link could not be made, the rest go to the same file system: copy them without trying.
    const copy = copied > 0;
    const ways = await Promise.all(names.map((name) => linkOrCopy(path.join(source, name), path.join(target, name), { copy, ...(link ? { link } : {}) })));
    files += names.length;
    copied += ways.filter((way) => way === 'copied').length;
  }
  return { files, copied };
}
