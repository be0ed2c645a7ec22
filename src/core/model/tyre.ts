import type { CheckedSpecification } from '../spec/spec.types.ts';

// The tyre round each felloe, as the models use it: a hide band named by its
// leather, an iron band, or none (kind none, or no tyre key). The schema
// leaves the sizes optional so that kind none needs none; the cross-field
// checks refuse a hide or iron tyre without them, so a helper that finds one
// missing is a fault in the program.

interface TyreBand {
  /** Axial width, mm. */
  width: number;
  /** Radial thickness, mm: the felloe lies inside it. */
  thickness: number;
  /** Compression a shrunk-on tyre leaves in each spoke, N; undefined where not given. */
  preCompression?: number;
}

export type Tyre = (TyreBand & { kind: 'rawhide'; material: string }) | (TyreBand & { kind: 'iron' });

export function tyreOf(spec: Pick<CheckedSpecification, 'wheels'>): Tyre | null {
  const t = spec.wheels.tyre;
  if (t === undefined || t.kind === 'none') return null;
  if (t.width_mm === undefined || t.thickness_mm === undefined) throw new Error('wheels.tyre: a tyre needs width_mm and thickness_mm; the specification checks should have refused it');
  const band: TyreBand = { width: t.width_mm, thickness: t.thickness_mm, ...(t.pre_compression_N === undefined ? {} : { preCompression: t.pre_compression_N }) };
  if (t.kind === 'iron') return { ...band, kind: 'iron' };
  if (t.material === undefined) throw new Error('wheels.tyre: a rawhide tyre names its material; the specification checks should have refused it');
  return { ...band, kind: 'rawhide', material: t.material };
}

/** The tyre's radial thickness, 0 for a bare felloe. */
export function tyreThickness(spec: Pick<CheckedSpecification, 'wheels'>): number {
  const t = tyreOf(spec);
  return t === null ? 0 : t.thickness;
}

/**
 * The wheel build the ride model's contact stiffness is held for: a hide tyre
 * softens the wheel ("tyred"); an iron tyre does not, and is taken as the bare
 * wooden wheel. Its band clamps the felloe joints, so the real wheel is if
 * anything stiffer than the bare figure: the ride model then errs soft (low
 * dynamic loads) until an iron-tyred stiffness is held in the ride data.
 */
export function wheelBuild(spec: Pick<CheckedSpecification, 'wheels'>): 'tyred' | 'bare' {
  return tyreOf(spec)?.kind === 'rawhide' ? 'tyred' : 'bare';
}
