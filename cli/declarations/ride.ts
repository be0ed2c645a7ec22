import { command } from '../args.ts';

export const ride = command({
  name: 'ride',
  summary: 'run the ride model over rough ground and the stone (across both tracks and under one wheel) and a drop: the time series, plots and a report',
  positionals: [{ name: 'spec', what: 'specification file', help: 'the build specification: .yaml, .yml or .json' }],
  options: {
    // The same list as RIDE_CASES (src/core/ride/ride-model.ts); a test holds them together.
    case: { type: 'string', value: 'CASE', choices: ['rough-ridge', 'rough-one-wheel', 'stone-ridge', 'stone-one-wheel', 'drop'], help: 'the one case to run (all of them when absent)' },
    out: { type: 'string', value: 'DIR', help: 'write the outputs into DIR (default axletree-out/<spec name>/ride/)' },
    json: { type: 'boolean', default: false, help: 'print the results as JSON without the long series (the CSV files hold them)' },
  },
  about: `writes: the time series (ride-<case>.csv, the unit in each header), plots
(ride-<case>-*.svg) and ride.md.`,
  example: 'axletree ride specs/demo-two-crew.yaml --case drop',
  async run({ positionals: [file], values }, con) {
    const { rideCommand } = await import('../commands/ride.ts');
    return rideCommand(file, values, con);
  },
});
