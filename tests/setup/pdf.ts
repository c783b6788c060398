import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

/** Reads a PDF back with pdfjs-dist (legacy build for Node): the text of each page and the metadata. */
export async function readPdf(bytes: Buffer) {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({
    data: new Uint8Array(bytes),
    isEvalSupported: false,
    disableFontFace: true,
    useSystemFonts: false,
    verbosity: 0,
  }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    // Items of one line come in order; join them with a space where pdfjs marks an end of line.
    pages.push(
      content.items
        .map((item) => ('str' in item ? `${item.str}${item.hasEOL ? '\n' : ''}` : ''))
        .join('')
        .replace(/[ \t]+/g, ' '),
    );
  }
  const meta = await doc.getMetadata();
  await doc.destroy();
  return { pages, text: pages.join('\n'), info: meta.info as Record<string, unknown>, xmp: meta.metadata };
}

export const hasPdftoppm = () => spawnSync('pdftoppm', ['-v'], { stdio: 'ignore' }).status === 0;

/** Renders the first page to PNG with poppler's pdftoppm; returns the PNG bytes. */
export function firstPagePng(bytes: Buffer, dpi = 110): Buffer {
  const dir = mkdtempSync(path.join(tmpdir(), 'sw-pdf-'));
  try {
    writeFileSync(path.join(dir, 'sheet.pdf'), bytes);
    execFileSync(
      'pdftoppm',
      ['-png', '-r', String(dpi), '-f', '1', '-l', '1', '-singlefile', 'sheet.pdf', 'page'],
      {
        cwd: dir,
      },
    );
    return readFileSync(path.join(dir, 'page.png'));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export function keepArtifact(name: string, bytes: Buffer): string {
  const dir = path.resolve('tests/artifacts');
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, name);
  writeFileSync(file, bytes);
  return file;
}
