/**
 * Resolve the data file named in the metadata, refusing any path that leaves the correlation folder, directly
 * (`../other/data.csv`, an absolute path) or through a symbolic link.
 */
import type { Stats } from 'node:fs';
import { lstat, realpath } from 'node:fs/promises';
import path from 'node:path';

/**
 * `stats` is given when the file is a regular file directly in the folder (not a link): then they are also what
 * `stat` would say, and readText need not ask again.
 */
export type ResolvedDataFile =
  | { ok: true; absolutePath: string; stats?: Stats }
  | { ok: false; problem: string; hint?: string };

function inside(folder: string, candidate: string): boolean {
  const relative = path.relative(folder, candidate);
  return relative !== '' && !relative.startsWith('..') && !path.isAbsolute(relative);
}

/** Resolve `file` (as written in the metadata) against `folder` (absolute). */
export async function resolveDataFile(folder: string, file: string): Promise<ResolvedDataFile> {
  if (path.isAbsolute(file) || !inside(folder, path.resolve(folder, file))) {
    return {
      ok: false,
      problem: `data file '${file}' is outside the correlation folder`,
      hint: 'keep the data file inside the folder and name it relative to it, e.g. data.csv',
    };
  }
  const absolutePath = path.resolve(folder, file);
  let stats: Stats;
  try {
    stats = await lstat(absolutePath);
  } catch {
    return { ok: false, problem: `data file '${file}' not found` };
  }
  // A regular file named without a folder part is an entry of the folder itself, so its real path is the folder's
  // real path joined with its name: inside, whatever links lead to the folder. No need to resolve both.
  if (stats.isFile() && path.dirname(file) === '.') return { ok: true, absolutePath, stats };
  let realFolder: string;
  let realFile: string;
  try {
    [realFolder, realFile] = await Promise.all([realpath(folder), realpath(absolutePath)]);
  } catch {
    return { ok: false, problem: `data file '${file}' is a symbolic link to a missing file` };
  }
  if (!inside(realFolder, realFile)) {
    return {
      ok: false,
      problem: `data file '${file}' is a symbolic link to a file outside the correlation folder`,
      hint: 'copy the data into the folder instead of linking to it',
    };
  }
  return { ok: true, absolutePath };
}
