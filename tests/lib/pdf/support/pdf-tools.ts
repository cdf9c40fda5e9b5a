/** Poppler's command-line tools (Debian poppler-utils) for reading back rendered PDFs. */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

export const OUT_DIR = path.join(process.cwd(), 'test-results', 'pdf');

export function writePdf(name: string, bytes: Buffer): string {
  fs.mkdirSync(OUT_DIR, { recursive: true });
  const file = path.join(OUT_DIR, name);
  fs.writeFileSync(file, bytes);
  return file;
}

/** Text of every page in drawing order (pdftotext -raw; pages end with form feeds), whitespace collapsed. */
export function pageTexts(file: string): string[] {
  const raw = execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
  const pages = raw.split('\f');
  if (pages.at(-1)?.trim() === '') pages.pop();
  return pages.map((p) => p.replace(/[\s\u2007]+/g, ' ').trim());
}

/** Rows of `pdfimages -list` below its two header lines: one per embedded raster image. */
export function listImages(file: string): string[] {
  return execFileSync('pdfimages', ['-list', file], { encoding: 'utf8' })
    .split('\n')
    .slice(2)
    .filter((l) => l.trim());
}

export function pdfInfo(file: string): Record<string, string> {
  const out = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
  return Object.fromEntries(
    out
      .split('\n')
      .filter((l) => l.includes(':'))
      .map((l) => [l.slice(0, l.indexOf(':')).trim(), l.slice(l.indexOf(':') + 1).trim()]),
  );
}

/** Page `page` as PNG at `dpi` into test-results/pdf, for a person to look at; returns the file. */
export function pageToPng(file: string, page: number, name: string, dpi = 80): string {
  const prefix = path.join(OUT_DIR, name);
  execFileSync('pdftoppm', [
    '-png',
    '-r',
    String(dpi),
    '-f',
    String(page),
    '-l',
    String(page),
    '-singlefile',
    file,
    prefix,
  ]);
  return `${prefix}.png`;
}
