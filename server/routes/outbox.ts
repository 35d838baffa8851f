import { Router } from 'express';
import type { CapturedMail } from '../mail/local-smtp';

/** Development only (never mounted in production): the mail the local SMTP fake caught. */
export function outboxRouter(outbox: { messages: () => CapturedMail[] }): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    res.json({ messages: outbox.messages() });
  });
  return router;
}
