import { describe, expect, it } from 'vitest';
import { contentDisposition, nameForType, sanitizeFileName, sniffContentType } from './sniff.js';

describe('sniffContentType', () => {
  it('recognises PDF, PNG and JPEG by their first bytes whatever the name says', () => {
    expect(sniffContentType(Buffer.from('%PDF-1.7\n...'), 'photo.png')).toBe('application/pdf');
    expect(
      sniffContentType(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0]), 'a.pdf'),
    ).toBe('image/png');
    expect(sniffContentType(Buffer.from([0xff, 0xd8, 0xff, 0xe0, 1, 2]), 'x.txt')).toBe(
      'image/jpeg',
    );
  });

  it('accepts UTF-8 text and labels .csv as CSV', () => {
    expect(sniffContentType(Buffer.from('Drum Ø 400 mm\n'), 'notes.txt')).toBe('text/plain');
    expect(sniffContentType(Buffer.from('a,b\n1,2\n'), 'data.CSV')).toBe('text/csv');
  });

  it('refuses binaries, NUL bytes, invalid UTF-8 and empty files', () => {
    expect(sniffContentType(Buffer.from('MZ\x90\x00\x03'), 'report.pdf')).toBeUndefined();
    expect(sniffContentType(Buffer.from([0x50, 0x4b, 0x03, 0x04]), 'sheet.csv')).toBeUndefined();
    expect(sniffContentType(Buffer.from([0xc3, 0x28]), 'a.txt')).toBeUndefined();
    expect(sniffContentType(Buffer.alloc(0), 'a.txt')).toBeUndefined();
  });
});

describe('sanitizeFileName', () => {
  it('keeps only the last path segment and strips traversal', () => {
    expect(sanitizeFileName('../../etc/passwd')).toBe('passwd');
    expect(sanitizeFileName('..\\..\\windows\\win.ini')).toBe('win.ini');
    expect(sanitizeFileName('..')).toBe('attachment');
    expect(sanitizeFileName('.hidden')).toBe('hidden');
  });

  it('removes control and reserved characters, keeps letters of any script', () => {
    expect(sanitizeFileName('data\u0000sheet\r\n.pdf')).toBe('datasheet.pdf');
    expect(sanitizeFileName('a<b>:c".txt')).toBe('a_b__c_.txt');
    expect(sanitizeFileName('Bremsscheibe Ø400 – Blatt.pdf')).toBe('Bremsscheibe Ø400 – Blatt.pdf');
  });

  it('removes bidi controls and zero-width characters that disguise the extension', () => {
    expect(sanitizeFileName('photo\u202Egnp.exe')).toBe('photognp.exe');
    expect(sanitizeFileName('re\u200Bport\u2066.pdf\u2069')).toBe('report.pdf');
    expect(sanitizeFileName('\u200B\u200F')).toBe('attachment');
  });

  it('limits length but keeps the extension', () => {
    const n = sanitizeFileName('x'.repeat(300) + '.pdf');
    expect(n.length).toBe(200);
    expect(n.endsWith('.pdf')).toBe(true);
  });
});

describe('nameForType', () => {
  it('makes the extension follow the sniffed type', () => {
    expect(nameForType('report.html', 'text/plain')).toBe('report.html.txt');
    expect(nameForType('notes', 'text/plain')).toBe('notes.txt');
    expect(nameForType('Notes.TXT', 'text/plain')).toBe('Notes.TXT');
    expect(nameForType('scan.JPEG', 'image/jpeg')).toBe('scan.JPEG');
    expect(nameForType('scan.png', 'application/pdf')).toBe('scan.png.pdf');
    expect(nameForType('x'.repeat(200), 'image/png')).toBe('x'.repeat(196) + '.png');
  });
});

describe('contentDisposition', () => {
  it('gives an ASCII fallback and an RFC 5987 UTF-8 name', () => {
    expect(contentDisposition('Ø400 "drum".pdf')).toBe(
      `attachment; filename="_400 _drum_.pdf"; filename*=UTF-8''%C3%98400%20%22drum%22.pdf`,
    );
  });
});
