export const THUMBNAIL_MAX_BYTES = 400 * 1024;
const DATA_URL_PREFIX = 'data:image/png;base64,';
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** Decodes a PNG data URL, trusting the bytes rather than the declared type. */
export function decodeThumbnail(dataUrl: string): { ok: true; png: Buffer } | { ok: false; message: string } {
  if (!dataUrl.startsWith(DATA_URL_PREFIX)) {
    return { ok: false, message: 'A thumbnail must be a PNG data URL starting with data:image/png;base64,' };
  }
  const base64 = dataUrl.slice(DATA_URL_PREFIX.length);
  if (!/^[A-Za-z0-9+/]*={0,2}$/.test(base64) || base64.length % 4 !== 0) {
    return { ok: false, message: 'The thumbnail is not valid base64' };
  }
  const png = Buffer.from(base64, 'base64');
  if (png.length > THUMBNAIL_MAX_BYTES) {
    return { ok: false, message: `A thumbnail is at most 400 KB; this one is ${Math.ceil(png.length / 1024)} KB` };
  }
  if (png.length < PNG_SIGNATURE.length + 12 || !png.subarray(0, PNG_SIGNATURE.length).equals(PNG_SIGNATURE)) {
    return { ok: false, message: 'The thumbnail is not a PNG image' };
  }
  return { ok: true, png };
}
