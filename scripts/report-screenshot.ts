// Regenerates docs/report-screenshot.png: the first page of the demo's HTML
// report, as the README shows it. Needs Debian's chromium (see .ci/run).
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { writeFileAtomic } from '../src/node/atomic-write.ts';
import { demoReportHtml } from './demo-report.ts';
import { launchChromium } from './headless-chromium.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
const file = join(mkdtempSync(join(tmpdir(), 'axletree-report-')), 'report.html');
await writeFileAtomic(file, demoReportHtml('demo-two-crew', true));
const browser = await launchChromium();
try {
  const page = await browser.newPage();
  await page.goto(pathToFileURL(file).href);
  await writeFileAtomic(join(root, 'docs', 'report-screenshot.png'), await page.screenshot());
} finally {
  await browser.close();
}
console.log('wrote docs/report-screenshot.png');
