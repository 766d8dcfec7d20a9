/**
 * Options of the handbook's full-text index (MiniSearch), shared by the build-time index (src/pages/search-index.json.ts)
 * and the browser, which must load the index with the same options. Searches every word as a prefix with a little
 * fuzziness (typos of about one letter in five), all words required; titles and materials weigh double.
 */
export interface SearchDocument {
  readonly id: string;
  readonly title: string;
  readonly material: string;
  readonly property: string;
  readonly tags: string;
  readonly source: string;
}

export const SEARCH_OPTIONS = {
  idField: 'id',
  fields: ['title', 'material', 'property', 'tags', 'source'],
  storeFields: [] as string[],
  searchOptions: {
    prefix: true,
    fuzzy: 0.2,
    combineWith: 'AND' as const,
    boost: { title: 2, material: 2 },
  },
};
