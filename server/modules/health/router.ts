import { Router } from 'express';
import type { Database } from '../../db/database';
import type { Logger } from '../../logger';

/** GET /api/health — answers 200 when the server and its database respond. */
export function healthRouter(db: Database, version: string, logger: Logger): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await db.sequelize.query('SELECT 1');
      res.set('Cache-Control', 'no-store').json({ status: 'ok', database: 'ok', version });
    } catch (error) {
      logger.error('Health check: the database did not answer', error);
      res.status(503).set('Cache-Control', 'no-store').json({ status: 'degraded', database: 'error', version });
    }
  });
  return router;
}
