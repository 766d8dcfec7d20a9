/**
 * Deleting a cache folder's files whose key is no longer used (src/load/fitCache.ts pruneFitCache,
 * src/load/folderRecord.ts pruneFolderRecords): only names that `pattern` matches are touched, its first group
 * being the key, so files of other kinds, and temporary files a build running now may be writing, are left alone.
 */
import { readdirSync, rmSync } from 'node:fs';
import path from 'node:path';

/**
 * @returns how many files were deleted (0 when the folder does not exist)
 * @example pruneKeyedFiles('.cache/correlary-fits', /^([0-9a-f]{64})\.json$/, new Set([key])) // => 2
 */
export function pruneKeyedFiles(directory: string, pattern: RegExp, keep: ReadonlySet<string>): number {
  let names: string[];
  try {
    names = readdirSync(directory);
  } catch {
    return 0;
  }
  let deleted = 0;
  for (const name of names) {
    const match = pattern.exec(name);
    if (match === null || keep.has(match[1]!)) continue;
    rmSync(path.join(directory, name), { force: true });
    deleted++;
  }
  return deleted;
}
