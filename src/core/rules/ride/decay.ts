import { param } from '../../data/param.ts';
import { defineRule } from '../../pipeline/define-rule.ts';
import { num, step } from '../../pipeline/step.ts';
import { withinLimit } from '../within-limit.ts';
import { NOT_RUN_FIX, notRunMessage, rideNotRun, rideSourceIds, rideWorking } from './ride-working.ts';

export const rideDecay = defineRule({
  id: 'ride.decay',
  title: 'How fast the crew stop bouncing',
  checks: "After the drop test, the cycles until the crew's motion falls below a fraction of its first amplitude (ride.inputs.decay_fraction), against the cycles allowed.",
  kind: 'check',
  worst: 'warning',
  method: ['design-basis-ride', 'hunt-crossley-1975'],
  needs: ['ride', 'floorDampingNeeded'],
  limits: { cycles: { direction: 'max', unit: 'cycles', levels: { hard: 'warning' } } },
  params: [],
  messages: {
    within: { code: 2811, text: "After the drop test the crew's motion falls below {fraction:%} of its first amplitude in {value:1} cycles (limit {limit:1}); floor damping ratio {zeta:1} ({zetaSource})." },
    slow: { code: 2812, text: "After the drop test the crew's motion takes {value:1} cycles to fall below {fraction:%} of its first amplitude, more than {limit:1}; floor damping ratio {zeta:1} ({zetaSource})." },
    unsettled: { code: 2813, text: "After the drop test the crew's motion does not fall below {fraction:%} of its first amplitude within the run; floor damping ratio {zeta:1} ({zetaSource})." },
    notRun: notRunMessage(2814, "how fast the crew's motion dies out"),
    notComputed: { code: 2815, text: 'The ride model could not run the drop test: {reason}.' },
  },
  run(ctx) {
    const rides = ctx.models.ride;
    if (rides === null) return ctx.report(rideNotRun());
    const lim = ctx.limit('cycles');
    const fraction = param(ctx.data, 'ride.inputs', 'decay_fraction');
    const r = rides.drop;
    if (r.stopped) {
      // The rule's worst is a warning: the crew rule fails the same build where the road cases could not run either.
      ctx.report({ subject: 'ride.drop', label: `crew, ${r.title}`, message: 'notComputed', params: { reason: r.stopped }, severity: 'warning', load_case: 'drop', combination: 'characteristic', fix: NOT_RUN_FIX, working: rideWorking(r) });
      return;
    }
    const cycles = r.decayCycles;
    const slow = cycles === null || !withinLimit(cycles, lim);
    // The tuner runs many simulations: it is asked only where the decay is slow.
    const need = slow ? ctx.models.floorDampingNeeded : null;
    const allowed = (lim.hard ?? lim.advisory)!;
    const delta = Math.log(1 / fraction.value) / allowed;
    const zetaLinear = delta / Math.sqrt(4 * Math.PI ** 2 + delta ** 2);
    const common = {
      subject: 'ride.drop',
      label: `crew, ${r.title}`,
      params: { fraction: fraction.value, zeta: r.floorDamping.value, zetaSource: r.floorDamping.source.split(':')[0] },
      sources: [...fraction.sources, ...rideSourceIds(ctx.data, ctx.spec, 'drop')],
      load_case: 'drop',
      combination: 'characteristic' as const,
      fix: need === null
        ? 'None needed.'
        : `Damp the floor more: ${need.ratio === null ? `no floor damping ratio up to ${num(need.bounds[1])} meets the ride rules` : `a floor damping ratio of ${num(need.ratio)} would meet the ride rules`}; measure a floor sample with axletree floor-test and name it in the specification.`,
      working: [
        ...rideWorking(r),
        ...r.crew.map((c) => (c.decay_cycles === null ? `${c.role}: not below the fraction within the run` : step(`${c.role}: cycles to fall below the fraction`, '', c.decay_cycles, '1'))),
        'from the largest turning point after the wheels first touch; log-interpolated between turning points',
        step('δ = ln(1 / fraction) / N, a linear single-degree system decaying in the cycles allowed', `ln(1 / ${num(fraction.value)}) / ${num(allowed)}`, delta, '1'),
        step('it needs ζ ≥ δ / √(4π² + δ²)', `${num(delta)} / √(4π² + ${num(delta)}²)`, zetaLinear, '1'),
        ...(need ? [`tuner: ${need.working}`] : []),
      ],
    };
    if (cycles === null) {
      ctx.report({ ...common, message: 'unsettled', unit: 'cycles', severity: 'warning' });
      return;
    }
    ctx.report({ ...common, message: { pass: 'within', warning: 'slow' }, value: cycles, unit: 'cycles', against: { limit: 'cycles' } });
  },
});
