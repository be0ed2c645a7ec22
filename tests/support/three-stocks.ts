// The central-axle demo's first three stock sections (demo data): tests that
// need frame rails and naves left without stock patch the demo with these.
export const THREE_STOCKS = {
  stock: {
    lumber: [
      { species: 'white-ash', width_mm: 75, thickness_mm: 75, lengths_mm: [2400, 3000, 3600], price_per_m3: 1350 },
      { species: 'rock-elm', width_mm: 100, thickness_mm: 100, lengths_mm: [2400, 3000], price_per_m3: 1500 },
      { species: 'white-oak', width_mm: 75, thickness_mm: 75, lengths_mm: [1800, 2400], price_per_m3: 1600 },
    ],
  },
};
