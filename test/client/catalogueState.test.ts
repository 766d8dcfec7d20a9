/** catalogueState: the catalogue's view in the URL query (URLSearchParams rules, WHATWG URL standard). */
import { describe, expect, it } from 'vitest';
import { queryFromState, stateFromQuery } from '../../src/client/catalogueState.ts';

describe('catalogueState', () => {
  it('stateFromQuery(query) reads search, filters and sort, ignoring unknown parameters', () => {
    expect(stateFromQuery('?q=corvane&material=Corvane-12+coolant&sort=n&dir=desc&x=1')).toEqual({
      q: 'corvane',
      property: '',
      material: 'Corvane-12 coolant',
      tag: '',
      status: '',
      sort: 'n',
      dir: 'desc',
    });
    expect(stateFromQuery('').dir).toBe('asc');
  });

  it('queryFromState(state) leaves out empty values and round-trips through stateFromQuery', () => {
    const state = stateFromQuery('?tag=alloy%20%26%20steel&status=in-review&sort=title');
    expect(queryFromState(state)).toBe('?tag=alloy+%26+steel&status=in-review&sort=title');
    expect(stateFromQuery(queryFromState(state))).toEqual(state);
    expect(queryFromState(stateFromQuery(''))).toBe('');
  });
});
