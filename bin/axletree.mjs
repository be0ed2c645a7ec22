#!/usr/bin/env -S node --max-semi-space-size=8
// Runs the command built into dist/ (`npm ci` and `npm run build` make it)
// while it is no older than the sources it was made from (dist/inputs.json);
// otherwise runs the TypeScript source through tsx, so a checkout always runs
// what it holds.
import { existsSync, readFileSync, statSync } from 'node:fs';
import { setFlagsFromString } from 'node:v8';

// The LP solver is 3.5 MB of WebAssembly; optimising its hot functions costs
// about 80 MB and half a second of CPU, and the planner's LPs never repay it
// (measured: a demo check's peak memory 345 -> 255 MB, CPU 3.1 -> 2.6 s; the
// bench's bin-packing sets take as long on the baseline compiler alone).
setFlagsFromString('--liftoff-only');
// The first line starts Node with a young generation of at most 8 MB a
// semi-space (V8 lets it grow to 16, and the decisive-input search's re-runs
// make it): measured on the demo's check, peak memory 151-159 -> 135-139 MB
// with CPU time the same within the noise. It is a start-up option, so it
// holds where the bin is run as a program (npx, an installed axletree);
// `npm start` passes it too; a bare `node bin/axletree.mjs` runs without it.
// The old generation grows by a tenth at each full collection rather than by
// V8's own factor (up to fourfold): the decisive-input search leaves much
// short-lived garbage, and a heap grown for it stays grown while the outputs
// are built (measured on the demo's check: peak memory 163-170 -> 151-156 MB,
// CPU time the same within the noise, about 3.9 s either way). A command
// that runs many checks (batch, sweep, size) sets V8's own growth back when
// its long part starts (cli/main.ts): there the extra collections cost CPU.
setFlagsFromString('--heap-growing-percent=10');
// Half V8's budget (920) of bytecode inlined into one optimised function: the
// optimising compiler does less work on the check's large functions and the
// code it makes runs as fast (measured on the demo's check, alternating five
// runs each: CPU 3.93 -> 3.60 s, wall 2.67 -> 2.51 s; without the decisive
// search 1.82 -> 1.76 s CPU).
setFlagsFromString('--max-inlined-bytecode-size-cumulative=460');

const dist = new URL('../dist/axletree.mjs', import.meta.url);

/** True when every source of the bundle is no newer than the bundle. */
function fresh() {
  try {
    const built = statSync(dist).mtimeMs;
    const { inputs } = JSON.parse(readFileSync(new URL('../dist/inputs.json', import.meta.url), 'utf8'));
    return inputs.every((path) => statSync(new URL(`../${path}`, import.meta.url)).mtimeMs <= built);
  } catch {
    return false;
  }
}

if (fresh()) {
  await import(dist.href);
} else {
  if (existsSync(dist)) process.stderr.write('axletree: dist/ is older than the source, so the source runs (slower to start); `npm run build` brings it up to date.\n');
  const { register } = await import('tsx/esm/api');
  register();
  await import('../cli/main.ts');
}
