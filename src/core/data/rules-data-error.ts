// A fault in the editable rules data, told so that a teacher can find and
// fix it: which file, which line, which key, and what would be accepted.

export interface RulesDataProblem {
  /** Path of the file as it was read. */
  file: string;
  /** 1-based line in that file, where it could be found. */
  line: number | null;
  /** Dotted key path inside the file, e.g. "white-ash.mor_kPa.green.value"; "" for the whole file. */
  keyPath: string;
  /** What is wrong, and what is allowed there. */
  message: string;
}

export function describeProblem(p: RulesDataProblem): string {
  const where = p.line === null ? p.file : `${p.file}:${p.line}`;
  const key = p.keyPath === '' ? '(whole file)' : p.keyPath;
  return `${where}: ${key}: ${p.message}`;
}

export class RulesDataError extends Error {
  readonly problems: readonly RulesDataProblem[];

  constructor(problems: readonly RulesDataProblem[]) {
    const head =
      problems.length === 1 ? 'Rules data has a problem:' : `Rules data has ${problems.length} problems:`;
    super([head, ...problems.map((p) => '  ' + describeProblem(p))].join('\n'));
    this.name = 'RulesDataError';
    this.problems = problems;
  }
}
