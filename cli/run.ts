import { parseArgs } from 'node:util';
import { checkCommand } from './commands/check.ts';
import { rulesCommand } from './commands/rules.ts';
import { stockCommand } from './commands/stock.ts';
import { EXIT, type Console } from './console.ts';

const USAGE = `axletree: design-rule checks for replica chariots

usage:
  axletree check <spec.yaml|spec.json> [--out DIR] [--json]
      check a build specification; writes a workbook, a report (Markdown and
      HTML) and result.json into DIR (default axletree-out/<spec name>/)
  axletree rules [--json]
      list the rules with their limits and sources
  axletree stock <instance.json> [--json]
      plan the cutting of stock lengths into pieces with saw kerf, least
      cost (or fewest stock pieces where no price is given)
  axletree help
`;

const OPTIONS = {
  out: { type: 'string' },
  json: { type: 'boolean', default: false },
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
    case 'rules':
      return rulesCommand({ json: values.json }, con);
    case 'stock':
      if (rest.length !== 1) {
        con.err(`axletree stock: give exactly one instance file (got ${rest.length}).\n\n${USAGE}`);
        return EXIT.badInput;
      }
      return stockCommand(rest[0], { json: values.json }, con);
    default:
      con.err(`axletree: unknown command "${command}"; commands: check, rules, stock, help.\n\n${USAGE}`);
      return EXIT.badInput;
  }
}
