import type { RulesData } from '../../data/rules-data.ts';
import { formatNumber as fmt } from '../../format/number-format.ts';
import type { CheckedSpecification } from '../../spec/spec.types.ts';
import type { FloorNet } from '../cable-net/floor-net.ts';
import { layout } from '../layout.ts';
import { jointPlace } from '../lashing-geometry.ts';
import { axleBar, frameBar, frameSectionInPlan } from '../spec-sections.ts';
import { intersectionMoisture } from '../timber/strength-factors.ts';
import { propertyAtMoisture } from '../timber/moisture-strength.ts';
import type { FrameAnchor, FrameInput, FrameStrut } from './frame-model.ts';

// The floor frame of a specification as the coupled floor model needs it:
// the loop's shape, the rails' section bent in plan, every strap end as an
// anchor, and the lashed parts beneath as struts across it.

/** Largest angle one chord of a bent corner spans, degrees (the mesh; the loop converges well within it, tests/floor-frame). */
export const ARC_STEP_DEG = 2;

export interface StrutBasis extends FrameStrut {
  /** How its stiffness was found, in words. */
  working: string[];
  sources: string[];
}

export interface FrameBasis {
  input: FrameInput;
  /** Mean modulus of the rails along the grain at the build's moisture, MPa. */
  E_MPa: number;
  I_mm4: number;
  A_mm2: number;
  species: string;
  struts: StrutBasis[];
  /** Lashed parts that give the frame no support here, and why. */
  unsupported: string[];
  sources: string[];
}

/** Mean modulus of elasticity along the grain at a moisture content (Wood Handbook eq. 5-3 between 12 % and green), MPa. */
export function meanModulus(data: RulesData, species: string, moisturePct: number): { value: number; sources: string[] } {
  const sp = data.species[species];
  const mp = intersectionMoisture(data, species);
  return { value: propertyAtMoisture(sp.moe_MPa.dry12.value, sp.moe_MPa.green.value, moisturePct, mp.value), sources: [...sp.moe_MPa.dry12.sources, ...sp.moe_MPa.green.sources, ...mp.sources] };
}

/** Anchors and straps of the net: a front-to-back strap pulls the rear and front rails along x, a side-to-side one the side rails along y. */
function anchorsOf(floor: FloorNet): { anchors: FrameAnchor[]; straps: [number, number][] } {
  const anchors: FrameAnchor[] = [];
  const straps: [number, number][] = floor.net.straps.map((s) => {
    const i = anchors.length;
    if (s.family === 'front-to-back') anchors.push({ side: 'rear', at: s.cross, dir: 'x', inward: 1 }, { side: 'front', at: s.cross, dir: 'x', inward: -1 });
    else anchors.push({ side: 'right', at: s.cross, dir: 'y', inward: 1 }, { side: 'left', at: s.cross, dir: 'y', inward: -1 });
    return [i, i + 1];
  });
  return { anchors, straps };
}

/**
 * A lashing's stiffness against the rail sliding along the part it binds:
 * n wraps, each of length ℓ round both members, crossed at about 45°, so a
 * slide δ stretches each wrap's crossing legs by δ·cos 45° over their whole
 * length: k = n·E·A/ℓ (judgement; the wraps' friction and bedding are left
 * out, and a lashing that slips is softer still).
 */
function lashingStiffness(spec: CheckedSpecification, data: RulesData, joint: 'pole-to-floor' | 'axle-to-floor'): { k: number; line: string; sources: string[] } | null {
  const l = spec.lashings.find((x) => x.joint === joint);
  if (!l) return null;
  const E = data.leathers[l.material].modulus_MPa;
  const ell = jointPlace(joint, spec, layout(spec)).wrapPerimeter;
  const k = (l.wraps * E.value * l.width_mm * l.thickness_mm) / ell;
  return { k, line: `${joint} lashing: k_l = n·E·b·t/ℓ = ${fmt(l.wraps)} × ${fmt(E.value)} × ${fmt(l.width_mm)} × ${fmt(l.thickness_mm)} / ${fmt(ell, 'mm')} = ${fmt(k)} N/mm`, sources: E.sources };
}

