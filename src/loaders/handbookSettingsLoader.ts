/**
 * Astro content loader for the handbook settings file (`handbook.yaml` at the content root): one entry, id
 * `settings`, holding the validated settings with their defaults. A problem in the file fails the build with every
 * message logged as `path:line:column: problem`. In `astro dev`, editing the file reloads it.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Loader, LoaderContext } from 'astro/loaders';
import { formatDiagnostic, readHandbookSettings } from '../load/index.ts';

export interface HandbookSettingsLoaderOptions {
  /** Content directory, relative to the project root or absolute. Defaults to `content`. */
  readonly directory?: string;
}

/** Id of the one entry of the `handbook` collection. */
export const HANDBOOK_SETTINGS_ID = 'settings';

async function loadSettings(context: LoaderContext, absoluteDirectory: string): Promise<void> {
  const displayDirectory = path.relative(process.cwd(), absoluteDirectory) || '.';
  const result = await readHandbookSettings(displayDirectory);
  for (const problem of result.diagnostics) {
    if (problem.severity === 'warning') context.logger.warn(formatDiagnostic(problem));
    else context.logger.error(formatDiagnostic(problem));
  }
  if (result.settings === undefined) {
    const errors = result.diagnostics.filter((problem) => problem.severity === 'error').length;
    throw new Error(`${errors} problem${errors === 1 ? '' : 's'} in ${result.file}; run 'npx correlary check ${displayDirectory}' for the list`);
  }
  const data = await context.parseData({ id: HANDBOOK_SETTINGS_ID, data: { ...result.settings } });
  const digest = context.generateDigest(data);
  // Unchanged settings leave the store untouched: a change would make Astro save its whole store (every
  // correlation) early in the build, while the correlations are still being read (see src/loaders/pendingFiles.ts).
  if (context.store.get(HANDBOOK_SETTINGS_ID)?.digest === digest && context.store.keys().length === 1) return;
  context.store.clear();
  context.store.set({ id: HANDBOOK_SETTINGS_ID, data, digest });
}

/** The settings loader: `defineCollection({ loader: handbookSettingsLoader(), schema: handbookSettingsSchema })`. */
export function handbookSettingsLoader(options: HandbookSettingsLoaderOptions = {}): Loader {
  const directory = options.directory ?? 'content';
  return {
    name: 'correlary-handbook-settings',
    load: async (context) => {
      const absoluteDirectory = path.resolve(fileURLToPath(context.config.root), directory);
      await loadSettings(context, absoluteDirectory);
      context.watcher?.on('all', (_event, changed) => {
        if (path.dirname(changed) !== absoluteDirectory) return;
        loadSettings(context, absoluteDirectory).catch((caught: unknown) => context.logger.error(caught instanceof Error ? caught.message : String(caught)));
      });
    },
  };
}
