export interface PartMass {
  part: string;
  /** rolling: stands on wheels and pole; yoke: rests on the horses; crew; load. */
  group: 'rolling' | 'yoke';
  /** The crew and carried loads are variable actions; everything else is the vehicle's own weight (permanent). */
  variable?: boolean;
  mass_kg: number;
  x_mm: number;
  y_mm: number;
  z_mm: number;
  /** True where the specification gave a measured mass. */
  measured: boolean;
  /** How the mass was found, with numbers. */
  basis: string;
}
