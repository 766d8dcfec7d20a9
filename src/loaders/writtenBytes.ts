/**
 * The bytes of a part the content loader wrote in this build into a correlation's folder (its parts file,
 * folderParts.ts; see writtenDownload.ts, which reads the page parts as JSON), or undefined when it is not there.
 * Only a build may ask: `astro dev` writes no files, so a folder left by an earlier build could be stale.
 */
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { StoredFitReference } from '../load/storedFit.ts';
import { correlationFilesFolder } from './correlationFilesFolder.ts';
import { PARTS_FILE, readPart } from './folderParts.ts';

const folders = new Map<string, string>();

/**
 * @param reference the entry's stored fit reference (its folder's parent is Astro's cache folder)
 * @example writtenBytes(entry.fit, 'water-cp', '.handbook-entry.json')?.length // => 21873
 */
export function writtenBytes(reference: StoredFitReference, slug: string, file: string): Buffer | undefined {
  const directory = reference.fitCache.directory;
  let folder = folders.get(directory);
  if (folder === undefined) {
    folder = correlationFilesFolder(pathToFileURL(`${path.dirname(path.resolve(directory))}${path.sep}`));
    folders.set(directory, folder);
  }
  return readPart(path.join(folder, slug, PARTS_FILE), file);
}
