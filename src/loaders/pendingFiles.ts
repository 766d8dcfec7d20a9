/**
 * The writing of the correlations' downloads, left running while Astro goes on. The content loader starts it
 * (src/loaders/correlationFiles.ts writeCorrelationFiles, in worker threads when there are many) and returns, so
 * that the files are written while Astro bundles the server code on the main thread; the integration
 * (src/loaders/correlationFilesIntegration.ts) waits for it at the end of that build, before any page renders
 * (pages read parts written there), and a failure fails the build there. Astro loads the loader and the integration as separate module instances, so the
 * work is kept on globalThis under a registered symbol.
 */

const KEY = Symbol.for('correlary.pendingCorrelationFiles');
type Holder = { [KEY]?: Promise<void> };

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
 * Resolves when the files last started are written (at once when none were); rejects with their failure.
 * @example await filesWritten()
 */
export async function filesWritten(): Promise<void> {
  await (globalThis as Holder)[KEY];
}
