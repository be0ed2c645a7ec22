import type { Finding } from '../findings/finding.ts';
import type { LegacyRule } from '../engine/rule.ts';
import type { LegacyContext, Rule } from './define-rule.ts';

/** An older rule in the new registry: its findings carried over, a note's severity made info. */
export function legacyRule(old: LegacyRule): Rule {
  return {
    id: old.id,
    title: old.title,
    checks: old.checks,
    kind: old.kind,
    ...(old.worst ? { worst: old.worst } : {}),
    method: [],
    needs: [],
    limits: {},
    params: old.limits,
    messages: {},
    run: () => {
      throw new Error(`rule ${old.id} runs through its older form`);
    },
    legacy: (ctx: LegacyContext): Finding[] => old.run(ctx as Parameters<LegacyRule['run']>[0]).map((f) => (old.kind === 'note' ? { ...f, severity: 'info' } : f)),
  };
}
