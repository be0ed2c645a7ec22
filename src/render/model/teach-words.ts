// What each rule family checks, in plain words for an apprentice, with the
// formula it rests on. Our own short summaries of docs/design-basis.md: the
// section each family cites there sets the method out in full.

export interface FamilyLesson {
  /** What the family asks, and why, in a few sentences. */
  words: string;
  /** The formula, a line each, as the design basis writes it. */
  formula: string[];
}

export const LESSONS: Readonly<Record<string, FamilyLesson>> = {
  balance: {
    words:
      'The chariot stands on its two wheels and on the pole. Take moments about the points where the wheels touch the ground: a mass ahead of the axle puts load on the yoke, a mass behind it takes load off, and speeding up or braking moves load through the height of each mass. What is left is carried by the yoke on the horses\' necks. It must press down in every case, or the yoke rides up and jerks the horses, and each horse\'s share must stay a modest part of its own weight.',
    formula: ['R_pole = [ Σ m_i·g·(x_i − x_a) + m·a·(h_y − h_g) + c·m·g ] / (L + c)', 'R_yoke = R_pole + m_yoke·g, each horse carries R_yoke / n'],
  },
  draught: {
    words:
      'The team must be able to pull the loaded chariot up the steepest grade it will be driven on. The pull needed is the weight on the wheels times the soil\'s resistance, the hub\'s friction and the grade together. A team keeps up about a tenth of its body weight as a steady pull, and about a quarter for a short climb.',
    formula: ['P = W·(C_s + C_b + i)', 'steady pull of the team = k_n·m_horse·g / 10, short pull = k_n·m_horse·g / 4'],
  },
  turn: {
    words:
      'In a turn the chariot is pushed outwards. It slides if that push is more than the tyres\' grip, and it tips if the push, acting at the height of the centre of mass, outweighs the weight acting at half the track. The axle runs on a tighter circle than the yoke, and the outer wheel takes extra load.',
    formula: ['R_a = √(R_y² − L²), a_lat = v²·R_a / R_y²', 'tips at a_lat = g·SSF with SSF = t / (2·h_g); slides at a_lat = μ·g', 'load moved to the outer wheel ΔN = m·a_lat·h_g / t'],
  },
  floor: {
    words:
      'The floor is a net of straps stretched across the frame. Under the crew\'s feet the straps sag until their tension, pulling at a slant, holds the weight up: a tight net sags little but pulls hard on its ends and on the frame. The checks compare the strap tension with the strength of a laced strap end, the sag with its limit, and the room left above the pole and axle.',
    formula: ['one strap with a load P at mid-span: 2·T·sin θ = P', 'T = (T_0 + EA) / cos θ − EA'],
  },
  wheel: {
    words:
      'Wheels fail at their joints more often than in their timbers. The felloe joints pass shear and bending through their dowels, helped by friction where a tyre squeezes the joint; the spoke tenons bear on the nave; and the nave bears on the axle arm, where a side push at the rim becomes a lever about the hub.',
    formula: ['nave: M = F·r + N_w·e', 'R = N_w / 2 ± M / L_b, p = R_max / (d·l_zone)'],
  },
  member: {
    words:
      'Each timber part is a beam or a strut. Find the bending moment and the force from the loads of each load case, turn them into a stress on the part\'s section, and compare it with the design strength: the handbook\'s strength at its fifth percentile, graded for the stock, reduced for how long the load lasts and divided by the material factor. A long part in compression can buckle before it crushes, so a strut takes a buckling factor as well.',
    formula: ['f_k = f_mean·(1 − 1.645·COV), f_d = f_k·k_select·k_mod / γ_M', 'bending: σ_m = M / W, utilisation = σ_d / f_d', 'strut: N_d ≤ k_c·f_c,0,d·A·(1 − σ_m,d / f_m,d)'],
  },
  bend: {
    words:
      'A steam-bent part breaks on the form if it is bent too tight for its thickness. Each species has a least ratio of bend radius to thickness, smaller with a strap along the outside of the bend. The ratios are remembered, not read: make a trial bend.',
    formula: ['R / t ≥ (R / t)_min for the species, with or without a strap'],
  },
  lashing: {
    words:
      'Rawhide lashings hold the joints. A lashing must not break, the members must not slide on each other (the wraps clamp them together and friction holds them), and the strap\'s end must have enough turns to hold, as a rope round a post does.',
    formula: ['strength 2·n·b·t·f_d', 'slip resistance μ·2·n·T_pre', 'turns at the end ≥ ln(T / T_tail) / (2π·μ)'],
  },
  ride: {
    words:
      'Over rough ground, and when a wheel strikes a stone, the chariot bounces. A model of masses, springs and dampers (the wheels, the axle, the floor, the crew\'s legs, the yoke on the horses) is run through each case step by step in time. It tells how high the crew rise and whether they leave the floor, whether the yoke is pulled up off the necks, and how quickly the bouncing dies away.',
    formula: ['contact force F = k·δ + λ·δ·δ\' while touching, 0 while the gap is open', 'dynamic load factor = peak force / standing force'],
  },
  stock: {
    words:
      'The cut list adds allowances to each finished size (for planing the faces and trimming the ends, the bending form\'s ends on a steamed part, shrinkage for green wood) and orders spares for steam bending. The stock plan fits the rough lengths into the lengths on sale at the least cost, or in the fewest pieces, and says how far its plan may be from the best one.',
    formula: ['green work: S_M = S_0·(30 − M) / 30', 'spares = ceil(q / f_good) − q'],
  },
};
