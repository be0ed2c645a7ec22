import { param } from '../../data/param.ts';
import { makeFinding } from '../../engine/make-finding.ts';
import type { Rule } from '../../engine/rule.ts';
import { decaysSlowly } from '../../ride/ride-verdict.ts';
import { rideSources, rideWorking } from './ride-working.ts';

export const rideDecay: Rule = {
  id: 'ride.decay',
  title: 'How fast the crew stop bouncing',
  checks: "After the drop test, the cycles until the crew's motion falls below 10 % of its first amplitude, against three cycles (common practice).",
  kind: 'check',
  worst: 'warning',
  limits: ['max_cycles'],
  run(ctx) {
    const max = ctx.limit('max_cycles');
    const fraction = param(ctx.data, 'ride.inputs', 'decay_fraction');
    const r = ctx.analysis.ride.drop;
    const slow = decaysSlowly(r, max.value);
    const need = slow ? ctx.analysis.floorDampingNeeded : null;
    const needed = need === null ? '' : need.ratio === null ? 'no floor damping ratio up to 1 meets the ride rules' : `a floor damping ratio of ${need.ratio.toFixed(3)} would meet the ride rules`;
    const cycles = r.decayCycles;
    return [makeFinding(this.id, {
      severity: slow ? 'warning' : 'pass',
      subject: `crew, ${r.title}`,
      value: cycles,
      unit: 'cycles',
      limit: max.value,
      message: slow ? 'rideDecaySlow' : 'rideDecayWithin',
      params: { value: cycles === null ? 'more than the run holds' : cycles.toFixed(2), limit: max.value, fraction: (fraction.value * 100).toFixed(0), zeta: r.floorDamping.value, zetaSource: r.floorDamping.source.split(':')[0], needed },
      fix: slow ? `Damp the floor more: ${needed}; measure a floor sample with axletree floor-test and name it in the specification.` : 'None needed.',
      source: `${max.source}; ${rideSources(r)}`,
      working: [...rideWorking(r), `crew decay: ${r.crew.map((c) => `${c.role} ${c.decay_cycles === null ? 'not within the run' : c.decay_cycles.toFixed(2)}`).join(', ')} cycles to ${(fraction.value * 100).toFixed(0)} % (from the largest turning point after the wheels first touch; log-interpolated between turning points); a linear single-degree system needs ζ ≥ 0.121 for ${max.value} cycles${need ? `\ntuner: ${need.working}` : ''}`].join('\n'),
    })];
  },
};
