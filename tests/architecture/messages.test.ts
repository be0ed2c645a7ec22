import { describe, expect, it } from 'vitest';
import { CORE_MESSAGES } from '../../src/core/diagnostics/core-messages.ts';
import { MESSAGES } from '../../src/core/diagnostics/messages.ts';
import { literalText, placeholders } from '../../src/core/format/template.ts';
import { RULES } from '../../src/core/rules/index.ts';

// One table of stable codes across the input messages, the pipeline's and every
// rule's; a rule's templates hold no number of their own, so a message cannot
// state a number its limit does not hold.
const ruleMessages = RULES.flatMap((r) => Object.entries(r.messages).map(([key, m]) => ({ where: `${r.id}.${key}`, ...m })));

describe('messages', () => {
  it('a code stands for one message text', () => {
    const all = [
      ...Object.entries(MESSAGES).map(([k, m]) => ({ where: k, code: m.code, text: m.text })),
      ...Object.entries(CORE_MESSAGES).map(([k, m]) => ({ where: k, code: m.code, text: m.text })),
      ...ruleMessages,
    ];
    const texts = new Map<number, Map<string, string>>();
    for (const m of all) {
      if (!texts.has(m.code)) texts.set(m.code, new Map());
      texts.get(m.code)!.set(m.text, m.where);
    }
    const clashes = [...texts].filter(([, t]) => t.size > 1).map(([code, t]) => `${code}: ${[...t.values()].join(', ')}`);
    expect(clashes).toEqual([]);
  });

  it("a rule's templates hold no number of their own, and findings' codes are 2xxx", () => {
    expect(ruleMessages.length).toBeGreaterThan(10);
    for (const m of ruleMessages) {
      expect(literalText(m.text), m.where).not.toMatch(/\d/);
      expect(m.code, m.where).toBeGreaterThanOrEqual(2000);
      expect(m.code, m.where).toBeLessThan(3000);
    }
  });

  it('a placeholder names a format the formatter knows', () => {
    for (const m of ruleMessages) for (const p of placeholders(m.text)) expect(p.format ?? '', `${m.where} {${p.name}}`).toMatch(/^$|^1$|^%$|^[^\s{}]+$/);
  });
});
