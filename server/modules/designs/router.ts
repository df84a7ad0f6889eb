import { Router, type RequestHandler } from 'express';
import type { z } from 'zod';
import { createEmptyDesignDocument } from '../../domainBridge';
import type { UserModel } from '../../db/models/user';
import { requireAuth, requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { requireValidDocument } from './documentCheck';
import { sendRevisionJson } from './revisionJson';
import { createDesignBodySchema, designIdParamsSchema, revisionParamsSchema, saveRevisionBodySchema } from './schemas';
import type { DesignsService } from './service';

type DesignParams = z.output<typeof designIdParamsSchema>;
type RevisionParams = z.output<typeof revisionParamsSchema>;

export interface DesignsRouterOptions {
  /** Whether a builder may read a revision (they are assigned to a build of it). */
  builderMayRead?: (user: UserModel, designId: number, revision: number) => Promise<boolean>;
}

/**
 * /api/designs — designs and their revisions; owners and designers. A builder assigned to a build
 * may read that build's revision and its picture, and nothing else here.
 */
export function designsRouter(designs: DesignsService, options: DesignsRouterOptions = {}): Router {
  const router = Router();
  const staff = requireRole('owner', 'designer');
  const staffOrAssignedBuilder: RequestHandler = async (req, res, next) => {
    const { id, number } = req.params as unknown as RevisionParams;
    if (req.user?.role === 'builder' && options.builderMayRead && (await options.builderMayRead(req.user, id, number))) return next();
    staff(req, res, next);
  };
  router.use(requireAuth);

  router.get('/', staff, async (_req, res) => {
    res.json({ designs: await designs.list() });
  });

  router.post('/', staff, validate({ body: createDesignBodySchema }), async (req, res) => {
    const body = req.body as z.output<typeof createDesignBodySchema>;
    const document =
      body.document === undefined
        ? createEmptyDesignDocument({ name: body.name, systemId: body.systemId, units: body.units })
        : await requireValidDocument(body.document);
    // The request's name, system and units win over the imported document's, so the list shows what was typed.
    const named = { ...document, name: body.name, systemId: body.systemId, units: body.units ?? document.units };
    res.status(201).json(await designs.create(req.user!, named));
  });

  router.get('/:id', staff, validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params as unknown as DesignParams;
    const { design, revision } = await designs.getLatest(id);
    sendRevisionJson(res, { design }, revision.meta, revision.documentJson);
  });

  router.delete('/:id', staff, validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params as unknown as DesignParams;
    await designs.archive(id, req.user!);
    res.status(204).end();
  });

  router.get('/:id/revisions', staff, validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params as unknown as DesignParams;
    res.json({ revisions: await designs.listRevisions(id) });
  });

  router.post('/:id/revisions', staff, validate({ params: designIdParamsSchema, body: saveRevisionBodySchema }), async (req, res) => {
    const { id } = req.params as unknown as DesignParams;
    const body = req.body as z.output<typeof saveRevisionBodySchema>;
    const document = await requireValidDocument(body.document);
    const revision = await designs.saveRevision(id, req.user!, body.baseRevision, {
      document,
      thumbnail: body.thumbnail,
      message: body.message || undefined,
    });
    res.status(201);
    sendRevisionJson(res, {}, revision.meta, revision.documentJson);
  });

  router.get('/:id/revisions/:number', validate({ params: revisionParamsSchema }), staffOrAssignedBuilder, async (req, res) => {
    const { id, number } = req.params as unknown as RevisionParams;
    const revision = await designs.getRevision(id, number);
    sendRevisionJson(res, {}, revision.meta, revision.documentJson);
  });

  router.get('/:id/revisions/:number/thumbnail', validate({ params: revisionParamsSchema }), staffOrAssignedBuilder, async (req, res) => {
    const { id, number } = req.params as unknown as RevisionParams;
    const png = await designs.getThumbnail(id, number);
    // A revision never changes, so its picture can be cached for good (privately: it needs a session).
    res
      .set({
        'Content-Type': 'image/png',
        'Cache-Control': 'private, max-age=31536000, immutable',
        'X-Content-Type-Options': 'nosniff',
        'Content-Disposition': `inline; filename="design-${id}-revision-${number}.png"`,
        'Content-Security-Policy': "default-src 'none'; sandbox",
      })
      .send(png);
  });

  return router;
}
