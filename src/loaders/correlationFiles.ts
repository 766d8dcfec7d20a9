/**
 * The per-correlation files of a build (coefficients, data, plot, chart data, snippets: see
 * src/components/lib/correlationFiles.ts), written by the content loader into a folder of Astro's cache, one
 * sub-folder per correlation, and copied into the output when the build is done (copyCorrelationFiles, from the
 * integration in src/loaders/correlationFilesIntegration.ts). Thousands of small files are thus written once each,
 * not rendered as thousands of Astro routes. A correlation whose stored entry and code are unchanged keeps its
 * folder from the last build (a digest file says what it was written from); folders of correlations no longer
 * in the handbook are deleted. Same input, same bytes: nothing here depends on time or machine.
 *
 * The output gets hard links to the cache's files where the file system allows (copies otherwise), so a file of
 * the cache is never written to in place: a folder to rewrite is deleted and its files are created anew, and a
 * file linked into an earlier build's output keeps its bytes.
 */
import { createHash } from 'node:crypto';
import { mkdir, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { correlationFiles } from '../components/lib/correlationFiles.ts';
import { toCacheJson } from '../load/fitCache.ts';
import { linkOrCopy, type LinkFile } from './linkOrCopy.ts';
import type { HandbookIdentity } from '../export/index.ts';
import type { CorrelationEntry } from '../schema/index.ts';

const DIGEST = '.digest';
const MANIFEST = 'manifest.json';

/**
 * Write the files of every fitted entry into `folder`/<slug>/ (unless unchanged) and the list of slugs.
 * @param version the files code version (filesCodeVersion), part of each folder's digest
 * @param identity the handbook identity of each correlation's files (handbookIdentity.ts identityOf)
 * @example await writeCorrelationFiles(folder, entries, version, (slug) => identityOf(slug, settings, base, site)) // => folders written
 */
export async function writeCorrelationFiles(
  folder: string,
  entries: readonly CorrelationEntry[],
  version: string,
  identity: (slug: string) => HandbookIdentity,
): Promise<number> {
  await mkdir(folder, { recursive: true });
  const fitted = entries.filter((entry) => entry.fit !== null);
  let written = 0;
  for (const entry of fitted) {
    const target = path.join(folder, entry.slug);
    const handbook = identity(entry.slug);
    const digest = createHash('sha256').update(version).update('\0').update(toCacheJson([entry, handbook])).digest('hex');
    const previous = await readFile(path.join(target, DIGEST), 'utf8').catch(() => undefined);
    if (previous === digest) continue;
    await rm(target, { recursive: true, force: true });
    await mkdir(target, { recursive: true });
    // 'wx': a file of the cache is created, never written to (the output may hold a hard link to an older one).
    await Promise.all(correlationFiles(entry, handbook).map((file) => writeFile(path.join(target, file.file), file.text, { flag: 'wx' })));
    await writeFile(path.join(target, DIGEST), digest);
    written++;
  }
  const slugs = fitted.map((entry) => entry.slug).sort();
  const keep = new Set([...slugs, MANIFEST]);
  for (const name of await readdir(folder)) {
    if (!keep.has(name)) await rm(path.join(folder, name), { recursive: true, force: true });
  }
  await writeFile(path.join(folder, MANIFEST), `${JSON.stringify({ slugs })}\n`);
  return written;
}

/**
 * Put the files written by writeCorrelationFiles into the built site's correlations/<slug>/ folders: hard links
 * to the cache's files where the file system allows, copies otherwise (linkOrCopy).
 * @param link how to link a file (node:fs link; a test passes one that fails, to exercise the copies)
 * @example await copyCorrelationFiles(folder, 'dist') // => { files: 5100, copied: 0 }
 */
export async function copyCorrelationFiles(folder: string, outDir: string, link?: LinkFile): Promise<{ files: number; copied: number }> {
  let manifest: { slugs: string[] };
  try {
    manifest = JSON.parse(await readFile(path.join(folder, MANIFEST), 'utf8')) as { slugs: string[] };
  } catch {
    return { files: 0, copied: 0 }; // nothing was written (no correlation was fitted)
  }
  let files = 0;
  let copied = 0;
  for (const slug of manifest.slugs) {
    const source = path.join(folder, slug);
    const target = path.join(outDir, 'correlations', slug);
    await mkdir(target, { recursive: true });
    const names = (await readdir(source)).filter((name) => name !== DIGEST);
    // Once a link could not be made, the rest go to the same file system: copy them without trying.
    const copy = copied > 0;
    const ways = await Promise.all(names.map((name) => linkOrCopy(path.join(source, name), path.join(target, name), { copy, ...(link ? { link } : {}) })));
    files += names.length;
    copied += ways.filter((way) => way === 'copied').length;
  }
  return { files, copied };
}
