import { Router, type RequestHandler } from 'express';
import type { AppConfig } from '../../config';
import { validate } from '../../middleware/validate';
import { publicBaseUrl } from '../../publicUrl';
import type { PasswordResets } from './passwordReset';
import { passwordResetConfirmBodySchema, passwordResetRequestBodySchema } from './schemas';

export const RESET_REQUESTED_MESSAGE = 'If an account uses that email address, a message with a reset link is on its way. The link works once, for an hour.';

/** /api/auth/password-reset — ask for a reset link, then use it. No session needed. */
export function passwordResetRouter(deps: { resets: PasswordResets; config: AppConfig; limiter: RequestHandler }): Router {
  const router = Router();
  router.post('/', deps.limiter, validate({ body: passwordResetRequestBodySchema }), async (req, res) => {
    const { email } = req.body;
    await deps.resets.request(email, publicBaseUrl(req, deps.config));
    res.status(202).json({ message: RESET_REQUESTED_MESSAGE });
  });
  router.post('/confirm', deps.limiter, validate({ body: passwordResetConfirmBodySchema }), async (req, res) => {
    const { token, newPassword } = req.body;
    await deps.resets.confirm(token, newPassword);
    res.status(204).end();
  });
  return router;
}
