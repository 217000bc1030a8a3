// GET /api/dev/mailbox: what the mail catcher caught, newest first, and /api/dev/mailbox/:id/html one
// message's HTML part. Mounted only when the catcher is in use (outside production, no SMTP_URL), and
// then open to anyone: it holds only mail the development server itself sent, and reading it without
// signing in is what makes it useful in browser tests.
import { Router } from 'express';
import { z } from 'zod';
import { AppError } from '../../lib/app-error';
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

  // A message's HTML part as a page of its own, for the mailbox page's sandboxed frame. Mail carries
  // inline styles, which the app's policy refuses; this answer gets a policy of its own: nothing but
  // those styles and embedded images, no scripts, and framed by this site's pages only.
  router.get('/dev/mailbox/:id/html', (req, res) => {
    const id = z.coerce.number().int().positive().parse(req.params.id);
    const mail = catcher.messages().find((m) => m.id === id);
    if (!mail || mail.html === null)
      throw AppError.notFound(`Caught message ${id} with an HTML part`);
    res
      .set(
        'Content-Security-Policy',
        "default-src 'none'; style-src 'unsafe-inline'; img-src data:; frame-ancestors 'self'; sandbox",
      )
      .type('html')
      .send(mail.html);
  });

  return router;
}
