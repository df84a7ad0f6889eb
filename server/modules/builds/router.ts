import { Router } from 'express';
import type { z } from 'zod';
import { requireAuth, requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { buildIdParamsSchema, buildsQuerySchema, changeStateBodySchema, createBuildBodySchema, patchBuildBodySchema, tickBodySchema, type CreateBuildBody, type PatchBuildBody, type TickBody } from './schemas';
import type { BuildsService } from './service';

type BuildParams = z.output<typeof buildIdParamsSchema>;

/**
 * /api/builds — owners and designers plan builds and watch progress; builders see and work on the
 * builds assigned to them (403 on any other). Customers and instructors have no builds.
 */
export function buildsRouter(builds: BuildsService): Router {
  const router = Router();
  router.use(requireAuth);
  const staff = requireRole('owner', 'designer');
  const anyBuildRole = requireRole('owner', 'designer', 'builder');

  router.get('/', anyBuildRole, validate({ query: buildsQuerySchema }), async (req, res) => {
    const query = req.query as unknown as z.output<typeof buildsQuerySchema>;
    res.json({ builds: await builds.list(req.user!, query.designId) });
  });

  router.get('/builders', staff, async (_req, res) => {
    res.json({ builders: await builds.assignableBuilders() });
  });

  router.post('/', staff, validate({ body: createBuildBodySchema }), async (req, res) => {
    res.status(201).json(await builds.create(req.user!, req.body as CreateBuildBody));
  });

  router.get('/:id', anyBuildRole, validate({ params: buildIdParamsSchema }), async (req, res) => {
    const { id } = req.params as unknown as BuildParams;
    res.json(await builds.get(req.user!, id));
  });

  router.patch('/:id', staff, validate({ params: buildIdParamsSchema, body: patchBuildBodySchema }), async (req, res) => {
    const { id } = req.params as unknown as BuildParams;
    res.json(await builds.update(req.user!, id, req.body as PatchBuildBody));
  });

  router.post('/:id/state', anyBuildRole, validate({ params: buildIdParamsSchema, body: changeStateBodySchema }), async (req, res) => {
    const { id } = req.params as unknown as BuildParams;
    res.json(await builds.changeState(req.user!, id, (req.body as z.output<typeof changeStateBodySchema>).state));
  });

  router.post('/:id/progress', requireRole('builder'), validate({ params: buildIdParamsSchema, body: tickBodySchema }), async (req, res) => {
    const { id } = req.params as unknown as BuildParams;
    res.json(await builds.tick(req.user!, id, req.body as TickBody));
  });

  return router;
}
