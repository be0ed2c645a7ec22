/* Generated from src/core/spec/spec.schema.json by `npm run gen`. Do not edit. */

// As written by the user (numbers or unit strings; optional keys may be absent).
/**
 * A timber species id from rules/materials/species.yaml.
 */
export type Species = string;
/**
 * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
 */
export type Grade = 'selected' | 'sawn';
/**
 * A leather or rawhide id from rules/materials/leathers.yaml.
 */
export type Leather = string;
/**
 * A coordinate in the unit of its key; a string with another unit is converted.
 */
export type Position = number | string;

/**
 * A build specification for a two-wheeled, horse-drawn chariot. Units live in the key names; a string value with another unit ("65 in", "1.65 m", "5 ft 4 in") is converted. Positions: x forward from the rear edge of the floor, y to the left of the centre line, z up from the ground, all in mm.
 */
export interface BuildSpecification {
  /**
   * Version of this vocabulary; 1.
   */
  spec_version: 1;
  /**
   * Free text naming the build.
   */
  name: string;
  /**
   * Timber moisture content at assembly, percent of oven-dry mass. Default 12.
   */
  moisture_content_pct?: number | string;
  box: {
    floor: {
      /**
       * Inner span of the floor, front to back.
       */
      depth_mm: number | string;
      /**
       * Inner span of the floor, side to side.
       */
      width_mm: number | string;
      /**
       * Top of the floor above the ground. Default: wheel radius + half the axle height (or diameter) + pole height + frame thickness (or diameter).
       */
      height_mm?: number | string;
      /**
       * How close to the frame a crew member's centre of mass can stand; sets the crew envelope. Default 150 (design note, section 3).
       */
      usable_margin_mm?: number | string;
      /**
       * The rectangle, centred on each crew member, over which their weight bears on the straps (both feet and the stance between them).
       */
      foot_patch?: {
        /**
         * Front to back. Default 300 (mechanics note, section 5).
         */
        length_mm?: number | string;
        /**
         * Side to side. Default 350 (mechanics note, section 5).
         */
        width_mm?: number | string;
      };
      /**
       * The floor frame: rails of rectangular section (width_mm and thickness_mm) or bars of round section (diameter_mm); give exactly one of the two forms.
       */
      frame: {
        species: Species;
        /**
         * Rail width in plan (rectangular rails; give with thickness_mm, or give diameter_mm instead).
         */
        width_mm?: number | string;
        /**
         * Rail depth, vertical (rectangular rails; give with width_mm, or give diameter_mm instead).
         */
        thickness_mm?: number | string;
        /**
         * Diameter of round-section bars (bent round rods, as in New Kingdom Egyptian bodies): give instead of width_mm and thickness_mm.
         */
        diameter_mm?: number | string;
        /**
         * Radius, on the rail's centre line, of the two front corners of a frame whose front rail is steam-bent round them; the rear corners are jointed. Omit for a frame with four jointed corners.
         */
        bend_radius_mm?: number | string;
        grade?: Grade;
        /**
         * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
         */
        grain_slope_deg?: number | string;
        /**
         * True when the front rail is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
         */
        bend_strap?: boolean;
      };
    };
    /**
     * Screens, rails and hand-holds as one mass. Default 0.
     */
    siding_mass_kg?: number | string;
    /**
     * Height of the siding's centre of mass above the floor top; it stands centred over the floor. Default 450 (an assumption for a waist-high screen; replace with your own).
     */
    siding_height_mm?: number | string;
    /**
     * Measured mass of the whole box (frame, straps, siding); overrides the computed mass.
     */
    mass_kg?: number | string;
  };
  /**
   * The axle: rectangular (width_mm and height_mm) or round (diameter_mm); give exactly one of the two forms.
   */
  axle: {
    /**
     * Axle centre line: 0 = under the rear edge of the floor; depth/2 = central.
     */
    x_mm: number | string;
    species: Species;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    length_mm: number | string;
    /**
     * Width, front to back (rectangular axle; give with height_mm, or give diameter_mm instead).
     */
    width_mm?: number | string;
    /**
     * Depth, vertical (rectangular axle; give with width_mm, or give diameter_mm instead).
     */
    height_mm?: number | string;
    /**
     * Diameter of a round axle: give instead of width_mm and height_mm.
     */
    diameter_mm?: number | string;
    /**
     * Distance between the box's two bearings on the axle.
     */
    bearing_span_mm: number | string;
    /**
     * Measured mass of the axle; overrides the computed mass.
     */
    mass_kg?: number | string;
    grade?: Grade;
    /**
     * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
     */
    grain_slope_deg?: number | string;
  };
  wheels: {
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    diameter_mm: number | string;
    /**
     * Distance between the wheels' mid-planes.
     */
    track_mm: number | string;
    spokes: number;
    nave: {
      species: Species;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      length_mm: number | string;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      diameter_mm: number | string;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      bore_mm: number | string;
    };
    spoke: {
      species: Species;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      width_mm: number | string;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      thickness_mm: number | string;
      grade?: Grade;
      /**
       * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
       */
      grain_slope_deg?: number | string;
    };
    felloe: {
      species: Species;
      /**
       * Radial depth of the rim.
       */
      depth_mm: number | string;
      /**
       * Axial width of the rim.
       */
      width_mm: number | string;
      pieces: number;
      /**
       * Inner radius of a steam-bent felloe; omit for sawn segments.
       */
      bend_radius_mm?: number | string;
      grade?: Grade;
      /**
       * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
       */
      grain_slope_deg?: number | string;
      /**
       * True when a felloe is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
       */
      bend_strap?: boolean;
      /**
       * How the felloe's lengths are joined end to end; the joints fall midway between spokes. Every default here is an assumption, not a measurement: state your own.
       */
      joint?: {
        /**
         * dowel: the ends butt on dowels bored straight into them; the dowels pass the rim's shear, and the joint opens under a moment unless a tyre's pre-compression ties it. tenon: a round tongue on one end in a socket in the other, passing shear and moment by bearing. Default dowel (assumed).
         */
        kind?: 'dowel' | 'tenon';
        /**
         * Dowels or tenons across each joint. Default 2 (assumed).
         */
        count?: number;
        /**
         * Diameter of each dowel or round tenon. Default 12 (assumed).
         */
        diameter_mm?: number | string;
        /**
         * A tenon's length into the next felloe (tenons only). Default 60 (assumed).
         */
        length_mm?: number | string;
      };
    };
    /**
     * A tyre round each felloe. kind rawhide (a hide or leather band, named by material) or iron (a forged band, its mass from the density of iron); none, or no tyre key, for a bare felloe.
     */
    tyre?: {
      /**
       * none, rawhide (also a leather tyre: material names which) or iron. Default rawhide, the tyre this key held before kinds were added.
       */
      kind?: 'none' | 'rawhide' | 'iron';
      /**
       * For a rawhide or leather tyre: a leather or rawhide id from rules/materials/leathers.yaml. Not given for an iron tyre.
       */
      material?: string;
      /**
       * Axial width of the tyre.
       */
      width_mm?: number | string;
      /**
       * Radial thickness of the tyre; the felloe lies inside it.
       */
      thickness_mm?: number | string;
      /**
       * The compression a tyre shrunk on (hot iron, or hide put on wet) leaves in each spoke, in N. Where given, the felloe ring model treats the spokes as staying in compression. Omit where unknown.
       */
      pre_compression_N?: number | string;
    };
    /**
     * Measured mass of one wheel; overrides the computed mass.
     */
    mass_kg?: number | string;
  };
  pole: {
    species: Species;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number | string;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    height_mm: number | string;
    /**
     * Where the pole is fixed under the floor.
     */
    rear_x_mm: number | string;
    /**
     * Where the pole leaves the box.
     */
    root_x_mm: number | string;
    /**
     * The yoke bearing point.
     */
    yoke_x_mm: number | string;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    yoke_height_mm: number | string;
    /**
     * Radius of the steam bend where the pole rises to the yoke; omit for a straight rise.
     */
    bend_radius_mm?: number | string;
    /**
     * Measured mass of the pole; overrides the computed mass.
     */
    mass_kg?: number | string;
    grade?: Grade;
    /**
     * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
     */
    grain_slope_deg?: number | string;
    /**
     * True when the pole is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
     */
    bend_strap?: boolean;
  };
  yoke: {
    species: Species;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    length_mm: number | string;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number | string;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    height_mm: number | string;
    /**
     * Centre to centre of the two necks.
     */
    neck_spacing_mm: number | string;
    /**
     * Measured mass of the yoke; overrides the computed mass.
     */
    mass_kg?: number | string;
    grade?: Grade;
    /**
     * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
     */
    grain_slope_deg?: number | string;
  };
  floor_straps: {
    material: Leather;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number | string;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    thickness_mm: number | string;
    /**
     * Centre-to-centre spacing of the straps.
     */
    pitch_mm: number | string;
    weave: 'two-way' | 'front-to-back' | 'side-to-side';
    /**
     * Tension in each strap before loading; the builder's estimate. Default 150 (from memory).
     */
    pretension_N?: number | string;
    /**
     * A floor sample of this build measured by a drop test (`axletree floor-test`). When given, the ride model uses its damping ratio for the floor under the crew instead of the default from the rules data.
     */
    measured?: {
      /**
       * Damping ratio of the floor (fraction of critical) from the test: the fitted value `axletree floor-test` reports as damping_ratio.
       */
      damping_ratio: number;
      /**
       * Stiffness k = M (2 pi f_n)^2 from the test, for the record and for comparison with the strap-floor model; the ride model keeps the floor stiffness the cable-net solver computes for the crew's own load.
       */
      stiffness_N_per_mm?: number | string;
      /**
       * Where the numbers come from: the test's date, the sample, the mass and the drop height, or the report file.
       */
      source: string;
    };
  };
  /**
   * @maxItems 20
   */
  lashings?: {
    joint: 'pole-to-axle' | 'pole-to-yoke' | 'pole-to-floor' | 'axle-to-floor' | 'frame-corners' | 'siding-to-frame';
    material: Leather;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number | string;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    thickness_mm: number | string;
    wraps: number;
    /**
     * Pull on each wrap as laid; the builder's estimate. Default 100 (from memory).
     */
    pretension_N?: number | string;
    /**
     * Full turns each end of the strap makes round a member before it is tucked; checked against the capstan equation. Omit to be told how many are needed.
     */
    anchor_turns?: number;
  }[];
  /**
   * @minItems 1
   * @maxItems 4
   */
  crew: {
    /**
     * Driver, passenger, archer...; unique within the crew.
     */
    role: string;
    /**
     * A mass in kg; a string with another unit is converted.
     */
    mass_kg: number | string;
    x_mm: Position;
    y_mm: Position;
    /**
     * Centre of mass above the floor top. Default 1000 (from memory: a standing adult's centre of mass is a little above half their height).
     */
    cg_height_mm?: number | string;
  }[];
  /**
   * @maxItems 50
   */
  loads?: {
    name: string;
    /**
     * A mass in kg; a string with another unit is converted.
     */
    mass_kg: number | string;
    x_mm: Position;
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    y_mm?: number | string;
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    z_mm: number | string;
  }[];
  /**
   * The horses. Give the lightest horse's mass one way, exactly: horse_mass_kg (weighed), or horse.girth_cm with horse.body_length_cm (a tape), or horse.type with horse.height_m (a preset band from rules/parameters/horses.yaml, whose low end the checks use).
   */
  team: {
    horses: number;
    /**
     * Mass of the lightest horse in the team, weighed. Give this, or team.horse's girth and length, or its type and height.
     */
    horse_mass_kg?: number | string;
    /**
     * The lightest horse measured, where it was not weighed: girth_cm with body_length_cm (mass by Carroll and Huntington's tape formula), or type with height_m (a preset band; the checks use its low end).
     */
    horse?: {
      /**
       * The horse's build, for a preset mass band: pony, cob, riding (a light riding horse) or draught (a heavy draught horse). Give height_m with it.
       */
      type?: 'pony' | 'cob' | 'riding' | 'draught';
      /**
       * Height at the withers (one hand is 0.1016 m: 11 hands is 1.12 m). Give type with it.
       */
      height_m?: number | string;
      /**
       * Girth round the barrel just behind the withers and elbows, the tape snug. Give body_length_cm with it.
       */
      girth_cm?: number | string;
      /**
       * Body length from the point of the shoulder to the point of the buttock. Give girth_cm with it.
       */
      body_length_cm?: number | string;
    };
  };
  operation: {
    /**
     * Design speed.
     */
    speed_kmh: number | string;
    /**
     * Tightest planned turn, radius of the yoke's path.
     */
    turn_radius_m: number | string;
    /**
     * Design forward acceleration, in g. Default 0.2 (from memory).
     */
    acceleration_g?: number | string;
    /**
     * Design braking deceleration as a positive number, in g. Default 0.3 (from memory).
     */
    braking_g?: number | string;
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    bump_height_mm?: number | string;
    /**
     * Length along the track of the design stone (a raised-cosine hump) for the ride model's stone-strike case. Default 200 (from memory: a stone or a rut edge).
     */
    bump_length_mm?: number | string;
    /**
     * The routine rough ground driven over at the design speed (a raised-cosine ridge of soil, sod or ruts): the ride model's rough-ground case, whose dynamic factors feed the strength checks. Default: the ground type's rough_ground in rules/grounds.yaml.
     */
    rough_ground?: {
      /**
       * A coordinate in the unit of its key; a string with another unit is converted.
       */
      height_mm: number | string;
      /**
       * Length of the ridge along the track; at least 500 mm (shorter is struck, not ridden over: give it as the stone, bump_height_mm and bump_length_mm).
       */
      length_mm: number | string;
    };
    /**
     * Height the ride model's drop test releases the chariot from, every point above its standing position. Default 500 (from memory).
     */
    drop_height_mm?: number | string;
    /**
     * The steepest sustained grade the build is driven up, in per cent (rise over distance × 100): the draught check's design grade. Default: draught.pull's default_grade_pct in rules/limits/draught.yaml.
     */
    grade_pct?: number | string;
    /**
     * Ground type from rules/grounds.yaml; sets rolling resistance and friction. Default turf.
     */
    ground?: string;
    /**
     * True when the chariot may be driven wet (rain, fords, wet grass): the lashings are checked at the leather's wet strength. Default false.
     */
    wet?: boolean;
  };
  stock?: {
    /**
     * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
     */
    grade?: 'selected' | 'sawn';
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    kerf_mm?: number | string;
    allowance?: {
      /**
       * A coordinate in the unit of its key; a string with another unit is converted.
       */
      face_mm?: number | string;
      /**
       * A coordinate in the unit of its key; a string with another unit is converted.
       */
      end_mm?: number | string;
    };
    /**
     * True when parts are cut green and dry after.
     */
    green?: boolean;
    /**
     * How the growth rings lie in the parts' cross-section, for green sizing: flat-sawn (the width face is tangential to the rings, the thickness radial) or quarter-sawn (the width face radial, the thickness tangential). Omit where unknown: every cross dimension is then sized by the larger, tangential shrinkage (mechanics note, section 9). Turned parts (naves, linchpins) always take the tangential figure.
     */
    orientation?: 'flat-sawn' | 'quarter-sawn';
    /**
     * @maxItems 30
     */
    lumber?: {
      species: Species;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      width_mm: number | string;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      thickness_mm: number | string;
      /**
       * @minItems 1
       * @maxItems 20
       *
       * Items: A length in the unit of its key; a string with another unit is converted.
       */
      lengths_mm: (number | string)[];
      price_per_m3?: number;
    }[];
    /**
     * Further timber parts to cut (siding rails, hand-holds, spares), listed for the cut list and stock plan only: their mass is not in the mass model (give it under loads or in box.siding_mass_kg).
     *
     * @maxItems 50
     */
    extra_parts?: {
      name: string;
      species: Species;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      length_mm: number | string;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      width_mm: number | string;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      thickness_mm: number | string;
      quantity?: number;
      grade?: Grade;
      /**
       * As stock.orientation, for this part; default: stock.orientation.
       */
      orientation?: 'flat-sawn' | 'quarter-sawn';
    }[];
  };
}

