import { Router, type Request, type RequestHandler } from 'express';
import { z } from 'zod';
import {
  boardSlugSchema,
  caseConfirmationInputSchema,
  caseCreateSchema,
  idParamSchema,
  caseListQuerySchema,
  caseMergeInputSchema,
  casePageQuerySchema,
  caseUpdateSchema,
  caseVoteInputSchema,
  commentDeleteQuerySchema,
  commentInputSchema,
  commentUpdateSchema,
  flagListQuerySchema,
  moderationInputSchema,
  similarCasesQuerySchema,
} from '@railyard/shared';
import { requireJsonBody } from '../../middleware/csrf-guard';
import { requireRole } from '../../middleware/require-role';
import type { CaseModerationAction, CasebookService, Viewer } from './casebook.service';

const caseModerationActions: CaseModerationAction[] = ['lock', 'unlock', 'hide', 'restore'];

const netName = z.string().min(1).max(200);
const refdes = z.string().min(1).max(64);

const viewer = (req: Request): Viewer => (req.user ? { id: req.user.id, role: req.user.role } : null);
const idParam = (req: Request) => idParamSchema.parse(req.params.id);

export function casebookRouter(service: CasebookService, writeLimit: RequestHandler): Router {
  const router = Router();
  // the role guard comes first on every write, so 401 and 403 are decided before the body is read
  const member = requireRole('member');
  const moderator = requireRole('moderator');

  router.get('/boards/:slug/cases/similar', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    res.json(await service.similar(slug, similarCasesQuerySchema.parse(req.query), viewer(req)));
  });

  router.get('/boards/:slug/cases', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    res.json(await service.list(slug, caseListQuerySchema.parse(req.query), viewer(req)));
  });

  router.post('/boards/:slug/cases', member, writeLimit, requireJsonBody, async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const created = await service.create(slug, caseCreateSchema.parse(req.body), req.user!);
    res.status(201).location(`/api/cases/${created.id}`).json({ case: created });
  });

  router.get('/boards/:slug/nets/:net/cases', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    res.json(await service.listForNet(slug, netName.parse(req.params.net), casePageQuerySchema.parse(req.query), viewer(req)));
  });

  router.get('/boards/:slug/components/:refdes/cases', async (req, res) => {
    const slug = boardSlugSchema.parse(req.params.slug);
    const page = casePageQuerySchema.parse(req.query);
    res.json(await service.listForComponent(slug, refdes.parse(req.params.refdes), page, viewer(req)));
  });

  router.get('/cases/:id', async (req, res) => {
    const found = await service.get(idParam(req), viewer(req));
    if ('mergedInto' in found) {
      // not cached: an admin may undo the merge, and a browser keeps a cached 301 for good
      res.status(301).set('Cache-Control', 'no-store').location(`/api/cases/${found.mergedInto.id}`).json(found);
      return;
    }
    res.json(found);
  });

  router.patch('/cases/:id', member, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    res.json({ case: await service.update(id, caseUpdateSchema.parse(req.body), req.user!) });
  });

  router.delete('/cases/:id', member, writeLimit, async (req, res) => {
    await service.remove(idParam(req), req.user!);
    res.status(204).end();
  });

  router.get('/cases/:id/revisions', async (req, res) => {
    res.json(await service.revisions(idParam(req), viewer(req)));
  });

  router.put('/cases/:id/vote', member, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    const { value } = caseVoteInputSchema.parse(req.body);
    res.json(await service.vote(id, value, req.user!));
  });

  router.delete('/cases/:id/vote', member, writeLimit, async (req, res) => {
    res.json(await service.removeVote(idParam(req), req.user!));
  });

  router.get('/cases/:id/confirmations', async (req, res) => {
    res.json(await service.confirmations(idParam(req), viewer(req)));
  });

  router.post('/cases/:id/confirmation', member, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    const { note } = caseConfirmationInputSchema.parse(req.body);
    const { created, score } = await service.confirm(id, note, req.user!);
    res.status(created ? 201 : 200).json({ score });
  });

  router.delete('/cases/:id/confirmation', member, writeLimit, async (req, res) => {
    res.json(await service.removeConfirmation(idParam(req), req.user!));
  });

  router.get('/cases/:id/comments', async (req, res) => {
    res.json(await service.comments(idParam(req), viewer(req)));
  });

  router.post('/cases/:id/comments', member, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    const { body } = commentInputSchema.parse(req.body);
    res.status(201).json({ comment: await service.addComment(id, body, req.user!) });
  });

  router.patch('/comments/:id', member, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    const { body, reason } = commentUpdateSchema.parse(req.body);
    res.json({ comment: await service.editComment(id, body, reason, req.user!) });
  });

  router.delete('/comments/:id', member, writeLimit, async (req, res) => {
    const id = idParam(req);
    const { reason } = commentDeleteQuerySchema.parse(req.query);
    await service.deleteComment(id, reason, req.user!);
    res.status(204).end();
  });

  for (const action of caseModerationActions) {
    router.post(`/cases/:id/${action}`, moderator, writeLimit, requireJsonBody, async (req, res) => {
      const id = idParam(req);
      const { reason } = moderationInputSchema.parse(req.body);
      res.json({ case: await service.moderateCase(id, action, reason, req.user!) });
    });
  }

  router.post('/cases/:id/merge', moderator, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    res.json(await service.merge(id, caseMergeInputSchema.parse(req.body), req.user!));
  });

  for (const action of ['hide', 'restore'] as const) {
    router.post(`/comments/:id/${action}`, moderator, writeLimit, requireJsonBody, async (req, res) => {
      const id = idParam(req);
      const { reason } = moderationInputSchema.parse(req.body);
      res.json({ comment: await service.moderateComment(id, action, reason, req.user!) });
    });
  }

  router.post('/cases/:id/flag', member, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    const { reason } = moderationInputSchema.parse(req.body);
    res.status(201).json({ flag: await service.flag('case', id, reason, req.user!) });
  });

  router.post('/comments/:id/flag', member, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    const { reason } = moderationInputSchema.parse(req.body);
    res.status(201).json({ flag: await service.flag('comment', id, reason, req.user!) });
  });

  router.get('/moderation/flags', moderator, async (req, res) => {
    res.json(await service.flags(flagListQuerySchema.parse(req.query).status));
  });

  router.post('/moderation/flags/:id/resolve', moderator, writeLimit, requireJsonBody, async (req, res) => {
    const id = idParam(req);
    const { reason } = moderationInputSchema.parse(req.body);
    res.json({ flag: await service.resolveFlag(id, reason, req.user!) });
  });

  return router;
}

/**
 * The web pages of a merged-away case (`/cases/:id`, `/cases/:id/history`) answer a real redirect to
 * the case it ended up in, so old links and bookmarks land there; anything else goes on to the app shell.
 */
export function mergedCasePagesRouter(service: CasebookService): Router {
  const router = Router();
  for (const suffix of ['', '/history']) {
    router.get(`/cases/:id${suffix}`, async (req, res, next) => {
      const id = idParamSchema.safeParse(req.params.id);
      const destination = id.success ? await service.mergeDestination(id.data) : null;
      if (destination === null) return next();
      // the kept case's page tells the reader where the old link went
      const query = new URL(req.originalUrl, 'http://localhost').searchParams;
      if (!query.has('mergedFrom')) query.set('mergedFrom', String(id.data));
      // not cached: an admin may undo the merge, and a browser keeps a cached 301 for good
      res.set('Cache-Control', 'no-store').redirect(301, `/cases/${destination}${suffix}?${query.toString()}`);
    });
  }
  return router;
}
