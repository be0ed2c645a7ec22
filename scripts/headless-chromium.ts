// Debian's chromium driven by playwright-core (which downloads no browser),
// for the report's browser test and its screenshot. A fresh profile each time
// and the background services off, so a run neither reads nor phones anything.
import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';

export const CHROMIUM_FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

/** A4 at 96 px to the inch, the page the report is laid out for. */
export const A4_VIEWPORT = { width: 794, height: 1123 };

export function hasChromium(): boolean {
  return existsSync(CHROMIUM);
}

export async function launchChromium(): Promise<BrowserContext> {
  const profile = mkdtempSync(join(tmpdir(), 'axletree-chromium-'));
  return chromium.launchPersistentContext(profile, { executablePath: CHROMIUM, headless: true, args: CHROMIUM_FLAGS, viewport: A4_VIEWPORT });
}
