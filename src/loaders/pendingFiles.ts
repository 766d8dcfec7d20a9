/**
 * The writing of the correlations' downloads, left running while Astro goes on. The content loader prepares it
 * (src/loaders/correlationFiles.ts writeCorrelationFiles, in worker threads when there are many) with deferFiles
 * and returns; the integration (src/loaders/correlationFilesIntegration.ts) starts it when the build starts, that is
 * after Astro has synced the content and saved its store, so that the files are written while Astro bundles the
 * server code and the client code and renders the pages. Each correlation page waits only for its own folder
 * (folderWritten: it reads the page parts written there), so the first pages render while later folders are still
 * being written; the integration waits for all of them before putting them into the output, and a failure fails
 * the build at the first page that waits or there.
 *
 * Why not start at once from the loader: Astro 5.18 saves its content store (data-store.json) with a debounced
 * write, and a save asked for while an earlier one is still being written is later written with the earlier one's
 * data (astro/dist/content/mutable-data-store.js, #writeFileAtomic's pending re-write). Thousands of file reads and
 * writes queued by this work on Node's I/O threads kept an early save (of the previous build's store) in flight
 * until the final save, whose data was then lost: a rebuild of 5000 correlations bundled the previous store and its
 * pages asked for a pruned fit record. Started after the store is saved, this work cannot delay that save.
 *
 * Astro loads the loader, the integration and the built pages as separate module instances, so the work is kept on
 * globalThis under registered symbols.
 */

const KEY = Symbol.for('correlary.pendingCorrelationFiles');
const DEFERRED = Symbol.for('correlary.deferredCorrelationFiles');
const FOLDERS = Symbol.for('correlary.writtenCorrelationFolders');
/** Says that one correlation's folder is complete (written now, or unchanged from an earlier build). */
export type FolderDone = (slug: string) => void;
type Holder = { [KEY]?: Promise<void>; [DEFERRED]?: (done: FolderDone) => Promise<unknown>; [FOLDERS]?: Folders };

/** The folders of the work last started: those said complete, and a waiter per folder asked for before that. */
interface Folders {
  readonly done: Set<string>;
  readonly waiting: Map<string, (() => void)[]>;
}

function freshFolders(): { folders: Folders; done: FolderDone } {
  const folders: Folders = { done: new Set(), waiting: new Map() };
  const done: FolderDone = (slug) => {
    folders.done.add(slug);
    for (const wake of folders.waiting.get(slug) ?? []) wake();
    folders.waiting.delete(slug);
  };
  return { folders, done };
}

/**
 * Remember `work` as the files being written (replacing any earlier one) without waiting for it.
 * @example startFiles(writeCorrelationFiles(folder, entries, version, identity))
 */
export function startFiles(work: Promise<unknown>): void {
  track(work, freshFolders().folders);
}

function track(work: Promise<unknown>, folders: Folders): void {
  const settled = work.then(() => undefined);
  settled.catch(() => undefined); // reported by filesWritten, not as an unhandled rejection
  (globalThis as Holder)[KEY] = settled;
  (globalThis as Holder)[FOLDERS] = folders;
}

/**
 * Remember `start` as the files to write, to be started by beginFiles (replacing any earlier work not yet started).
 * `start` gets the function to call as each folder is complete (for folderWritten).
 * @example deferFiles((done) => writeCorrelationFiles(folder, entries, version, identity, { onFolder: done }))
 */
export function deferFiles(start: (done: FolderDone) => Promise<unknown>): void {
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
  const { folders, done } = freshFolders();
  let work: Promise<unknown>;
  try {
    work = start(done);
  } catch (caught) {
    work = Promise.reject(caught);
  }
  track(work, folders);
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

/**
 * Resolves when the folder of `slug` is complete, or when the files last started are all written (a correlation
 * with no folder: no fit); rejects with their failure if it comes first. Starts deferred files first; resolves at
 * once when nothing was started (`astro dev`, tests).
 * @example await folderWritten(entry.slug) // in a correlation page, before reading its page parts
 */
export async function folderWritten(slug: string): Promise<void> {
  beginFiles();
  const holder = globalThis as Holder;
  const all = holder[KEY];
  const folders = holder[FOLDERS];
  if (all === undefined || folders === undefined || folders.done.has(slug)) return;
  const mine = new Promise<void>((resolve) => folders.waiting.set(slug, [...(folders.waiting.get(slug) ?? []), resolve]));
  await Promise.race([mine, all]);
}
