// `npm run build:web`: the workbench as static files in web/dist/ (one
// self-contained index.html; see scripts/web-bundle.ts). Also run by
// `npm run build`, so npm ci leaves it built.
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { defaultRulesDir } from '../src/node/load-rules-data.ts';
import { WORKBENCH_PAGE } from '../src/node/workbench-page.ts';
import { bundleWeb } from './web-bundle.ts';

export async function writeWorkbench(): Promise<void> {
  mkdirSync(dirname(WORKBENCH_PAGE), { recursive: true });
  const made = await bundleWeb(defaultRulesDir());
  writeFileSync(WORKBENCH_PAGE, made.html);
  console.log(`build:web: ${WORKBENCH_PAGE}, ${(made.bytes / 2 ** 20).toFixed(1)} MiB`);
}

// Run as a script (npm run build:web), not when scripts/build.ts imports it.
if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) await writeWorkbench();
