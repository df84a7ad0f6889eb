import { z } from 'zod';
import { positiveWhole } from '../designs/schemas';

export const designParamsSchema = z.object({ designId: positiveWhole('A design id') });
export const uploadParamsSchema = z.object({ id: positiveWhole('An upload id') });

/** 10 MB: a phone photo or a drawing set. */
export const UPLOAD_MAX_BYTES = 10 * 1024 * 1024;

/** What may be attached, by the type found in the bytes. */
export const ALLOWED_TYPES: Record<string, { label: string; image: boolean }> = {
  'image/jpeg': { label: 'JPEG photo', image: true },
  'image/png': { label: 'PNG image', image: true },
  'image/webp': { label: 'WebP image', image: true },
  'application/pdf': { label: 'PDF drawing', image: false },
};

/** Archive types the byte sniffer recognises; refused with their own message. */
export const ARCHIVE_TYPES = new Set([
  'application/zip', 'application/x-tar', 'application/gzip', 'application/x-bzip2', 'application/x-7z-compressed',
  'application/x-rar-compressed', 'application/x-xz', 'application/zstd', 'application/x-lzip', 'application/x-cpio',
  'application/vnd.ms-cab-compressed', 'application/x-compress', 'application/x-lzh-compressed', 'application/java-archive',
]);
