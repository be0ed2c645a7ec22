import { command } from '../args.ts';

export const floorTest = command({
  name: 'floor-test',
  summary: 'natural frequency, damping ratio and stiffness of a floor sample from a drop test',
  positionals: [{ name: 'record', what: 'CSV record', help: 'the drop-test record: CSV with a header row naming time_s and displacement_mm (other columns are ignored, # lines are comments)' }],
  options: {
    'mass-kg': { type: 'string', value: 'M', required: true, help: 'the mass dropped on the sample, in kg (required)' },
    out: { type: 'string', value: 'DIR', help: 'write the report and plot into DIR (default axletree-out/<csv name>/)' },
    json: { type: 'boolean', default: false, help: 'print the estimate as JSON; the summary goes to standard error' },
  },
  about: `writes: floor-test.md and floor-test.svg (the record and the fitted
curve).`,
  example: 'axletree floor-test specs/floor-test-demo.csv --mass-kg 40',
  async run({ positionals: [file], values }, con) {
    const { floorTestCommand } = await import('../commands/floor-test.ts');
    return floorTestCommand(file, { massKg: values['mass-kg'], out: values.out, json: values.json }, con);
  },
});
