import { command } from '../args.ts';

export const size = command({
  name: 'size',
  summary: 'propose the smallest passing section for each failing or warning member, and one-input options for the other failing findings',
  positionals: [{ name: 'spec', what: 'specification file', help: 'the build specification: .yaml, .yml, .json, or .xlsx' }],
  options: {
    out: { type: 'string', value: 'DIR', help: 'write the outputs into DIR (default axletree-out/size-<spec name>/)' },
    free: { type: 'boolean', default: false, help: "take every section from the size series (whole 5 mm steps, half to three times the section as given, the part's species kept) instead of the stock list" },
    json: { type: 'boolean', default: false, help: 'print size.json on standard output, and progress as JSON lines on standard error' },
  },
  about: `For each member whose rule (member.axle, member.pole, member.felloe,
member.spoke, member.yoke, member.frame-rail) fails or warns: the smallest
section, least area first and a tie by the lesser depth, that passes its
rule with no other finding worse, the rest of the build held; from the stock
list (where it lists the part's species) or, with --free, from the size
series; with the change in the build's mass and stock cost. For each other
failing finding: the smallest change of one input that makes it pass, by
bisection on the check, listed and not applied.
writes: size.md, size.html, size.json and size-proposed.yaml (the
specification with every proposed section written in). The specification
file is never written to. Ctrl-C stops after the item in hand and writes what
is finished.`,
  example: 'axletree size specs/teaching-flawed.yaml --out build/sizes',
  findings: 'some failing or warning member has no passing section, or some other failing finding has no one-input option',
  async run({ positionals: [file], values }, con) {
    const { sizeCommand } = await import('../commands/size.ts');
    return sizeCommand(file, { out: values.out, free: values.free, json: values.json }, con);
  },
});
