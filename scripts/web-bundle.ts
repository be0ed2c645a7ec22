// Bundles the workbench (src/web/) into one self-contained HTML page: the
// page's script and its style inline, the check worker's script inline as
// text (started from a Blob), the rules data and the demo build inside. A
// page opened from disk may not load module scripts, worker files or wasm,
// so nothing is loaded from anywhere: the same file works from a static host,
// from `axletree serve`, and opened from disk.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Plugin } from 'esbuild';
import { loadRulesData } from '../src/node/load-rules-data.ts';
import { INITIAL_SLOT } from '../src/node/workbench-page.ts';
import { WORKBENCH_CSS } from '../src/web/workbench-style.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const DEMO = 'specs/demo-two-crew.yaml';


function virtuals(rulesDir: string, workerSource: string): Plugin {
  const data = loadRulesData(rulesDir);
  const modules: Record<string, { contents: string; loader: 'json' | 'text' }> = {
    'axletree:rules-data': { contents: JSON.stringify(data), loader: 'json' },
    'axletree:demo-spec': { contents: readFileSync(new URL(`../${DEMO}`, import.meta.url), 'utf8'), loader: 'text' },
    'axletree:choices': { contents: JSON.stringify({ species: Object.keys(data.species), leathers: Object.keys(data.leathers), grounds: Object.keys(data.grounds) }), loader: 'json' },
    'axletree:worker-source': { contents: workerSource, loader: 'text' },
  };
  return {
    name: 'axletree-virtual',
    setup(b) {
      b.onResolve({ filter: /^axletree:/ }, (a) => ({ path: a.path, namespace: 'axletree' }));
      b.onLoad({ filter: /.*/, namespace: 'axletree' }, (a) => modules[a.path]);
    },
  };
}

/** An inline script must not hold `</script`; inside a string `<\/script` reads the same. */
const inlineSafe = (js: string) => js.replace(/<\/(script)/gi, '<\\/$1');

export interface WebBundle {
  html: string;
  bytes: number;
}

export async function bundleWeb(rulesDir: string): Promise<WebBundle> {
  const esbuild = await import('esbuild');
  const common = { absWorkingDir: ROOT, bundle: true, platform: 'browser', format: 'iife', target: 'es2022', minify: true, write: false, legalComments: 'none', logLevel: 'warning' } as const;
  const worker = await esbuild.build({ ...common, entryPoints: ['src/web/check-worker.ts'], plugins: [virtuals(rulesDir, '')] });
  const page = await esbuild.build({ ...common, entryPoints: ['src/web/main.ts'], plugins: [virtuals(rulesDir, worker.outputFiles[0].text)] });
  const html = [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<title>axletree workbench</title>',
    `<style>${WORKBENCH_CSS}</style>`,
    '</head>',
    '<body>',
    INITIAL_SLOT,
    '<noscript>The workbench needs JavaScript; the command line (npx axletree check) gives the same answer.</noscript>',
    `<script>${inlineSafe(page.outputFiles[0].text)}</script>`,
    '</body>',
    '</html>',
    '',
  ].join('\n');
  return { html, bytes: Buffer.byteLength(html) };
}