export function frameOfFloor(spec: CheckedSpecification, data: RulesData, floor: FloorNet, arcStepDeg = ARC_STEP_DEG): FrameBasis {
  const frame = spec.box.floor.frame;
  const { depth, width } = floor.outline;
  const w = frameBar(spec).width;
  const E = meanModulus(data, frame.species, spec.moisture_content_pct);
  // Bent in plan: the rail's width in plan is the depth of its section.
  const inPlan = frameSectionInPlan(spec);
  const I = inPlan.I;
  const A = inPlan.area;
  const struts: StrutBasis[] = [];
  const unsupported: string[] = [];
  const strut = (part: 'pole' | 'axle', joint: 'pole-to-floor' | 'axle-to-floor', ends: FrameStrut['ends'], dir: 'x' | 'y', span: number) => {
    const lash = lashingStiffness(spec, data, joint);
    if (!lash) return;
    const p = part === 'pole' ? { species: spec.pole.species, area: spec.pole.width_mm * spec.pole.height_mm, size: `${fmt(spec.pole.width_mm)} × ${fmt(spec.pole.height_mm)}` } : { species: spec.axle.species, area: axleBar(spec).area, size: axleBar(spec).size };
    const Ep = meanModulus(data, p.species, spec.moisture_content_pct);
    const kBar = (Ep.value * p.area) / span;
    // A lashing at each rail, and the part between them, in series.
    const k = 1 / (2 / lash.k + 1 / kBar);
    struts.push({
      part,
      ends,
      dir,
      stiffness_N_per_mm: k,
      working: [lash.line, `${part} between the rails (${p.size}): k_b = E·A/L = ${fmt(Ep.value)} × ${fmt(p.area)} / ${fmt(span, 'mm')} = ${fmt(kBar)} N/mm`, `in series, a lashing at each rail: k = 1/(2/k_l + 1/k_b) = ${fmt(k)} N/mm`],
      sources: [...lash.sources, ...Ep.sources],
    });
  };
  // The pole runs fore and aft at y = 0: a strut between the rear and front rails where it reaches both.
  if (spec.lashings.some((l) => l.joint === 'pole-to-floor')) {
    if (spec.pole.rear_x_mm <= 0 && spec.pole.root_x_mm >= floor.outline.frontAt(0)) strut('pole', 'pole-to-floor', [{ side: 'rear', at: 0 }, { side: 'front', at: 0 }], 'x', floor.outline.frontAt(0) + w);
    else unsupported.push('the pole does not reach both the rear and the front rail, so its lashing holds no rail apart from the other');
  }
  // The axle runs across at x: a strut between the side rails where it passes under them.
  if (spec.lashings.some((l) => l.joint === 'axle-to-floor')) {
    const x = Math.max(spec.axle.x_mm, -w / 2);
    if (spec.axle.x_mm + axleBar(spec).width / 2 >= -w && x <= depth) strut('axle', 'axle-to-floor', [{ side: 'right', at: x }, { side: 'left', at: x }], 'y', 2 * floor.outline.halfWidthAt(Math.max(0, x)) + w);
    else unsupported.push('the axle does not pass under the side rails, so its lashing holds neither');
  }
  const { anchors, straps } = anchorsOf(floor);
  const input: FrameInput = {
    shape: { depth, width, rail: w, innerRadius: floor.outline.cornerRadius, arcStepDeg },
    section: { EA: E.value * A, EI: E.value * I },
    anchors,
    straps,
    struts,
  };
  return { input, E_MPa: E.value, I_mm4: I, A_mm2: A, species: frame.species, struts, unsupported, sources: [...new Set([...E.sources, ...struts.flatMap((s) => s.sources)])] };
}
