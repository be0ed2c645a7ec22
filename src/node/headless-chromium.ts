// Debian's chromium driven by playwright-core (which downloads no browser):
// for printing the reports to PDF, the browser test and the screenshot. A
// fresh profile each time and the background services off, so a run neither
// reads nor phones anything.
import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BrowserContext } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';

export const CHROMIUM_FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

/** A4 at 96 px to the inch, the page the report is laid out for. */
export const A4_VIEWPORT = { width: 794, height: 1123 };

export function hasChromium(): boolean {
  return existsSync(CHROMIUM);
}

/** The browser, headless; playwright-core is loaded only here, so a run that prints nothing never needs it. */
export async function launchChromium(): Promise<BrowserContext> {
  const { chromium } = await import('playwright-core');
  const profile = mkdtempSync(join(tmpdir(), 'axletree-chromium-'));
  return chromium.launchPersistentContext(profile, { executablePath: CHROMIUM, headless: true, args: CHROMIUM_FLAGS, viewport: A4_VIEWPORT });
}
