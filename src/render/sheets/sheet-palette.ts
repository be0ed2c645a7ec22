// The workbooks' own neutral colours (docs/style.md): chosen in CIELAB for
// their lightness, so that header, caution, label and input cells stay
// apart when printed in grey, and text on each keeps a contrast of 7:1 or more.

/** Table header cells: a cool light grey. */
export const HEADER_FILL = '#D2DBE3';
/** The caution line: a pale sand fill under deep brown ink (8.3:1). */
export const CAUTION_FILL = '#FDEFDC';
export const CAUTION_INK = '#74331E';
/** Labels, help and computed cells of the fill-in sheets: a barely tinted grey. */
export const LABEL_FILL = '#EBEEF1';
/** Cells the user types into: a near-white cream inside an olive border, so they differ in shape as well as colour. */
export const INPUT_FILL = '#FCFAE8';
export const INPUT_EDGE = '#8B9056';
/** Quiet text, in italics (keys, defaults set apart): lighter than the body's black, yet 7.5:1 on the label grey. */
export const QUIET_INK = '#474C50';
