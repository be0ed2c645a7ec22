// Regenerates docs/workbench-screenshot.png: the workbench with the demo
// build, as the README shows it. Needs Debian's chromium and the built page
// (npm run build:web).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeFileAtomic } from '../src/node/atomic-write.ts';
import { serveWorkbench } from '../src/node/serve-web.ts';
import { readWorkbenchPage, withInitialBuild } from '../src/node/workbench-page.ts';
import { launchChromium } from './headless-chromium.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
const page = await readWorkbenchPage();
if (page === undefined) throw new Error('the workbench page is not built: npm run build:web');
const server = await serveWorkbench(withInitialBuild(page, readFileSync(join(root, 'specs', 'demo-two-crew.yaml'), 'utf8'), 'demo-two-crew.yaml'), 0);
const browser = await launchChromium();
try {
  const tab = await browser.newPage();
  await tab.setViewportSize({ width: 1400, height: 1000 });
  await tab.goto(server.url);
  await tab.locator('#verdict[data-stage="full"]').waitFor({ timeout: 60_000 });
  await tab.waitForFunction(() => document.body.dataset.pictures?.endsWith('-full'));
  // Scrolled to the drawings, so the picture shows the form, the verdict and a drawing at once.
  await tab.evaluate(() => document.querySelector('#answer')?.scrollIntoView());
  await writeFileAtomic(join(root, 'docs', 'workbench-screenshot.png'), await tab.screenshot());
} finally {
  await browser.close();
  await server.close();
}
console.log('wrote docs/workbench-screenshot.png');
