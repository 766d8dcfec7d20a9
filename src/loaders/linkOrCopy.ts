/**
 * Putting a file of the build's cache into the output: as a hard link where the file system allows (no bytes are
 * copied), else as a copy. The caller must never write to a linked file in place; src/loaders/correlationFiles.ts
 * deletes a folder it rewrites and creates its files anew, so the output of an earlier build keeps its bytes.
 */
import { copyFile, link, stat, unlink } from 'node:fs/promises';

/** Makes `target` a hard link to `source` (node:fs/promises link, or a stand-in in tests). */
export type LinkFile = (source: string, target: string) => Promise<void>;

/** Error codes of a hard link that the file system or the folders do not allow; the file is copied instead. */
const CANNOT_LINK = new Set(['EXDEV', 'EPERM', 'EACCES', 'ENOTSUP', 'EOPNOTSUPP', 'ENOSYS', 'EMLINK', 'EINVAL']);

/** Copy `source` to `target`, replacing (not overwriting) an existing `target`: it may be linked elsewhere. */
async function replaceWithCopy(source: string, target: string): Promise<void> {
  await unlink(target).catch(() => undefined);
  await copyFile(source, target);
}

/**
 * Put `source` at `target`: a hard link, or a copy when the file system cannot link (another device, a file system
 * without hard links) or when `copy` is set. An existing `target` is replaced, never written to.
 * @returns how the file got there
 * @example await linkOrCopy('cache/a/plot.svg', 'dist/correlations/a/plot.svg') // => 'linked'
 */
export async function linkOrCopy(source: string, target: string, options: { copy?: boolean; link?: LinkFile } = {}): Promise<'linked' | 'copied'> {
  if (options.copy) {
    await replaceWithCopy(source, target);
    return 'copied';
  }
  const makeLink = options.link ?? link;
  try {
    await makeLink(source, target);
    return 'linked';
  } catch (caught) {
    const code = (caught as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') {
      // Left by something else (Astro empties the output first): link to the cache's file unless it already is.
      const [from, to] = await Promise.all([stat(source), stat(target)]);
      if (from.ino === to.ino && from.dev === to.dev) return 'linked';
      await unlink(target);
      return linkOrCopy(source, target, options);
    }
    if (code === undefined || !CANNOT_LINK.has(code)) throw caught;
    await replaceWithCopy(source, target);
    return 'copied';
  }
}
