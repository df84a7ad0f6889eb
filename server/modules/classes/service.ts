import type { Database } from '../../db/database';
import type { ClassModel } from '../../db/models/sharing';
import type { UserModel } from '../../db/models/user';
import { notFound } from '../../middleware/appError';
import type { LinkView, LinksService, NewLink } from '../links/service';

export interface ClassView {
  id: number;
  name: string;
  description: string;
  expiresAt: string | null;
  revokedAt: string | null;
  createdAt: string;
  /** Not revoked and not past its expiry. */
  active: boolean;
  links: LinkView[];
  /** Opens of all its links. */
  openCount: number;
}

/** Classes: an instructor's named group of read-only links with one expiry for the whole group. */
export function createClassesService(db: Database, links: LinksService) {
  const { Class, ShareLink } = db.models;

  function present(row: ClassModel, classLinks: LinkView[]): ClassView {
    const now = Date.now();
    return {
      id: row.id,
      name: row.name,
      description: row.description,
      expiresAt: row.expiresAt ? row.expiresAt.toISOString() : null,
      revokedAt: row.revokedAt ? row.revokedAt.toISOString() : null,
      createdAt: row.createdAt.toISOString(),
      active: !row.revokedAt && !(row.expiresAt && row.expiresAt.getTime() <= now),
      links: classLinks,
      openCount: classLinks.reduce((sum, link) => sum + link.openCount, 0),
    };
  }

  /** The class if the actor may manage it (its instructor, or the owner); otherwise 404. */
  async function owned(actor: UserModel, id: number): Promise<ClassModel> {
    const row = await Class.findByPk(id);
    if (!row || (actor.role !== 'owner' && row.createdBy !== actor.id)) throw notFound('That class');
    return row;
  }

  async function view(actor: UserModel, row: ClassModel): Promise<ClassView> {
    return present(row, await links.list(actor, { classIds: [row.id] }));
  }

  return {
    async list(actor: UserModel): Promise<ClassView[]> {
      const rows = await Class.findAll({ where: actor.role === 'owner' ? {} : { createdBy: actor.id }, order: [['createdAt', 'DESC'], ['id', 'DESC']] });
      const all = await links.list(actor, { classIds: rows.map((row) => row.id) });
      return rows.map((row) => present(row, all.filter((link) => link.classId === row.id)));
    },

    async get(actor: UserModel, id: number): Promise<ClassView> {
      return view(actor, await owned(actor, id));
    },

    async create(actor: UserModel, input: { name: string; description?: string; expiresAt?: Date | null }): Promise<ClassView> {
      const row = await db.write((transaction) =>
        Class.create({ name: input.name, description: input.description ?? '', expiresAt: input.expiresAt ?? null, createdBy: actor.id }, { transaction }),
      );
      return present(row, []);
    },

    async update(actor: UserModel, id: number, changes: { name?: string; description?: string; expiresAt?: Date | null }): Promise<ClassView> {
      const row = await owned(actor, id);
      await db.write(async (transaction) => {
        if (changes.name !== undefined) row.name = changes.name;
        if (changes.description !== undefined) row.description = changes.description;
        if (changes.expiresAt !== undefined) row.expiresAt = changes.expiresAt;
        await row.save({ transaction });
      });
      return view(actor, row);
    },

    async addLink(actor: UserModel, id: number, input: NewLink): Promise<{ link: LinkView; token: string; path: string }> {
      const row = await owned(actor, id);
      if (row.revokedAt) throw notFound('That class');
      return links.create(actor, { ...input, label: input.label || row.name }, row.id);
    },

    /** Revokes the class and every link in it. */
    async revoke(actor: UserModel, id: number): Promise<ClassView> {
      const row = await owned(actor, id);
      await db.write(async (transaction) => {
        const now = new Date();
        if (!row.revokedAt) {
          row.revokedAt = now;
          await row.save({ transaction });
        }
        await ShareLink.update({ revokedAt: now }, { where: { classId: row.id, revokedAt: null }, transaction });
      });
      return view(actor, row);
    },
  };
}

export type ClassesService = ReturnType<typeof createClassesService>;
