/**
 * Astro content loader for the handbook: a small adapter over src/load (read + validate) and the core (fit).
 * Astro 5's glob() loader cannot read CSV, so this is a custom object loader
 * (Content Loader API, astro@5 dist/content/loaders/types.d.ts: store, parseData, generateDigest, logger, watcher).
 *
 * Any error in any folder fails the build with every message logged; warnings are logged and kept in the entry
 * so that the page can show them.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Loader, LoaderContext } from 'astro/loaders';
import { fitHandbook, formatDiagnostic, handbookHistory, readHandbookSettings } from '../load/index.ts';
import { identityOf } from '../components/lib/identityOf.ts';
import { handbookSettingsSchema } from '../schema/index.ts';
import { filesCodeVersion, fitCodeVersion, readingCodeVersion } from '../load/fitCodeVersion.ts';
import { writeCorrelationFiles } from './correlationFiles.ts';
import { correlationFilesFolder } from './correlationFilesFolder.ts';
import { deferFiles } from './pendingFiles.ts';
import { takeCheckedHandbook } from './checkedHandbook.ts';
import { storedEntry } from './storedEntry.ts';
import { rememberStoredCorrelations, resaveInOrder } from './storedCorrelations.ts';
import type { CorrelationEntry } from '../schema/index.ts';

export interface CorrelationLoaderOptions {
  /**
   * Content directory, absolute or relative to the project root. Defaults to the CORRELARY_CONTENT environment
   * variable (set by `correlary build --content`), else `content`.
   */
  readonly directory?: string;
}

