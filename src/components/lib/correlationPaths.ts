/**
 * Static paths for the per-correlation routes (the page and its downloads): one per stored entry, the entry as
 * props. Downloads exist only for entries with a fit.
 */
import { correlationEntries } from './correlationEntries.ts';

export async function correlationPaths(options: { readonly fittedOnly?: boolean } = {}) {
  const entries = await correlationEntries();
  return entries
    .filter((entry) => !options.fittedOnly || entry.data.fit !== null)
    .map((entry) => ({ params: { slug: entry.id }, props: { entry: entry.data } }));
}
