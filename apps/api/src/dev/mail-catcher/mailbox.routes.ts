// GET /api/dev/mailbox: what the mail catcher caught, newest first. Mounted only when the catcher is in
// use (outside production, no SMTP_URL), and then open to anyone: it holds only mail the development
// server itself sent, and reading it without signing in is what makes it useful in browser tests.
import { Router } from 'express';
import { z } from 'zod';
import type { MailCatcher } from './mail-catcher';

const mailboxQuery = z.strictObject({
  /** only messages to this address (envelope or header) */
  to: z.string().trim().min(1).max(320).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});

export function mailboxRouter(catcher: MailCatcher): Router {
  const router = Router();

  router.get('/dev/mailbox', (req, res) => {
    const { to, limit } = mailboxQuery.parse(req.query);
    const wanted = to?.toLowerCase();
    const messages = catcher
      .messages()
      .filter((m) => !wanted || [...m.envelopeTo, ...m.to].some((a) => a.toLowerCase() === wanted))
      .slice(-limit)
      .reverse();
    res.json({ messages });
  });

  return router;
}
