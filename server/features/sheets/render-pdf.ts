import { open } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { createCanvas } from '@napi-rs/canvas';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { HttpError } from '../../http/errors';
import { withDecodeSlot } from '../photos/photo-pipeline';

/** Pages are drawn at 300 dpi (6-point print stays legible at 200 %), smaller when a page would exceed `longSidePx`. */
export const PDF_RENDER_DPI = 300;
/** More pages than a service sheet has: a bigger file is refused before anything is drawn. */
export const PDF_MAX_PAGES = 40;

const require = createRequire(import.meta.url);
/** The 14 standard PDF fonts as pdfjs ships them, for sheets that name a font without embedding it. */
const standardFontDataUrl = `${join(dirname(require.resolve('pdfjs-dist/package.json')), 'standard_fonts')}/`;

const notReadable = (detail: string) =>
  new HttpError(
    415,
    'unsupported_type',
    `That PDF could not be read (${detail}). Export it again, or send each page as a PNG or TIFF scan.`,
  );

/** A PDF starts with `%PDF-` within its first 1,024 bytes (ISO 32000-1, 7.5.2, as readers accept it). */
export async function looksLikePdf(path: string): Promise<boolean> {
  const file = await open(path, 'r');
  try {
    const head = Buffer.alloc(1024);
    const { bytesRead } = await file.read(head, 0, 1024, 0);
    return head.subarray(0, bytesRead).includes('%PDF-', 0, 'latin1');
  } finally {
    await file.close();
  }
}

export interface PdfPageImage {
  pageNumber: number;
  png: Buffer;
}

/**
 * Draws every page of a PDF as a PNG, one page at a time (memory holds one page), with pdfjs-dist on
 * @napi-rs/canvas. Scripts in the PDF never run (`isEvalSupported: false`, no scripting).
 */
export async function* renderPdfPages(
  data: Uint8Array,
  limits: { longSidePx: number; maxPixels: number },
  signal?: AbortSignal,
): AsyncGenerator<PdfPageImage> {
  const task = getDocument({
    data,
    isEvalSupported: false,
    enableXfa: false,
    standardFontDataUrl,
    verbosity: 0,
    stopAtErrors: true,
  });
  let pdf: Awaited<typeof task.promise>;
  try {
    pdf = await task.promise;
  } catch (err) {
    await task.destroy().catch(() => {});
    throw notReadable(
      err instanceof Error && err.name === 'PasswordException'
        ? 'it is protected by a password'
        : 'it is damaged or not a PDF',
    );
  }
  try {
    if (pdf.numPages > PDF_MAX_PAGES)
      throw new HttpError(
        413,
        'too_large',
        `The PDF has ${pdf.numPages} pages; send at most ${PDF_MAX_PAGES} at a time.`,
      );
    for (let n = 1; n <= pdf.numPages; n++) {
      signal?.throwIfAborted();
      const page = await pdf.getPage(n);
      const base = page.getViewport({ scale: 1 });
      const long = Math.max(base.width, base.height);
      const scale = Math.min(
        PDF_RENDER_DPI / 72,
        limits.longSidePx / long,
        Math.sqrt(limits.maxPixels / (base.width * base.height)),
      );
      const viewport = page.getViewport({ scale });
      // Drawing takes one of the decode slots uploads use: a page at 300 dpi is as large as a big photo.
      const png = await withDecodeSlot(async () => {
        const canvas = createCanvas(Math.max(1, Math.floor(viewport.width)), Math.max(1, Math.floor(viewport.height)));
        const context = canvas.getContext('2d');
        context.fillStyle = '#ffffff';
        context.fillRect(0, 0, canvas.width, canvas.height);
        try {
          // @napi-rs/canvas implements the canvas API pdfjs draws with; its types differ from the DOM's.
          await page.render({
            canvas: canvas as unknown as HTMLCanvasElement,
            canvasContext: context as unknown as CanvasRenderingContext2D,
            viewport,
          }).promise;
        } catch {
          throw notReadable(`page ${n} could not be drawn`);
        }
        return canvas.encode('png');
      });
      yield { pageNumber: n, png };
      page.cleanup();
    }
  } finally {
    await pdf.destroy().catch(() => {});
  }
}
