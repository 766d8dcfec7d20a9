/**
 * The handbook identity that the downloads and code snippets of one correlation carry: the handbook's title,
 * organisation and notice (content/handbook.yaml) and the absolute address of the correlation's page (the site
 * address and base path, with any override of the build).
 */
import type { HandbookIdentity } from '../../export/index.ts';
import { handbookSettings } from './handbookSettings.ts';

/** @example (await handbookIdentity('water-cp')).url // => "https://handbook.example.org/handbook/correlations/water-cp/" */
export async function handbookIdentity(slug: string): Promise<HandbookIdentity> {
  const settings = await handbookSettings();
  const base = import.meta.env.BASE_URL.replace(/\/?$/, '/');
  const site = import.meta.env.SITE || settings.url;
  return {
    title: settings.title,
    organisation: settings.organisation ?? null,
    notice: settings.notice ?? null,
    url: new URL(`${base}correlations/${slug}/`, site).href,
  };
}
