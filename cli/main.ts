// The only module that touches the process: arguments in, exit code out.
import { setFlagsFromString } from 'node:v8';
import { run } from './run.ts';
import { EXIT } from './exit-codes.ts';
import { faultLine } from './fault-line.ts';
// The first Ctrl-C asks a long run (batch, sweep, size) to stop after the
// item in hand and write what it finished; a command with nothing to keep,
// or a second Ctrl-C, stops at once, except while an output set is being
// swapped into place: then right after it, so the last complete set stands.
// (Imported when the signal comes, so start-up loads nothing of src/; a
// command that writes has it loaded already.)
const stop = new AbortController();
let keepsPartial = false;
process.on('SIGINT', () => {
  if (keepsPartial && !stop.signal.aborted) {
    stop.abort();
    process.stderr.write('\naxletree: stopping after the item in hand; what is finished will be written (Ctrl-C again to stop at once)\n');
    return;
  }
  void import('../src/node/critical-section.ts').then(({ whenSafe }) => whenSafe(() => process.exit(130)));
});

// A reader that closes early (`| head`) is not a fault: the rest of stdout
// goes nowhere, and the run still finishes and writes its outputs.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code !== 'EPIPE') throw e;
});

try {
  process.exitCode = await run(process.argv.slice(2), {
    out: (s) => process.stdout.write(s),
    err: (s) => process.stderr.write(s),
    cwd: process.cwd(),
    stop: stop.signal,
    errIsTerminal: process.stderr.isTTY === true,
    // A command that keeps a partial result says so when it starts its long part.
    keepPartial: () => {
      keepsPartial = true;
      // Many checks, not one (a batch, a sweep, a sizing): V8's own growth of the old generation again. The bin slows
      // it for one check's peak memory (bin/axletree.mjs); over thousands of checks the extra full collections cost
      // a sixth to a quarter more CPU (the demo's 100 x 100 statics sweep 18.5-19.4 -> 13.8-14.8 s, the nine-spec
      // batch 15.9-16.1 -> 13.7-13.9 s, run from the bundle beside each other).
      setFlagsFromString('--heap-growing-percent=0');
    },
  });
} catch (e) {
  // run() answers its own faults; this catches what escapes even that.
  process.stderr.write(faultLine(e));
  process.exitCode = EXIT.fault;
}
