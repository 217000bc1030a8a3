import { Router } from 'express';
import { railSearchQuerySchema } from '@railyard/shared';
import type { SearchService } from './search.service';

export function searchRouter(service: SearchService): Router {
  const router = Router();
  router.get('/search', async (req, res) => {
    const { q, limit, board } = railSearchQuerySchema.parse(req.query);
    res.json(await service.searchRails(q, limit, board));
  });
  return router;
}
