import { Router } from 'express';
import { requireAuth, requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { buildIdParamsSchema, buildsQuerySchema, changeStateBodySchema, createBuildBodySchema, patchBuildBodySchema, tickBodySchema } from './schemas';
import type { BuildsService } from './service';

/**
 * /api/builds — owners and designers plan builds and watch progress; builders see and work on the
 * builds assigned to them (403 on any other). Customers and instructors have no builds.
 */
export function buildsRouter(builds: BuildsService): Router {
  const router = Router();
  router.use(requireAuth);
  const staff = requireRole('owner', 'designer');
  const anyBuildRole = requireRole('owner', 'designer', 'builder');

  router.route('/').get(anyBuildRole).get(validate({ query: buildsQuerySchema }), async (req, res) => {
    res.json({ builds: await builds.list(req.user!, req.query.designId) });
  });

  router.route('/builders').get(staff).get(async (_req, res) => {
    res.json({ builders: await builds.assignableBuilders() });
  });

  router.route('/').post(staff).post(validate({ body: createBuildBodySchema }), async (req, res) => {
    res.status(201).json(await builds.create(req.user!, req.body));
  });

  router.route('/:id').get(anyBuildRole).get(validate({ params: buildIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    res.json(await builds.get(req.user!, id));
  });

  router.route('/:id').patch(staff).patch(validate({ params: buildIdParamsSchema, body: patchBuildBodySchema }), async (req, res) => {
    const { id } = req.params;
    res.json(await builds.update(req.user!, id, req.body));
  });

  router.route('/:id/state').post(anyBuildRole).post(validate({ params: buildIdParamsSchema, body: changeStateBodySchema }), async (req, res) => {
    const { id } = req.params;
    res.json(await builds.changeState(req.user!, id, req.body.state));
  });

  router.route('/:id/progress').post(requireRole('builder')).post(validate({ params: buildIdParamsSchema, body: tickBodySchema }), async (req, res) => {
    const { id } = req.params;
    res.json(await builds.tick(req.user!, id, req.body));
  });

  return router;
}
