/**
 * `/search-index.json`: the full-text index of the catalogue (titles, materials, properties, tags, sources), built
 * once at build time so that search works on the static site with no server. Loaded by src/client/catalogueSearch.ts.
 */
import type { APIRoute } from 'astro';
import { correlationEntries } from '../components/lib/correlationEntries.ts';
import MiniSearch from 'minisearch';
import { SEARCH_OPTIONS, type SearchDocument } from '../client/searchOptions.ts';

export const GET: APIRoute = async () => {
  // In slug order, whatever order the collection comes in (two builds of the same handbook once gave it in two
  // orders, and the index's document numbers with it; the usual order is this one, so the bytes are the usual ones).
  const entries = (await correlationEntries()).map((entry) => entry.data).sort((a, b) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0));
  const index = new MiniSearch<SearchDocument>(SEARCH_OPTIONS);
  index.addAll(
    entries.map((entry) => ({
      id: entry.slug,
      title: entry.meta.title,
      material: [entry.meta.material.name, entry.meta.material.grade, entry.meta.material.phase].filter(Boolean).join(' '),
      property: `${entry.meta.property.name} ${entry.meta.variable.name}`,
      tags: entry.meta.tags.join(' '),
      source: [entry.meta.source.citation, entry.meta.source.method].filter(Boolean).join(' '),
    })),
  );
  return new Response(JSON.stringify(index), { headers: { 'Content-Type': 'application/json' } });
};
