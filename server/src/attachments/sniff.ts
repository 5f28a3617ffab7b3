import { stripInvisible } from '@holdfast/shared';

/** What the bytes of an upload say they are; the file name never decides. */
export type SniffedType =
  'application/pdf' | 'image/png' | 'image/jpeg' | 'text/plain' | 'text/csv';

const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function startsWith(buf: Buffer, bytes: number[]): boolean {
  return buf.length >= bytes.length && bytes.every((b, i) => buf[i] === b);
}

/** C0 control bytes other than tab, LF, FF and CR never occur in plain text or CSV. */
// eslint-disable-next-line no-control-regex -- matching control bytes is the point
const CONTROL = /[\x00-\x08\x0b\x0e-\x1f\x7f]/;

function isText(buf: Buffer): boolean {
  if (buf.includes(0)) return false;
  try {
    return !CONTROL.test(new TextDecoder('utf-8', { fatal: true }).decode(buf));
  } catch {
    return false;
  }
}

/**
 * PDF (`%PDF-`), PNG (8-byte signature), JPEG (FF D8 FF), or text: valid UTF-8 with no NUL
 * or other control bytes (tab, line breaks and form feed allowed). Text named `.csv` is served as text/csv, otherwise text/plain — the name only labels
 * text, it never admits bytes. Anything else: undefined (refused).
 */
export function sniffContentType(buf: Buffer, fileName: string): SniffedType | undefined {
  if (buf.length === 0) return undefined;
  if (buf.subarray(0, 5).toString('latin1') === '%PDF-') return 'application/pdf';
  if (startsWith(buf, PNG)) return 'image/png';
  if (startsWith(buf, [0xff, 0xd8, 0xff])) return 'image/jpeg';
  if (isText(buf)) return /\.csv$/i.test(fileName) ? 'text/csv' : 'text/plain';
  return undefined;
}

/**
 * A file name safe to store and to send back: the last path segment only, no control or
 * reserved characters, no bidi controls or zero-width characters (they disguise the
 * extension), no leading dots, at most 200 characters (keeping the extension).
 */
export function sanitizeFileName(raw: string): string {
  const base = stripInvisible(raw.normalize('NFC')).split(/[\\/]/).pop() ?? '';
  let name = base
    // eslint-disable-next-line no-control-regex -- stripping control characters is the point
    .replace(/[\u0000-\u001f\u007f-\u009f]/g, '')
    .replace(/[<>:"|?*]/g, '_')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^[.\s]+/, '')
    .replace(/[.\s]+$/, '');
  if (name.length > 200) {
    const dot = name.lastIndexOf('.');
    const ext = dot > 0 && name.length - dot <= 10 ? name.slice(dot) : '';
    name = name.slice(0, 200 - ext.length) + ext;
  }
  return name || 'attachment';
}

/** The extensions that name each sniffed type; the first is added when the name has none of them. */
const extensions: Record<SniffedType, string[]> = {
  'application/pdf': ['.pdf'],
  'image/png': ['.png'],
  'image/jpeg': ['.jpg', '.jpeg'],
  'text/plain': ['.txt'],
  'text/csv': ['.csv'],
};

/**
 * The stored name ends in an extension of the sniffed type, so a download never opens as
 * something else: text uploaded as `report.html` is kept as `report.html.txt`.
 */
export function nameForType(fileName: string, type: SniffedType): string {
  const allowed = extensions[type];
  if (allowed.some((ext) => fileName.toLowerCase().endsWith(ext))) return fileName;
  const ext = allowed[0]!;
  return fileName.length + ext.length > 200
    ? fileName.slice(0, 200 - ext.length) + ext
    : fileName + ext;
}

/** `attachment; filename="ascii"; filename*=UTF-8''percent-encoded` (RFC 6266 / RFC 5987). */
export function contentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  const encoded = encodeURIComponent(fileName).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}
