import type { RulesData } from '../data/rules-data.ts';
import type { Layout } from '../model/layout.ts';
import { tyreOf } from '../model/tyre.ts';
import type { CheckedSpecification } from '../spec/spec.types.ts';
import { cutlistFactor } from './cutlist-factors.ts';
import { fmt } from './part-demand.ts';

// The wheelwright's setting-out of one wheel (both are alike), in mm and
// degrees. The wheel is taken undished, its spokes in one plane; angles run
// clockwise round the wheel face from the first spoke's centre line.

export interface WheelGeometry {
  tread: number;
  felloeOuter: number;
  felloeInner: number;
  naveRadius: number;
  boreRadius: number;
  spokeWidth: number;
  tyreThickness: number;
  spokes: number;
  pieces: number;
  shoulders: number;
  tenonNave: number;
  tenonFelloe: number;
  overall: number;
  mortiseSpacingDeg: number;
  mortisePositionsDeg: number[];
  /** One felloe piece on the outer face: arc and chord. */
  arc: number;
  chord: number;
  endAngleDeg: number;
  jointPositionsDeg: number[];
  /** Radius of the dowels across each felloe joint: mid-depth. */
  dowelRadius: number;
  tyreLength: number | null;
  lines: string[];
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

export function wheelGeometry(spec: CheckedSpecification, data: RulesData, lay: Layout): WheelGeometry {
  const w = spec.wheels;
  const n = w.spokes;
  const p = w.felloe.pieces;
  const rn = w.nave.diameter_mm / 2;
  const wall = (w.nave.diameter_mm - w.nave.bore_mm) / 2;
  const naveFrac = cutlistFactor(data, 'nave_tenon_fraction');
  const felloeFrac = cutlistFactor(data, 'felloe_tenon_fraction');
  const tenonNave = naveFrac.value * wall;
  const tenonFelloe = felloeFrac.value * w.felloe.depth_mm;
  const shoulders = lay.spokeLength;
  const Ro = lay.felloeOuter;
  const spacing = 360 / n;
  const theta = (2 * Math.PI) / p;
  const arc = Ro * theta;
  const chord = p === 1 ? 0 : 2 * Ro * Math.sin(Math.PI / p);
  const endAngle = p === 1 ? 90 : 90 - 180 / p;
  // Joints as far from every spoke as they can be: the angles between a joint and
  // a spoke are multiples of 360/lcm(n, p), so half of that from the nearest spoke.
  const lcm = (n * p) / gcd(n, p);
  const offset = 180 / lcm;
  const joints = Array.from({ length: p }, (_, j) => offset + (j * 360) / p);
  const tyre = tyreOf(spec);
  const t = tyre === null ? undefined : tyre.thickness;
  const tyreLength = t === undefined ? null : Math.PI * (w.diameter_mm - t);
  const lines = [
    `undished wheel, spokes in one plane; angles clockwise on the wheel face from the centre line of spoke 1`,
    `felloe outer radius R_o = ${fmt(lay.wheelRadius)}${t === undefined ? '' : ` − tyre ${t}`} = ${fmt(Ro)} mm; inner R_i = R_o − depth ${w.felloe.depth_mm} = ${fmt(lay.felloeInner)} mm; nave radius r_n = ${fmt(rn)} mm`,
    `spoke between shoulders = R_i − r_n = ${fmt(lay.felloeInner)} − ${fmt(rn)} = ${fmt(shoulders)} mm (on the centre line)`,
    `tenon into the nave = ${naveFrac.value} × nave wall (${w.nave.diameter_mm} − ${w.nave.bore_mm})/2 = ${fmt(tenonNave)} mm (${naveFrac.source})`,
    `tenon into the felloe = ${felloeFrac.value} × felloe depth ${w.felloe.depth_mm} = ${fmt(tenonFelloe)} mm (${felloeFrac.source})`,
    `spoke overall = ${fmt(shoulders)} + ${fmt(tenonNave)} + ${fmt(tenonFelloe)} = ${fmt(shoulders + tenonNave + tenonFelloe)} mm`,
    `mortise spacing = 360°/${n} = ${fmt(spacing, 3)}°`,
    `felloe piece: arc on the outer face 2π R_o/${p} = ${fmt(arc)} mm; chord 2 R_o sin(π/${p}) = ${fmt(chord)} mm; inner face arc ${fmt(lay.felloeInner * theta)} mm`,
    p === 1
      ? 'one felloe piece: its single joint has radial faces, square to the rim'
      : `end faces radial: angle to the chord 90° − 180°/${p} = ${fmt(endAngle, 3)}°`,
    `felloe joints and their dowels (at mid-depth, radius ${fmt(lay.felloeInner + w.felloe.depth_mm / 2)} mm) at 180°/lcm(${n}, ${p}) = ${fmt(offset, 3)}° + j × 360°/${p}, ${fmt(offset, 3)}° from the nearest spoke${n % p === 0 ? ', midway between two spokes' : ` (${n} spokes do not divide among ${p} pieces evenly)`}`,
    t === undefined
      ? 'no tyre'
      : tyre!.kind === 'iron'
        ? `iron tyre: its mid-thickness circumference π (D − t) = π × (${w.diameter_mm} − ${t}) = ${fmt(tyreLength!)} mm as it sits on the wheel; the smith forges it shorter by the shrink allowance, which is not included`
        : `tyre cut to its mid-thickness circumference π (D − t) = π × (${w.diameter_mm} − ${t}) = ${fmt(tyreLength!)} mm, the length a strip keeps when bent round (rawhide laid on wet shrinks tight as it dries); no lap or lacing allowance included`,
  ];
  return {
    tread: lay.wheelRadius,
    felloeOuter: Ro,
    felloeInner: lay.felloeInner,
    naveRadius: rn,
    boreRadius: w.nave.bore_mm / 2,
    spokeWidth: w.spoke.width_mm,
    tyreThickness: t ?? 0,
    spokes: n,
    pieces: p,
    shoulders,
    tenonNave,
    tenonFelloe,
    overall: shoulders + tenonNave + tenonFelloe,
    mortiseSpacingDeg: spacing,
    mortisePositionsDeg: Array.from({ length: n }, (_, i) => i * spacing),
    arc,
    chord,
    endAngleDeg: endAngle,
    jointPositionsDeg: joints,
    dowelRadius: lay.felloeInner + w.felloe.depth_mm / 2,
    tyreLength,
    lines,
  };
}
