/**
 * The catalogue in the browser: filters (property, material, tag, review status), full-text search and column
 * sorting over the rows the page already lists. The state is read from and written to the URL (catalogueState),
 * so a filtered view can be linked and survives a reload. Rows are only hidden and reordered, never rebuilt.
 */
import { loadCatalogueSearch, type CatalogueSearch } from './catalogueSearch.ts';
import { FILTER_NAMES, queryFromState, stateFromQuery, type CatalogueState } from './catalogueState.ts';

interface Row {
  readonly element: HTMLTableRowElement;
  readonly slug: string;
  readonly title: string;
  readonly index: number;
  readonly tags: readonly string[];
}

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

function cellText(row: HTMLTableRowElement, column: number): string {
  return row.cells[column]?.textContent?.trim() ?? '';
}

function cellNumber(row: HTMLTableRowElement, column: number): number {
  return Number(row.cells[column]?.dataset['value'] ?? NaN);
}

/** Compare two rows by the column `key` (header order: title, material, property, range, n, order, status). */
function compareBy(key: string, columns: readonly string[]): (a: Row, b: Row) => number {
  const column = columns.indexOf(key);
  if (column < 0) return (a, b) => a.index - b.index;
  if (['range', 'n', 'order'].includes(key)) return (a, b) => cellNumber(a.element, column) - cellNumber(b.element, column) || a.index - b.index;
  return (a, b) => collator.compare(cellText(a.element, column), cellText(b.element, column)) || a.index - b.index;
}

/** Wire up the catalogue on this page; resolves once the initial state (including a search from the URL) is shown. */
export async function mountCatalogue(root: Document = document): Promise<void> {
  const form = root.querySelector<HTMLFormElement>('[data-catalogue-controls]');
  const table = root.querySelector<HTMLTableElement>('[data-catalogue-table]');
  const countElement = root.querySelector<HTMLElement>('[data-catalogue-count]');
  const emptyElement = root.querySelector<HTMLElement>('[data-catalogue-empty]');
  if (!form || !table || !countElement || !emptyElement) return;
  const count: HTMLElement = countElement;
  const empty: HTMLElement = emptyElement;
  const body = table.tBodies[0]!;
  const rows: Row[] = [...body.rows].map((element, index) => ({
    element,
    slug: element.dataset['slug'] ?? '',
    title: cellText(element, 0),
    index,
    tags: JSON.parse(element.dataset['tags'] ?? '[]') as string[],
  }));
  const headers = [...table.tHead!.rows[0]!.cells];
  const columns = headers.map((cell) => cell.dataset['sortKey'] ?? '');
  const input = form.querySelector<HTMLInputElement>('input[name="q"]')!;
  let state = stateFromQuery(location.search);
  let search: CatalogueSearch | null = null;
  let searchLoading: Promise<CatalogueSearch> | null = null;

  const ensureSearch = (): Promise<CatalogueSearch> => {
    searchLoading ??= loadCatalogueSearch(form.dataset['indexHref'] ?? 'search-index.json').then((loaded) => (search = loaded));
    return searchLoading;
  };

  const sortButtons = headers.map((cell) => {
    const key = cell.dataset['sortKey'];
    if (!key) return null;
    const button = root.createElement('button');
    button.type = 'button';
    button.className = 'sort-button';
    button.textContent = cell.textContent ?? key;
    button.addEventListener('click', () => {
      const dir = state.sort === key && state.dir === 'asc' ? 'desc' : 'asc';
      show({ ...state, sort: key, dir });
    });
    cell.replaceChildren(button);
    return button;
  });

  function show(next: CatalogueState): void {
    state = next;
    const ranking = new Map<string, number>();
    if (state.q !== '' && search) search.search(state.q).forEach((slug, rank) => ranking.set(slug, rank));
    const visible = rows.filter((row) => {
      const data = row.element.dataset;
      if (state.property !== '' && data['property'] !== state.property) return false;
      if (state.material !== '' && data['material'] !== state.material) return false;
      if (state.status !== '' && data['status'] !== state.status) return false;
      if (state.tag !== '' && !row.tags.includes(state.tag)) return false;
      if (state.q !== '' && search && !ranking.has(row.slug)) return false;
      return true;
    });
    const byColumn = compareBy(state.sort === '' ? 'title' : state.sort, columns);
    const ordered = [...visible].sort((a, b) => {
      if (state.sort === '' && state.q !== '') return ranking.get(a.slug)! - ranking.get(b.slug)!;
      return state.dir === 'desc' ? byColumn(b, a) : byColumn(a, b);
    });
    const shown = new Set(ordered);
    for (const row of rows) row.element.hidden = !shown.has(row);
    body.append(...ordered.map((row) => row.element), ...rows.filter((row) => !shown.has(row)).map((row) => row.element));
    headers.forEach((cell, i) => {
      const key = columns[i];
      if (key && key === (state.sort || (state.q === '' ? 'title' : ''))) cell.setAttribute('aria-sort', state.dir === 'desc' ? 'descending' : 'ascending');
      else cell.removeAttribute('aria-sort');
      sortButtons[i]?.setAttribute('aria-label', `Sort by ${cell.textContent?.trim() ?? key}`);
    });
    const filtered = ordered.length < rows.length;
    count.textContent = filtered ? `${ordered.length} of ${rows.length} correlations match.` : `${rows.length} correlations.`;
    empty.hidden = ordered.length > 0;
    const query = queryFromState(state);
    if (query !== location.search) history.replaceState(null, '', `${location.pathname}${query}${location.hash}`);
  }

  const fromForm = (): CatalogueState => {
    const values = Object.fromEntries(FILTER_NAMES.map((name) => [name, (form.elements.namedItem(name) as HTMLSelectElement).value]));
    return { ...state, ...values, q: input.value.trim() };
  };
  const fillForm = () => {
    input.value = state.q;
    for (const name of FILTER_NAMES) {
      const select = form.elements.namedItem(name) as HTMLSelectElement;
      select.value = [...select.options].some((option) => option.value === state[name]) ? state[name] : '';
    }
  };

  let timer: ReturnType<typeof setTimeout> | undefined;
  input.addEventListener('input', () => {
    clearTimeout(timer);
    timer = setTimeout(() => {
      const next = fromForm();
      if (next.q !== '' && search === null) void ensureSearch().then(() => show(fromForm()));
      else show(next);
    }, 120);
  });
  form.addEventListener('change', (event) => {
    if (event.target !== input) show(fromForm());
  });
  form.addEventListener('submit', (event) => event.preventDefault());
  for (const clear of root.querySelectorAll<HTMLButtonElement>('[data-catalogue-clear]')) {
    clear.addEventListener('click', () => {
      state = { ...stateFromQuery(''), sort: state.sort, dir: state.dir };
      fillForm();
      show(state);
      input.focus();
    });
  }

  form.hidden = false;
  fillForm();
  if (state.q !== '') {
    try {
      await ensureSearch();
    } catch (caught) {
      count.textContent = 'The search index could not be loaded; the filters still work.';
      console.error(caught);
    }
  }
  show(state);
  form.dataset['ready'] = 'true';
}
