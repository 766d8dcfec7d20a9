/**
 * The handbook identity that the downloads and code snippets of one correlation carry: the handbook's title,
 * organisation and notice (content/handbook.yaml) and the absolute address of the correlation's page (the site
 * address and base path, with any override of the build).
 */
import type { HandbookIdentity } from '../../export/index.ts';
import { handbookSettings } from './handbookSettings.ts';
import { identityOf } from './identityOf.ts';

/** @example (await handbookIdentity('water-cp')).url // => "https://handbook.example.org/handbook/correlations/water-cp/" */
export async function handbookIdentity(slug: string): Promise<HandbookIdentity> {
  return identityOf(slug, await handbookSettings(), import.meta.env.BASE_URL, import.meta.env.SITE);
}
