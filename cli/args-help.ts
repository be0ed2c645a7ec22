// The help texts, made from the command declarations: a command's --help
// (usage, arguments, options, more, an example, the exit codes) and the
// overview of all commands.
import { dashed, type CommandDecl } from './args.ts';
import { EXIT, EXIT_MEANING } from './exit-codes.ts';

const WIDTH = 80;

/** Words wrapped to the width, every line after the first indented. */
function wrap(text: string, indent: number, first = indent): string {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const start = lines.length ? indent : first;
    if (line && start + line.length + 1 + word.length > WIDTH) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  lines.push(line);
  return lines.map((l, i) => (i === 0 ? l : ' '.repeat(indent) + l)).join('\n');
}

/** Rows of a two-column table: the name, then its text wrapped beside it. */
function table(rows: [string, string][]): string[] {
  const col = Math.min(24, Math.max(...rows.map(([n]) => n.length)) + 4);
  return rows.map(([name, text]) => {
    // A name that fills its column is followed by the text on the next line, so the two never touch.
    const head = `  ${name}`;
    return head.length >= col ? `${head}\n${' '.repeat(col)}${wrap(text, col)}` : `${head.padEnd(col)}${wrap(text, col)}`;
  });
}

export function usageLine(d: CommandDecl): string {
  const options = Object.entries(d.options).map(([name, o]) => {
    const text = o.type === 'boolean' ? dashed(name) : `${dashed(name)} ${o.value ?? 'VALUE'}`;
    const once = o.required ? text : `[${text}]`;
    return o.multiple ? `${once}...` : once;
  });
  return ['axletree', d.name, ...d.positionals.map((p) => (p.many ? `<${p.name}>...` : p.optional ? `[<${p.name}>]` : `<${p.name}>`)), ...options].join(' ');
}

export function exitCodeLines(findings?: string): string[] {
  return table([
    [String(EXIT.ok), EXIT_MEANING[EXIT.ok]],
    [String(EXIT.failed), findings ? `${EXIT_MEANING[EXIT.failed]}: ${findings}` : `${EXIT_MEANING[EXIT.failed]} (not given here: this command makes no findings)`],
    [String(EXIT.badInput), EXIT_MEANING[EXIT.badInput]],
    [String(EXIT.fault), EXIT_MEANING[EXIT.fault]],
    [String(EXIT.stopped), EXIT_MEANING[EXIT.stopped]],
  ]);
}

/** `axletree <command> --help`. */
export function commandHelp(d: CommandDecl): string {
  const options: [string, string][] = Object.entries(d.options).map(([name, o]) => {
    const choices = o.choices ? `; one of: ${o.choices.join(', ')}` : '';
    const value = `${typeof o.default === 'string' ? ` (default ${o.default})` : ''}${o.multiple ? '; may be given more than once' : ''}`;
    return [o.type === 'boolean' ? dashed(name) : `${dashed(name)} ${o.value ?? 'VALUE'}`, `${o.help}${choices}${value}`];
  });
  options.push(['-h, --help', 'show this help']);
  return [
    wrap(`axletree ${d.name}: ${d.summary}`, 2, 0),
    '',
    `usage: ${usageLine(d)}`,
    ...(d.positionals.length ? ['', ...table(d.positionals.map((p) => [`<${p.name}>`, p.help]))] : []),
    '',
    'options:',
    ...table(options),
    ...(d.about ? ['', d.about.trimEnd()] : []),
    '',
    'example:',
    `  ${d.example}`,
    '',
    'exit codes:',
    ...exitCodeLines(d.findings),
    '',
  ].join('\n');
}

/** `axletree help`, and `axletree` alone. */
export function overview(commands: readonly CommandDecl[]): string {
  return [
    'axletree: design-rule checks for replica chariots',
    '',
    'commands:',
    ...commands.flatMap((d) => [`  ${usageLine(d)}`, `      ${wrap(d.summary, 6)}`]),
    '',
    '  axletree <command> --help   that command: its options, an example, the exit codes',
    '  axletree --version          the version',
    '  axletree help               this overview',
    '',
    'exit codes (every command):',
    ...exitCodeLines('for check, the verdict is FAIL'),
    '',
  ].join('\n');
}
