/**
 * The writing of the correlations' downloads, left running while Astro goes on. The content loader prepares it
 * (src/loaders/correlationFiles.ts writeCorrelationFiles, in worker threads when there are many) with deferFiles
 * and returns; the integration (src/loaders/correlationFilesIntegration.ts) starts it when the build starts, that is
 * after Astro has synced the content and saved its store, so that the files are written while Astro bundles the
 * server code on the main thread, and waits for it at the end of that build, before any page renders (pages read
 * parts written there); a failure fails the build there.
 *
 * Why not start at once from the loader: Astro 5.18 saves its content store (data-store.json) with a debounced
 * write, and a save asked for while an earlier one is still being written is later written with the earlier one's
 * data (astro/dist/content/mutable-data-store.js, #writeFileAtomic's pending re-write). Thousands of file reads and
 * writes queued by this work on Node's I/O threads kept an early save (of the previous build's store) in flight
 * until the final save, whose data was then lost: a rebuild of 5000 correlations bundled the previous store and its
 * pages asked for a pruned fit record. Started after the store is saved, this work cannot delay that save.
 *
 * Astro loads the loader and the integration as separate module instances, so the work is kept on globalThis under
 * a registered symbol.
 */

const KEY = Symbol.for('correlary.pendingCorrelationFiles');
const DEFERRED = Symbol.for('correlary.deferredCorrelationFiles');
type Holder = { [KEY]?: Promise<void>; [DEFERRED]?: () => Promise<unknown> };

/**
 * Remember `work` as the files being written (replacing any earlier one) without waiting for it.
 * @example startFiles(writeCorrelationFiles(folder, entries, version, identity))
 */
export function startFiles(work: Promise<unknown>): void {
  const settled = work.then(() => undefined);
  settled.catch(() => undefined); // reported by filesWritten, not as an unhandled rejection
  (globalThis as Holder)[KEY] = settled;
}

/**
 * Remember `start` as the files to write, to be started by beginFiles (replacing any earlier work not yet started).
 * @example deferFiles(() => writeCorrelationFiles(folder, entries, version, identity))
 */
export function deferFiles(start: () => Promise<unknown>): void {
  (globalThis as Holder)[DEFERRED] = start;
}

/**
 * Start the files deferred by deferFiles, if any (once). @example beginFiles() // in astro:build:start
 */
export function beginFiles(): void {
  const holder = globalThis as Holder;
  const start = holder[DEFERRED];
  if (start === undefined) return;
  delete holder[DEFERRED];
  let work: Promise<unknown>;
  try {
    work = start();
  } catch (caught) {
    work = Promise.reject(caught);
  }
  startFiles(work);
}

/**
 * Resolves when the files last started are written (starting deferred files first; at once when there are none);
 * rejects with their failure.
 * @example await filesWritten()
 */
export async function filesWritten(): Promise<void> {
  beginFiles();
  await (globalThis as Holder)[KEY];
}
