import PDFDocument from 'pdfkit';
import sharp from 'sharp';
import { FONTS, fontRuns } from './pdf-text';

const INK = '#221c15';
const SOFT = '#5d5247';
const GLOW = '#b4530b';

/** A thin layer over pdfkit: text that falls back across fonts, headings, and images from WebP. */
export function createWriter(title = 'Hand-back report') {
  const doc = new PDFDocument({
    size: 'A4',
    margin: 56,
    info: { Title: title, Creator: 'Gridleak' },
    bufferPages: true,
  });
  for (const [name, file] of Object.entries(FONTS)) doc.registerFont(name, file);
  const width = doc.page.width - 112;

  const text = (value: string, opts: { bold?: boolean; size?: number; colour?: string; gap?: number } = {}) => {
    const runs = fontRuns(value, opts.bold ? 'bold' : 'body');
    doc.fontSize(opts.size ?? 11).fillColor(opts.colour ?? INK);
    runs.forEach((run, i) => doc.font(run.font).text(run.text, { continued: i < runs.length - 1, width, lineGap: 2 }));
    if (!runs.length) doc.text('');
    doc.moveDown(opts.gap ?? 0.4);
  };
  const ensureSpace = (points: number) => {
    if (doc.y + points > doc.page.height - 72) doc.addPage();
  };

  return {
    doc,
    width,
    text,
    ensureSpace,
    heading(value: string) {
      ensureSpace(80);
      doc.moveDown(0.6);
      text(value, { bold: true, size: 16, colour: GLOW, gap: 0.3 });
    },
    label(value: string) {
      text(value, { bold: true, size: 10, colour: SOFT, gap: 0.1 });
    },
    /** Places a WebP or JPEG image, converted for the PDF, within the width and height given (points). */
    async image(bytes: Buffer, maxWidth: number, maxHeight: number, at?: { x: number; y: number }) {
      const jpeg = await sharp(bytes)
        .flatten({ background: '#ffffff' })
        .resize({
          width: Math.round(maxWidth * 2),
          height: Math.round(maxHeight * 2),
          fit: 'inside',
          withoutEnlargement: true,
        })
        .jpeg({ quality: 82 })
        .toBuffer();
      const { width: w = 1, height: h = 1 } = await sharp(jpeg).metadata();
      const scale = Math.min(maxWidth / w, maxHeight / h);
      const x = at?.x ?? doc.page.margins.left;
      const y = at?.y ?? doc.y;
      doc.image(jpeg, x, y, { width: w * scale, height: h * scale });
      return { width: w * scale, height: h * scale };
    },
    /**
     * Footer on every page: the set and page numbers; returns the page count. The footer sits below the bottom
     * margin, where pdfkit would start a new page for it, so the margin is lifted while it is written.
     */
    footer(line: string): number {
      const range = doc.bufferedPageRange();
      for (let i = range.start; i < range.start + range.count; i++) {
        doc.switchToPage(i);
        const bottom = doc.page.margins.bottom;
        doc.page.margins.bottom = 0;
        const y = doc.page.height - 40;
        doc
          .font('body')
          .fontSize(8)
          .fillColor(SOFT)
          .text(`${line} · page ${i + 1} of ${range.count}`, 56, y, { width, align: 'center', lineBreak: false });
        doc.page.margins.bottom = bottom;
      }
      return doc.bufferedPageRange().count;
    },
    finish(): Promise<Buffer> {
      return new Promise((resolve, reject) => {
        const chunks: Buffer[] = [];
        doc.on('data', (c: Buffer) => chunks.push(c));
        doc.on('end', () => resolve(Buffer.concat(chunks)));
        doc.on('error', reject);
        doc.end();
      });
    },
  };
}
export type Writer = ReturnType<typeof createWriter>;
