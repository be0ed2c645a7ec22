// Picks the command, reads its arguments, runs it, and answers the exit code.
// Loads only declarations: a command's code is imported when it runs, so
// --version and --help load almost nothing.
import { dashed, parseCommand } from './args.ts';
import { nearest } from './args-nearest.ts';
import { commandHelp, overview } from './args-help.ts';
import type { Console } from './console.ts';
import { COMMANDS } from './declarations/index.ts';
import { EXIT } from './exit-codes.ts';
import { faultLine } from './fault-line.ts';
import { VERSION } from './version.ts';

/** Options of axletree itself, given before any command. */
const TOP = { version: ['--version'], help: ['--help', '-h'] } as const;

export async function run(argv: string[], con: Console): Promise<number> {
  try {
    const code = await dispatch(argv, con);
    // Only a long run that keeps its finished part is still here after Ctrl-C (cli/main.ts).
    return con.stop?.aborted ? EXIT.stopped : code;
  } catch (e) {
    // An output place that cannot be written is the user's to fix, not a fault of the tool (src/node/output-error.ts; matched by name so start-up loads nothing of src/).
    if (e instanceof Error && e.name === 'OutputError') {
      con.err(`axletree: ${e.message}.\n`);
      return EXIT.badInput;
    }
    con.err(faultLine(e));
    return EXIT.fault;
  }
}

async function dispatch(argv: string[], con: Console): Promise<number> {
  const [first, ...rest] = argv;
  if (first === undefined || (rest.length === 0 && (first === 'help' || (TOP.help as readonly string[]).includes(first)))) {
    con.out(overview(COMMANDS));
    return EXIT.ok;
  }
  if (rest.length === 0 && (TOP.version as readonly string[]).includes(first)) {
    con.out(`axletree ${VERSION}\n`);
    return EXIT.ok;
  }
  if (first === 'help') return dispatch([...rest, '--help'], con);
  if (first.startsWith('-')) return refuse('axletree', topOption(first, rest), con);
  const decl = COMMANDS.find((c) => c.name === first);
  if (!decl) {
    const near = nearest(first, COMMANDS.map((c) => c.name));
    return refuse('axletree', `unknown command "${first}"; ${near ? `did you mean ${near}?` : `commands: ${COMMANDS.map((c) => c.name).join(', ')}`}`, con);
  }
  const parsed = parseCommand(decl, rest, takersOf);
  if (parsed.kind === 'refused') return refuse(`axletree ${decl.name}`, parsed.message, con);
  if (parsed.kind === 'help') {
    con.out(commandHelp(decl));
    return EXIT.ok;
  }
  return decl.run(parsed.args, con);
}

/** What is wrong with an option given before the command (or beside --version / --help). */
function topOption(option: string, rest: string[]): string {
  const name = option.replace(/^--?/, '').replace(/=.*$/, '');
  if (Object.hasOwn(TOP, name)) return `${option} takes nothing else (got ${rest.join(' ')})`;
  const takers = takersOf(name);
  if (takers.length) return `option ${dashed(name)} goes after the command, as in axletree ${takers[0]} ... ${dashed(name)}`;
  const near = nearest(name, Object.keys(TOP));
  return `unknown option ${option}; ${near ? `did you mean --${near}?` : 'give a command first (axletree help lists them)'}`;
}

/** The commands that take an option. */
function takersOf(option: string): string[] {
  const commands = COMMANDS.filter((c) => Object.hasOwn(c.options, option)).map((c) => c.name);
  return Object.hasOwn(TOP, option) && option !== 'help' ? [...commands, `axletree itself (axletree --${option})`] : commands;
}

/** One line naming what is refused; no usage dump. */
function refuse(who: string, message: string, con: Console): number {
  con.err(`${who}: ${message}\n`);
  return EXIT.badInput;
}
