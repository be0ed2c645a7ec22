import { command } from '../args.ts';

export const check = command({
  name: 'check',
  summary: 'check a build specification against every design rule',
  positionals: [{ name: 'spec', what: 'specification file', help: 'the build specification: .yaml, .yml, .json, or .xlsx (a fill-in workbook from axletree new)' }],
  options: {
    out: { type: 'string', value: 'DIR', help: 'write the outputs into DIR (default axletree-out/<spec name>/)' },
    json: { type: 'boolean', default: false, help: 'print result.json on standard output; the summary goes to standard error' },
    teach: { type: 'boolean', default: false, help: 'also write teach.html: each rule family in plain words with its formula, worked from this build\'s own findings' },
    pdf: { type: 'boolean', default: false, help: 'also print report.pdf and summary.pdf (A4) through the headless browser at /usr/bin/chromium; without one, only the HTML is written' },
    'no-decisive': { type: 'boolean', default: false, help: 'skip the search for the inputs each decisive finding hangs on and their break-even values (it re-runs parts of the check many times)' },
  },
  about: `writes: a workbook (result.xlsx), a report (report.md and report.html, with
plots and drawings; report.html opens with the feasibility summary, also
written alone as summary.html) and result.json; nothing when the
specification is refused. The specification file is never written to.`,
  example: 'axletree check specs/demo-two-crew.yaml --out build/two-crew',
  findings: 'the verdict is FAIL (a finding is beyond a hard limit, or the check could not show a part is safe); a verdict of ERROR exits 3',
  async run({ positionals: [file], values }, con) {
    const { checkCommand } = await import('../commands/check.ts');
    return checkCommand(file, { out: values.out, json: values.json, decisive: !values['no-decisive'], teach: values.teach, pdf: values.pdf }, con);
  },
});
