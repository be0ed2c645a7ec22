import { parseArgs } from 'node:util';
import { checkCommand } from './commands/check.ts';
import { newCommand } from './commands/new.ts';
import { floorTestCommand } from './commands/floor-test.ts';
import { rideCommand } from './commands/ride.ts';
import { rulesCommand } from './commands/rules.ts';
import { stockCommand } from './commands/stock.ts';
import { EXIT, type Console } from './console.ts';

const USAGE = `axletree: design-rule checks for replica chariots

usage:
  axletree check <spec.yaml|spec.json|spec.xlsx> [--out DIR] [--json]
      check a build specification; writes a workbook, a report (Markdown and
      HTML) and result.json into DIR (default axletree-out/<spec name>/)
  axletree new <file.xlsx|file.yaml> [--from SPEC] [--force]
      write a fill-in specification: a workbook (one sheet per section, with
      drop-downs and help) or a commented YAML file; blank, or holding the
      values of SPEC; an existing file is replaced only with --force
  axletree rules [--json]
      list the rules with their limits and sources
  axletree stock <instance.json> [--json]
      plan the cutting of stock lengths into pieces with saw kerf, least
      cost (or fewest stock pieces where no price is given)
  axletree ride <spec.yaml|spec.json> [--case ridge|one-wheel|drop] [--out DIR] [--json]
      run the ride model (all three cases, or the one named); writes the time
      series (CSV), plots and a report into DIR (default
      axletree-out/<spec name>/ride/); --json prints the results without
      the long series
  axletree floor-test <record.csv> --mass-kg M [--out DIR] [--json]
      natural frequency, damping ratio and stiffness of a floor sample from a
      drop test (CSV with time_s and displacement_mm); writes a report and a
      plot into DIR (default axletree-out/<csv name>/)
  axletree help
`;

const OPTIONS = {
  out: { type: 'string' },
  'mass-kg': { type: 'string' },
  case: { type: 'string' },
  json: { type: 'boolean', default: false },
  from: { type: 'string' },
  force: { type: 'boolean', default: false },
  help: { type: 'boolean', short: 'h', default: false },
} as const;

export async function run(argv: string[], con: Console): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({ args: argv, options: OPTIONS, allowPositionals: true, strict: true });
  } catch (e) {
    con.err(`axletree: ${(e as Error).message}\n\n${USAGE}`);
    return EXIT.badInput;
  }
  const [command, ...rest] = parsed.positionals;
  const { values } = parsed;
  if (values.help || command === 'help' || command === undefined) {
    (command === undefined && !values.help ? con.err : con.out)(USAGE);
    return command === undefined && !values.help ? EXIT.badInput : EXIT.ok;
  }
  switch (command) {
    case 'check':
      if (rest.length !== 1) {
        con.err(`axletree check: give exactly one specification file (got ${rest.length}).\n\n${USAGE}`);
        return EXIT.badInput;
      }
      return checkCommand(rest[0], { out: values.out, json: values.json }, con);
    case 'new':
      if (rest.length !== 1) {
        con.err(`axletree new: give exactly one file to write (got ${rest.length}).\n\n${USAGE}`);
        return EXIT.badInput;
      }
      return newCommand(rest[0], { from: values.from, force: values.force }, con);
    case 'rules':
      return rulesCommand({ json: values.json }, con);
    case 'stock':
      if (rest.length !== 1) {
        con.err(`axletree stock: give exactly one instance file (got ${rest.length}).\n\n${USAGE}`);
        return EXIT.badInput;
      }
      return stockCommand(rest[0], { json: values.json }, con);
    case 'ride':
      if (rest.length !== 1) {
        con.err(`axletree ride: give exactly one specification file (got ${rest.length}).\n\n${USAGE}`);
        return EXIT.badInput;
      }
      return rideCommand(rest[0], { case: values.case, out: values.out, json: values.json }, con);
    case 'floor-test':
      if (rest.length !== 1) {
        con.err(`axletree floor-test: give exactly one CSV record (got ${rest.length}).\n\n${USAGE}`);
        return EXIT.badInput;
      }
      return floorTestCommand(rest[0], { massKg: values['mass-kg'], out: values.out, json: values.json }, con);
    default:
      con.err(`axletree: unknown command "${command}"; commands: check, new, ride, rules, stock, floor-test, help.\n\n${USAGE}`);
      return EXIT.badInput;
  }
}
