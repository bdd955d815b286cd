import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadImage, createCanvas } from '@napi-rs/canvas';
import jsQRModule from 'jsqr';

const jsQR = (jsQRModule as unknown as { default?: typeof jsQRModule }).default ?? jsQRModule;

/** Fails with a clear message when a poppler tool the read-back needs is not installed. */
export function requirePoppler(): void {
  for (const tool of ['pdftotext', 'pdftoppm', 'pdfimages']) {
    try {
      execFileSync(tool, ['-v'], { stdio: 'pipe' });
    } catch {
      throw new Error(`${tool} is missing: install Debian's poppler-utils (scripts/ install it) to read result sheets back`);
    }
  }
}

function withPdf<T>(pdf: Buffer, work: (path: string, dir: string) => T): T {
  const dir = mkdtempSync(join(tmpdir(), 'tw-sheet-'));
  try {
    const path = join(dir, 'sheet.pdf');
    writeFileSync(path, pdf);
    return work(path, dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** The text of each page, as `pdftotext -layout` lays it out. */
export function pdfPageTexts(pdf: Buffer): string[] {
  const text = withPdf(pdf, (path) => execFileSync('pdftotext', ['-layout', '-enc', 'UTF-8', path, '-'], { encoding: 'utf8' }));
  const pages = text.split('\f');
  if (pages.at(-1)?.trim() === '') pages.pop();
  return pages;
}

/** Collapses runs of white space, so sentences wrapped over lines can be matched whole. */
export function flat(text: string): string {
  return text.replace(/\s+/g, ' ');
}

/** Decodes the QR code found on one page rendered by `pdftoppm -png -r 150`, or null when none is found. */
export async function decodeQrOnPage(pdf: Buffer, pageNumber: number): Promise<string | null> {
  const png = withPdf(pdf, (path, dir) => {
    execFileSync('pdftoppm', ['-png', '-r', '150', '-f', String(pageNumber), '-l', String(pageNumber), '-singlefile', path, join(dir, 'page')]);
    return readFileSync(join(dir, 'page.png'));
  });
  const image = await loadImage(png);
  const canvas = createCanvas(image.width, image.height);
  const ctx = canvas.getContext('2d');
  ctx.drawImage(image, 0, 0);
  const { data, width, height } = ctx.getImageData(0, 0, image.width, image.height);
  return jsQR(new Uint8ClampedArray(data.buffer, data.byteOffset, data.byteLength), width, height)?.data ?? null;
}

/** The images embedded in the PDF, as `pdfimages -list` reports them. */
export function pdfImages(pdf: Buffer): { page: number; width: number; height: number; xPpi: number }[] {
  const listing = withPdf(pdf, (path) => execFileSync('pdfimages', ['-list', path], { encoding: 'utf8' }));
  return listing
    .split('\n')
    .slice(2)
    .filter((line) => line.trim() !== '')
    .map((line) => line.trim().split(/\s+/))
    .map((cols) => ({ page: Number(cols[0]), width: Number(cols[3]), height: Number(cols[4]), xPpi: Number(cols[12]) }));
}
