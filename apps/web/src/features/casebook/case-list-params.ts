// The case list's filters live in the address (?net=VSYS&outcome=solved&q=no+boot&page=2), so a
// filtered list can be bookmarked or sent to a colleague. Anything unreadable in the address is
// dropped rather than refused: a hand-edited link still opens a list.
import type { CaseOutcome, CaseSort } from '@railyard/shared';
import type { QueryParams } from '../../lib/api-client';
import { casesPerPage, outcomesInOrder, queryMaxLength, sortsInOrder } from './case-vocabulary';

export type CaseListFilters = {
  net?: string;
  component?: string;
  outcome?: CaseOutcome;
  q?: string;
  sort?: CaseSort;
  page: number;
  /** the viewer's own drafts instead of published cases */
  drafts: boolean;
};

const lastPage = 10_000;

function text(params: URLSearchParams, name: string, max: number): string | undefined {
  const value = params.get(name)?.trim();
  return value ? value.slice(0, max) : undefined;
}

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((candidate) => candidate === value);
}

export function filtersFromSearch(params: URLSearchParams): CaseListFilters {
  const q = text(params, 'q', queryMaxLength);
  let sort = oneOf(sortsInOrder, params.get('sort'));
  // ranking by match needs something to match
  if (sort === 'relevance' && !q) sort = undefined;
  const page = Number(params.get('page'));
  const filters: CaseListFilters = {
    page: Number.isInteger(page) && page >= 1 && page <= lastPage ? page : 1,
    drafts: params.get('drafts') === '1',
  };
  const net = text(params, 'net', 200);
  const component = text(params, 'component', 64);
  const outcome = oneOf(outcomesInOrder, params.get('outcome'));
  if (net) filters.net = net;
  if (component) filters.component = component;
  if (outcome) filters.outcome = outcome;
  if (q) filters.q = q;
  if (sort) filters.sort = sort;
  return filters;
}

/** The address's query for these filters; defaults are left out, so links stay short. */
export function searchFromFilters(filters: CaseListFilters): Record<string, string> {
  const search: Record<string, string> = {};
  if (filters.drafts) search.drafts = '1';
  if (filters.net) search.net = filters.net;
  if (filters.component) search.component = filters.component;
  if (filters.outcome) search.outcome = filters.outcome;
  if (filters.q) search.q = filters.q;
  if (filters.sort) search.sort = filters.sort;
  if (filters.page > 1) search.page = String(filters.page);
  return search;
}

/** The query of GET /boards/:slug/cases for these filters. */
export function listQueryOf(filters: CaseListFilters): QueryParams {
  return {
    status: filters.drafts ? 'draft' : undefined,
    net: filters.net,
    component: filters.component,
    outcome: filters.outcome,
    q: filters.q,
    sort: filters.sort,
    page: filters.page > 1 ? filters.page : undefined,
    pageSize: casesPerPage,
  };
}

/** The sort the API applies when none is asked for: by match when searching, by rating otherwise. */
export function effectiveSort(filters: Pick<CaseListFilters, 'q' | 'sort'>): CaseSort {
  return filters.sort ?? (filters.q ? 'relevance' : 'rank');
}

/** "21–40 of 57": the rows shown, counted from 1. */
export function pageRange(page: number, pageSize: number, total: number) {
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return { first, last, pages: Math.max(1, Math.ceil(total / pageSize)) };
}
