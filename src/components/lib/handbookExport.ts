/**
 * The body of the two handbook-wide exports: `/handbook.json` (every fitted correlation) and
 * `/handbook-approved.json` (only those whose approval holds: the recorded fingerprint equals the current one; the
 * file a design tool should consume). Both are handbookJson (src/export/handbookJson.ts) over the same records.
 */
import { correlationEntries } from './correlationEntries.ts';
import { version } from '../../../package.json';
import { handbookJson } from '../../export/index.ts';
import { correlationDownloads } from './correlationDownloads.ts';
import { entryRecord } from './entryRecord.ts';
import type { CorrelationEntry } from './entryView.ts';
import { handbookSettings } from './handbookSettings.ts';

/**
 * @param site Astro's configured site address, if any
 * @param include which fitted entries to list (default: all)
 * @example await handbookExport(site, (entry) => entry.reviewTrail.approval === 'holds') // => handbook-approved.json data
 */
export async function handbookExport(site: URL | undefined, include: (entry: CorrelationEntry) => boolean = () => true) {
  const settings = await handbookSettings();
  const base = import.meta.env.BASE_URL.replace(/\/?$/, '/');
  const entries = (await correlationEntries()).map((entry) => entry.data).filter((entry) => entry.fit !== null && include(entry));
  entries.sort((a, b) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0));
  return handbookJson({
    generator: { name: 'correlary', version },
    handbook: {
      title: settings.title,
      organisation: settings.organisation,
      url: new URL(base, site ?? settings.url).href,
      basePath: base,
      notice: settings.notice,
    },
    correlations: entries.map((entry) => ({
      record: entryRecord(entry, { title: settings.title, organisation: settings.organisation ?? null, notice: settings.notice ?? null, url: new URL(`${base}correlations/${entry.slug}/`, site ?? settings.url).href }),
      url: `${base}correlations/${entry.slug}/`,
      downloads: correlationDownloads(entry, base),
    })),
  });
}
