import { Router } from 'express';
import { boardSlugSchema, componentParamsSchema, componentsQuerySchema } from '@railyard/shared';
import type { BoardsService } from './boards.service';

export function boardsRouter(service: BoardsService): Router {
  const router = Router();

  router.get('/boards', async (_req, res) => {
    res.json({ boards: await service.listBoards() });
  });

  router.get('/boards/:slug', async (req, res) => {
    res.json(await service.getBoard(boardSlugSchema.parse(req.params.slug)));
  });

  router.get('/boards/:slug/nets', async (req, res) => {
    res.json(await service.listNets(boardSlugSchema.parse(req.params.slug)));
  });

  router.get('/boards/:slug/components', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const query = componentsQuerySchema.parse(req.query);
    res.json(await service.listComponents(slug, query.net));
  });

  router.get('/boards/:slug/placement', async (req, res) => {
    res.json(await service.getPlacement(boardSlugSchema.parse(req.params.slug)));
  });

  router.get('/boards/:slug/components/:refdes', async (req, res) => {
    const { slug, refdes } = componentParamsSchema.parse(req.params);
    res.json(await service.getComponent(slug, refdes));
  });

  return router;
}
