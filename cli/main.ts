// The only module that touches the process: arguments in, exit code out.
import { run } from './run.ts';
import { EXIT } from './exit-codes.ts';
import { faultLine } from './fault-line.ts';
// Ctrl-C stops at once, except while an output set is being swapped into place: then right after it, so the last complete set stands.
// (Imported when the signal comes, so start-up loads nothing of src/; a command that writes has it loaded already.)
process.on('SIGINT', () => {
  void import('../src/node/critical-section.ts').then(({ whenSafe }) => whenSafe(() => process.exit(130)));
});

try {
  process.exitCode = await run(process.argv.slice(2), {
    out: (s) => process.stdout.write(s),
    err: (s) => process.stderr.write(s),
    cwd: process.cwd(),
  });
} catch (e) {
  // run() answers its own faults; this catches what escapes even that.
  process.stderr.write(faultLine(e));
  process.exitCode = EXIT.fault;
}
