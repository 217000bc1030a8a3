import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { boardSlugSchema, netUpdateSchema, powerLinkCreateSchema, rootNetUpdateSchema } from '@railyard/shared';
import { requireJsonBody } from '../../middleware/csrf-guard';
import { requireRole } from '../../middleware/require-role';
import type { BoardEditsService } from './board-edits.service';

const netName = z.string().min(1).max(200);
const linkId = z.coerce.number().int().positive();
const linksQuery = z.strictObject({ net: netName.optional() });
const removeQuery = z.strictObject({ reason: z.string().max(500).default('') });

export function boardEditsRouter(service: BoardEditsService, writeLimit: RequestHandler): Router {
  const router = Router();
  const moderator = requireRole('moderator');

  router.get('/boards/:slug/power-links', async (req, res) => {
    const { net } = linksQuery.parse(req.query);
    res.json({ links: await service.listLinks(boardSlugSchema.parse(req.params.slug), net) });
  });

  router.post('/boards/:slug/power-links', moderator, writeLimit, requireJsonBody, async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const link = await service.addLink(slug, powerLinkCreateSchema.parse(req.body), req.user!.id);
    res.status(201).json({ link });
  });

  router.delete('/boards/:slug/power-links/:id', moderator, writeLimit, async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const { reason } = removeQuery.parse(req.query);
    await service.removeLink(slug, linkId.parse(req.params.id), req.user!.id, reason);
    res.status(204).end();
  });

  router.patch('/boards/:slug/nets/:net', moderator, writeLimit, requireJsonBody, async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const net = await service.updateNet(slug, netName.parse(req.params.net), netUpdateSchema.parse(req.body), req.user!.id);
    res.json({ net });
  });

  router.put('/boards/:slug/root', moderator, writeLimit, requireJsonBody, async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const body = rootNetUpdateSchema.parse(req.body);
    res.json(await service.setRoot(slug, body.net, req.user!.id, body.reason));
  });

  return router;
}
