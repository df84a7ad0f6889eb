import { Router } from 'express';
import type { AppConfig } from '../../config';
import { requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { publicBaseUrl } from '../../publicUrl';
import { classLinkBodySchema } from '../links/schemas';
import { classIdParamsSchema, createClassBodySchema, patchClassBodySchema } from './schemas';
import type { ClassesService } from './service';

/** /api/classes — an instructor's classes (the owner sees all). */
export function classesRouter(deps: { classes: ClassesService; config: AppConfig }): Router {
  const { classes, config } = deps;
  const router = Router();
  router.use(requireRole('instructor', 'owner'));

  router.get('/', async (req, res) => {
    res.json({ classes: await classes.list(req.user!) });
  });

  router.post('/', validate({ body: createClassBodySchema }), async (req, res) => {
    res.status(201).json({ class: await classes.create(req.user!, req.body) });
  });

  router.get('/:id', validate({ params: classIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    res.json({ class: await classes.get(req.user!, id) });
  });

  router.patch('/:id', validate({ params: classIdParamsSchema, body: patchClassBodySchema }), async (req, res) => {
    const { id } = req.params;
    res.json({ class: await classes.update(req.user!, id, req.body) });
  });

  router.post('/:id/links', validate({ params: classIdParamsSchema, body: classLinkBodySchema }), async (req, res) => {
    const { id } = req.params;
    const created = await classes.addLink(req.user!, id, req.body);
    res.status(201).json({ link: created.link, token: created.token, url: `${publicBaseUrl(req, config)}${created.path}` });
  });

  /** Revokes the class and all its links. */
  router.delete('/:id', validate({ params: classIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    res.json({ class: await classes.revoke(req.user!, id) });
  });

  return router;
}
