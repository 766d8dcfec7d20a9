/**
 * `/handbook.json`: every fitted correlation of the handbook as one machine-readable file (src/export/handbookJson.ts),
 * described by `/handbook.schema.json`.
 */
import type { APIRoute } from 'astro';
import { getCollection } from 'astro:content';
import { version } from '../../package.json';
import { correlationDownloads } from '../components/lib/correlationDownloads.ts';
import { entryRecord } from '../components/lib/entryRecord.ts';
import { fitOf } from '../components/lib/entryView.ts';
import { handbookSettings } from '../components/lib/handbookSettings.ts';
import { handbookJson } from '../export/index.ts';

export const GET: APIRoute = async ({ site }) => {
  const settings = await handbookSettings();
  const base = import.meta.env.BASE_URL.replace(/\/?$/, '/');
  const entries = (await getCollection('correlations')).map((entry) => entry.data).filter((entry) => fitOf(entry) !== null);
  entries.sort((a, b) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0));
  const json = handbookJson({
    generator: { name: 'correlary', version },
    handbook: {
      title: settings.title,
      organisation: settings.organisation,
      url: new URL(base, site ?? settings.url).href,
      basePath: base,
      notice: settings.notice,
    },
    correlations: entries.map((entry) => ({
      record: entryRecord(entry),
      url: `${base}correlations/${entry.slug}/`,
      downloads: correlationDownloads(entry, base),
    })),
  });
  return new Response(`${JSON.stringify(json, null, 2)}\n`, { headers: { 'Content-Type': 'application/json; charset=utf-8' } });
};
