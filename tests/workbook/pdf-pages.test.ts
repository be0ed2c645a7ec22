// The page counter the print test relies on, on PDFs made by hand.
import { describe, expect, it } from 'vitest';
import { pdfPageCount } from './pdf-pages.ts';

/** A minimal PDF body: a catalogue, a page tree with `count` pages, and the pages themselves. */
function pdf(count: number, pages = count, nested = false): Uint8Array {
  const kids = Array.from({ length: pages }, (_, i) => `${10 + i} 0 obj\n<< /Type /Page /Parent ${nested ? 3 : 2} 0 R /MediaBox [0 0 595 842] >>\nendobj`);
  const tree = nested
    ? `2 0 obj\n<< /Type /Pages /Kids [3 0 R] /Count ${count} >>\nendobj\n3 0 obj\n<< /Type /Pages /Parent 2 0 R /Kids [] /Count ${pages} >>\nendobj`
    : `2 0 obj\n<</Type/Pages/Kids[]/Count ${count}>>\nendobj`;
  return new TextEncoder().encode(`%PDF-1.7\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R >>\nendobj\n${tree}\n${kids.join('\n')}\n%%EOF\n`);
}

describe('pdfPageCount', () => {
  it('counts page objects, not the page tree, and checks them against the root count', () => {
    expect(pdfPageCount(pdf(3))).toBe(3);
    // A tree of two levels: only the root's count (the node without a parent) is the whole.
    expect(pdfPageCount(pdf(5, 5, true))).toBe(5);
  });

  it('refuses a PDF whose page objects and page count disagree', () => {
    expect(() => pdfPageCount(pdf(4, 3))).toThrow(/says 4 pages but 3/);
  });

  it('refuses what it cannot count rather than saying none', () => {
    expect(() => pdfPageCount(new TextEncoder().encode('%PDF-1.7\n1 0 obj\n<< /Type /ObjStm /N 40 >>\nstream\n...'))).toThrow(/cannot count/);
    expect(() => pdfPageCount(new TextEncoder().encode('PK\u0003\u0004'))).toThrow(/not a PDF/);
  });
});
