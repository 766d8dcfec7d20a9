/**
 * The per-correlation files of a build (coefficients, data, plot, chart data, snippets: see
 * src/components/lib/correlationFiles.ts), written by the content loader into a folder of Astro's cache, one
 * sub-folder per correlation, and copied into the output when the build is done (copyCorrelationFiles, from the
 * integration in src/loaders/correlationFilesIntegration.ts). Thousands of small files are thus written once each,
 * not rendered as thousands of Astro routes. A correlation whose stored entry and code are unchanged keeps its
 * folder from the last build (a digest file says what it was written from); folders of correlations no longer
 * in the handbook are deleted. Same input, same bytes: nothing here depends on time or machine.
 */
import { createHash } from 'node:crypto';
import { copyFile, mkdir, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { correlationFiles } from '../components/lib/correlationFiles.ts';
import { toCacheJson } from '../load/fitCache.ts';
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
    await Promise.all(correlationFiles(entry, handbook).map((file) => writeFile(path.join(target, file.file), file.text)));
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
 * Copy the files written by writeCorrelationFiles into the built site's correlations/<slug>/ folders.
 * @example await copyCorrelationFiles(folder, 'dist') // => number of files copied
 */
export async function copyCorrelationFiles(folder: string, outDir: string): Promise<number> {
  let manifest: { slugs: string[] };
  try {
    manifest = JSON.parse(await readFile(path.join(folder, MANIFEST), 'utf8')) as { slugs: string[] };
  } catch {
    return 0; // nothing was written (no correlation was fitted)
  }
  let copied = 0;
  for (const slug of manifest.slugs) {
    const source = path.join(folder, slug);
    const target = path.join(outDir, 'correlations', slug);
    await mkdir(target, { recursive: true });
    const names = (await readdir(source)).filter((name) => name !== DIGEST);
    await Promise.all(names.map((name) => copyFile(path.join(source, name), path.join(target, name))));
    copied += names.length;
  }
  return copied;
}
