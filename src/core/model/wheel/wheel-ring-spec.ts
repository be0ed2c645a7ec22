import type { RulesData } from '../../data/rules-data.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import type { Layout } from '../layout.ts';
import { rectangle, type Section } from '../sections.ts';
import { characteristicValue } from '../timber/characteristic.ts';
import { timberPart } from '../timber/timber-part.ts';
import { felloeJoints, type FelloeJoints } from './felloe-joints.ts';
import { tyrePrecompression, type TyrePrecompression } from './tyre-precompression.ts';
import type { WheelRing } from './wheel-ring.ts';

// The ring frame of one specification's wheel: the felloe's mid-depth radius
// and section, the spokes' axial stiffness, the tyre's pre-compression, and
// its joints. Stiffnesses are mean values at the moisture content (the share
// of the load each part takes follows the mean stiffness, as EN 1995-1-1
// section 2.2.2 has it for a first-order analysis).

/** Elements per spoke span: the peak moment is then within 0.1 % of the converged one (tests/wheel/wheel-ring.test.ts). */
export const RING_ELEMENTS_PER_SPAN = 16;

export interface WheelRingSpec {
  ring: WheelRing;
  felloe: Section;
  /** Felloe and spoke mean moduli at the moisture content, MPa. */
  felloeE: number;
  spokeE: number;
  spokeArea: number;
  spokeLength: number;
  tyre: TyrePrecompression;
  joints: FelloeJoints;
  /** True where the joints pass no moment: dowelled ends with no pre-compressed tyre to tie them. */
  hinged: boolean;
  /** Catalogue ids of the moduli. */
  sourceIds: string[];
}

export function wheelRingSpec(spec: CheckedSpecification, data: RulesData, lay: Layout): WheelRingSpec {
  const w = spec.wheels;
  const M = spec.moisture_content_pct;
  const fe = timberPart(spec, 'felloe');
  const sp = timberPart(spec, 'spoke');
  const felloeE = characteristicValue(data, fe.species, 'stiffness', M, fe.grainSlopeDeg);
  const spokeE = characteristicValue(data, sp.species, 'stiffness', M, sp.grainSlopeDeg);
  const felloe = rectangle(w.felloe.width_mm, w.felloe.depth_mm);
  const spokeArea = w.spoke.width_mm * w.spoke.thickness_mm;
  const tyre = tyrePrecompression(spec);
  const joint = w.felloe.joint;
  return {
    ring: {
      radius: (lay.felloeInner + lay.felloeOuter) / 2,
      spokes: w.spokes,
      EI: felloeE.mean * felloe.I,
      EA: felloeE.mean * felloe.area,
      spokeStiffness: (spokeE.mean * spokeArea) / lay.spokeLength,
      spokeLength: lay.spokeLength,
      precompression: tyre.perSpoke,
      elementsPerSpan: RING_ELEMENTS_PER_SPAN,
    },
    felloe,
    felloeE: felloeE.mean,
    spokeE: spokeE.mean,
    spokeArea,
    spokeLength: lay.spokeLength,
    tyre,
    joints: felloeJoints(w.spokes, w.felloe.pieces),
    hinged: joint.kind === 'dowel' && tyre.perSpoke === 0,
    sourceIds: [...new Set([...felloeE.sourceIds, ...spokeE.sourceIds])],
  };
}
