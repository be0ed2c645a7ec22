import type { MemberCase } from '../../model/member-cases.ts';
import type { TurnModel } from '../../model/turn.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import { num, step } from '../../pipeline/step.ts';
import type { CaseInfo, Working } from '../member/member-finding.ts';

// The loads on one wheel's nave, case by case: the wheel load N_w and the
// side force F at the rim. The member cases give the vertical load and, in
// the design turn, the outer wheel's lateral ground force; the inner wheel
// in the turn and the side force of the stone strike are found here.

export type WheelSide = 'outer' | 'inner';

export interface NaveLoad {
  info: CaseInfo;
  /** Design wheel load, N. */
  N: number;
  /** Design side force at the rim, N. */
  F: number;
  /** How F was found. */
  side: Working;
}

export interface NaveLoadInput {
  spec: CheckedSpecification;
  cases: readonly MemberCase[];
  turn: TurnModel;
  /** γ_Q of the fundamental combination (the turn's inertia leads). */
  gammaQ: number;
  /** The ground's lateral friction, the most a tyre holds sideways per unit of wheel load. */
  mu: number;
}

/** The inner wheel in the design turn: the member case with the load transfer taken off instead of added. */
function innerInTurn(c: MemberCase, i: NaveLoadInput): NaveLoad {
  const dN = i.gammaQ * i.turn.loadTransfer;
  const N = Math.max(0, c.wheel_N - 2 * dN);
  const F = i.gammaQ * i.turn.innerLateral;
  const { turn_radius_m: R, speed_kmh: v } = i.spec.operation;
  return {
    info: {
      ...c,
      title: `inner wheel in the design turn (${R} m at ${v} km/h)`,
      working: `${c.working}; the inner wheel: N_inner = N_outer − 2·γ_Q·ΔN = ${num(c.wheel_N)} − 2 × ${num(dN)} = ${num(N)} N${N === 0 ? ' (it lifts: no load left)' : ''}`,
    },
    N,
    F,
    side: step('F_lat,inner = γ_Q·F_inner (the lateral force shared in proportion to wheel load)', `${num(i.gammaQ)} × ${num(i.turn.innerLateral)}`, F, 'N'),
  };
}

/** The stone strike's side force: the peak wheel force times the ground's lateral friction (an assumption, the bound). */
function struck(c: MemberCase, i: NaveLoadInput): NaveLoad {
  const F = i.mu * c.wheel_N;
  return {
    info: c,
    N: c.wheel_N,
    F,
    side: step(
      'F_side = μ_lat·N_w (assumed: the stone struck at an angle, the tyre held sideways to the point of slipping at the peak force)',
      `${num(i.mu)} × ${num(c.wheel_N)}`,
      F,
      'N',
    ),
  };
}

/** Every member case as one wheel's nave sees it. */
export function naveLoads(which: WheelSide, i: NaveLoadInput): NaveLoad[] {
  return i.cases.map((c) => {
    if (c.id === 'turn' && which === 'inner') return innerInTurn(c, i);
    if (c.id === 'stone') return struck(c, i);
    const F = c.wheelLateral_N;
    const side: Working = F > 0 ? step('F_lat (the member case)', '', F, 'N') : 'no side force at the rim in this case';
    return { info: c, N: c.wheel_N, F, side };
  });
}
