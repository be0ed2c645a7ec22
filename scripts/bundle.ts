// Bundles the command line (cli/main.ts) into a directory as JavaScript
// modules: the entry axletree.mjs and a chunk per command, loaded when the
// command runs. Used by scripts/build.ts (dist/) and by the test of the bundle.
import { readFileSync, realpathSync, rmSync } from 'node:fs';
import { basename, dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Plugin } from 'esbuild';

const ROOT = fileURLToPath(new URL('..', import.meta.url));

// Left to Node to load: HiGHS finds its WebAssembly beside its own file, and
// odex is loaded through createRequire, and playwright-core (loaded only to
// print a PDF) reads its own files through CommonJS's __dirname. The rest
// bundles cleanly (exceljs included; their output was compared with
// the unbundled run's).
const EXTERNAL = ['highs', 'odex', 'playwright-core'];

/**
 * The bundle lives elsewhere than the sources, so a module that finds files
 * from its own place (`new URL('../../rules', import.meta.url)`) would look in
 * the wrong place. Each of our modules gets back its own URL, worked out from
 * the bundle's (so the bundle must stay where it was built).
 */
function ownUrl(outdir: string): Plugin {
  return {
    name: 'own-import-meta-url',
    setup(b) {
      b.onLoad({ filter: /\.ts$/ }, (args) => {
        if (args.path.includes('/node_modules/')) return undefined;
        const text = readFileSync(args.path, 'utf8');
        if (!text.includes('import.meta.url')) return undefined;
        const fromOut = relative(outdir, args.path).split('\\').join('/');
        return { contents: text.replaceAll('import.meta.url', `new URL(${JSON.stringify(fromOut)}, import.meta.url).href`), loader: 'ts' };
      });
    },
  };
}

/** `exceljs` resolved to the part of it the command uses (scripts/exceljs-workbook.mjs says why). */
function workbookOnly(): Plugin {
  return {
    name: 'exceljs-workbook-only',
    setup(b) {
      b.onResolve({ filter: /^exceljs$/ }, () => ({ path: join(ROOT, 'scripts', 'exceljs-workbook.mjs') }));
    },
  };
}

export interface Bundle {
  /** The project's own files it was made from, from the repository root. */
  inputs: string[];
  files: number;
  bytes: number;
}

/** Bundle into outdir (emptied first); undefined when esbuild is not installed. */
export async function bundle(outdir: string): Promise<Bundle | undefined> {
  const esbuild = await import('esbuild').catch(() => undefined);
  if (!esbuild) return undefined;
  rmSync(outdir, { recursive: true, force: true });
  const result = await esbuild.build({
    // The batch review's check thread and the sweep's worker thread are entries of their own: each is started
    // from beside the chunk that holds its pool (src/node/review/worker-place.mjs, src/node/sweep).
    entryPoints: { axletree: 'cli/main.ts', 'review-worker': 'src/node/review/check-worker.ts', 'sweep-worker': 'src/node/sweep/sweep-worker.ts' },
    absWorkingDir: ROOT,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    splitting: true,
    outdir,
    outExtension: { '.js': '.mjs' },
    external: EXTERNAL,
    // Bundled CommonJS packages call require(); an ES module has none of its own.
    banner: { js: "import { createRequire as __axletreeRequire } from 'node:module'; const require = __axletreeRequire(import.meta.url);" },
    // Node runs the bundle from its real path: where outdir is reached through a
    // symbolic link (a linked node_modules), the sources are found from there.
    plugins: [workbookOnly(), ownUrl(join(realpathSync(dirname(outdir)), basename(outdir)))],
    metafile: true,
    logLevel: 'warning',
  });
  const outputs = Object.values(result.metafile.outputs);
  return {
    inputs: Object.keys(result.metafile.inputs).filter((p) => !p.includes('node_modules/')),
    files: outputs.length,
    bytes: outputs.reduce((n, o) => n + o.bytes, 0),
  };
}
