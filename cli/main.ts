// The only module that touches the process: arguments in, exit code out.
import { run } from './run.ts';

process.exitCode = await run(process.argv.slice(2), {
  out: (s) => process.stdout.write(s),
  err: (s) => process.stderr.write(s),
  cwd: process.cwd(),
});
