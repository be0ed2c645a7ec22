/* Generated from src/core/spec/spec.schema.json by `npm run gen`. Do not edit. */

// As written by the user (numbers or unit strings; optional keys may be absent).
/**
 * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
 */
export type Grade = 'selected' | 'sawn';

/**
 * A build specification for a two-wheeled, horse-drawn chariot. Units live in the key names; a string value with another unit ("65 in", "1.65 m", "5 ft 4 in") is converted. Positions, all in mm: x forward from the rear edge of the floor (the inside face of the frame’s rear rail, on the centre line), y to the left of the centre line (looking forward), z up from level ground. "Examples in specs/" gives the range of the demo and validation builds shipped in specs/.
 */
export interface BuildSpecification {
  /**
   * Version of this vocabulary: always 1.
   */
  spec_version: 1;
  /**
   * Free text naming the build, as the reports title it (at most 200 characters).
   */
  name: string;
  /**
   * Timber moisture content at assembly, in per cent of the wood’s oven-dry mass: read it with a pin moisture meter on an offcut of the same stock, a hand’s breadth from the end. Air-dried stock kept under cover is typically 12 to 20, kiln-dried 8 to 12 (from memory). Examples in specs/: 12 to 14. Default 12.
   */
  moisture_content_pct?: number | string;
  /**
   * The body: the floor frame, the straps woven across it, and the siding.
   */
  box: {
    /**
     * The floor the crew stands on: a frame of rails with straps woven across it.
     */
    floor: {
      /**
       * Inner span of the floor, front to back, in mm: from the inside face of the rear rail to the inside face of the front rail, along the centre line. Examples in specs/: 410 to 900.
       */
      depth_mm: number | string;
      /**
       * Inner span of the floor, side to side, in mm: between the inside faces of the side rails, where the floor is widest. Examples in specs/: 560 to 1020.
       */
      width_mm: number | string;
      /**
       * Top of the floor (the straps) above level ground, in mm, the chariot standing on its wheels with the pole at the yoke height. Typically 500 to 800 (from memory). Default: wheel radius + half the axle height (or diameter) + pole height + frame thickness (or diameter).
       */
      height_mm?: number | string;
      /**
       * How close to the frame a crew member’s centre of mass can stand, in mm in from the inside face of the rails; sets the crew envelope. Examples in specs/: 300. Default 150 (design note, section 3).
       */
      usable_margin_mm?: number | string;
      /**
       * The rectangle, centred on each crew member, over which their weight bears on the straps (both feet and the stance between them).
       */
      foot_patch?: {
        /**
         * Front to back, in mm: from the heel of the rear foot to the toe of the front one, the crew braced as they ride. Typically 250 to 400 (from memory). Default 300 (mechanics note, section 5).
         */
        length_mm?: number | string;
        /**
         * Side to side, in mm: across the outer edges of both feet at the usual stance. Typically 300 to 450 (from memory). Default 350 (mechanics note, section 5).
         */
        width_mm?: number | string;
      };
      /**
       * The floor frame: rails of rectangular section (width_mm and thickness_mm) or bars of round section (diameter_mm); give exactly one of the two forms.
       */
      frame: {
        /**
         * Timber of the frame’s rails: a species id from rules/materials/species.yaml (the drop-down lists every one).
         */
        species: string;
        /**
         * Rail width in plan, in mm: across the rail’s top face (rectangular rails; give with thickness_mm, or give diameter_mm instead). Examples in specs/: 40 to 80.
         */
        width_mm?: number | string;
        /**
         * Rail depth, vertical, in mm: from the rail’s top face to its underside (rectangular rails; give with width_mm, or give diameter_mm instead). Examples in specs/: 35 to 45.
         */
        thickness_mm?: number | string;
        /**
         * Diameter of round-section bars, in mm, taken with calipers at mid-length (bent round rods, as in New Kingdom Egyptian bodies): give instead of width_mm and thickness_mm. Examples in specs/: 32 to 36.
         */
        diameter_mm?: number | string;
        /**
         * Radius of the two front corners where the front rail is steam-bent round them, in mm, on the rail’s centre line (the inside radius plus half the rail’s width); the rear corners are jointed. Omit for a frame with four jointed corners. Examples in specs/: 200 to 520.
         */
        bend_radius_mm?: number | string;
        grade?: Grade;
        /**
         * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
         */
        grain_slope_deg?: number | string;
        /**
         * True when the front rail is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
         */
        bend_strap?: boolean;
      };
    };
    /**
     * Screens, rails and hand-holds as one mass, in kg: weigh them, or estimate from their timber and leather. Examples in specs/: 4 to 10. Default 0.
     */
    siding_mass_kg?: number | string;
    /**
     * Height of the siding’s centre of mass above the floor top, in mm; it stands centred over the floor. Examples in specs/: 350 to 420. Default 450 (an assumption for a waist-high screen; replace with your own).
     */
    siding_height_mm?: number | string;
    /**
     * Measured mass of the whole box (frame, straps, siding), in kg, weighed off the axle; overrides the computed mass. Typically 10 to 40 (from memory).
     */
    mass_kg?: number | string;
  };
  /**
   * The axle: rectangular (width_mm and height_mm) or round (diameter_mm); give exactly one of the two forms.
   */
  axle: {
    /**
     * Where the axle’s centre line is, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line): 0 puts it under the rear edge of the floor, half the floor depth under the middle. Examples in specs/: 0 to 450.
     */
    x_mm: number | string;
    /**
     * Timber of the axle: a species id from rules/materials/species.yaml (the drop-down lists every one).
     */
    species: string;
    /**
     * Overall length of the axle, in mm, end to end, the arms that pass through the naves included. Examples in specs/: 1500 to 2100.
     */
    length_mm: number | string;
    /**
     * Width of a rectangular axle, front to back, in mm, at the middle (give with height_mm, or give diameter_mm instead). Examples in specs/: 65 to 80.
     */
    width_mm?: number | string;
    /**
     * Depth of a rectangular axle, vertical, in mm, at the middle (give with width_mm, or give diameter_mm instead). Examples in specs/: 65 to 80.
     */
    height_mm?: number | string;
    /**
     * Diameter of a round axle, in mm, at the middle: give instead of width_mm and height_mm. Examples in specs/: 65 to 66.
     */
    diameter_mm?: number | string;
    /**
     * Distance between the box’s two bearings on the axle, in mm: centre to centre of where the box (or its under-frame) rests on the axle. Examples in specs/: 600 to 1000.
     */
    bearing_span_mm: number | string;
    /**
     * Measured mass of the axle, in kg, weighed on its own; overrides the computed mass. Typically 4 to 15 (from memory).
     */
    mass_kg?: number | string;
    grade?: Grade;
    /**
     * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
     */
    grain_slope_deg?: number | string;
  };
  /**
   * The two wheels, alike: size, spacing, nave, spokes, felloe and tyre.
   */
  wheels: {
    /**
     * Overall diameter of a wheel, in mm, over the tyre: across the wheel through the nave’s centre. Examples in specs/: 900 to 950.
     */
    diameter_mm: number | string;
    /**
     * Distance between the wheels’ mid-planes, in mm: centre to centre of the two tyres where they meet the ground. Examples in specs/: 1200 to 1640.
     */
    track_mm: number | string;
    /**
     * Spokes in each wheel, a whole number. Examples in specs/: 4 to 12.
     */
    spokes: number;
    /**
     * The nave (hub): the turned block the spokes are set in and the axle arm turns in.
     */
    nave: {
      /**
       * Timber of the naves: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Length of the nave along the axle, in mm, from its inner face to its outer face. Examples in specs/: 200 to 440.
       */
      length_mm: number | string;
      /**
       * Outside diameter of the nave, in mm, where the spokes enter it. Examples in specs/: 120 to 160.
       */
      diameter_mm: number | string;
      /**
       * Diameter of the hole through the nave that the axle arm turns in, in mm. Examples in specs/: 62 to 76.
       */
      bore_mm: number | string;
    };
    /**
     * The spokes, all alike.
     */
    spoke: {
      /**
       * Timber of the spokes: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Width of a spoke’s section, in mm, at mid-length, as seen from the side of the wheel (in the wheel’s plane). Examples in specs/: 28 to 36.
       */
      width_mm: number | string;
      /**
       * Thickness of a spoke’s section, in mm, at mid-length, along the axle (across the wheel’s plane). Examples in specs/: 25 to 30.
       */
      thickness_mm: number | string;
      grade?: Grade;
      /**
       * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
       */
      grain_slope_deg?: number | string;
    };
    /**
     * The felloe: the wooden rim, in one or more bent or sawn pieces.
     */
    felloe: {
      /**
       * Timber of the felloes: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Radial depth of the rim, in mm: from its inner face (where the spokes enter) to its outer face (under the tyre). Examples in specs/: 45 to 54.
       */
      depth_mm: number | string;
      /**
       * Axial width of the rim, in mm: across its running face, side to side. Examples in specs/: 25 to 48.
       */
      width_mm: number | string;
      /**
       * Pieces the rim is made of, a whole number: 1 for a single steam-bent hoop, more for several bent lengths or sawn segments. Examples in specs/: 1 to 2.
       */
      pieces: number;
      /**
       * Inner radius of a steam-bent felloe, in mm: half the rim’s inside diameter. Omit for sawn segments. Examples in specs/: 397 to 430.
       */
      bend_radius_mm?: number | string;
      grade?: Grade;
      /**
       * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
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
         * Dowels or tenons across each joint, a whole number. Examples in specs/: 2 to 3. Default 2 (assumed).
         */
        count?: number;
        /**
         * Diameter of each dowel or round tenon, in mm. Examples in specs/: 16. Default 12 (assumed).
         */
        diameter_mm?: number | string;
        /**
         * A tenon’s length into the next felloe, in mm (tenons only). Typically 40 to 80 (from memory). Default 60 (assumed).
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
       * Axial width of the tyre, in mm, across its running face. Examples in specs/: 25 to 30.
       */
      width_mm?: number | string;
      /**
       * Radial thickness of the tyre, in mm, at the tread; the felloe lies inside it. Examples in specs/: 5 to 8.
       */
      thickness_mm?: number | string;
      /**
       * The compression a tyre shrunk on (hot iron, or hide put on wet) leaves in each spoke, in N. Where given, the felloe ring model treats the spokes as staying in compression. Examples in specs/: 300 to 1000. Omit where unknown.
       */
      pre_compression_N?: number | string;
    };
    /**
     * Measured mass of one wheel, in kg, weighed off the axle; overrides the computed mass. Typically 5 to 15 (from memory).
     */
    mass_kg?: number | string;
  };
  /**
   * The draught pole: fixed under the floor, out through the front of the box, and rising to the yoke.
   */
  pole: {
    /**
     * Timber of the pole: a species id from rules/materials/species.yaml (the drop-down lists every one).
     */
    species: string;
    /**
     * Width of the pole’s section, side to side, in mm, where it leaves the box. Examples in specs/: 60 to 64.
     */
    width_mm: number | string;
    /**
     * Depth of the pole’s section, vertical, in mm, where it leaves the box. Examples in specs/: 60 to 72.
     */
    height_mm: number | string;
    /**
     * Where the pole’s rear end is fixed under the floor, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line). Examples in specs/: 0.
     */
    rear_x_mm: number | string;
    /**
     * Where the pole leaves the box, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line): usually at the front rail. Examples in specs/: 440 to 900.
     */
    root_x_mm: number | string;
    /**
     * The yoke’s bearing point on the pole, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line). Examples in specs/: 2600 to 2950.
     */
    yoke_x_mm: number | string;
    /**
     * Height of the yoke’s bearing point above level ground, in mm (z), the horses standing in harness. Examples in specs/: 1050 to 1300.
     */
    yoke_height_mm: number | string;
    /**
     * Radius of the steam bend where the pole rises to the yoke, in mm, on the pole’s centre line; omit for a straight rise. Examples in specs/: 1000 to 1500.
     */
    bend_radius_mm?: number | string;
    /**
     * Measured mass of the pole, in kg; overrides the computed mass. Typically 4 to 15 (from memory).
     */
    mass_kg?: number | string;
    grade?: Grade;
    /**
     * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
     */
    grain_slope_deg?: number | string;
    /**
     * True when the pole is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
     */
    bend_strap?: boolean;
  };
  /**
   * The yoke: the cross-bar over the horses’ necks that the pole bears on.
   */
  yoke: {
    /**
     * Timber of the yoke: a species id from rules/materials/species.yaml (the drop-down lists every one).
     */
    species: string;
    /**
     * Overall length of the yoke, end to end, in mm. Examples in specs/: 1000 to 1150.
     */
    length_mm: number | string;
    /**
     * Width of the yoke’s section, front to back, in mm, at the middle. Examples in specs/: 50 to 56.
     */
    width_mm: number | string;
    /**
     * Depth of the yoke’s section, vertical, in mm, at the middle. Examples in specs/: 50 to 55.
     */
    height_mm: number | string;
    /**
     * Centre to centre of the two necks, in mm, along the yoke: where the neck saddles (or bows) sit. Examples in specs/: 600 to 720.
     */
    neck_spacing_mm: number | string;
    /**
     * Measured mass of the yoke, in kg; overrides the computed mass. Examples in specs/: 4.2.
     */
    mass_kg?: number | string;
    grade?: Grade;
    /**
     * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
     */
    grain_slope_deg?: number | string;
  };
  /**
   * The woven floor: leather or rawhide straps stretched across the frame.
   */
  floor_straps: {
    /**
     * Leather of the straps: a leather or rawhide id from rules/materials/leathers.yaml.
     */
    material: string;
    /**
     * Width of one strap, in mm, laid flat. Examples in specs/: 12 to 30.
     */
    width_mm: number | string;
    /**
     * Thickness of one strap, in mm, taken with calipers on the dry strap. Examples in specs/: 4 to 12.
     */
    thickness_mm: number | string;
    /**
     * Centre-to-centre spacing of the straps, in mm: measure across ten and divide by ten. Examples in specs/: 25 to 40.
     */
    pitch_mm: number | string;
    /**
     * How the straps run: two-way (a lattice, front to back and side to side), front-to-back only, or side-to-side only.
     */
    weave: 'two-way' | 'front-to-back' | 'side-to-side';
    /**
     * Tension in each strap before loading, in N; the builder’s estimate (a spring balance on one strap as it is laced gives it). Examples in specs/: 60. Default 150 (from memory).
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
       * Stiffness k = M (2 pi f_n)^2 from the test, in N/mm, for the record and for comparison with the strap-floor model; the ride model keeps the floor stiffness the cable-net solver computes for the crew’s own load.
       */
      stiffness_N_per_mm?: number | string;
      /**
       * Where the numbers come from: the test's date, the sample, the mass and the drop height, or the report file.
       */
      source: string;
    };
  };
  /**
   * The leather lashings that bind the joints: one entry per lashed joint.
   *
   * @maxItems 20
   */
  lashings?: {
    /**
     * The joint the lashing binds: pole-to-axle, pole-to-yoke, pole-to-floor, axle-to-floor, frame-corners or siding-to-frame.
     */
    joint: 'pole-to-axle' | 'pole-to-yoke' | 'pole-to-floor' | 'axle-to-floor' | 'frame-corners' | 'siding-to-frame';
    /**
     * Leather of the lashing: a leather or rawhide id from rules/materials/leathers.yaml.
     */
    material: string;
    /**
     * Width of the lashing strap, in mm, laid flat. Examples in specs/: 14 to 18.
     */
    width_mm: number | string;
    /**
     * Thickness of the lashing strap, in mm. Examples in specs/: 3 to 4.
     */
    thickness_mm: number | string;
    /**
     * Wraps of the strap round the joint, a whole number: count the strands that cross one face. Examples in specs/: 12 to 20.
     */
    wraps: number;
    /**
     * Pull on each wrap as laid, in N; the builder’s estimate. Examples in specs/: 150. Default 100 (from memory).
     */
    pretension_N?: number | string;
    /**
     * Full turns each end of the strap makes round a member before it is tucked, a count (halves allowed); checked against the capstan equation. Examples in specs/: 2. Omit to be told how many are needed.
     */
    anchor_turns?: number;
  }[];
  /**
   * The people aboard, one entry each, placed where they stand as driven.
   *
   * @minItems 1
   * @maxItems 4
   */
  crew: {
    /**
     * Driver, passenger, archer...; unique within the crew (text).
     */
    role: string;
    /**
     * Mass of the person dressed and equipped as they ride, in kg, weighed. Examples in specs/: 65 to 80.
     */
    mass_kg: number | string;
    /**
     * Where the person’s centre of mass stands, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line): about over the middle of their feet. Examples in specs/: 220 to 400.
     */
    x_mm: number | string;
    /**
     * Where the person’s centre of mass stands, in mm to the left of the centre line (y; negative to the right, looking forward). Examples in specs/: -210 to 210.
     */
    y_mm: number | string;
    /**
     * Centre of mass above the floor top, in mm, the person standing braced. Examples in specs/: 960. Default 1000 (from memory: a standing adult’s centre of mass is a little above half their height).
     */
    cg_height_mm?: number | string;
  }[];
  /**
   * Things carried (water, weapons, baggage), one entry each, each a mass at a point.
   *
   * @maxItems 50
   */
  loads?: {
    /**
     * What the load is (text).
     */
    name: string;
    /**
     * Mass of the load, in kg, weighed. Examples in specs/: 4.
     */
    mass_kg: number | string;
    /**
     * Where its centre of mass is, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line). Examples in specs/: 480.
     */
    x_mm: number | string;
    /**
     * Where its centre of mass is, in mm to the left of the centre line (y; negative to the right). Examples in specs/: 0. Default 0 (on the centre line).
     */
    y_mm?: number | string;
    /**
     * Height of its centre of mass above level ground, in mm (z). Examples in specs/: 760.
     */
    z_mm: number | string;
  }[];
  /**
   * The horses. Give the lightest horse's mass one way, exactly: horse_mass_kg (weighed), or horse.girth_cm with horse.body_length_cm (a tape), or horse.type with horse.height_m (a preset band from rules/parameters/horses.yaml, whose low end the checks use).
   */
  team: {
    /**
     * Horses in the team, a whole number. Examples in specs/: 2.
     */
    horses: number;
    /**
     * Mass of the lightest horse in the team, in kg, weighed on a livestock scale. Examples in specs/: 300 to 430. Give this, or team.horse’s girth and length, or its type and height.
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
       * Height at the withers, in m, measured with a measuring stick, the horse standing square on level ground (one hand is 0.1016 m: 11 hands is 1.12 m). Examples in specs/: 1.12. Give type with it.
       */
      height_m?: number | string;
      /**
       * Girth round the barrel just behind the withers and elbows, in cm, the tape snug. Typically 140 to 200 for a light horse (from memory). Give body_length_cm with it.
       */
      girth_cm?: number | string;
      /**
       * Body length from the point of the shoulder to the point of the buttock, in cm, along the horse’s side. Typically 130 to 180 for a light horse (from memory). Give girth_cm with it.
       */
      body_length_cm?: number | string;
    };
  };
  /**
   * How the chariot is driven: speed, turns, ground, and the design events the checks use.
   */
  operation: {
    /**
     * Design speed, in km/h: the fastest the chariot is driven. A trot is about 10 to 15, a canter 20 to 30, a gallop 35 to 50 (from memory). Examples in specs/: 18 to 38.
     */
    speed_kmh: number | string;
    /**
     * Tightest planned turn, in m: the radius of the path of the yoke (the horses’ necks); pace out the turn’s width and halve it. Examples in specs/: 10 to 40.
     */
    turn_radius_m: number | string;
    /**
     * Design forward acceleration, in g (standard gravity). Examples in specs/: 0.2. Default 0.2 (from memory).
     */
    acceleration_g?: number | string;
    /**
     * Design braking deceleration as a positive number, in g (standard gravity). Examples in specs/: 0.3. Default 0.3 (from memory).
     */
    braking_g?: number | string;
    /**
     * Height of the design stone (or rut edge) struck at the design speed, in mm: the ride model’s accidental stone-strike case. Examples in specs/: 15 to 30. Default 30 (from memory).
     */
    bump_height_mm?: number | string;
    /**
     * Length along the track of the design stone (a raised-cosine hump), in mm, for the ride model’s stone-strike case. Typically 100 to 400 (from memory). Default 200 (from memory: a stone or a rut edge).
     */
    bump_length_mm?: number | string;
    /**
     * The routine rough ground driven over at the design speed (a raised-cosine ridge of soil, sod or ruts): the ride model's rough-ground case, whose dynamic factors feed the strength checks. Default: the ground type's rough_ground in rules/grounds.yaml.
     */
    rough_ground?: {
      /**
       * Height of the ridge, in mm. Examples in specs/: 10.
       */
      height_mm: number | string;
      /**
       * Length of the ridge along the track, in mm; at least 500 (shorter is struck, not ridden over: give it as the stone, bump_height_mm and bump_length_mm). Examples in specs/: 1000.
       */
      length_mm: number | string;
    };
    /**
     * Height the ride model’s drop test releases the chariot from, in mm, every point above its standing position. Typically 300 to 1000 (from memory). Default 500 (from memory).
     */
    drop_height_mm?: number | string;
    /**
     * The steepest sustained grade the build is driven up, in per cent (rise over distance × 100): the draught check’s design grade. Typically 0 to 10 on roads and tracks (from memory). Default: draught.pull’s default_grade_pct in rules/limits/draught.yaml.
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
  /**
   * The timber to cut the parts from, and how it is cut: for the cut list and the stock plan.
   */
  stock?: {
    /**
     * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
     */
    grade?: 'selected' | 'sawn';
    /**
     * The saw’s kerf: the width of the cut a saw blade makes, in mm, which the stock plan leaves between parts cut from one piece. Measure a trial cut across its width. Typically 1.5 to 4 (from memory). Default 3.
     */
    kerf_mm?: number | string;
    /**
     * What is left on each rough part for planing and trimming.
     */
    allowance?: {
      /**
       * Machining allowance per face, in mm: what planing takes off each face of a rough-sawn part. Typically 2 to 5 (common practice). Default 3 (common practice).
       */
      face_mm?: number | string;
      /**
       * Machining allowance per end, in mm: cut off each end to square it and lose end checks. Typically 10 to 50 (common practice). Default 25 (common practice).
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
     * Timber you have or can buy, one entry per size: the stock plan cuts the parts from it.
     *
     * @maxItems 30
     */
    lumber?: {
      /**
       * Timber of these boards: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Width of the boards as sawn, in mm. Examples in specs/: 75 to 175.
       */
      width_mm: number | string;
      /**
       * Thickness of the boards as sawn, in mm. Examples in specs/: 60 to 175.
       */
      thickness_mm: number | string;
      /**
       * The lengths to be had, in mm, separated by semicolons in one cell (2400; 3000; 3600). Examples in specs/: 900 to 3600.
       *
       * @minItems 1
       * @maxItems 20
       *
       * Items: A length in the unit of its key; a string with another unit is converted.
       */
      lengths_mm: (number | string)[];
      /**
       * Price per cubic metre, in your own currency; the stock plan totals the cost. Examples in specs/: 1350 to 1700.
       */
      price_per_m3?: number;
    }[];
    /**
     * Further timber parts to cut (siding rails, hand-holds, spares), listed for the cut list and stock plan only: their mass is not in the mass model (give it under loads or in box.siding_mass_kg).
     *
     * @maxItems 50
     */
    extra_parts?: {
      /**
       * What the part is (text).
       */
      name: string;
      /**
       * Timber of the part: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Finished length of the part, in mm, as drawn.
       */
      length_mm: number | string;
      /**
       * Finished width of the part, in mm, as drawn.
       */
      width_mm: number | string;
      /**
       * Finished thickness of the part, in mm, as drawn.
       */
      thickness_mm: number | string;
      /**
       * How many to cut, a whole number. Default 1.
       */
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
 * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
 */
export type CheckedGrade = 'selected' | 'sawn';

/**
 * A build specification for a two-wheeled, horse-drawn chariot. Units live in the key names; a string value with another unit ("65 in", "1.65 m", "5 ft 4 in") is converted. Positions, all in mm: x forward from the rear edge of the floor (the inside face of the frame’s rear rail, on the centre line), y to the left of the centre line (looking forward), z up from level ground. "Examples in specs/" gives the range of the demo and validation builds shipped in specs/.
 */
export interface CheckedSpecification {
  /**
   * Version of this vocabulary: always 1.
   */
  spec_version: 1;
  /**
   * Free text naming the build, as the reports title it (at most 200 characters).
   */
  name: string;
  /**
   * Timber moisture content at assembly, in per cent of the wood’s oven-dry mass: read it with a pin moisture meter on an offcut of the same stock, a hand’s breadth from the end. Air-dried stock kept under cover is typically 12 to 20, kiln-dried 8 to 12 (from memory). Examples in specs/: 12 to 14. Default 12.
   */
  moisture_content_pct: number;
  /**
   * The body: the floor frame, the straps woven across it, and the siding.
   */
  box: {
    /**
     * The floor the crew stands on: a frame of rails with straps woven across it.
     */
    floor: {
      /**
       * Inner span of the floor, front to back, in mm: from the inside face of the rear rail to the inside face of the front rail, along the centre line. Examples in specs/: 410 to 900.
       */
      depth_mm: number;
      /**
       * Inner span of the floor, side to side, in mm: between the inside faces of the side rails, where the floor is widest. Examples in specs/: 560 to 1020.
       */
      width_mm: number;
      /**
       * Top of the floor (the straps) above level ground, in mm, the chariot standing on its wheels with the pole at the yoke height. Typically 500 to 800 (from memory). Default: wheel radius + half the axle height (or diameter) + pole height + frame thickness (or diameter).
       */
      height_mm: number;
      /**
       * How close to the frame a crew member’s centre of mass can stand, in mm in from the inside face of the rails; sets the crew envelope. Examples in specs/: 300. Default 150 (design note, section 3).
       */
      usable_margin_mm: number;
      /**
       * The rectangle, centred on each crew member, over which their weight bears on the straps (both feet and the stance between them).
       */
      foot_patch: {
        /**
         * Front to back, in mm: from the heel of the rear foot to the toe of the front one, the crew braced as they ride. Typically 250 to 400 (from memory). Default 300 (mechanics note, section 5).
         */
        length_mm: number;
        /**
         * Side to side, in mm: across the outer edges of both feet at the usual stance. Typically 300 to 450 (from memory). Default 350 (mechanics note, section 5).
         */
        width_mm: number;
      };
      /**
       * The floor frame: rails of rectangular section (width_mm and thickness_mm) or bars of round section (diameter_mm); give exactly one of the two forms.
       */
      frame: {
        /**
         * Timber of the frame’s rails: a species id from rules/materials/species.yaml (the drop-down lists every one).
         */
        species: string;
        /**
         * Rail width in plan, in mm: across the rail’s top face (rectangular rails; give with thickness_mm, or give diameter_mm instead). Examples in specs/: 40 to 80.
         */
        width_mm?: number;
        /**
         * Rail depth, vertical, in mm: from the rail’s top face to its underside (rectangular rails; give with width_mm, or give diameter_mm instead). Examples in specs/: 35 to 45.
         */
        thickness_mm?: number;
        /**
         * Diameter of round-section bars, in mm, taken with calipers at mid-length (bent round rods, as in New Kingdom Egyptian bodies): give instead of width_mm and thickness_mm. Examples in specs/: 32 to 36.
         */
        diameter_mm?: number;
        /**
         * Radius of the two front corners where the front rail is steam-bent round them, in mm, on the rail’s centre line (the inside radius plus half the rail’s width); the rear corners are jointed. Omit for a frame with four jointed corners. Examples in specs/: 200 to 520.
         */
        bend_radius_mm?: number;
        grade?: CheckedGrade;
        /**
         * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
         */
        grain_slope_deg: number;
        /**
         * True when the front rail is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
         */
        bend_strap: boolean;
      };
    };
    /**
     * Screens, rails and hand-holds as one mass, in kg: weigh them, or estimate from their timber and leather. Examples in specs/: 4 to 10. Default 0.
     */
    siding_mass_kg: number;
    /**
     * Height of the siding’s centre of mass above the floor top, in mm; it stands centred over the floor. Examples in specs/: 350 to 420. Default 450 (an assumption for a waist-high screen; replace with your own).
     */
    siding_height_mm: number;
    /**
     * Measured mass of the whole box (frame, straps, siding), in kg, weighed off the axle; overrides the computed mass. Typically 10 to 40 (from memory).
     */
    mass_kg?: number;
  };
  /**
   * The axle: rectangular (width_mm and height_mm) or round (diameter_mm); give exactly one of the two forms.
   */
  axle: {
    /**
     * Where the axle’s centre line is, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line): 0 puts it under the rear edge of the floor, half the floor depth under the middle. Examples in specs/: 0 to 450.
     */
    x_mm: number;
    /**
     * Timber of the axle: a species id from rules/materials/species.yaml (the drop-down lists every one).
     */
    species: string;
    /**
     * Overall length of the axle, in mm, end to end, the arms that pass through the naves included. Examples in specs/: 1500 to 2100.
     */
    length_mm: number;
    /**
     * Width of a rectangular axle, front to back, in mm, at the middle (give with height_mm, or give diameter_mm instead). Examples in specs/: 65 to 80.
     */
    width_mm?: number;
    /**
     * Depth of a rectangular axle, vertical, in mm, at the middle (give with width_mm, or give diameter_mm instead). Examples in specs/: 65 to 80.
     */
    height_mm?: number;
    /**
     * Diameter of a round axle, in mm, at the middle: give instead of width_mm and height_mm. Examples in specs/: 65 to 66.
     */
    diameter_mm?: number;
    /**
     * Distance between the box’s two bearings on the axle, in mm: centre to centre of where the box (or its under-frame) rests on the axle. Examples in specs/: 600 to 1000.
     */
    bearing_span_mm: number;
    /**
     * Measured mass of the axle, in kg, weighed on its own; overrides the computed mass. Typically 4 to 15 (from memory).
     */
    mass_kg?: number;
    grade?: CheckedGrade;
    /**
     * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
     */
    grain_slope_deg: number;
  };
  /**
   * The two wheels, alike: size, spacing, nave, spokes, felloe and tyre.
   */
  wheels: {
    /**
     * Overall diameter of a wheel, in mm, over the tyre: across the wheel through the nave’s centre. Examples in specs/: 900 to 950.
     */
    diameter_mm: number;
    /**
     * Distance between the wheels’ mid-planes, in mm: centre to centre of the two tyres where they meet the ground. Examples in specs/: 1200 to 1640.
     */
    track_mm: number;
    /**
     * Spokes in each wheel, a whole number. Examples in specs/: 4 to 12.
     */
    spokes: number;
    /**
     * The nave (hub): the turned block the spokes are set in and the axle arm turns in.
     */
    nave: {
      /**
       * Timber of the naves: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Length of the nave along the axle, in mm, from its inner face to its outer face. Examples in specs/: 200 to 440.
       */
      length_mm: number;
      /**
       * Outside diameter of the nave, in mm, where the spokes enter it. Examples in specs/: 120 to 160.
       */
      diameter_mm: number;
      /**
       * Diameter of the hole through the nave that the axle arm turns in, in mm. Examples in specs/: 62 to 76.
       */
      bore_mm: number;
    };
    /**
     * The spokes, all alike.
     */
    spoke: {
      /**
       * Timber of the spokes: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Width of a spoke’s section, in mm, at mid-length, as seen from the side of the wheel (in the wheel’s plane). Examples in specs/: 28 to 36.
       */
      width_mm: number;
      /**
       * Thickness of a spoke’s section, in mm, at mid-length, along the axle (across the wheel’s plane). Examples in specs/: 25 to 30.
       */
      thickness_mm: number;
      grade?: CheckedGrade;
      /**
       * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
       */
      grain_slope_deg: number;
    };
    /**
     * The felloe: the wooden rim, in one or more bent or sawn pieces.
     */
    felloe: {
      /**
       * Timber of the felloes: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Radial depth of the rim, in mm: from its inner face (where the spokes enter) to its outer face (under the tyre). Examples in specs/: 45 to 54.
       */
      depth_mm: number;
      /**
       * Axial width of the rim, in mm: across its running face, side to side. Examples in specs/: 25 to 48.
       */
      width_mm: number;
      /**
       * Pieces the rim is made of, a whole number: 1 for a single steam-bent hoop, more for several bent lengths or sawn segments. Examples in specs/: 1 to 2.
       */
      pieces: number;
      /**
       * Inner radius of a steam-bent felloe, in mm: half the rim’s inside diameter. Omit for sawn segments. Examples in specs/: 397 to 430.
       */
      bend_radius_mm?: number;
      grade?: CheckedGrade;
      /**
       * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
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
         * Dowels or tenons across each joint, a whole number. Examples in specs/: 2 to 3. Default 2 (assumed).
         */
        count: number;
        /**
         * Diameter of each dowel or round tenon, in mm. Examples in specs/: 16. Default 12 (assumed).
         */
        diameter_mm: number;
        /**
         * A tenon’s length into the next felloe, in mm (tenons only). Typically 40 to 80 (from memory). Default 60 (assumed).
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
       * Axial width of the tyre, in mm, across its running face. Examples in specs/: 25 to 30.
       */
      width_mm?: number;
      /**
       * Radial thickness of the tyre, in mm, at the tread; the felloe lies inside it. Examples in specs/: 5 to 8.
       */
      thickness_mm?: number;
      /**
       * The compression a tyre shrunk on (hot iron, or hide put on wet) leaves in each spoke, in N. Where given, the felloe ring model treats the spokes as staying in compression. Examples in specs/: 300 to 1000. Omit where unknown.
       */
      pre_compression_N?: number;
    };
    /**
     * Measured mass of one wheel, in kg, weighed off the axle; overrides the computed mass. Typically 5 to 15 (from memory).
     */
    mass_kg?: number;
  };
  /**
   * The draught pole: fixed under the floor, out through the front of the box, and rising to the yoke.
   */
  pole: {
    /**
     * Timber of the pole: a species id from rules/materials/species.yaml (the drop-down lists every one).
     */
    species: string;
    /**
     * Width of the pole’s section, side to side, in mm, where it leaves the box. Examples in specs/: 60 to 64.
     */
    width_mm: number;
    /**
     * Depth of the pole’s section, vertical, in mm, where it leaves the box. Examples in specs/: 60 to 72.
     */
    height_mm: number;
    /**
     * Where the pole’s rear end is fixed under the floor, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line). Examples in specs/: 0.
     */
    rear_x_mm: number;
    /**
     * Where the pole leaves the box, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line): usually at the front rail. Examples in specs/: 440 to 900.
     */
    root_x_mm: number;
    /**
     * The yoke’s bearing point on the pole, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line). Examples in specs/: 2600 to 2950.
     */
    yoke_x_mm: number;
    /**
     * Height of the yoke’s bearing point above level ground, in mm (z), the horses standing in harness. Examples in specs/: 1050 to 1300.
     */
    yoke_height_mm: number;
    /**
     * Radius of the steam bend where the pole rises to the yoke, in mm, on the pole’s centre line; omit for a straight rise. Examples in specs/: 1000 to 1500.
     */
    bend_radius_mm?: number;
    /**
     * Measured mass of the pole, in kg; overrides the computed mass. Typically 4 to 15 (from memory).
     */
    mass_kg?: number;
    grade?: CheckedGrade;
    /**
     * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
     */
    grain_slope_deg: number;
    /**
     * True when the pole is bent against a supporting strap (a steel strap along the outer face, with end stops); selects which of the species’ two steam-bending limits applies. Default true.
     */
    bend_strap: boolean;
  };
  /**
   * The yoke: the cross-bar over the horses’ necks that the pole bears on.
   */
  yoke: {
    /**
     * Timber of the yoke: a species id from rules/materials/species.yaml (the drop-down lists every one).
     */
    species: string;
    /**
     * Overall length of the yoke, end to end, in mm. Examples in specs/: 1000 to 1150.
     */
    length_mm: number;
    /**
     * Width of the yoke’s section, front to back, in mm, at the middle. Examples in specs/: 50 to 56.
     */
    width_mm: number;
    /**
     * Depth of the yoke’s section, vertical, in mm, at the middle. Examples in specs/: 50 to 55.
     */
    height_mm: number;
    /**
     * Centre to centre of the two necks, in mm, along the yoke: where the neck saddles (or bows) sit. Examples in specs/: 600 to 720.
     */
    neck_spacing_mm: number;
    /**
     * Measured mass of the yoke, in kg; overrides the computed mass. Examples in specs/: 4.2.
     */
    mass_kg?: number;
    grade?: CheckedGrade;
    /**
     * Slope of grain, in degrees: the angle between the grain and the length of the part, read from the run of the grain on a face (follow a surface check, or ink drawn along the grain; a slope of 1 in 10 is 5.7). Reduces strength and stiffness by Hankinson’s formula. Typically 0 to 3 for straight, riven stock (from memory). Default 0 (straight grain).
     */
    grain_slope_deg: number;
  };
  /**
   * The woven floor: leather or rawhide straps stretched across the frame.
   */
  floor_straps: {
    /**
     * Leather of the straps: a leather or rawhide id from rules/materials/leathers.yaml.
     */
    material: string;
    /**
     * Width of one strap, in mm, laid flat. Examples in specs/: 12 to 30.
     */
    width_mm: number;
    /**
     * Thickness of one strap, in mm, taken with calipers on the dry strap. Examples in specs/: 4 to 12.
     */
    thickness_mm: number;
    /**
     * Centre-to-centre spacing of the straps, in mm: measure across ten and divide by ten. Examples in specs/: 25 to 40.
     */
    pitch_mm: number;
    /**
     * How the straps run: two-way (a lattice, front to back and side to side), front-to-back only, or side-to-side only.
     */
    weave: 'two-way' | 'front-to-back' | 'side-to-side';
    /**
     * Tension in each strap before loading, in N; the builder’s estimate (a spring balance on one strap as it is laced gives it). Examples in specs/: 60. Default 150 (from memory).
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
       * Stiffness k = M (2 pi f_n)^2 from the test, in N/mm, for the record and for comparison with the strap-floor model; the ride model keeps the floor stiffness the cable-net solver computes for the crew’s own load.
       */
      stiffness_N_per_mm?: number;
      /**
       * Where the numbers come from: the test's date, the sample, the mass and the drop height, or the report file.
       */
      source: string;
    };
  };
  /**
   * The leather lashings that bind the joints: one entry per lashed joint.
   *
   * @maxItems 20
   */
  lashings: {
    /**
     * The joint the lashing binds: pole-to-axle, pole-to-yoke, pole-to-floor, axle-to-floor, frame-corners or siding-to-frame.
     */
    joint: 'pole-to-axle' | 'pole-to-yoke' | 'pole-to-floor' | 'axle-to-floor' | 'frame-corners' | 'siding-to-frame';
    /**
     * Leather of the lashing: a leather or rawhide id from rules/materials/leathers.yaml.
     */
    material: string;
    /**
     * Width of the lashing strap, in mm, laid flat. Examples in specs/: 14 to 18.
     */
    width_mm: number;
    /**
     * Thickness of the lashing strap, in mm. Examples in specs/: 3 to 4.
     */
    thickness_mm: number;
    /**
     * Wraps of the strap round the joint, a whole number: count the strands that cross one face. Examples in specs/: 12 to 20.
     */
    wraps: number;
    /**
     * Pull on each wrap as laid, in N; the builder’s estimate. Examples in specs/: 150. Default 100 (from memory).
     */
    pretension_N: number;
    /**
     * Full turns each end of the strap makes round a member before it is tucked, a count (halves allowed); checked against the capstan equation. Examples in specs/: 2. Omit to be told how many are needed.
     */
    anchor_turns?: number;
  }[];
  /**
   * The people aboard, one entry each, placed where they stand as driven.
   *
   * @minItems 1
   * @maxItems 4
   */
  crew: {
    /**
     * Driver, passenger, archer...; unique within the crew (text).
     */
    role: string;
    /**
     * Mass of the person dressed and equipped as they ride, in kg, weighed. Examples in specs/: 65 to 80.
     */
    mass_kg: number;
    /**
     * Where the person’s centre of mass stands, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line): about over the middle of their feet. Examples in specs/: 220 to 400.
     */
    x_mm: number;
    /**
     * Where the person’s centre of mass stands, in mm to the left of the centre line (y; negative to the right, looking forward). Examples in specs/: -210 to 210.
     */
    y_mm: number;
    /**
     * Centre of mass above the floor top, in mm, the person standing braced. Examples in specs/: 960. Default 1000 (from memory: a standing adult’s centre of mass is a little above half their height).
     */
    cg_height_mm: number;
  }[];
  /**
   * Things carried (water, weapons, baggage), one entry each, each a mass at a point.
   *
   * @maxItems 50
   */
  loads: {
    /**
     * What the load is (text).
     */
    name: string;
    /**
     * Mass of the load, in kg, weighed. Examples in specs/: 4.
     */
    mass_kg: number;
    /**
     * Where its centre of mass is, in mm forward from the rear edge of the floor (x; the inside face of the frame’s rear rail, along the centre line). Examples in specs/: 480.
     */
    x_mm: number;
    /**
     * Where its centre of mass is, in mm to the left of the centre line (y; negative to the right). Examples in specs/: 0. Default 0 (on the centre line).
     */
    y_mm: number;
    /**
     * Height of its centre of mass above level ground, in mm (z). Examples in specs/: 760.
     */
    z_mm: number;
  }[];
  /**
   * The horses. Give the lightest horse's mass one way, exactly: horse_mass_kg (weighed), or horse.girth_cm with horse.body_length_cm (a tape), or horse.type with horse.height_m (a preset band from rules/parameters/horses.yaml, whose low end the checks use).
   */
  team: {
    /**
     * Horses in the team, a whole number. Examples in specs/: 2.
     */
    horses: number;
    /**
     * Mass of the lightest horse in the team, in kg, weighed on a livestock scale. Examples in specs/: 300 to 430. Give this, or team.horse’s girth and length, or its type and height.
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
       * Height at the withers, in m, measured with a measuring stick, the horse standing square on level ground (one hand is 0.1016 m: 11 hands is 1.12 m). Examples in specs/: 1.12. Give type with it.
       */
      height_m?: number;
      /**
       * Girth round the barrel just behind the withers and elbows, in cm, the tape snug. Typically 140 to 200 for a light horse (from memory). Give body_length_cm with it.
       */
      girth_cm?: number;
      /**
       * Body length from the point of the shoulder to the point of the buttock, in cm, along the horse’s side. Typically 130 to 180 for a light horse (from memory). Give girth_cm with it.
       */
      body_length_cm?: number;
    };
  };
  /**
   * How the chariot is driven: speed, turns, ground, and the design events the checks use.
   */
  operation: {
    /**
     * Design speed, in km/h: the fastest the chariot is driven. A trot is about 10 to 15, a canter 20 to 30, a gallop 35 to 50 (from memory). Examples in specs/: 18 to 38.
     */
    speed_kmh: number;
    /**
     * Tightest planned turn, in m: the radius of the path of the yoke (the horses’ necks); pace out the turn’s width and halve it. Examples in specs/: 10 to 40.
     */
    turn_radius_m: number;
    /**
     * Design forward acceleration, in g (standard gravity). Examples in specs/: 0.2. Default 0.2 (from memory).
     */
    acceleration_g: number;
    /**
     * Design braking deceleration as a positive number, in g (standard gravity). Examples in specs/: 0.3. Default 0.3 (from memory).
     */
    braking_g: number;
    /**
     * Height of the design stone (or rut edge) struck at the design speed, in mm: the ride model’s accidental stone-strike case. Examples in specs/: 15 to 30. Default 30 (from memory).
     */
    bump_height_mm: number;
    /**
     * Length along the track of the design stone (a raised-cosine hump), in mm, for the ride model’s stone-strike case. Typically 100 to 400 (from memory). Default 200 (from memory: a stone or a rut edge).
     */
    bump_length_mm: number;
    /**
     * The routine rough ground driven over at the design speed (a raised-cosine ridge of soil, sod or ruts): the ride model's rough-ground case, whose dynamic factors feed the strength checks. Default: the ground type's rough_ground in rules/grounds.yaml.
     */
    rough_ground?: {
      /**
       * Height of the ridge, in mm. Examples in specs/: 10.
       */
      height_mm: number;
      /**
       * Length of the ridge along the track, in mm; at least 500 (shorter is struck, not ridden over: give it as the stone, bump_height_mm and bump_length_mm). Examples in specs/: 1000.
       */
      length_mm: number;
    };
    /**
     * Height the ride model’s drop test releases the chariot from, in mm, every point above its standing position. Typically 300 to 1000 (from memory). Default 500 (from memory).
     */
    drop_height_mm: number;
    /**
     * The steepest sustained grade the build is driven up, in per cent (rise over distance × 100): the draught check’s design grade. Typically 0 to 10 on roads and tracks (from memory). Default: draught.pull’s default_grade_pct in rules/limits/draught.yaml.
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
  /**
   * The timber to cut the parts from, and how it is cut: for the cut list and the stock plan.
   */
  stock: {
    /**
     * Grade of the stock for this part: selected (hand-selected, straight-grained, riven or clear) or sawn (sawn with small defects). Default: stock.grade.
     */
    grade: 'selected' | 'sawn';
    /**
     * The saw’s kerf: the width of the cut a saw blade makes, in mm, which the stock plan leaves between parts cut from one piece. Measure a trial cut across its width. Typically 1.5 to 4 (from memory). Default 3.
     */
    kerf_mm: number;
    /**
     * What is left on each rough part for planing and trimming.
     */
    allowance: {
      /**
       * Machining allowance per face, in mm: what planing takes off each face of a rough-sawn part. Typically 2 to 5 (common practice). Default 3 (common practice).
       */
      face_mm: number;
      /**
       * Machining allowance per end, in mm: cut off each end to square it and lose end checks. Typically 10 to 50 (common practice). Default 25 (common practice).
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
     * Timber you have or can buy, one entry per size: the stock plan cuts the parts from it.
     *
     * @maxItems 30
     */
    lumber: {
      /**
       * Timber of these boards: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Width of the boards as sawn, in mm. Examples in specs/: 75 to 175.
       */
      width_mm: number;
      /**
       * Thickness of the boards as sawn, in mm. Examples in specs/: 60 to 175.
       */
      thickness_mm: number;
      /**
       * The lengths to be had, in mm, separated by semicolons in one cell (2400; 3000; 3600). Examples in specs/: 900 to 3600.
       *
       * @minItems 1
       * @maxItems 20
       *
       * Items: A length in the unit of its key; a string with another unit is converted.
       */
      lengths_mm: number[];
      /**
       * Price per cubic metre, in your own currency; the stock plan totals the cost. Examples in specs/: 1350 to 1700.
       */
      price_per_m3?: number;
    }[];
    /**
     * Further timber parts to cut (siding rails, hand-holds, spares), listed for the cut list and stock plan only: their mass is not in the mass model (give it under loads or in box.siding_mass_kg).
     *
     * @maxItems 50
     */
    extra_parts: {
      /**
       * What the part is (text).
       */
      name: string;
      /**
       * Timber of the part: a species id from rules/materials/species.yaml (the drop-down lists every one).
       */
      species: string;
      /**
       * Finished length of the part, in mm, as drawn.
       */
      length_mm: number;
      /**
       * Finished width of the part, in mm, as drawn.
       */
      width_mm: number;
      /**
       * Finished thickness of the part, in mm, as drawn.
       */
      thickness_mm: number;
      /**
       * How many to cut, a whole number. Default 1.
       */
      quantity: number;
      grade?: CheckedGrade;
      /**
       * As stock.orientation, for this part; default: stock.orientation.
       */
      orientation?: 'flat-sawn' | 'quarter-sawn';
    }[];
  };
}
