// Inputs a builder gives but can only estimate before the build exists: a
// verdict that hangs on one of them must say so even though it was given.
// (Common practice: these are the figures a workshop guesses at planning.)
const ESTIMATES: readonly RegExp[] = [
  /^crew\.\d+\.(mass_kg|x_mm|y_mm)$/,
  /^loads\.\d+\.(mass_kg|x_mm)$/,
  /^lashings\.\d+\.pretension_N$/,
  /^floor_straps\.pretension_N$/,
  /^wheels\.tyre\.pre_compression_N$/,
  /^team\.horse_mass_kg$/,
  /^team\.horse\.(height_m|girth_cm|body_length_cm)$/,
  /^(box|wheels|pole|yoke)\.mass_kg$/,
  /^moisture_content_pct$/,
];

export function builderEstimate(path: string): boolean {
  return ESTIMATES.some((re) => re.test(path));
}
