// Aliases in a YAML specification: a few, used as YAML means them (the
// anchored value repeated, YAML 1.2.2 section 7.1), read as written; the
// limits hold at their boundaries.
import { describe, expect, it } from 'vitest';
import { INPUT_LIMITS } from '../../src/core/input/input-limits.ts';
import { parseSpecText } from '../../src/core/input/parse-spec-text.ts';

const aliases = (n: number) => `base: &a [1, 2]\n${Array.from({ length: n }, (_, i) => `k${i}: *a`).join('\n')}\n`;

describe('YAML aliases', () => {
  it('read as the anchored value wherever they stand', () => {
    const r = parseSpecText('oak: &oak white-oak\naxle: { species: *oak }\npole: { species: *oak }\n', 'YAML');
    expect(r.ok && r.raw).toEqual({ oak: 'white-oak', axle: { species: 'white-oak' }, pole: { species: 'white-oak' } });
  });

  it('are allowed up to the limit, and one more is refused at that alias', () => {
    expect(parseSpecText(aliases(INPUT_LIMITS.yamlAliases), 'YAML').ok).toBe(true);
    const r = parseSpecText(aliases(INPUT_LIMITS.yamlAliases + 1), 'YAML');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues[0].message).toContain(`one more than the ${INPUT_LIMITS.yamlAliases} aliases`);
    expect(r.issues[0].at).toEqual({ line: INPUT_LIMITS.yamlAliases + 2, column: `k${INPUT_LIMITS.yamlAliases}: `.length + 1 });
  });

  it('may expand to the entry limit but not past it', () => {
    // An anchor of n - 1 values is n nodes (the list and its items); each alias to it adds n.
    const anchored = (n: number, uses: number) => `a: &a [${Array.from({ length: n - 1 }, () => '0').join(', ')}]\n${Array.from({ length: uses }, (_, i) => `k${i}: *a`).join('\n')}\n`;
    const n = INPUT_LIMITS.textEntries / 20;
    expect(parseSpecText(anchored(n, 20), 'YAML').ok).toBe(true);
    const r = parseSpecText(anchored(n + 1, 20), 'YAML');
    expect(!r.ok && r.issues[0].message).toContain(`expands the file to more than ${INPUT_LIMITS.textEntries} entries`);
  });

  it('refuse an alias inside its own anchor at any depth', () => {
    const r = parseSpecText('a: &x\n  b:\n    - c: [1, *x]\n', 'YAML');
    expect(!r.ok && r.issues[0].message).toContain('stands inside the very node its anchor &x names');
  });
});
