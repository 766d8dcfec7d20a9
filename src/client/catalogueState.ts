/**
 * The catalogue's view state (search words, filters, sort) and its place in the URL query, so that a filtered,
 * sorted view can be linked and survives a reload: `?q=corvane&property=density&sort=n&dir=desc`.
 */
export interface CatalogueState {
  readonly q: string;
  readonly property: string;
  readonly material: string;
  readonly tag: string;
  readonly status: string;
  /** Column key to sort by ('' = by title, or by relevance while searching). */
  readonly sort: string;
  readonly dir: 'asc' | 'desc';
}

export const FILTER_NAMES = ['property', 'material', 'tag', 'status'] as const;

/** The state a query string describes; unknown parameters are ignored. @example stateFromQuery('?tag=alloy').tag // => "alloy" */
export function stateFromQuery(query: string): CatalogueState {
  const params = new URLSearchParams(query);
  const get = (name: string) => params.get(name)?.trim() ?? '';
  return {
    q: get('q'),
    property: get('property'),
    material: get('material'),
    tag: get('tag'),
    status: get('status'),
    sort: get('sort'),
    dir: get('dir') === 'desc' ? 'desc' : 'asc',
  };
}

/** The query string of a state, empty values left out. @example queryFromState({ ...state, tag: 'alloy' }) // => "?tag=alloy" */
export function queryFromState(state: CatalogueState): string {
  const params = new URLSearchParams();
  for (const name of ['q', ...FILTER_NAMES, 'sort'] as const) if (state[name] !== '') params.set(name, state[name]);
  if (state.sort !== '' && state.dir === 'desc') params.set('dir', 'desc');
  const text = params.toString();
  return text === '' ? '' : `?${text}`;
}
