import { Router, type RequestHandler } from 'express';
import { createEmptyDesignDocument } from '../../domainBridge';
import type { Role, UserModel } from '../../db/models/user';
import type { HotReads } from '../../hotReads';
import { requireAuth, requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { requireValidDocument } from './documentCheck';
import { sendRevisionJson } from './revisionJson';
import { createDesignBodySchema, designIdParamsSchema, revisionParamsSchema, saveRevisionBodySchema } from './schemas';
import type { DesignsService } from './service';

export interface DesignsRouterOptions {
  /** Whether a builder may read a revision (they are assigned to a build of it). */
  builderMayRead?: (user: UserModel, designId: number, revision: number) => Promise<boolean>;
  /** Keeps the list's and design reads' answers for repeats (server/hotReads.ts). */
  hotReads?: Pick<HotReads, 'rememberDesignsList' | 'rememberDesign'>;
}

/** Who may list and read designs. */
export const DESIGN_LIST_ROLES = ['owner', 'designer'] as const satisfies readonly Role[];

/**
 * /api/designs — designs and their revisions; owners and designers. A builder assigned to a build
 * may read that build's revision and its picture, and nothing else here.
 */
export function designsRouter(designs: DesignsService, options: DesignsRouterOptions = {}): Router {
  const router = Router();
  const staff = requireRole(...DESIGN_LIST_ROLES);
  const staffOrAssignedBuilder: RequestHandler = async (req, res, next) => {
    const params = revisionParamsSchema.safeParse(req.params);
    if (req.user?.role === 'builder' && params.success && options.builderMayRead && (await options.builderMayRead(req.user, params.data.id, params.data.number))) return next();
    staff(req, res, next);
  };
  router.use(requireAuth);

  router.route('/').get(staff).get(async (req, res) => {
    const text = JSON.stringify({ designs: await designs.list() });
    res.type('application/json').send(text);
    options.hotReads?.rememberDesignsList(req, text);
  });

  router.route('/').post(staff).post(validate({ body: createDesignBodySchema }), async (req, res) => {
    const body = req.body;
    const document =
      body.document === undefined
        ? createEmptyDesignDocument({ name: body.name, systemId: body.systemId, units: body.units })
        : await requireValidDocument(body.document);
    // The request's name, system and units win over the imported document's, so the list shows what was typed.
    const named = { ...document, name: body.name, systemId: body.systemId, units: body.units ?? document.units };
    res.status(201).json(await designs.create(req.user!, named));
  });

  router.route('/:id').get(staff).get(validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    const { design, revision } = await designs.getLatest(id);
    const text = sendRevisionJson(res, { design }, revision.meta, revision.documentJson);
    options.hotReads?.rememberDesign(req, id, text);
  });

  router.route('/:id').delete(staff).delete(validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    await designs.archive(id, req.user!);
    res.status(204).end();
  });

  router.route('/:id/revisions').get(staff).get(validate({ params: designIdParamsSchema }), async (req, res) => {
    const { id } = req.params;
    res.json({ revisions: await designs.listRevisions(id) });
  });

  router.route('/:id/revisions').post(staff).post(validate({ params: designIdParamsSchema, body: saveRevisionBodySchema }), async (req, res) => {
    const { id } = req.params;
    const body = req.body;
    // The revision it was edited from, if still in memory: its unchanged parts need no new check.
    const document = await requireValidDocument(body.document, 'document', designs.parsedRevision(id, body.baseRevision));
    const revision = await designs.saveRevision(id, req.user!, body.baseRevision, {
      document,
      thumbnail: body.thumbnail,
      message: body.message || undefined,
    });
    // The revision's details only: the client already holds the document it sent.
    res.status(201).json({ revision: { ...revision.meta, profileCount: document.profiles.length } });
  });

  router.route('/:id/revisions/:number').get(staffOrAssignedBuilder).get(validate({ params: revisionParamsSchema }), async (req, res) => {
    const { id, number } = req.params;
    const revision = await designs.getRevision(id, number);
    sendRevisionJson(res, {}, revision.meta, revision.documentJson);
  });

  router.route('/:id/revisions/:number/thumbnail').get(staffOrAssignedBuilder).get(validate({ params: revisionParamsSchema }), async (req, res) => {
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