/** Read, validate and fit every correlation, then replace the collection's entries. */
async function loadAll(context: LoaderContext, absoluteDirectory: string): Promise<void> {
  const displayDirectory = path.relative(process.cwd(), absoluteDirectory) || '.';
  // Fits are cached beside Astro's own cache; the store keeps only a reference to them (src/load/storedFit.ts).
  const fitCache = {
    directory: fileURLToPath(new URL('correlary-fits/', context.config.cacheDir)),
    version: fitCodeVersion(fileURLToPath(context.config.root)),
  };
  // `correlary build` has made this very pass already in this process (its check): take it rather than repeat it.
  // Otherwise many datasets not in the cache are fitted in worker threads; records no folder uses any more are deleted.
  const call = { directory: displayDirectory, workingDirectory: process.cwd(), fitCache };
  // Each folder's reading and fitting is recorded, so that an unchanged folder is neither parsed nor validated again.
  const folderRecords = { directory: fileURLToPath(new URL('correlary-folders/', context.config.cacheDir)), version: readingCodeVersion(fileURLToPath(context.config.root)) };
  const checked = context.watcher === undefined ? takeCheckedHandbook(call) : undefined;
  const handbook = checked?.handbook ?? (await fitHandbook(displayDirectory, { fitCache, folderRecords, workers: { root: fileURLToPath(context.config.root) }, prune: true }));
  // Paths in the handbook are relative to the working directory of the pass that read it (the check pass's may be
  // another: a build staged outside the user's working directory, see checkedHandbook.ts).
  const passDirectory = checked?.call.workingDirectory ?? process.cwd();
  // Two git processes for the whole folder; dates come from commits, so the same commit builds the same pages.
  const histories = checked?.histories ?? (await handbookHistory(displayDirectory, handbook.datasets));
  const entries: { entry: Record<string, unknown>; filePath: string }[] = [];
  for (const item of handbook.datasets) {
    const entry = storedEntry(item, fitCache.directory, histories);
    const correlation = item.dataset.correlation;
    if (entry === undefined || correlation === undefined) continue;
    entries.push({ entry, filePath: path.relative(fileURLToPath(context.config.root), path.resolve(passDirectory, correlation.metadataPath)) });
  }

  const sorted = handbook.diagnostics;
  for (const problem of sorted) {
    if (problem.severity === 'warning') context.logger.warn(formatDiagnostic(problem));
    else context.logger.error(formatDiagnostic(problem));
  }
  const errors = sorted.filter((problem) => problem.severity === 'error').length;
  if (errors > 0) {
    throw new Error(`${errors} problem${errors === 1 ? '' : 's'} in ${displayDirectory}; run 'npx correlary check ${displayDirectory}' for the list`);
  }

  context.store.clear();
  const stored: CorrelationEntry[] = [];
  const inputs: { id: string; data: Record<string, unknown>; digest: string; filePath: string }[] = [];
  for (const { entry, filePath } of entries) {
    const id = String(entry['slug']);
    const data = await context.parseData({ id, data: entry, filePath });
    const input = { id, data, digest: String(context.generateDigest(data)), filePath };
    context.store.set(input);
    inputs.push(input);
    stored.push(data as CorrelationEntry);
  }
  // So that the bundling of the store can check Astro saved all of it (storedCorrelations.ts).
  if (context.watcher === undefined) {
    rememberStoredCorrelations({
      digests: inputs.map((input) => input.digest),
      resave: () => resaveInOrder(context.store, inputs),
    });
  }
  // A build writes each correlation's downloads once here (copied into the output at the end); `astro dev`, which
  // watches the content, serves them from a route instead.
  if (context.watcher === undefined) {
    const root = fileURLToPath(context.config.root);
    // The handbook identity the files carry, as the pages compute it (handbookIdentity.ts) from the same settings.
    const settings = (await readHandbookSettings(displayDirectory)).settings ?? handbookSettingsSchema.parse({});
    const identity = (slug: string) => identityOf(slug, settings, context.config.base, context.config.site);
    // Written (many folders in worker threads) while Astro bundles and renders: started when the build starts, after
    // Astro has saved its content store; each page waits for its own folder, the integration for all of them
    // before putting them into the output (pendingFiles.ts says why not at once).
    const workers = { root, folder: fileURLToPath(new URL('correlary-worker/', context.config.cacheDir)) };
    deferFiles((onFolder) => writeCorrelationFiles(correlationFilesFolder(context.config.cacheDir), stored, filesCodeVersion(root, fitCache.version), identity, { workers, onFolder }));
  }
  const { readingMs, fittingMs, refittingMs } = handbook.timing;
  const seconds = (ms: number, digits = 2): string => (ms / 1000).toFixed(digits);
  // "of which fitting what was not cached": the fits themselves, without the cache keys, look-ups and review trails.
  context.logger.info(
    `loaded ${entries.length} correlation${entries.length === 1 ? '' : 's'} from ${displayDirectory} in ${seconds(readingMs + fittingMs)} s (fitting ${seconds(fittingMs)} s, ${handbook.cachedFits} from the fit cache; fitting what was not cached ${seconds(refittingMs, 3)} s)`,
  );
}

/** Watchers already subscribed, so that a repeated load in `astro dev` does not add a second listener. */
const watched = new WeakSet<object>();

/**
 * The handbook's loader: `defineCollection({ loader: correlationLoader(), schema: correlationEntrySchema })`.
 * In `astro dev`, a change to any file under the content directory reloads the whole collection.
 */
export function correlationLoader(options: CorrelationLoaderOptions = {}): Loader {
  const directory = options.directory ?? process.env['CORRELARY_CONTENT'] ?? 'content';
  return {
    name: 'correlary-correlations',
    load: async (context) => {
      const absoluteDirectory = path.resolve(fileURLToPath(context.config.root), directory);
      await loadAll(context, absoluteDirectory);
      const watcher = context.watcher;
      if (watcher === undefined || watched.has(watcher)) return;
      watched.add(watcher);
      watcher.add(absoluteDirectory);
      watcher.on('all', (_event, changed) => {
        if (!changed.startsWith(absoluteDirectory)) return;
        loadAll(context, absoluteDirectory).catch((caught: unknown) => {
          context.logger.error(caught instanceof Error ? caught.message : String(caught));
        });
      });
    },
  };
}
