// The capstan (Euler-Eytelwein) equation for a strap wrapped round a member:
// a pull T_tail on the slack end holds T_tail * e^(mu * phi) on the loaded end
// over a wrap angle phi (mechanics note, section 7).

const TURN = 2 * Math.PI;

/** The largest load a tail pull holds over `turns` full turns at friction mu. */
export function capstanHold(tail_N: number, mu: number, turns: number): number {
  return tail_N * Math.exp(mu * TURN * turns);
}

/** Full turns needed for a tail pull to hold a load: ln(T/T_tail) / (2 pi mu); none where the tail alone holds it. */
export function turnsToHold(load_N: number, tail_N: number, mu: number): number {
  return load_N <= tail_N ? 0 : Math.log(load_N / tail_N) / (TURN * mu);
}

/** The friction coefficient at which `turns` full turns let a tail pull hold a load. */
export function frictionForHold(load_N: number, tail_N: number, turns: number): number {
  return Math.log(load_N / tail_N) / (TURN * turns);
}
