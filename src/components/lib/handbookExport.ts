/**
 * The body of the two handbook-wide exports: `/handbook.json` (every fitted correlation) and
 * `/handbook-approved.json` (only those whose approval holds: the recorded fingerprint equals the current one; the
 * file a design tool should consume). Both are handbookJson (src/export/handbookJson.ts) over the same records,
 * as `JSON.stringify(…, null, 2)` and a line end. In a build, each correlation's record comes as the text the files
 * workers wrote beside its downloads (handbookEntryFile.ts), used when it was made with the same handbook identity;
 * otherwise (`astro dev`, entries holding their fit, a missing file) it is made here. Same bytes either way.
 */
import { correlationEntries } from './correlationEntries.ts';
import { version } from '../../../package.json';
import { handbookJson, type HandbookIdentity } from '../../export/index.ts';
import { isStoredFitReference } from '../../load/storedFit.ts';
import { filesWritten } from '../../loaders/pendingFiles.ts';
import { writtenBytes } from '../../loaders/writtenBytes.ts';
import { correlationDownloads } from './correlationDownloads.ts';
import { entryRecord } from './entryRecord.ts';
import type { CorrelationEntry } from './entryView.ts';
import { HANDBOOK_ENTRY_FILE, handbookEntryIdentity } from './handbookEntryFile.ts';
import { handbookEntryHead, handbookEntryTail } from './handbookEntryText.ts';
import { handbookJsonBytes } from './handbookJsonBytes.ts';
import { handbookSettings } from './handbookSettings.ts';

/** The record's part written by the files workers in this build for `handbook`, or undefined. */
function writtenHead(entry: CorrelationEntry, handbook: HandbookIdentity): Uint8Array | undefined {
  if (!import.meta.env.PROD || !isStoredFitReference(entry.fit)) return undefined;
  const bytes = writtenBytes(entry.fit, entry.slug, HANDBOOK_ENTRY_FILE);
  const line = bytes?.indexOf(10) ?? -1;
  if (bytes === undefined || line < 0 || bytes.toString('utf8', 0, line) !== handbookEntryIdentity(handbook)) return undefined;
  return bytes.subarray(line + 1);
}

/**
 * @param site Astro's configured site address, if any
 * @param include which fitted entries to list (default: all)
 * @returns the file's bytes (UTF-8)
 * @example await handbookExport(site, (entry) => entry.reviewTrail.approval === 'holds') // => handbook-approved.json
 */
export async function handbookExport(site: URL | undefined, include: (entry: CorrelationEntry) => boolean = () => true): Promise<Uint8Array<ArrayBuffer>> {
  const settings = await handbookSettings();
  const base = import.meta.env.BASE_URL.replace(/\/?$/, '/');
  const entries = (await correlationEntries()).map((entry) => entry.data).filter((entry) => entry.fit !== null && include(entry));
  entries.sort((a, b) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0));
  // The files are written while pages render (src/loaders/pendingFiles.ts); every folder is needed here.
  if (import.meta.env.PROD) await filesWritten();
  const handbook = handbookJson({
    generator: { name: 'correlary', version },
    handbook: {
      title: settings.title,
      organisation: settings.organisation,
      url: new URL(base, site ?? settings.url).href,
      basePath: base,
      notice: settings.notice,
    },
    correlations: [],
  });
  const correlations = entries.map((entry) => {
    const identity: HandbookIdentity = { title: settings.title, organisation: settings.organisation ?? null, notice: settings.notice ?? null, url: new URL(`${base}correlations/${entry.slug}/`, site ?? settings.url).href };
    const head = writtenHead(entry, identity) ?? handbookEntryHead(JSON.stringify(entryRecord(entry, identity), null, 2));
    return [head, handbookEntryTail(`${base}correlations/${entry.slug}/`, correlationDownloads(entry, base))] as const;
  });
  return handbookJsonBytes(JSON.stringify(handbook, null, 2), correlations);
}
