import type { BrowserContext } from 'playwright-core';
import { CHROMIUM, hasChromium, launchChromium } from './headless-chromium.ts';

/** Prints a self-contained HTML page to an A4 PDF; close it when done. */
export interface PdfPrinter {
  print(html: string): Promise<Uint8Array>;
  close(): Promise<void>;
}

function printerOf(context: BrowserContext): PdfPrinter {
  return {
    async print(html) {
      const page = await context.newPage();
      try {
        // The page is set as content: it fetches nothing (its own policy forbids it) and needs no file.
        await page.setContent(html, { waitUntil: 'load' });
        await page.emulateMedia({ media: 'print' });
        return await page.pdf({ format: 'A4', preferCSSPageSize: true, printBackground: true });
      } finally {
        await page.close();
      }
    },
    close: () => context.close(),
  };
}

/**
 * A printer through the headless browser, or why there is none (no browser
 * installed, or it would not start): the caller then writes the HTML alone
 * and says why in one line.
 */
export async function pdfPrinter(): Promise<{ printer: PdfPrinter } | { why: string }> {
  if (!hasChromium()) return { why: `no browser at ${CHROMIUM}` };
  try {
    return { printer: printerOf(await launchChromium()) };
  } catch (e) {
    return { why: `the browser at ${CHROMIUM} did not start (${e instanceof Error ? e.message.split('\n')[0] : String(e)})` };
  }
}
