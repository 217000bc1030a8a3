import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { boardSlugSchema, treeQuerySchema } from '@railyard/shared';
import type { TraceJson } from './power-graph-cache';
import type { PowerTreeService } from './power-tree.service';

const netNameSchema = z.string().min(1).max(200);

/**
 * With the tag already set, Express skips hashing the body but still answers 304 to a matching
 * If-None-Match. Gzipped from the cache when the client accepts it: one weak tag stands for both
 * encodings, which carry the same JSON (RFC 9110 §8.8.1).
 */
function sendTrace(req: Request, res: Response, trace: TraceJson) {
  res.vary('Accept-Encoding').set('ETag', trace.etag).type('json');
  if (req.acceptsEncodings('gzip', 'identity') === 'gzip') {
    res.set('Content-Encoding', 'gzip').send(trace.gzipped);
  } else {
    res.send(trace.bytes);
  }
}

export function powerTreeRouter(service: PowerTreeService): Router {
  const router = Router();

  router.get('/boards/:slug/tree', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const query = treeQuerySchema.parse(req.query);
    sendTrace(req, res, await service.getTreeJson(slug, null, query.direction, query.depth));
  });

  router.get('/boards/:slug/nets/:net', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    res.json(await service.getNetDetail(slug, netNameSchema.parse(req.params.net)));
  });

  router.get('/boards/:slug/nets/:net/tree', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const query = treeQuerySchema.parse(req.query);
    const net = netNameSchema.parse(req.params.net);
    sendTrace(req, res, await service.getTreeJson(slug, net, query.direction, query.depth));
  });

  return router;
}
