import { Router } from 'express';
import { requireRole } from '../../middleware/requireAuth';
import type { MailService } from './mailService';

/** /api/outbox — the messages the local fake SMTP server received; the owner only. */
export function outboxRouter(mail: MailService): Router {
  const router = Router();
  router.use(requireRole('owner'));
  router.get('/', (_req, res) => {
    res.json({ mode: mail.mode, messages: mail.outbox() });
  });
  return router;
}
