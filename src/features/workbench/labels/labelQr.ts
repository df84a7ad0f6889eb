import QRCode from 'qrcode';

/** The QR code of a label as a PNG data URL: medium error correction survives a scuffed label. */
export function labelQrDataUrl(url: string, pixels = 200): Promise<string> {
  return QRCode.toDataURL(url, { errorCorrectionLevel: 'M', margin: 1, width: pixels });
}