// After unit conversion and defaults: what the computation core receives.
/**
 * A timber species id from rules/materials/species.yaml.
 */
export type CheckedSpecies = string;
/**
 * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
 */
export type CheckedGrade = 'selected' | 'sawn';
/**
 * A leather or rawhide id from rules/materials/leathers.yaml.
 */
export type CheckedLeather = string;
/**
 * A coordinate in the unit of its key; a string with another unit is converted.
 */
export type CheckedPosition = number;

/**
 * A build specification for a two-wheeled, horse-drawn chariot. Units live in the key names; a string value with another unit ("65 in", "1.65 m", "5 ft 4 in") is converted. Positions: x forward from the rear edge of the floor, y to the left of the centre line, z up from the ground, all in mm.
 */
export interface CheckedSpecification {
  /**
   * Version of this vocabulary; 1.
   */
  spec_version: 1;
  /**
   * Free text naming the build.
   */
  name: string;
  /**
   * Timber moisture content at assembly, percent of oven-dry mass. Default 12.
   */
  moisture_content_pct: number;
  box: {
    floor: {
      /**
       * Inner span of the floor, front to back.
       */
      depth_mm: number;
      /**
       * Inner span of the floor, side to side.
       */
      width_mm: number;
      /**
       * Top of the floor above the ground. Default: wheel radius + half the axle height (or diameter) + pole height + frame thickness (or diameter).
       */
      height_mm: number;
      /**
       * How close to the frame a crew member's centre of mass can stand; sets the crew envelope. Default 150 (design note, section 3).
       */
      usable_margin_mm: number;
      /**
       * The rectangle, centred on each crew member, over which their weight bears on the straps (both feet and the stance between them).
       */
      foot_patch: {
        /**
         * Front to back. Default 300 (mechanics note, section 5).
         */
        length_mm: number;
        /**
         * Side to side. Default 350 (mechanics note, section 5).
         */
        width_mm: number;
      };
      /**
       * The floor frame: rails of rectangular section (width_mm and thickness_mm) or bars of round section (diameter_mm); give exactly one of the two forms.
       */
      frame: {
        species: CheckedSpecies;
        /**
         * Rail width in plan (rectangular rails; give with thickness_mm, or give diameter_mm instead).
         */
        width_mm?: number;
        /**
         * Rail depth, vertical (rectangular rails; give with width_mm, or give diameter_mm instead).
         */
        thickness_mm?: number;
        /**
         * Diameter of round-section bars (bent round rods, as in New Kingdom Egyptian bodies): give instead of width_mm and thickness_mm.
         */
        diameter_mm?: number;
        /**
         * Radius, on the rail's centre line, of the two front corners of a frame whose front rail is steam-bent round them; the rear corners are jointed. Omit for a frame with four jointed corners.
         */
        bend_radius_mm?: number;
        grade?: CheckedGrade;
        /**
         * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
         */
        grain_slope_deg: number;
        /**
         * True when the front rail is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
         */
        bend_strap: boolean;
      };
    };
    /**
     * Screens, rails and hand-holds as one mass. Default 0.
     */
    siding_mass_kg: number;
    /**
     * Height of the siding's centre of mass above the floor top; it stands centred over the floor. Default 450 (an assumption for a waist-high screen; replace with your own).
     */
    siding_height_mm: number;
    /**
     * Measured mass of the whole box (frame, straps, siding); overrides the computed mass.
     */
    mass_kg?: number;
  };
  /**
   * The axle: rectangular (width_mm and height_mm) or round (diameter_mm); give exactly one of the two forms.
   */
  axle: {
    /**
     * Axle centre line: 0 = under the rear edge of the floor; depth/2 = central.
     */
    x_mm: number;
    species: CheckedSpecies;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    length_mm: number;
    /**
     * Width, front to back (rectangular axle; give with height_mm, or give diameter_mm instead).
     */
    width_mm?: number;
    /**
     * Depth, vertical (rectangular axle; give with width_mm, or give diameter_mm instead).
     */
    height_mm?: number;
    /**
     * Diameter of a round axle: give instead of width_mm and height_mm.
     */
    diameter_mm?: number;
    /**
     * Distance between the box's two bearings on the axle.
     */
    bearing_span_mm: number;
    /**
     * Measured mass of the axle; overrides the computed mass.
     */
    mass_kg?: number;
    grade?: CheckedGrade;
    /**
     * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
     */
    grain_slope_deg: number;
  };
  wheels: {
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    diameter_mm: number;
    /**
     * Distance between the wheels' mid-planes.
     */
    track_mm: number;
    spokes: number;
    nave: {
      species: CheckedSpecies;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      length_mm: number;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      diameter_mm: number;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      bore_mm: number;
    };
    spoke: {
      species: CheckedSpecies;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      width_mm: number;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      thickness_mm: number;
      grade?: CheckedGrade;
      /**
       * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
       */
      grain_slope_deg: number;
    };
    felloe: {
      species: CheckedSpecies;
      /**
       * Radial depth of the rim.
       */
      depth_mm: number;
      /**
       * Axial width of the rim.
       */
      width_mm: number;
      pieces: number;
      /**
       * Inner radius of a steam-bent felloe; omit for sawn segments.
       */
      bend_radius_mm?: number;
      grade?: CheckedGrade;
      /**
       * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
       */
      grain_slope_deg: number;
      /**
       * True when a felloe is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
       */
      bend_strap: boolean;
      /**
       * How the felloe's lengths are joined end to end; the joints fall midway between spokes. Every default here is an assumption, not a measurement: state your own.
       */
      joint: {
        /**
         * dowel: the ends butt on dowels bored straight into them; the dowels pass the rim's shear, and the joint opens under a moment unless a tyre's pre-compression ties it. tenon: a round tongue on one end in a socket in the other, passing shear and moment by bearing. Default dowel (assumed).
         */
        kind: 'dowel' | 'tenon';
        /**
         * Dowels or tenons across each joint. Default 2 (assumed).
         */
        count: number;
        /**
         * Diameter of each dowel or round tenon. Default 12 (assumed).
         */
        diameter_mm: number;
        /**
         * A tenon's length into the next felloe (tenons only). Default 60 (assumed).
         */
        length_mm: number;
      };
    };
    /**
     * A tyre round each felloe. kind rawhide (a hide or leather band, named by material) or iron (a forged band, its mass from the density of iron); none, or no tyre key, for a bare felloe.
     */
    tyre?: {
      /**
       * none, rawhide (also a leather tyre: material names which) or iron. Default rawhide, the tyre this key held before kinds were added.
       */
      kind: 'none' | 'rawhide' | 'iron';
      /**
       * For a rawhide or leather tyre: a leather or rawhide id from rules/materials/leathers.yaml. Not given for an iron tyre.
       */
      material?: string;
      /**
       * Axial width of the tyre.
       */
      width_mm?: number;
      /**
       * Radial thickness of the tyre; the felloe lies inside it.
       */
      thickness_mm?: number;
      /**
       * The compression a tyre shrunk on (hot iron, or hide put on wet) leaves in each spoke, in N. Where given, the felloe ring model treats the spokes as staying in compression. Omit where unknown.
       */
      pre_compression_N?: number;
    };
    /**
     * Measured mass of one wheel; overrides the computed mass.
     */
    mass_kg?: number;
  };
  pole: {
    species: CheckedSpecies;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    height_mm: number;
    /**
     * Where the pole is fixed under the floor.
     */
    rear_x_mm: number;
    /**
     * Where the pole leaves the box.
     */
    root_x_mm: number;
    /**
     * The yoke bearing point.
     */
    yoke_x_mm: number;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    yoke_height_mm: number;
    /**
     * Radius of the steam bend where the pole rises to the yoke; omit for a straight rise.
     */
    bend_radius_mm?: number;
    /**
     * Measured mass of the pole; overrides the computed mass.
     */
    mass_kg?: number;
    grade?: CheckedGrade;
    /**
     * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
     */
    grain_slope_deg: number;
    /**
     * True when the pole is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
     */
    bend_strap: boolean;
  };
  yoke: {
    species: CheckedSpecies;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    length_mm: number;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    height_mm: number;
    /**
     * Centre to centre of the two necks.
     */
    neck_spacing_mm: number;
    /**
     * Measured mass of the yoke; overrides the computed mass.
     */
    mass_kg?: number;
    grade?: CheckedGrade;
    /**
     * Slope of grain: the angle between the grain and the length of the part, in degrees (a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Default 0 (straight grain).
     */
    grain_slope_deg: number;
  };
  floor_straps: {
    material: CheckedLeather;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    thickness_mm: number;
    /**
     * Centre-to-centre spacing of the straps.
     */
    pitch_mm: number;
    weave: 'two-way' | 'front-to-back' | 'side-to-side';
    /**
     * Tension in each strap before loading; the builder's estimate. Default 150 (from memory).
     */
    pretension_N: number;
    /**
     * A floor sample of this build measured by a drop test (`axletree floor-test`). When given, the ride model uses its damping ratio for the floor under the crew instead of the default from the rules data.
     */
    measured?: {
      /**
       * Damping ratio of the floor (fraction of critical) from the test: the fitted value `axletree floor-test` reports as damping_ratio.
       */
      damping_ratio: number;
      /**
       * Stiffness k = M (2 pi f_n)^2 from the test, for the record and for comparison with the strap-floor model; the ride model keeps the floor stiffness the cable-net solver computes for the crew's own load.
       */
      stiffness_N_per_mm?: number;
      /**
       * Where the numbers come from: the test's date, the sample, the mass and the drop height, or the report file.
       */
      source: string;
    };
  };
  /**
   * @maxItems 20
   */
  lashings: {
    joint: 'pole-to-axle' | 'pole-to-yoke' | 'pole-to-floor' | 'axle-to-floor' | 'frame-corners' | 'siding-to-frame';
    material: CheckedLeather;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    width_mm: number;
    /**
     * A length in the unit of its key; a string with another unit is converted.
     */
    thickness_mm: number;
    wraps: number;
    /**
     * Pull on each wrap as laid; the builder's estimate. Default 100 (from memory).
     */
    pretension_N: number;
    /**
     * Full turns each end of the strap makes round a member before it is tucked; checked against the capstan equation. Omit to be told how many are needed.
     */
    anchor_turns?: number;
  }[];
  /**
   * @minItems 1
   * @maxItems 4
   */
  crew: {
    /**
     * Driver, passenger, archer...; unique within the crew.
     */
    role: string;
    /**
     * A mass in kg; a string with another unit is converted.
     */
    mass_kg: number;
    x_mm: CheckedPosition;
    y_mm: CheckedPosition;
    /**
     * Centre of mass above the floor top. Default 1000 (from memory: a standing adult's centre of mass is a little above half their height).
     */
    cg_height_mm: number;
  }[];
  /**
   * @maxItems 50
   */
  loads: {
    name: string;
    /**
     * A mass in kg; a string with another unit is converted.
     */
    mass_kg: number;
    x_mm: CheckedPosition;
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    y_mm: number;
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    z_mm: number;
  }[];
  /**
   * The horses. Give the lightest horse's mass one way, exactly: horse_mass_kg (weighed), or horse.girth_cm with horse.body_length_cm (a tape), or horse.type with horse.height_m (a preset band from rules/parameters/horses.yaml, whose low end the checks use).
   */
  team: {
    horses: number;
    /**
     * Mass of the lightest horse in the team, weighed. Give this, or team.horse's girth and length, or its type and height.
     */
    horse_mass_kg?: number;
    /**
     * The lightest horse measured, where it was not weighed: girth_cm with body_length_cm (mass by Carroll and Huntington's tape formula), or type with height_m (a preset band; the checks use its low end).
     */
    horse?: {
      /**
       * The horse's build, for a preset mass band: pony, cob, riding (a light riding horse) or draught (a heavy draught horse). Give height_m with it.
       */
      type?: 'pony' | 'cob' | 'riding' | 'draught';
      /**
       * Height at the withers (one hand is 0.1016 m: 11 hands is 1.12 m). Give type with it.
       */
      height_m?: number;
      /**
       * Girth round the barrel just behind the withers and elbows, the tape snug. Give body_length_cm with it.
       */
      girth_cm?: number;
      /**
       * Body length from the point of the shoulder to the point of the buttock. Give girth_cm with it.
       */
      body_length_cm?: number;
    };
  };
  operation: {
    /**
     * Design speed.
     */
    speed_kmh: number;
    /**
     * Tightest planned turn, radius of the yoke's path.
     */
    turn_radius_m: number;
    /**
     * Design forward acceleration, in g. Default 0.2 (from memory).
     */
    acceleration_g: number;
    /**
     * Design braking deceleration as a positive number, in g. Default 0.3 (from memory).
     */
    braking_g: number;
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    bump_height_mm: number;
    /**
     * Length along the track of the design stone (a raised-cosine hump) for the ride model's stone-strike case. Default 200 (from memory: a stone or a rut edge).
     */
    bump_length_mm: number;
    /**
     * The routine rough ground driven over at the design speed (a raised-cosine ridge of soil, sod or ruts): the ride model's rough-ground case, whose dynamic factors feed the strength checks. Default: the ground type's rough_ground in rules/grounds.yaml.
     */
    rough_ground?: {
      /**
       * A coordinate in the unit of its key; a string with another unit is converted.
       */
      height_mm: number;
      /**
       * Length of the ridge along the track; at least 500 mm (shorter is struck, not ridden over: give it as the stone, bump_height_mm and bump_length_mm).
       */
      length_mm: number;
    };
    /**
     * Height the ride model's drop test releases the chariot from, every point above its standing position. Default 500 (from memory).
     */
    drop_height_mm: number;
    /**
     * The steepest sustained grade the build is driven up, in per cent (rise over distance × 100): the draught check's design grade. Default: draught.pull's default_grade_pct in rules/limits/draught.yaml.
     */
    grade_pct?: number;
    /**
     * Ground type from rules/grounds.yaml; sets rolling resistance and friction. Default turf.
     */
    ground: string;
    /**
     * True when the chariot may be driven wet (rain, fords, wet grass): the lashings are checked at the leather's wet strength. Default false.
     */
    wet: boolean;
  };
  stock: {
    /**
     * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
     */
    grade: 'selected' | 'sawn';
    /**
     * A coordinate in the unit of its key; a string with another unit is converted.
     */
    kerf_mm: number;
    allowance: {
      /**
       * A coordinate in the unit of its key; a string with another unit is converted.
       */
      face_mm: number;
      /**
       * A coordinate in the unit of its key; a string with another unit is converted.
       */
      end_mm: number;
    };
    /**
     * True when parts are cut green and dry after.
     */
    green: boolean;
    /**
     * How the growth rings lie in the parts' cross-section, for green sizing: flat-sawn (the width face is tangential to the rings, the thickness radial) or quarter-sawn (the width face radial, the thickness tangential). Omit where unknown: every cross dimension is then sized by the larger, tangential shrinkage (mechanics note, section 9). Turned parts (naves, linchpins) always take the tangential figure.
     */
    orientation?: 'flat-sawn' | 'quarter-sawn';
    /**
     * @maxItems 30
     */
    lumber: {
      species: CheckedSpecies;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      width_mm: number;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      thickness_mm: number;
      /**
       * @minItems 1
       * @maxItems 20
       *
       * Items: A length in the unit of its key; a string with another unit is converted.
       */
      lengths_mm: number[];
      price_per_m3?: number;
    }[];
    /**
     * Further timber parts to cut (siding rails, hand-holds, spares), listed for the cut list and stock plan only: their mass is not in the mass model (give it under loads or in box.siding_mass_kg).
     *
     * @maxItems 50
     */
    extra_parts: {
      name: string;
      species: CheckedSpecies;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      length_mm: number;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      width_mm: number;
      /**
       * A length in the unit of its key; a string with another unit is converted.
       */
      thickness_mm: number;
      quantity: number;
      grade?: CheckedGrade;
      /**
       * As stock.orientation, for this part; default: stock.orientation.
       */
      orientation?: 'flat-sawn' | 'quarter-sawn';
    }[];
  };
}
