import QRCode from 'qrcode';

/** The verify URL as a PNG data URL; margin 0 because the title block frames it. */
export function qrDataUrl(url: string): Promise<string> {
  return QRCode.toDataURL(url, { errorCorrectionLevel: 'M', margin: 0, width: 160 });
}
