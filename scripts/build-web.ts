// `npm run build:web`: the workbench as static files in web/dist/ (one
// self-contained index.html; see scripts/web-bundle.ts).
import { mkdirSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { defaultRulesDir } from '../src/node/load-rules-data.ts';
import { bundleWeb } from './web-bundle.ts';

const out = new URL('../web/dist/', import.meta.url);
mkdirSync(out, { recursive: true });
const made = await bundleWeb(defaultRulesDir());
writeFileSync(new URL('index.html', out), made.html);
console.log(`build:web: ${fileURLToPath(new URL('index.html', out))}, ${(made.bytes / 2 ** 20).toFixed(1)} MiB`);
