/**
 * Writing one correlation's folder of downloads in the cache (src/loaders/correlationFiles.ts), in the loader's
 * thread or in a worker (src/loaders/filesWorker.ts): the same function either way, so the same bytes.
 */
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { correlationFiles } from '../components/lib/correlationFiles.ts';
import { snippetKinds } from '../components/lib/entrySnippets.ts';
import { PAGE_PARTS_FILE, pageParts } from '../components/lib/pageParts.ts';
import { folderExtras } from '../components/lib/folderExtras.ts';
import { toPackedJson } from '../load/packedJson.ts';
import type { HandbookIdentity } from '../export/index.ts';
import type { CorrelationEntry } from '../schema/index.ts';
import { PARTS_FILE, partsFileBytes } from './folderParts.ts';

/**
 * Replace `target` by a new folder holding the files of `entry` (correlationFiles): the downloads a file each, and
 * the build's own parts (names starting with a dot: the page parts, src/components/lib/pageParts.ts, and the
 * others, which stay out of the output) together with `digest` in one parts file (folderParts.ts). The old folder
 * is deleted and every file created anew ('wx'), never written to in place: the output of an earlier build may hold
 * hard links to them (src/loaders/linkOrCopy.ts). The file calls are synchronous: in a files worker they cost a
 * third of the CPU of the same calls through node:fs/promises (measured: 5500 files of 15 KB, 0.1 s against
 * 0.3 s), and they queue nothing on Node's I/O threads, which the main thread's own file work shares.
 * @example await writeCorrelationFolder('.astro/correlary-files/water-cp', entry, identity, digest) // => 13 (downloads and parts)
 */
export async function writeCorrelationFolder(target: string, entry: CorrelationEntry, handbook: HandbookIdentity, digest: string): Promise<number> {
  rmSync(target, { recursive: true, force: true });
  mkdirSync(target, { recursive: true });
  const files = correlationFolderFiles(entry, handbook);
  const downloads = files.filter((file) => !file.file.startsWith('.'));
  for (const file of downloads) writeFileSync(path.join(target, file.file), file.text, { flag: 'wx' });
  // Last, since it holds the digest: a folder left half-written by a failed build has none and is written again.
  writeFileSync(path.join(target, PARTS_FILE), partsFileBytes(digest, files.filter((file) => file.file.startsWith('.'))), { flag: 'wx' });
  return files.length;
}

/**
 * The files of a correlation's folder (without its digest): the downloads (correlationFiles), the page parts, and
 * what other routes take from the folder (folderExtras).
 * @example correlationFolderFiles(entry, identity).map((file) => file.file) // => ['coefficients.json', …, '.page.json', '.page-html.txt', '.handbook-entry.json']
 */
export function correlationFolderFiles(entry: CorrelationEntry, handbook: HandbookIdentity): { file: string; text: string }[] {
  const files = correlationFiles(entry, handbook);
  const texts = new Map(files.map((file) => [file.file, file.text]));
  return [...files, { file: PAGE_PARTS_FILE, text: pagePartsText(entry, texts) }, ...folderExtras(entry, texts, handbook)];
}

/**
 * The text of the page's costly parts (pageParts), built beside the downloads (its snippets are these files), not
 * published: packed JSON (src/load/packedJson.ts), the markup and snippet texts raw after the JSON (its data table's
 * diagnostics may hold NaN or ±Infinity, which JSON.stringify would write as null: packed JSON keeps them).
 * @param downloads the folder's downloads, file name → text (correlationFiles)
 * @example fromPackedJson(pagePartsText(entry, downloads)).katex // => '0.16.…'
 */
export function pagePartsText(entry: CorrelationEntry, downloads: ReadonlyMap<string, string>): string {
  const snippets = Object.fromEntries(snippetKinds(entry.slug).filter((kind) => kind.kind !== 'typescript').map((kind) => [kind.kind, downloads.get(kind.file)!]));
  return toPackedJson(pageParts(entry, snippets));
}
