import { resolve } from 'node:path';
import { command } from '../args.ts';
import { EXIT } from '../exit-codes.ts';

export const check = command({
  name: 'check',
  summary: 'check a build specification against every design rule (several, or a folder of them: a batch review)',
  positionals: [
    {
      name: 'spec',
      what: 'specification file',
      help: 'the build specification: .yaml, .yml, .json, or .xlsx (a fill-in workbook from axletree new); give several, or a folder (its specifications, not its sub-folders), for a batch review',
      many: true,
    },
  ],
  options: {
    out: { type: 'string', value: 'DIR', help: 'write the outputs into DIR (default axletree-out/<spec name>/; for a batch, axletree-out/review/)' },
    json: { type: 'boolean', default: false, help: 'print result.json on standard output (for a batch, the review table as JSON, and progress lines on standard error); the summary goes to standard error' },
    teach: { type: 'boolean', default: false, help: 'also write teach.html: each rule family in plain words with its formula, worked from this build\'s own findings' },
    pdf: { type: 'boolean', default: false, help: 'also print report.pdf and summary.pdf (A4) through the headless browser at /usr/bin/chromium; without one, only the HTML is written' },
    'no-decisive': { type: 'boolean', default: false, help: 'skip the search for the inputs each decisive finding hangs on and their break-even values (it re-runs parts of the check many times)' },
    jobs: { type: 'string', value: 'N', help: 'a batch checks N proposals at once, each on a thread of its own (default the number of cores)' },
  },
  about: `writes: a workbook (result.xlsx), a report (report.md and report.html, with
plots and drawings; report.html opens with the feasibility summary, also
written alone as summary.html) and result.json; nothing when the
specification is refused. The specification file is never written to.
A batch (several specifications, or a folder) writes each proposal's outputs
into <DIR>/<name>/ and one review table of them all into DIR: review.html,
review.xlsx and review.csv, a row per proposal (verdict, worst findings,
decisive inputs, cost, mass, a link to its report); a file that cannot be
checked is a row with its error. The batch's decisive search is held to a
smaller work limit (the table's notes name it). Ctrl-C stops after the
proposals in hand and writes the table of those finished.`,
  example: 'axletree check specs/demo-two-crew.yaml --out build/two-crew',
  findings: 'the verdict is FAIL (a finding is beyond a hard limit, or the check could not show a part is safe); a verdict of ERROR exits 3; a batch exits with the highest code of its proposals',
  async run({ positionals, values }, con) {
    const opts = { out: values.out, json: values.json, decisive: !values['no-decisive'], teach: values.teach, pdf: values.pdf };
    const { jobsOf } = await import('../jobs-option.ts');
    const jobs = jobsOf(values.jobs);
    if (typeof jobs === 'string') {
      con.err(`axletree check: ${jobs}\n`);
      return EXIT.badInput;
    }
    // One file is checked as it always was; so is a folder with no specification in it (check says what it is).
    const { specsIn } = await import('../../src/node/review/expand-inputs.ts');
    if (positionals.length === 1 && (await specsIn(resolve(con.cwd, positionals[0]))).length === 0) {
      const { checkCommand } = await import('../commands/check.ts');
      return checkCommand(positionals[0], opts, con);
    }
    const { checkBatch } = await import('../commands/check-batch.ts');
    return checkBatch(positionals, { ...opts, jobs }, con);
  },
});
