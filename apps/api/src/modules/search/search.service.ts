import { normalizeNetName } from '@railyard/board-analysis';
import type { RailSearchResponse } from '@railyard/shared';
import type { SearchRepository } from './search.repository';

export function createSearchService(repo: SearchRepository) {
  return {
    async searchRails(query: string, limit: number, board?: string): Promise<RailSearchResponse> {
      const key = normalizeNetName(query);
      if (key === '') return { query, groups: [] };
      const hits = await repo.searchRails(key, limit, board);
      const groups = new Map<string, RailSearchResponse['groups'][number]>();
      for (const hit of hits) {
        let group = groups.get(hit.slug);
        if (!group) groups.set(hit.slug, (group = { board: { slug: hit.slug, title: hit.title }, nets: [] }));
        group.nets.push({
          name: hit.name,
          kind: hit.kind,
          nominalVoltage: hit.nominal_voltage,
          matchedAlias: hit.alias,
          score: hit.score,
        });
      }
      // boards in the order of their best hit
      return { query, groups: [...groups.values()] };
    },
  };
}

export type SearchService = ReturnType<typeof createSearchService>;
