import type { WorkingStep } from '../../findings/finding.ts';
import type { TimberProperty } from '../../model/timber/characteristic.ts';
import type { DesignValue, TimberStrength } from '../../model/timber/design-strength.ts';
import { num, step } from '../../pipeline/step.ts';

const SYMBOL: Record<TimberProperty, string> = { bending: 'f_m', compression: 'f_c,0', shear: 'f_v', stiffness: 'E' };

/** The design strength of one case as a step: f_d = f_k·k_select·k_mod/γ_M; `f` names it where the property's own symbol does not. */
export function strengthStep(s: TimberStrength, d: DesignValue, f: string = symbolOf(s)): WorkingStep {
  return step(`${f},d = ${f},k·k_select·k_mod/γ_M`, `${num(s.characteristic.fk)} × ${num(s.kSelect)} × ${num(d.kMod)} / ${num(d.gammaM)}`, d.value, 'MPa');
}

/** The strength's symbol, with the grain angle where the load runs off the grain (f_c,90 straight across it). */
function symbolOf(s: TimberStrength): string {
  if (s.characteristic.property !== 'compression' || s.grainDeg === 0) return SYMBOL[s.characteristic.property];
  return s.grainDeg >= 90 ? 'f_c,90' : `f_c,${Math.round(s.grainDeg)}°`;
}
