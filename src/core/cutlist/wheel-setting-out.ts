import type { WheelSettingOut } from './cutting-result.ts';
import type { WheelGeometry } from './wheel-geometry.ts';

/** The setting-out of one wheel as reported, with the geometry its drawing is made from. */
export function wheelSettingOut(g: WheelGeometry): WheelSettingOut {
  return {
    spokes: g.spokes,
    spoke_length_shoulders_mm: g.shoulders,
    spoke_length_overall_mm: g.overall,
    tenon_nave_mm: g.tenonNave,
    tenon_felloe_mm: g.tenonFelloe,
    mortise_spacing_deg: g.mortiseSpacingDeg,
    mortise_positions_deg: g.mortisePositionsDeg,
    felloe_pieces: g.pieces,
    felloe_arc_mm: g.arc,
    felloe_chord_mm: g.chord,
    felloe_end_angle_deg: g.endAngleDeg,
    dowel_positions_deg: g.jointPositionsDeg,
    tyre_length_mm: g.tyreLength,
    geometry: g,
    basis: g.lines,
  };
}
