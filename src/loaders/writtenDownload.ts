/**
 * What the content loader wrote for a correlation in this build. In a build, the loader writes every fitted
 * correlation's folder into `<cache>/correlary-files/<slug>/` (src/loaders/correlationFiles.ts) before any page
 * renders, beside the fit cache `<cache>/correlary-fits/` that the entry's stored reference names; a page reads the
 * parts built there (src/components/lib/pageParts.ts) instead of building them a second time. Only a build may
 * ask: `astro dev` writes no files, so a folder left by an earlier build could be stale.
 */
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { fromPackedJson } from '../load/packedJson.ts';
import type { StoredFitReference } from '../load/storedFit.ts';
import { correlationFilesFolder } from './correlationFilesFolder.ts';
import { PARTS_FILE, readPart } from './folderParts.ts';

const folders = new Map<string, string>();
/** The last record read: a page's components ask for the same one in turn. */
let last: { file: string; value: unknown } | undefined;

/**
 * The value of the part `file` (packed JSON, src/load/packedJson.ts) in the correlation's folder (its parts file,
 * folderParts.ts), or undefined when it is not there or does not parse.
 * @param reference the entry's stored fit reference (its folder's parent is Astro's cache folder)
 * @example writtenPageParts(entry.fit, 'water-cp', '.page.json') // => { katex: '0.16.…', … }
 */
export function writtenPageParts(reference: StoredFitReference, slug: string, file: string): unknown {
  const directory = reference.fitCache.directory;
  let folder = folders.get(directory);
  if (folder === undefined) {
    folder = correlationFilesFolder(pathToFileURL(`${path.dirname(path.resolve(directory))}${path.sep}`));
    folders.set(directory, folder);
  }
  const full = path.join(folder, slug, PARTS_FILE);
  const key = `${full}\0${file}`;
  if (last?.file === key) return last.value;
  let value: unknown;
  try {
    const bytes = readPart(full, file);
    value = bytes === undefined ? undefined : fromPackedJson(bytes.toString('utf8'));
  } catch {
    value = undefined;
  }
  last = { file: key, value };
  return value;
}
