import type { CheckedSpecification } from '../../spec/spec.types.ts';

// The pre-compression a shrunk tyre keeps on each spoke, where the
// specification states it (`wheels.tyre.pre_compression_N`). Without it the
// spokes are taken as able only to push (the safe side for the felloe,
// design basis section 6).

export interface TyrePrecompression {
  /** N per spoke; 0 where none is assured. */
  perSpoke: number;
  /** How the value was found, for the working. */
  text: string;
}

export function tyrePrecompression(spec: CheckedSpecification): TyrePrecompression {
  const given = spec.wheels.tyre?.pre_compression_N;
  if (given !== undefined && given > 0) {
    return { perSpoke: given, text: `the tyre keeps a pre-compression of ${given} N on each spoke (wheels.tyre.pre_compression_N): every spoke bears until the ground load takes that out of it` };
  }
  return { perSpoke: 0, text: spec.wheels.tyre ? 'the tyre states no pre-compression on the spokes: they are taken as able only to push' : 'no tyre: the spokes are taken as able only to push' };
}
