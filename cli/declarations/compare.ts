import { command } from '../args.ts';

export const compare = command({
  name: 'compare',
  summary: 'check two or more builds the same way and set them side by side, saying why their verdicts differ',
  positionals: [
    { name: 'base', what: 'baseline specification', help: 'the build the others are compared against: .yaml, .yml, .json, or .xlsx' },
    { name: 'other', what: 'specification', many: true, help: 'one or more builds to compare with the baseline' },
  ],
  options: {
    out: { type: 'string', value: 'DIR', help: 'write the outputs into DIR (default axletree-out/compare-<base>-<other>/)' },
    json: { type: 'boolean', default: false, help: 'print compare.json on standard output; the summary and progress go to standard error' },
    'no-decisive': { type: 'boolean', default: false, help: 'skip the search for each build\'s decisive inputs (it re-runs parts of each check many times)' },
  },
  about: `writes: compare.md and compare.html (opening with why the verdicts
differ: the deciding findings, the values of the specifications that differ,
and what each does when the baseline is re-run with it changed), then every
figure with its difference and ratio against the baseline, the findings that
differ, each build's decisive inputs and its drawings at one scale;
compare.xlsx (the account, the figures and the findings) and compare.json.
Nothing is written when a specification is refused; no specification is
ever written to.`,
  example: 'axletree compare specs/demo-rear-axle.yaml specs/demo-two-crew.yaml',
  findings: 'a build\'s verdict is FAIL; the exit code is the highest of the builds\' (a verdict of ERROR exits 3)',
  async run({ positionals, values }, con) {
    const { compareCommand } = await import('../commands/compare.ts');
    return compareCommand(positionals, { out: values.out, json: values.json, decisive: !values['no-decisive'] }, con);
  },
});
