import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** Where rendered PDFs and page PNGs go for a human to look at (git-ignored test-output/). */
export const OUTPUT_DIR = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '../../../test-output/pdf',
);

const has = (cmd: string) => spawnSync('sh', ['-c', `command -v ${cmd}`]).status === 0;

/** Installs poppler-utils from Debian's packages when missing (as root), else explains. */
export function ensurePoppler(): void {
  if (has('pdftotext') && has('pdffonts') && has('pdftoppm')) return;
  if (process.getuid?.() !== 0) {
    throw new Error('PDF checks need poppler-utils: sudo apt-get install -y poppler-utils');
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['install', '-y', '-qq', 'poppler-utils'], { env, stdio: 'ignore' });
}

export interface PdfFacts {
  file: string;
  pages: number;
  /** Page size in pt from pdfinfo, e.g. { width: 612, height: 792 }. */
  size: { width: number; height: number };
  /** Size of every page, in order. */
  pageSizes: { width: number; height: number }[];
  /** Text per page (pdftotext -layout). */
  pageText: string[];
  /** Text per page in content-stream order (pdftotext -raw): table cells stay in row order. */
  rawPageText: string[];
  text: string;
  fonts: { name: string; embedded: boolean }[];
}

/** Saves the PDF under test-output/pdf/<name>.pdf and reads its facts with poppler. */
export function inspectPdf(pdf: Uint8Array, name: string): PdfFacts {
  mkdirSync(OUTPUT_DIR, { recursive: true });
  const file = path.join(OUTPUT_DIR, `${name}.pdf`);
  writeFileSync(file, pdf);
  const info = execFileSync('pdfinfo', [file]).toString();
  const pages = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
  const m = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info);
  const perPage = execFileSync('pdfinfo', ['-f', '1', '-l', String(pages), file]).toString();
  const pageSizes = [...perPage.matchAll(/Page\s+\d+ size:\s+([\d.]+) x ([\d.]+) pts/g)].map(
    (x) => ({ width: Number(x[1]), height: Number(x[2]) }),
  );
  const text = execFileSync('pdftotext', ['-layout', file, '-']).toString();
  const raw = execFileSync('pdftotext', ['-raw', file, '-']).toString();
  const fonts = execFileSync('pdffonts', [file])
    .toString()
    .split('\n')
    .slice(2)
    .filter((l) => l.trim())
    .map((l) => {
      const cols = l.trim().split(/\s+/);
      // name … emb sub uni objectId gen: 'emb' is the fifth column from the end.
      return { name: cols[0], embedded: cols[cols.length - 5] === 'yes' };
    });
  return {
    file,
    pages,
    size: { width: Number(m?.[1]), height: Number(m?.[2]) },
    pageSizes,
    pageText: text.split('\f').slice(0, pages),
    rawPageText: raw.split('\f').slice(0, pages),
    text,
    fonts,
  };
}

/**
 * Renders every page to PNG (for eyes) and to greyscale PGM (for numbers), and returns the
 * standard deviation of each page's grey levels: a blank page has none.
 */
export function pageInk(file: string, name: string, dpi = 40): number[] {
  const prefix = path.join(OUTPUT_DIR, name);
  execFileSync('pdftoppm', ['-png', '-r', '60', file, prefix]);
  const tmp = path.join(OUTPUT_DIR, `.${name}-gray`);
  rmSync(tmp, { recursive: true, force: true });
  mkdirSync(tmp);
  execFileSync('pdftoppm', ['-gray', '-r', String(dpi), file, path.join(tmp, 'p')]);
  const out = readdirSync(tmp)
    .sort()
    .map((f) => stddev(readPgm(readFileSync(path.join(tmp, f)))));
  rmSync(tmp, { recursive: true, force: true });
  return out;
}

function readPgm(buf: Buffer): Uint8Array {
  // Binary PGM: 'P5', width, height, maxval, one whitespace byte, then the pixels.
  let at = 0;
  const fields: string[] = [];
  while (fields.length < 4) {
    while (/\s/.test(String.fromCharCode(buf[at]))) at++;
    let word = '';
    while (!/\s/.test(String.fromCharCode(buf[at]))) word += String.fromCharCode(buf[at++]);
    fields.push(word);
  }
  if (fields[0] !== 'P5') throw new Error(`not a binary PGM: ${fields[0]}`);
  return buf.subarray(at + 1);
}

function stddev(px: Uint8Array): number {
  let sum = 0;
  let sq = 0;
  for (const v of px) {
    sum += v;
    sq += v * v;
  }
  const mean = sum / px.length;
  return Math.sqrt(Math.max(0, sq / px.length - mean * mean));
}
