import { Router } from 'express';
import { requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { presentUser } from './present';
import { createUserBodySchema, patchUserBodySchema, userIdParamsSchema } from './schemas';
import type { UsersService } from './service';

/** /api/users — the shop's accounts; owners only. */
export function usersRouter(users: UsersService): Router {
  const router = Router();
  router.use(requireRole('owner'));

  router.get('/', async (_req, res) => {
    const list = await users.list();
    res.json({ users: list.map(presentUser) });
  });

  router.post('/', validate({ body: createUserBodySchema }), async (req, res) => {
    const user = await users.create(req.body);
    res.status(201).json({ user: presentUser(user) });
  });

  router.patch('/:id', validate({ params: userIdParamsSchema, body: patchUserBodySchema }), async (req, res) => {
    const { id } = req.params;
    const user = await users.update(req.user!, id, req.body);
    res.json({ user: presentUser(user) });
  });

  return router;
}
