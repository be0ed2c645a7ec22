// The argument layer on its own: no command runs.
import { describe, expect, it } from 'vitest';
import { command, parseCommand } from '../../cli/args.ts';
import { editDistance, nearest } from '../../cli/args-nearest.ts';
import { EXIT, exitOfVerdict, worstExit } from '../../cli/exit-codes.ts';

const demo = command({
  name: 'demo',
  summary: 'a command for the tests',
  positionals: [{ name: 'file', what: 'file', help: 'a file' }],
  options: {
    out: { type: 'string', value: 'DIR', help: 'where' },
    json: { type: 'boolean', default: false, help: 'as JSON' },
    shade: { type: 'string', value: 'S', choices: ['light', 'dark'], default: 'light', help: 'how dark' },
  },
  example: 'axletree demo x',
  run: () => Promise.resolve(0),
});

describe('edit distance and the nearest name', () => {
  it('counts insertions, deletions and substitutions', () => {
    // Worked by hand: kitten -> sitten -> sittin -> sitting.
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('jsn', 'json')).toBe(1);
    // Two neighbours swapped count as one edit.
    expect(editDistance('drak', 'dark')).toBe(1);
    expect(editDistance('', 'out')).toBe(3);
  });

  it('suggests only what is near: a letter in three off, or a prefix', () => {
    expect(nearest('jsn', ['out', 'json'])).toBe('json');
    expect(nearest('mas', ['out', 'mass-kg'])).toBe('mass-kg');
    expect(nearest('case', ['json', 'help'])).toBeUndefined();
  });
});

describe('parseCommand', () => {
  it('gives typed values with their defaults', () => {
    expect(parseCommand(demo, ['x.yaml', '--out', 'o'])).toEqual({ kind: 'run', args: { positionals: ['x.yaml'], values: { out: 'o', json: false, shade: 'light' } } });
    expect(parseCommand(demo, ['--json', 'x.yaml', '--shade=dark'])).toMatchObject({ args: { values: { out: undefined, json: true, shade: 'dark' } } });
  });

  it('answers help for --help or -h', () => {
    expect(parseCommand(demo, ['-h']).kind).toBe('help');
    expect(parseCommand(demo, ['x', '--help']).kind).toBe('help');
  });

  it.each([
    [['x', '--jsn'], 'unknown option --jsn; did you mean --json?'],
    [['x', '--zzz'], 'unknown option --zzz; demo takes --out, --json, --shade, --help'],
    [['x', '--case', 'drop'], 'option --case is for ride, not demo; demo takes --out, --json, --shade, --help'],
    [['x', '--out'], 'option --out needs a value: --out DIR'],
    [['x', '--out', '--json'], 'option --out needs a value: --out DIR (got --json; a value that starts with "-" is written --out=--json)'],
    [['x', '--json=yes'], 'option --json takes no value (got --json=yes)'],
    [['x', '--out', 'a', '--out', 'b'], 'option --out is given twice; give it once'],
    [['x', '--shade', 'drak'], '--shade "drak" is not one of: light, dark; did you mean dark?'],
    [[], 'give exactly one file (got 0)'],
    [['x', 'y'], 'give exactly one file (got 2)'],
  ])('refuses %j in one line', (argv, message) => {
    const r = parseCommand(demo, argv, (o) => (o === 'case' ? ['ride'] : []));
    expect(r).toEqual({ kind: 'refused', message });
  });
});

describe('a last positional that takes one or more', () => {
  const many = command({
    name: 'many',
    summary: 'several files',
    positionals: [{ name: 'spec', what: 'specification file', help: 'files', many: true }],
    options: {},
    example: 'axletree many a b',
    run: () => Promise.resolve(0),
  });
  const after = command({ ...many, positionals: [{ name: 'base', what: 'baseline', help: 'one' }, { name: 'other', what: 'build', help: 'more', many: true }] });

  it('takes every one given', () => {
    expect(parseCommand(many, ['a.yaml', 'b.yaml', 'c.yaml'])).toMatchObject({ kind: 'run', args: { positionals: ['a.yaml', 'b.yaml', 'c.yaml'] } });
    expect(parseCommand(after, ['a.yaml', 'b.yaml'])).toMatchObject({ kind: 'run', args: { positionals: ['a.yaml', 'b.yaml'] } });
  });

  it('refuses none, naming what is wanted', () => {
    expect(parseCommand(many, [])).toEqual({ kind: 'refused', message: 'give one or more specification files (got 0)' });
    expect(parseCommand(after, ['a.yaml'])).toEqual({ kind: 'refused', message: 'give baseline, then one or more builds (got 1)' });
  });
});

describe('exit codes', () => {
  it('a run over several inputs exits with the highest code', () => {
    expect(worstExit([])).toBe(EXIT.ok);
    expect(worstExit([EXIT.failed, EXIT.ok])).toBe(EXIT.failed);
    expect(worstExit([EXIT.failed, EXIT.fault, EXIT.badInput])).toBe(EXIT.fault);
  });

  it("a check's verdict: fail is 1, error (a rule could not run) is 3, the rest 0", () => {
    expect(['pass', 'advice', 'warning', 'fail', 'error'].map((v) => exitOfVerdict(v as never))).toEqual([0, 0, 0, 1, 3]);
  });
});
