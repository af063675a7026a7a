import PDFDocument from 'pdfkit';

/**
 * A service sheet as a PDF drawn with pdfkit: one A4 page per title, each with a resistor symbol labelled with
 * its reference and a few thin lines, so the pages can be told apart once drawn.
 */
export function servicePdf(titles: string[] = ['Circuit diagram', 'Layout']): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', autoFirstPage: false, info: { Title: 'Cobbold Lane test sheet' } });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  titles.forEach((title, i) => {
    doc.addPage();
    doc.fontSize(18).text(title, 50, 50);
    doc.lineWidth(0.5).moveTo(50, 200).lineTo(545, 200).stroke();
    doc
      .moveTo(230 + i * 40, 150)
      .lineTo(230 + i * 40, 600)
      .stroke();
    doc.rect(220 + i * 40, 280, 20, 60).stroke();
    doc.fontSize(6).text('R23  47k', 250 + i * 40, 300);
  });
  doc.end();
  return done;
}
