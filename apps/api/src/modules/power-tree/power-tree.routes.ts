import { Router, type Response } from 'express';
import { z } from 'zod';
import { boardSlugSchema, treeQuerySchema } from '@railyard/shared';
import type { TraceJson } from './power-graph-cache';
import type { PowerTreeService } from './power-tree.service';

const netNameSchema = z.string().min(1).max(200);

/** With the tag already set, Express skips hashing the body but still answers 304 to a matching If-None-Match. */
function sendTrace(res: Response, trace: TraceJson) {
  res.set('ETag', trace.etag).type('json').send(trace.bytes);
}

export function powerTreeRouter(service: PowerTreeService): Router {
  const router = Router();

  router.get('/boards/:slug/tree', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const query = treeQuerySchema.parse(req.query);
    sendTrace(res, await service.getTreeJson(slug, null, query.direction, query.depth));
  });

  router.get('/boards/:slug/nets/:net', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    res.json(await service.getNetDetail(slug, netNameSchema.parse(req.params.net)));
  });

  router.get('/boards/:slug/nets/:net/tree', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const query = treeQuerySchema.parse(req.query);
    const net = netNameSchema.parse(req.params.net);
    sendTrace(res, await service.getTreeJson(slug, net, query.direction, query.depth));
  });

  return router;
}
