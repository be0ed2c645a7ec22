import { readFileSync } from 'node:fs';
import { launchChromium } from './scripts/headless-chromium.ts';
const ctx = await launchChromium();
const page = await ctx.newPage();
for (const f of process.argv.slice(2)) {
  await page.setContent(`<html><body style="margin:0">${readFileSync(f, 'utf8')}</body></html>`);
  await page.locator('svg').first().screenshot({ path: f.replace(/\.svg$/, '.png') });
}
await ctx.close();
