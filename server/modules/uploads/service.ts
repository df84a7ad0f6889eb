import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import type { Database } from '../../db/database';
import type { UploadModel } from '../../db/models/sharing';
import type { UserModel } from '../../db/models/user';
import { AppError, notFound } from '../../middleware/appError';
import { ALLOWED_TYPES, ARCHIVE_TYPES, UPLOAD_MAX_BYTES } from './schemas';

export interface UploadView {
  id: number;
  designId: number;
  name: string;
  mimeType: string;
  sizeBytes: number;
  kind: string;
  fileUrl: string;
  thumbnailUrl: string | null;
  uploadedBy: { id: number; displayName: string };
  createdAt: string;
}

export interface IncomingFile {
  originalName: string;
  claimedType: string;
  bytes: Buffer;
}

const THUMBNAIL_SIZE = 320;

const refuse = (code: string, message: string) => new AppError(400, code, message, { fields: { file: message } });

/** A file name a person gave, as a name only: no folders, no control characters, no "..". */
export function checkFileName(name: string): string {
  const trimmed = name.trim();
  if (!trimmed) throw refuse('invalid_file_name', 'The file has no name.');
  if (/[/\\]/.test(trimmed) || trimmed === '.' || trimmed === '..' || trimmed.includes('..')) {
    throw refuse('invalid_file_name', 'A file name cannot contain folders ("/", "\\" or "..").');
  }
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f]/.test(trimmed)) throw refuse('invalid_file_name', 'The file name contains control characters.');
  if (trimmed.length > 200) throw refuse('invalid_file_name', 'A file name is at most 200 characters.');
  return trimmed;
}

/**
 * Photos and PDF drawings attached to a design. The type comes from the bytes (file-type), never
 * from the name or the browser's claim; files live outside the served folder under random names;
 * images get a thumbnail from sharp. A refused file leaves nothing behind (it was only in memory).
 */
export function createUploadsService(db: Database, uploadsDir: string) {
  const { Design, Upload, User } = db.models;
  const pathOf = (storedName: string) => join(uploadsDir, storedName);
  const thumbPathOf = (storedName: string) => join(uploadsDir, `${storedName}.thumb.webp`);

  async function present(row: UploadModel): Promise<UploadView> {
    const author = await User.findByPk(row.uploadedBy, { attributes: ['id', 'displayName'] });
    return {
      id: row.id,
      designId: row.designId,
      name: row.originalName,
      mimeType: row.mimeType,
      sizeBytes: row.sizeBytes,
      kind: ALLOWED_TYPES[row.mimeType]?.label ?? row.mimeType,
      fileUrl: `/api/uploads/${row.id}/file`,
      thumbnailUrl: row.hasThumbnail ? `/api/uploads/${row.id}/thumbnail` : null,
      uploadedBy: { id: row.uploadedBy, displayName: author?.displayName ?? 'Former user' },
      createdAt: row.createdAt.toISOString(),
    };
  }

  async function liveDesign(designId: number) {
    const design = await Design.findByPk(designId, { attributes: ['id', 'archivedAt'] });
    if (!design || design.archivedAt) throw notFound('That design');
  }

  async function row(id: number): Promise<UploadModel> {
    const upload = await Upload.findByPk(id);
    if (!upload) throw notFound('That file');
    await liveDesign(upload.designId);
    return upload;
  }

  return {
    async list(designId: number): Promise<UploadView[]> {
      await liveDesign(designId);
      const rows = await Upload.findAll({ where: { designId }, order: [['createdAt', 'DESC'], ['id', 'DESC']] });
      return Promise.all(rows.map(present));
    },

    async add(actor: UserModel, designId: number, file: IncomingFile): Promise<UploadView> {
      await liveDesign(designId);
      const name = checkFileName(file.originalName);
      if (file.bytes.length === 0) throw refuse('empty_file', 'The file is empty.');
      if (file.bytes.length > UPLOAD_MAX_BYTES) throw new AppError(413, 'file_too_large', 'A file is at most 10 MB.', { fields: { file: 'A file is at most 10 MB' } });
      const detected = await fileTypeFromBuffer(file.bytes);
      if (detected && ARCHIVE_TYPES.has(detected.mime)) throw refuse('archive_refused', 'Archives (zip, tar, 7z and the like) are not accepted: attach the photos or PDFs themselves.');
      const allowed = detected ? ALLOWED_TYPES[detected.mime] : undefined;
      if (!detected || !allowed) throw refuse('unsupported_type', 'Attach a photo (JPEG, PNG, WebP) or a PDF drawing; this file is neither.');
      if (file.claimedType !== detected.mime) {
        throw refuse('type_mismatch', `The file says it is ${file.claimedType || 'of no type'} but its contents are a ${allowed.label}. Save it with the right type and try again.`);
      }

      const storedName = randomBytes(16).toString('hex');
      await mkdir(uploadsDir, { recursive: true });
      let hasThumbnail = false;
      try {
        await writeFile(pathOf(storedName), file.bytes, { flag: 'wx', mode: 0o600 });
        if (allowed.image) {
          const thumbnail = await sharp(file.bytes, { limitInputPixels: 100_000_000 })
            .rotate()
            .resize(THUMBNAIL_SIZE, THUMBNAIL_SIZE, { fit: 'inside', withoutEnlargement: true })
            .webp({ quality: 80 })
            .toBuffer()
            .catch(() => {
              throw refuse('unreadable_image', 'The image could not be read; it may be damaged.');
            });
          await writeFile(thumbPathOf(storedName), thumbnail, { flag: 'wx', mode: 0o600 });
          hasThumbnail = true;
        }
        const created = await db.write((transaction) =>
          Upload.create({ designId, originalName: name, storedName, mimeType: detected.mime, sizeBytes: file.bytes.length, hasThumbnail, uploadedBy: actor.id }, { transaction }),
        );
        return present(created);
      } catch (error) {
        await rm(pathOf(storedName), { force: true });
        await rm(thumbPathOf(storedName), { force: true });
        throw error;
      }
    },

    async file(id: number): Promise<{ upload: UploadModel; bytes: Buffer }> {
      const upload = await row(id);
      return { upload, bytes: await readFile(pathOf(upload.storedName)) };
    },

    async thumbnail(id: number): Promise<Buffer> {
      const upload = await row(id);
      if (!upload.hasThumbnail) throw notFound('That thumbnail');
      return readFile(thumbPathOf(upload.storedName));
    },

    /** Removes the file and its thumbnail. The uploader or the owner may. */
    async remove(actor: UserModel, id: number): Promise<void> {
      const upload = await row(id);
      if (actor.role !== 'owner' && upload.uploadedBy !== actor.id) throw new AppError(403, 'forbidden', 'Only the person who attached this file, or the shop owner, can delete it.');
      await db.write((transaction) => upload.destroy({ transaction }));
      await rm(pathOf(upload.storedName), { force: true });
      await rm(thumbPathOf(upload.storedName), { force: true });
    },
  };
}

export type UploadsService = ReturnType<typeof createUploadsService>;
