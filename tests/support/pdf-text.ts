import { PDFParse } from 'pdf-parse';
import { expect } from 'vitest';

/** The text of a PDF, as a reader would copy it out. */
export async function pdfText(pdf: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
}

/** Each page's text, in order; the array's length is the PDF's page count. */
export async function pdfPages(pdf: Buffer): Promise<string[]> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const result = await parser.getText();
    expect(result.pages.length).toBe(result.total);
    return result.pages.map((p) => p.text);
  } finally {
    await parser.destroy();
  }
}
