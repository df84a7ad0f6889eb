import { Router } from 'express';
import { QueryTypes } from 'sequelize';
import type { Database } from '../../db/database';
import { sqliteDateToIso } from '../../db/dates';
import { analyze } from '../../domainBridge';
import { requireRole } from '../../middleware/requireAuth';
import { validate } from '../../middleware/validate';
import { requireValidDocument } from '../designs/documentCheck';
import type { DesignsService } from '../designs/service';
import { analysisCsv } from './csv';
import { bomDiff, cutListDiff } from './diff';
import { designParamsSchema, diffQuerySchema, exportParamsSchema, exportQuerySchema, importBodySchema } from './schemas';

export type ApprovalState = 'approved' | 'changes_requested' | 'not_reviewed';

/** A file name made from a design name: letters, digits and dashes. */
export const fileStem = (name: string) => name.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-+|-+$/g, '').toLowerCase() || 'design';

/**
 * /api/designs/:designId/history, /diff, /export/:file — revision history with approval state,
 * a bill-of-materials and cut-list comparison of two revisions, and exports (owner, designer).
 */
export function revisionsRouter(deps: { db: Database; designs: DesignsService }): Router {
  const { db, designs } = deps;
  const router = Router({ mergeParams: true });
  // Mounted at /api/designs/:designId beside the designs router: guard only these paths, so the
  // designs router's own rules (an assigned builder may read a revision) still apply to the rest.
  router.use(['/history', '/diff', '/export'], requireRole('owner', 'designer'));

  router.get('/history', validate({ params: designParamsSchema }), async (req, res) => {
    const { designId } = req.params;
    const revisions = await designs.listRevisions(designId);
    const decisions = await db.sequelize.query<{ revision: number; decision: Exclude<ApprovalState, 'not_reviewed'>; byName: string; at: string }>(
      `SELECT r.revision_number AS revision, r.decision AS decision, u.display_name AS byName, r.created_at AS at
         FROM review_decisions r JOIN users u ON u.id = r.decided_by WHERE r.design_id = :designId ORDER BY r.created_at, r.id`,
      { replacements: { designId }, type: QueryTypes.SELECT },
    );
    // The newest decision on a revision is its state.
    const latest = new Map(decisions.map((row) => [row.revision, row]));
    res.json({
      revisions: revisions.map((revision) => {
        const decision = latest.get(revision.number);
        return {
          ...revision,
          approval: decision ? { state: decision.decision, by: decision.byName, at: sqliteDateToIso(decision.at) } : { state: 'not_reviewed' as const, by: null, at: null },
        };
      }),
    });
  });

  router.get('/diff', validate({ params: designParamsSchema, query: diffQuerySchema }), async (req, res) => {
    const { designId } = req.params;
    const { from, to } = req.query;
    const [before, after] = await Promise.all([designs.getRevision(designId, from), designs.getRevision(designId, to)]);
    const analysisOf = async (json: string) => analyze(await requireValidDocument(JSON.parse(json)));
    const [a, b] = [await analysisOf(before.documentJson), await analysisOf(after.documentJson)];
    res.json({ from, to, bom: bomDiff(a, b), cutList: cutListDiff(a, b) });
  });

  router.get('/export/:file', validate({ params: exportParamsSchema, query: exportQuerySchema }), async (req, res) => {
    const { designId, file } = req.params;
    const { revision: number } = req.query;
    const latest = await designs.getLatest(designId);
    const revision = number === undefined ? latest.revision : await designs.getRevision(designId, number);
    const stem = `${fileStem(latest.design.name)}-r${revision.meta.number}`;
    if (file === 'design.json') {
      res.attachment(`${stem}.json`).type('application/json').send(revision.documentJson);
      return;
    }
    const analysis = analyze(await requireValidDocument(JSON.parse(revision.documentJson)));
    const table = file === 'bom.csv' ? 'bom' : 'cutlist';
    res.attachment(`${stem}-${table}.csv`).type('text/csv; charset=utf-8').send(analysisCsv(analysis, table));
  });

  return router;
}

/** /api/designs/import — a new design from a design document file; nothing is written on a bad file. */
export function importRouter(designs: DesignsService): Router {
  const router = Router();
  router.use(requireRole('owner', 'designer'));
  router.post('/', validate({ body: importBodySchema }), async (req, res) => {
    const { document } = req.body;
    const parsed = await requireValidDocument(document);
    res.status(201).json(await designs.create(req.user!, parsed, { message: 'Imported from a file' }));
  });
  return router;
}
