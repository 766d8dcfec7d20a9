/**
 * Full-text search of the catalogue in the browser: loads the index built at build time (search-index.json,
 * MiniSearch) once, then answers each query with the matching slugs in order of relevance. No server.
 */
import MiniSearch from 'minisearch';
import { SEARCH_OPTIONS, type SearchDocument } from './searchOptions.ts';

export interface CatalogueSearch {
  /** Slugs matching every word of `query`, best first. */
  search(query: string): string[];
}

/** Load the static index from `href`. */
export async function loadCatalogueSearch(href: string): Promise<CatalogueSearch> {
  const response = await fetch(href);
  if (!response.ok) throw new Error(`search index ${href}: HTTP ${response.status}`);
  const index = MiniSearch.loadJSON<SearchDocument>(await response.text(), SEARCH_OPTIONS);
  return {
    search(query: string): string[] {
      return index.search(query).map((result) => String(result.id));
    },
  };
}
