import type { CheckedSpecification } from '../../spec/spec.types.ts';

// The pre-compression a shrunk tyre keeps on each spoke, where the
// specification states it. Today's schema has no such key (its tyres are
// leather or rawhide); iron tyres bring one, `wheels.tyre.spoke_precompression_N`,
// read here where present. Without it the spokes are taken as able only to
// push (the safe side for the felloe, design basis section 6).

export interface TyrePrecompression {
  /** N per spoke; 0 where none is assured. */
  perSpoke: number;
  /** How the value was found, for the working. */
  text: string;
}

export function tyrePrecompression(spec: CheckedSpecification): TyrePrecompression {
  const tyre = spec.wheels.tyre as { spoke_precompression_N?: unknown } | undefined;
  const given = tyre?.spoke_precompression_N;
  if (typeof given === 'number' && Number.isFinite(given) && given > 0) {
    return { perSpoke: given, text: `the tyre keeps a pre-compression of ${given} N on each spoke (wheels.tyre.spoke_precompression_N): every spoke bears until the ground load takes that out of it` };
  }
  return { perSpoke: 0, text: spec.wheels.tyre ? 'the tyre states no pre-compression on the spokes: they are taken as able only to push' : 'no tyre: the spokes are taken as able only to push' };
}
