// What `axletree --version` and `--help` load: only the argument layer and
// the declarations; each command's code is imported when it runs. And only
// cli/main.ts touches the process.
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { REPO } from '../support/run-cli.ts';

// Static imports only (`import x from`, `export ... from`); type-only ones and import() are left out.
const STATIC = /^(?:import|export)\s+(?!type\b)(?:[^'";]*?\sfrom\s+)?['"]([^'"]+)['"]/gm;

/** Every file and package reached from a file through static imports. */
function reached(entry: string): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string) => {
    if (files.has(file)) return;
    files.add(file);
    if (!file.endsWith('.ts')) return;
    for (const [, spec] of readFileSync(join(REPO, file), 'utf8').matchAll(STATIC)) {
      if (spec.startsWith('.')) visit(relative(REPO, resolve(dirname(join(REPO, file)), spec)));
      else packages.add(spec);
    }
  };
  visit(entry);
  return { files, packages };
}

describe('start-up', () => {
  it('cli/main.ts reaches no command code, nothing of src/ and no package before a command runs', () => {
    const { files, packages } = reached('cli/main.ts');
    expect([...files].filter((f) => f.startsWith('src/') || f.startsWith('cli/commands/'))).toEqual([]);
    expect([...packages].filter((p) => !p.startsWith('node:'))).toEqual([]);
    // A test of the test: the walk does follow imports.
    expect(files).toContain('cli/declarations/check.ts');
    expect(reached('cli/commands/check.ts').files).toContain('src/node/read-spec.ts');
  });

  it('only cli/main.ts touches the process', () => {
    const cli = join(REPO, 'cli');
    const files = readdirSync(cli, { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.ts'));
    const touching = files.filter((f) => /\bprocess\./.test(readFileSync(join(cli, f), 'utf8').replace(/\/\/.*$/gm, '')));
    expect(touching).toEqual(['main.ts']);
  });
});
