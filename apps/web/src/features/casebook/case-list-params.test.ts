import { caseListQuerySchema } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import {
  effectiveSort,
  filtersFromSearch,
  listQueryOf,
  pageRange,
  searchFromFilters,
} from './case-list-params';

const read = (query: string) => filtersFromSearch(new URLSearchParams(query));

function withoutUndefined(params: Record<string, unknown>) {
  return Object.fromEntries(Object.entries(params).filter(([, v]) => v !== undefined));
}

describe('case list filters in the address', () => {
  it('reads every filter back from the address it wrote', () => {
    const filters = read('net=VSYS&component=C1013&outcome=solved&q=no+boot&sort=newest&page=3');
    expect(filters).toEqual({
      net: 'VSYS',
      component: 'C1013',
      outcome: 'solved',
      q: 'no boot',
      sort: 'newest',
      page: 3,
      drafts: false,
    });
    expect(read(new URLSearchParams(searchFromFilters(filters)).toString())).toEqual(filters);
  });

  it('drops what it cannot read instead of failing the page', () => {
    expect(read('outcome=fixed&sort=loudest&page=-2')).toEqual({ page: 1, drafts: false });
    expect(read('page=2.5').page).toBe(1);
  });

  it('does not sort by match without a search text', () => {
    expect(read('sort=relevance').sort).toBeUndefined();
    expect(read('q=short&sort=relevance').sort).toBe('relevance');
  });

  it('leaves the defaults out of the address', () => {
    expect(searchFromFilters({ page: 1, drafts: false })).toEqual({});
  });

  it('asks the API in a form its contract accepts', () => {
    // packages/shared/src/casebook.ts: caseListQuerySchema is what the API parses the query with
    const query = withoutUndefined(listQueryOf(read('drafts=1&net=VSYS&q=dead&page=2')));
    const parsed = caseListQuerySchema.parse(
      Object.fromEntries(Object.entries(query).map(([k, v]) => [k, String(v)])),
    );
    expect(parsed).toMatchObject({ status: 'draft', net: 'VSYS', q: 'dead', page: 2 });
  });

  it('names the sort the API applies when none is chosen', () => {
    expect(effectiveSort({})).toBe('rank');
    expect(effectiveSort({ q: 'dead' })).toBe('relevance');
    expect(effectiveSort({ q: 'dead', sort: 'newest' })).toBe('newest');
  });

  it('counts the rows of a page from 1', () => {
    // 57 rows in pages of 20: 1–20, 21–40, 41–57, three pages
    expect(pageRange(2, 20, 57)).toEqual({ first: 21, last: 40, pages: 3 });
    expect(pageRange(3, 20, 57)).toEqual({ first: 41, last: 57, pages: 3 });
    expect(pageRange(1, 20, 0)).toEqual({ first: 0, last: 0, pages: 1 });
  });
});
