import { ruleLimitData } from '../data/param.ts';
import type { RulesData } from '../data/rules-data.ts';
import { combinationFactors } from './combination-factors.ts';
import type { TurnModel } from './turn.ts';

// Rollover and sliding are checked in equilibrium (EQU, design basis,
// section 2): the lateral inertia (variable, destabilising) x 1.5 against the
// threshold the weight provides (permanent, stabilising) x 0.9. The same
// check read as the lateral acceleration, unfactored, that each level allows:
// level x (0.9 / 1.5) x threshold; the plots and the figures draw these.

export interface LateralLimits {
  /** gamma_Q on the lateral inertia, gamma_G,stb on the threshold. */
  gammaQ: number;
  gammaStb: number;
  /** The unfactored lateral acceleration each level allows, m/s²; null where the limit has no such level. */
  rollover: { advisory: number | null; hard: number | null };
  sliding: { advisory: number | null; hard: number | null };
  sources: string[];
}

export function lateralLimits(data: RulesData, t: TurnModel): LateralLimits {
  const f = combinationFactors(data);
  const scale = f.gammaGstb / f.gammaQdst;
  const levels = (ruleId: string, threshold: number) => {
    const lim = ruleLimitData(data, ruleId, 'lateral_fraction');
    const at = (level: 'advisory' | 'hard') => {
      const l = lim[level];
      return l ? l.value * scale * threshold : null;
    };
    return { advisory: at('advisory'), hard: at('hard') };
  };
  return { gammaQ: f.gammaQdst, gammaStb: f.gammaGstb, rollover: levels('turn.rollover', t.rolloverAccel), sliding: levels('turn.sliding', t.slideAccel), sources: f.sources };
}
