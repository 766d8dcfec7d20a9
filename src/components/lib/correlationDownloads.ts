/**
 * The downloads of one correlation page, kind → path inside the site (base path included): the one list that the
 * page's download links and handbook.json's `downloads` share.
 */
import { snippetFiles } from './entrySnippets.ts';
import type { CorrelationEntry } from './entryView.ts';

/** @example correlationDownloads(entry, '/')['json'] // => '/correlations/<slug>/coefficients.json' */
export function correlationDownloads(entry: CorrelationEntry, basePath: string): Record<string, string> {
  const folder = `${basePath.replace(/\/?$/, '/')}correlations/${entry.slug}/`;
  return {
    json: `${folder}coefficients.json`,
    csv: `${folder}coefficients.csv`,
    data: `${folder}data.csv`,
    plot: `${folder}plot.svg`,
    ...Object.fromEntries(Object.entries(snippetFiles(entry.slug)).map(([kind, file]) => [kind, `${folder}${file}`])),
  };
}
