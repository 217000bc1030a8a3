import { Router } from 'express';
import { z } from 'zod';
import { boardSlugSchema, treeQuerySchema } from '@railyard/shared';
import type { PowerTreeService } from './power-tree.service';

const netNameSchema = z.string().min(1).max(200);

export function powerTreeRouter(service: PowerTreeService): Router {
  const router = Router();

  router.get('/boards/:slug/tree', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const query = treeQuerySchema.parse(req.query);
    res.type('json').send(await service.getTreeJson(slug, null, query.direction, query.depth));
  });

  router.get('/boards/:slug/nets/:net', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    res.json(await service.getNetDetail(slug, netNameSchema.parse(req.params.net)));
  });

  router.get('/boards/:slug/nets/:net/tree', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const query = treeQuerySchema.parse(req.query);
    const net = netNameSchema.parse(req.params.net);
    res.type('json').send(await service.getTreeJson(slug, net, query.direction, query.depth));
  });

  return router;
}
