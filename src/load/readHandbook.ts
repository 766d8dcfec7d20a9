/**
 * Read every correlation folder under a content directory and check that slugs are unique; read the handbook's
 * settings file (`handbook.yaml`, a file at the top level, so never taken for a correlation folder).
 */
import { readdir, stat } from 'node:fs/promises';
import path from 'node:path';
import { SLUG_PATTERN } from '../schema/index.ts';
import { error, type Diagnostic } from './diagnostic.ts';
import { mapLimited } from './mapLimited.ts';
import type { FolderRecord } from './folderRecord.ts';
import { readFolder, type FolderRead } from './readDataset.ts';
import { readHandbookSettings, type HandbookSettingsResult } from './readHandbookSettings.ts';
import type { DatasetResult } from './types.ts';

/** How many folders are read at once: enough to keep Node's four I/O threads busy. */
const FOLDERS_IN_FLIGHT = 16;

export interface HandbookResult {
  /** One result per folder, sorted by folder name. */
  readonly datasets: readonly DatasetResult[];
  /** Problems that concern more than one folder (duplicate slugs), the directory itself or its settings file. */
  readonly diagnostics: readonly Diagnostic[];
  /** The handbook settings file: its validated values (defaults when absent) and where it is. */
  readonly settings: HandbookSettingsResult;
}

export interface ReadHandbookOptions {
  /**
   * Called with each folder's result as soon as it is read (in no fixed order), and with how many folders there
   * are: fitHandbook starts fitting while the other folders are still being read. Problems that concern several
   * folders (duplicate slugs) are only known from the result.
   */
  readonly onDataset?: (dataset: DatasetResult, folders: number, read: FolderRead) => void;
  /** Called once with how many folders there are, before any is read (fitHandbook may start workers then). */
  readonly onFolders?: (folders: number) => void;
  /**
   * What an earlier read recorded for a folder path (src/load/folderRecord.ts), used when neither of its files
   * changed (readFolder). Called as each folder's reading starts.
   */
  readonly known?: (folder: string) => FolderRecord | undefined;
}

/**
 * Read all correlation folders in `directory`. Folders whose names start with '.' or '_' are skipped, so drafts
 * can be parked as `_draft-name`. Loose files at the top level are ignored.
 * @throws Error `readHandbook requires a directory` when `directory` is not one
 */
export async function readHandbook(directory: string, options: ReadHandbookOptions = {}): Promise<HandbookResult> {
  const info = await stat(directory).catch(() => undefined);
  if (info === undefined || !info.isDirectory()) throw new Error('readHandbook requires a directory');
  const entries = await readdir(directory, { withFileTypes: true });
  const folders = entries
    .filter((entry) => entry.isDirectory() && !entry.name.startsWith('.') && !entry.name.startsWith('_'))
    .map((entry) => entry.name)
    .sort();
  options.onFolders?.(folders.length);
  // A few folders at a time, in order, so that they are read one after another from the start and each is handed
  // to fitting as soon as it is read (onDataset). Started all at once, every folder's reads queued behind every
  // other's, and the first was read only when nearly all were: N = 5000 cold build, the fitting workers idle for
  // the 4 s of reading.
  const datasets = await mapLimited(folders, FOLDERS_IN_FLIGHT, async (name) => {
    const folder = path.join(directory, name);
    const read = await readFolder(folder, options.known?.(folder));
    options.onDataset?.(read.result, folders.length, read);
    return read.result;
  });
  const settings = await readHandbookSettings(directory);
  const diagnostics: Diagnostic[] = [...settings.diagnostics];

  const bySlug = new Map<string, DatasetResult[]>();
  for (const dataset of datasets) {
    if (!SLUG_PATTERN.test(dataset.slug)) {
      diagnostics.push(
        error(dataset.folder, { line: 0 }, `folder name '${dataset.slug}' is not a valid slug`, 'use lower-case letters and digits joined by single hyphens, or set slug: in the metadata'),
      );
    }
    bySlug.set(dataset.slug, [...(bySlug.get(dataset.slug) ?? []), dataset]);
  }
  for (const [slug, group] of bySlug) {
    if (group.length < 2) continue;
    for (const dataset of group) {
      const others = group.filter((other) => other !== dataset).map((other) => other.metadataPath);
      diagnostics.push(error(dataset.metadataPath, { line: dataset.slugLine }, `slug '${slug}' is also used by ${others.join(', ')}`, 'set a different slug: in one of them'));
    }
  }
  return { datasets, diagnostics, settings };
}
