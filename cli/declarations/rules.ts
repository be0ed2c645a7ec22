import { command } from '../args.ts';

export const rules = command({
  name: 'rules',
  summary: 'list the rules with their limits and the sources of every value',
  positionals: [],
  options: {
    json: { type: 'boolean', default: false, help: 'print the list as JSON' },
  },
  about: `The limits are read from rules/limits/*.yaml: edit them there, each value
with its source (an id of rules/sources.yaml).`,
  example: 'axletree rules --json',
  async run({ values }, con) {
    const { rulesCommand } = await import('../commands/rules.ts');
    return rulesCommand(values, con);
  },
});
