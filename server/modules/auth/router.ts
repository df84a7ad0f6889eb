import { Router, type RequestHandler } from 'express';
import type { AppPassport } from './passport';
import { AppError } from '../../middleware/appError';
import { requireAuth } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { presentUser } from '../users/present';
import { changePasswordBodySchema, patchMeBodySchema, signInBodySchema } from './schemas';
import type { AuthService } from './service';
import { SESSION_COOKIE_NAME, sessionCookieClearOptions } from './sessionMiddleware';

export const INVALID_CREDENTIALS_MESSAGE = 'That email and password do not match an active account.';

/** /api/auth — sign in and out, and the signed-in user's own account. */
export function authRouter(deps: { auth: AuthService; passport: AppPassport; signInLimiter: RequestHandler }): Router {
  const { auth, passport, signInLimiter } = deps;
  const router = Router();

  router.post('/sign-in', signInLimiter, validate({ body: signInBodySchema }), (req, res, next) => {
    passport.authenticate('local', { session: false }, (error: unknown, user: Express.User | false) => {
      if (error) return next(error);
      // One answer for unknown, wrong and deactivated accounts: it must not reveal which.
      if (!user) return next(new AppError(401, 'invalid_credentials', INVALID_CREDENTIALS_MESSAGE));
      // passport 0.7 regenerates the session here, so a planted session id never becomes signed in.
      req.login(user, (loginError) => {
        if (loginError) return next(loginError);
        res.json({ user: presentUser(user) });
      });
    })(req, res, next);
  });

  router.post('/sign-out', (req, res, next) => {
    if (!req.session) return void res.status(204).end();
    req.session.destroy((error) => {
      if (error) return next(error);
      res.clearCookie(SESSION_COOKIE_NAME, sessionCookieClearOptions(req.secure));
      res.status(204).end();
    });
  });

  // Who is signed in: null for an anonymous visitor (or an ended session). Asking is not a failure, so it
  // answers 200 either way and a visitor's browser logs no failed request on every page.
  router.get('/me', (req, res) => {
    res.json({ user: req.user ? presentUser(req.user) : null });
  });

  router.patch('/me', requireAuth, validate({ body: patchMeBodySchema }), async (req, res) => {
    const user = await auth.updateProfile(req.user!, req.body);
    res.json({ user: presentUser(user) });
  });

  router.post('/me/password', requireAuth, validate({ body: changePasswordBodySchema }), async (req, res) => {
    const { currentPassword, newPassword } = req.body;
    await auth.changePassword(req.user!, currentPassword, newPassword, req.sessionID);
    res.status(204).end();
  });

  return router;
}
