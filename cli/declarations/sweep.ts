import { command } from '../args.ts';

export const sweep = command({
  name: 'sweep',
  summary: 'check a build across a range of one to three of its values: a grid or a Latin hypercube, with the feasible envelope of each',
  positionals: [{ name: 'spec', what: 'specification file', many: true, help: 'the build specification (.yaml, .yml, .json or .xlsx); with --merge, the folders the shards wrote' }],
  options: {
    vary: { type: 'string', value: 'PATH=FROM..TO:N', multiple: true, help: 'a value to vary: its spec path as written in the spec (axle.x_mm, crew[0].x_mm), its range in the unit the spec takes there (or a quantity such as 6in), and N values across it; one to three of them' },
    samples: { type: 'string', value: 'N', help: 'a Latin hypercube of N points instead of the grid (N of each --vary then sets the values along its envelope line)' },
    seed: { type: 'string', value: 'S', default: '1', help: 'the seed the Latin hypercube is drawn from, a whole number: the same seed gives the same points' },
    figure: { type: 'string', value: 'NAME', multiple: true, help: 'a figure to keep at each point (a name in the figures of result.json); the first is plotted (default yoke_load_per_horse, the load on each horse)' },
    statics: { type: 'boolean', default: false, help: 'statics only: the ride model is not run (much faster; the dynamic factors are the data\'s bounds, so verdicts are provisional)' },
    jobs: { type: 'string', value: 'N', help: 'worker threads to check points on (default: the number of cores)' },
    shard: { type: 'string', value: 'I/N', help: 'run only the I-th of N equal slices of the points and write that share; join the shares with --merge' },
    merge: { type: 'boolean', default: false, help: 'join the shares the shards wrote (give their folders) into the whole sweep\'s outputs' },
    out: { type: 'string', value: 'DIR', help: 'write the outputs into DIR (default axletree-out/sweep-<spec name>/, or .../sweep-<spec name>-shard-I-of-N/ for a shard)' },
    json: { type: 'boolean', default: false, help: 'print sweep.json on standard output and progress as JSON lines on standard error; the summary goes to standard error' },
  },
  about: `writes: sweep.csv (after a caution on a # line) and sweep.json (every
point: the varied values, the verdict, the worst utilisation and the finding
it is of, the chosen figures, the reason a refused point was refused),
sweep.md and sweep.html (a line plot over one value or a heat map over two,
the feasible envelope of each value with the others at the design point, and
with two or three values the range of each that passes with any of the
others) and sweep-plot.svg. A point whose spec is refused is a row with its
reason. Ctrl-C stops after the points in hand and writes those finished. A
shard writes sweep-part.json only.`,
  example: 'axletree sweep specs/demo-two-crew.yaml --vary axle.x_mm=150..350:21 --vary crew[0].x_mm=200..450:11 --statics',
  async run({ positionals, values }, con) {
    const { sweepCommand } = await import('../commands/sweep.ts');
    return sweepCommand(positionals, values, con);
  },
});
