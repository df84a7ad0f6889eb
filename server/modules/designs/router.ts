import { Router } from 'express';
import { createEmptyDesignDocument } from '../../domainBridge';
import { requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { requireValidDocument } from './documentCheck';
import { sendRevisionJson } from './revisionJson';
import { createDesignBodySchema, designIdParamsSchema, revisionParamsSchema, saveRevisionBodySchema } from './schemas';
import type { DesignsService } from './service';

/** /api/designs — designs and their revisions; owners and designers. */
export function designsRouter(designs: DesignsService): Router {
  const router = Router();
  router.use(requireRole('owner', 'designer'));

  router.get('/', async (_req, res) => {
    res.json({ designs: await designs.list() });
  });

  router.post('/', validate({ body: createDesignBodySchema }), async (req, res) => {
    const body = req.body;
    const document =
      body.document === undefined
        ? createEmptyDesignDocument({ name: body.name, systemId: body.systemId, units: body.units })
        : await requireValidDocument(body.document);
    // The request's name, system and units win over the imported document's, so the list shows what was typed.
    const named = { ...document, name: body.name, systemId: body.systemId, units: body.units ?? document.units };
    res.status(201).json(await designs.create(req.user!, named));
  });

  router.get('/:id', validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    const { design, revision } = await designs.getLatest(id);
    sendRevisionJson(res, { design }, revision.meta, revision.documentJson);
  });

  router.delete('/:id', validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    await designs.archive(id, req.user!);
    res.status(204).end();
  });

  router.get('/:id/revisions', validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    res.json({ revisions: await designs.listRevisions(id) });
  });

  router.post('/:id/revisions', validate({ params: designIdParamsSchema, body: saveRevisionBodySchema }), async (req, res) => {
    const { id } = req.params;
    const body = req.body;
    const document = await requireValidDocument(body.document);
    const revision = await designs.saveRevision(id, req.user!, body.baseRevision, {
      document,
      thumbnail: body.thumbnail,
      message: body.message || undefined,
    });
    // The revision's details only: the client already holds the document it sent.
    res.status(201).json({ revision: { ...revision.meta, profileCount: document.profiles.length } });
  });

  router.get('/:id/revisions/:number', validate({ params: revisionParamsSchema }), async (req, res) => {
    const { id, number } = req.params;
    const revision = await designs.getRevision(id, number);
    sendRevisionJson(res, {}, revision.meta, revision.documentJson);
  });

  router.get('/:id/revisions/:number/thumbnail', validate({ params: revisionParamsSchema }), async (req, res) => {
    const { id, number } = req.params;
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
