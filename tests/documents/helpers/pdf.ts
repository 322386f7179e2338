// Reads rendered PDFs back with Debian's poppler-utils (pdftotext, pdfinfo, pdftoppm, pdfimages),
// so the checks see what a reader sees, not what the renderer meant to write.
import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

/** Fails with the command to run when poppler-utils is missing, instead of a spawn error. */
export function requirePoppler(): void {
  for (const tool of ['pdftotext', 'pdftoppm', 'pdfinfo', 'pdfimages']) {
    const probe = spawnSync(tool, ['-v'], { encoding: 'utf8' });
    if (probe.error) {
      throw new Error(
        `The document tests read PDFs with ${tool}, from Debian's poppler-utils, which is not ` +
          'installed. Run `bash scripts/ensure-debian-packages.sh` as root, or: ' +
          'sudo apt-get update && sudo apt-get install -y poppler-utils',
      );
    }
  }
}

/** The text of each page: `-layout` keeps each row of a table on one line, columns apart. */
export function pdfPages(pdf: Buffer, mode: 'layout' | 'raw' = 'layout'): string[] {
  const text = execFileSync('pdftotext', [`-${mode}`, '-enc', 'UTF-8', '-', '-'], {
    input: pdf,
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
  });
  // pdftotext ends every page with a form feed.
  return text.split('\f').slice(0, -1);
}

/** The document information as pdfinfo reads it (dates in ISO 8601). */
export function pdfInfo(pdf: Buffer): Record<string, string> {
  const text = execFileSync('pdfinfo', ['-isodates', '-'], { input: pdf, encoding: 'utf8' });
  return Object.fromEntries(
    text
      .split('\n')
      .filter((line) => line.includes(':'))
      .map((line) => {
        const at = line.indexOf(':');
        return [line.slice(0, at).trim(), line.slice(at + 1).trim()];
      }),
  );
}

/** One page as a PNG at a resolution, through pdftoppm. */
export function pdfPagePng(pdf: Buffer, page: number, dpi: number): Buffer {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-pdf-'));
  try {
    const file = path.join(dir, 'in.pdf');
    fs.writeFileSync(file, pdf);
    const prefix = path.join(dir, 'page');
    execFileSync('pdftoppm', [
      '-r',
      String(dpi),
      '-f',
      String(page),
      '-l',
      String(page),
      '-png',
      '-singlefile',
      file,
      prefix,
    ]);
    return fs.readFileSync(`${prefix}.png`);
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

/** The pictures placed in the PDF, page by page, as `pdfimages -list` reads them. */
export function pdfImages(pdf: Buffer): { page: number; width: number; height: number }[] {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-pdf-'));
  try {
    const file = path.join(dir, 'in.pdf');
    fs.writeFileSync(file, pdf);
    const text = execFileSync('pdfimages', ['-list', file], { encoding: 'utf8' });
    // Two heading lines, then one row per image: page, num, type, width, height, …
    return text
      .split('\n')
      .slice(2)
      .filter((line) => line.trim() !== '')
      .map((line) => {
        const [page, , , width, height] = line.trim().split(/\s+/);
        return { page: Number(page), width: Number(width), height: Number(height) };
      });
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

/** Whitespace collapsed, so text that wrapped inside a cell (after a hyphen too) reads as one run. */
export const squash = (text: string) => text.replace(/-\n/g, '-').replace(/\s+/g, ' ');
