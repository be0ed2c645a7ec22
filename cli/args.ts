// Our one layer over node:util's parseArgs. Each command declares its options
// and positionals; argv is read against the declaration and gives the values,
// or one line naming what is wrong (and the nearest valid option). No option
// is ever ignored: one the command does not take is refused.
import { parseArgs } from 'node:util';
import { nearest } from './args-nearest.ts';
import type { Console } from './console.ts';

export interface OptionDecl {
  type: 'string' | 'boolean';
  help: string;
  /** The value's name in help and messages (string options), e.g. DIR. */
  value?: string;
  default?: string | boolean;
  /** The only values a string option takes. */
  choices?: readonly string[];
  /** Shown as required in the usage line; the command itself says what is missing, with its message code. */
  required?: boolean;
  /** A string option that may be given more than once: the command receives every value, in order. */
  multiple?: boolean;
}

export interface PositionalDecl {
  /** Its name in the usage line. */
  name: string;
  /** What it is, as a count error names it: "specification file". */
  what: string;
  help: string;
  /** The last positional only: it takes one or more values (files, or a folder). */
  many?: boolean;
  /** The last positional only: it may be left out. */
  optional?: boolean;
}

export type OptionDecls = Readonly<Record<string, OptionDecl>>;

/** The values of the options as the command receives them. */
export type Values<O extends OptionDecls> = {
  -readonly [K in keyof O]: O[K] extends { type: 'boolean' } ? boolean : O[K] extends { multiple: true } ? string[] : O[K] extends { default: string } ? string : string | undefined;
};

export interface Parsed<O extends OptionDecls> {
  values: Values<O>;
  positionals: string[];
}

export interface CommandDecl<O extends OptionDecls = OptionDecls> {
  name: string;
  /** One line for the overview. */
  summary: string;
  /** Exactly these, in this order (the last may take one or more: `many`). */
  positionals: readonly PositionalDecl[];
  options: O;
  /** More about the command for its --help: what it writes, the input format. */
  about?: string;
  example: string;
  /** What a failing finding is for this command (exit 1); absent where the command makes no findings. */
  findings?: string;
  /** Runs the command; it imports what it needs only when called. */
  run(args: Parsed<O>, con: Console): Promise<number>;
}

/** A command declaration, with its values typed from its options. */
export function command<const O extends OptionDecls>(decl: CommandDecl<O>): CommandDecl<O> {
  return decl;
}

export type ParseResult<O extends OptionDecls> = { kind: 'help' } | { kind: 'run'; args: Parsed<O> } | { kind: 'refused'; message: string };

/** The option every command takes besides its own. */
const HELP = 'help';

/**
 * Read argv (what follows the command name) against a declaration. `elsewhere`
 * names, for an option this command does not take, who does take it.
 */
export function parseCommand<O extends OptionDecls>(decl: CommandDecl<O>, argv: string[], elsewhere: (option: string) => string[] = () => []): ParseResult<O> {
  const { tokens } = parseArgs({
    args: argv,
    options: { ...Object.fromEntries(Object.entries(decl.options).map(([name, o]) => [name, { type: o.type }])), [HELP]: { type: 'boolean', short: 'h' } },
    allowPositionals: true,
    strict: false,
    tokens: true,
  });
  const given = new Map<string, string | boolean | string[]>();
  const positionals: string[] = [];
  let help = false;
  for (const t of tokens) {
    if (t.kind === 'positional') positionals.push(t.value);
    if (t.kind !== 'option') continue;
    const problem = t.name === HELP ? (t.value === undefined ? undefined : `option --help takes no value (got ${t.rawName}=${t.value})`) : optionProblem(decl, t, given, elsewhere);
    if (problem) return { kind: 'refused', message: problem };
    if (t.name === HELP) help = true;
    else if (decl.options[t.name].multiple) given.set(t.name, [...((given.get(t.name) as string[] | undefined) ?? []), t.value!]);
    else given.set(t.name, t.value ?? true);
  }
  if (help) return { kind: 'help' };
  const count = countProblem(decl.positionals, positionals);
  if (count) return { kind: 'refused', message: count };
  const values = Object.fromEntries(Object.entries(decl.options).map(([name, o]) => [name, given.get(name) ?? o.default ?? (o.type === 'boolean' ? false : o.multiple ? [] : undefined)]));
  return { kind: 'run', args: { values: values as Values<O>, positionals } };
}

interface OptionToken {
  name: string;
  rawName: string;
  value?: string;
  inlineValue?: boolean;
}

function optionProblem(decl: CommandDecl, t: OptionToken, given: Map<string, unknown>, elsewhere: (option: string) => string[]): string | undefined {
  const o = Object.hasOwn(decl.options, t.name) ? decl.options[t.name] : undefined;
  const shown = dashed(t.name);
  if (!o) return unknownOption(decl, t.name, elsewhere(t.name));
  if (given.has(t.name) && !o.multiple) return `option ${shown} is given twice; give it once`;
  if (o.type === 'boolean') return t.value === undefined ? undefined : `option ${shown} takes no value (got ${t.rawName}=${t.value})`;
  const form = `${shown} ${o.value ?? 'VALUE'}`;
  if (t.value === undefined) return `option ${shown} needs a value: ${form}`;
  // A value that looks like an option was most likely an option: say so rather than take it.
  if (!t.inlineValue && t.value.startsWith('-') && t.value !== '-') return `option ${shown} needs a value: ${form} (got ${t.value}; a value that starts with "-" is written ${shown}=${t.value})`;
  if (o.choices && !o.choices.includes(t.value)) {
    const near = nearest(t.value, o.choices);
    return `${shown} "${t.value}" is not one of: ${o.choices.join(', ')}${near ? `; did you mean ${near}?` : ''}`;
  }
  return undefined;
}

function unknownOption(decl: CommandDecl, name: string, takers: string[]): string {
  const own = [...Object.keys(decl.options), HELP];
  const list = `${decl.name} takes ${own.map(dashed).join(', ')}`;
  if (takers.length) return `option ${dashed(name)} is for ${takers.join(', ')}, not ${decl.name}; ${list}`;
  const near = nearest(name, own);
  return near ? `unknown option ${dashed(name)}; did you mean ${dashed(near)}?` : `unknown option ${dashed(name)}; ${list}`;
}

function countProblem(wanted: readonly PositionalDecl[], got: string[]): string | undefined {
  const last = wanted.at(-1);
  // A last positional marked `many` takes one or more.
  if (last?.many) {
    if (got.length >= wanted.length) return undefined;
    const fixed = wanted.slice(0, -1).map((w) => w.what);
    return `give ${[...fixed, `one or more ${last.what}s`].join(', then ')} (got ${got.length})`;
  }
  if (got.length === wanted.length || (last?.optional && got.length === wanted.length - 1)) return undefined;
  if (last?.optional && got.length > wanted.length) return `give at most ${wanted.length === 1 ? `one ${last.what}` : `${wanted.length} arguments`} (got ${got.length})`;
  if (wanted.length === 0) return `takes no file or other argument (got ${got.map((g) => `"${g}"`).join(', ')})`;
  const what = wanted.length === 1 ? `exactly one ${wanted[0].what}` : `${wanted.length} arguments: ${wanted.map((w) => w.what).join(', ')}`;
  return `give ${what} (got ${got.length})`;
}

/** An option as typed on the command line: --out, or -h for a one-letter name. */
export const dashed = (name: string) => (name.length === 1 ? `-${name}` : `--${name}`);
