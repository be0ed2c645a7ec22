// The exit codes, the same for every command. A run that covers several
// inputs (or several parts) exits with the highest of them: 3 > 2 > 1 > 0.
// A long run stopped by Ctrl-C exits 130 (the shell's code for it) whatever
// the finished part found, so a script never takes part of a run for all of it.
import type { Severity } from '../src/core/findings/severity.ts';

export const EXIT = { ok: 0, failed: 1, badInput: 2, fault: 3, stopped: 130 } as const;
export type ExitCode = (typeof EXIT)[keyof typeof EXIT];

/** What each code means, in one line each; every --help prints these. */
export const EXIT_MEANING: Readonly<Record<ExitCode, string>> = {
  0: 'no finding fails',
  1: 'a finding fails',
  2: 'an input is refused (a file, an option or a value); the message names it',
  3: 'an internal error: a fault of the tool, not of the input (a rule that could not run, or an uncaught fault)',
  130: 'stopped by Ctrl-C (a batch, a sweep or a sizing first writes what it finished as a complete set, whose results name what was not done)',
};

/** The exit code of several results: the highest. */
export function worstExit(codes: Iterable<ExitCode>): ExitCode {
  let worst: ExitCode = EXIT.ok;
  for (const c of codes) if (c > worst) worst = c;
  return worst;
}

/** A check's verdict as an exit code: error (a rule could not run) above fail. */
export function exitOfVerdict(verdict: Severity): ExitCode {
  if (verdict === 'error') return EXIT.fault;
  return verdict === 'fail' ? EXIT.failed : EXIT.ok;
}
