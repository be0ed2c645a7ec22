import { command } from '../args.ts';

export const newSpec = command({
  name: 'new',
  summary: 'write a fill-in specification: a workbook or a commented YAML file, blank or holding the values of a specification',
  positionals: [{ name: 'file', what: 'file to write', help: 'the file to write: .xlsx (a workbook: one sheet per section, with drop-downs and help) or .yaml (a commented YAML file)' }],
  options: {
    from: { type: 'string', value: 'SPEC', help: 'fill the new file with the values of the specification SPEC' },
    force: { type: 'boolean', default: false, help: 'replace the file if it exists (without it an existing file is left alone)' },
  },
  example: 'axletree new my-build.xlsx --from specs/demo-two-crew.yaml',
  async run({ positionals: [file], values }, con) {
    const { newCommand } = await import('../commands/new.ts');
    return newCommand(file, values, con);
  },
});
