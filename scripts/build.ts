// `npm run build`, also run by `npm ci` (the `prepare` script): bundles the
// command line into dist/ as JavaScript, so `axletree` starts without
// compiling TypeScript. bin/axletree.mjs runs dist/axletree.mjs while it is no
// older than the sources listed in dist/inputs.json, and the TypeScript
// through tsx otherwise.
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { bundle } from './bundle.ts';
import { defaultRulesDir } from '../src/node/load-rules-data.ts';
import { writeRulesSnapshot } from '../src/node/rules-data-snapshot.ts';
import { writeWorkbench } from './build-web.ts';

const DIST = new URL('../dist/', import.meta.url);
const made = await bundle(fileURLToPath(DIST));
if (!made) {
  // Without the dev dependencies there is no bundler; the bin runs the source.
  console.warn('build: esbuild is not installed, so axletree runs from the TypeScript source (slower to start).');
} else {
  // Changes in node_modules come with `npm ci` or `npm install`, which build again.
  writeFileSync(new URL('inputs.json', DIST), JSON.stringify({ inputs: made.inputs }, null, 1) + '\n');
  // The rules data parsed once, used while the YAML files stay as they are.
  writeRulesSnapshot(defaultRulesDir(), fileURLToPath(new URL('rules-data.json', DIST)));
  console.log(`build: dist/axletree.mjs and ${made.files - 1} chunks, ${(made.bytes / 2 ** 20).toFixed(1)} MiB, from ${made.inputs.length} project files`);
}
// The workbench page too, so `axletree serve` works after npm ci.
if (made) await writeWorkbench();
