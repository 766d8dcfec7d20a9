/**
 * The handbook identity of one correlation's downloads (see handbookIdentity.ts) from the settings, the base path
 * and the configured site address: pure, so the content loader, which writes the downloads, computes it the same
 * way as the pages.
 */
import type { HandbookIdentity } from '../../export/index.ts';
import type { HandbookSettings } from '../../schema/index.ts';

/**
 * The configured site address, when set, wins over the settings' url.
 * @example identityOf('water-cp', settings, '/handbook/', undefined).url // => "<settings.url origin>/handbook/correlations/water-cp/"
 */
export function identityOf(slug: string, settings: HandbookSettings, basePath: string, site: string | undefined): HandbookIdentity {
  const base = basePath.replace(/\/?$/, '/');
  return {
    title: settings.title,
    organisation: settings.organisation ?? null,
    notice: settings.notice ?? null,
    url: new URL(`${base}correlations/${slug}/`, site || settings.url).href,
  };
}
