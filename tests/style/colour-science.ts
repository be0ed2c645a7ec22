// Colour arithmetic for checking the palettes: relative luminance and
// contrast ratio (WCAG 2.x definitions), CIELAB lightness and distance (D65,
// CIE 1976), and the colour-vision-deficiency simulation of Machado, Oliveira
// and Fernandes (2009) at full severity, applied to linear sRGB. The
// simulation matrices are as published in that paper's supplementary table
// (from memory: not checked against the printed table here).

export type Rgb = [number, number, number];

export function hexRgb(hex: string): Rgb {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`not a #RRGGBB colour: ${hex}`);
  return [1, 2, 3].map((i) => parseInt(m[i], 16) / 255) as Rgb;
}

const linear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);

function linearRgb(hex: string): Rgb {
  return hexRgb(hex).map(linear) as Rgb;
}

const XYZ: Rgb[] = [
  [0.4124, 0.3576, 0.1805],
  [0.2126, 0.7152, 0.0722],
  [0.0193, 0.1192, 0.9505],
];
const WHITE: Rgb = [0.95047, 1, 1.08883];

const times = (m: Rgb[], v: Rgb): Rgb => m.map((row) => row[0] * v[0] + row[1] * v[1] + row[2] * v[2]) as Rgb;

/** Relative luminance Y of an sRGB colour. */
export function luminance(hex: string): number {
  return times(XYZ, linearRgb(hex))[1];
}

/** The contrast ratio of two colours, (L1 + 0.05) / (L2 + 0.05), lighter over darker. */
export function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

function lab(lin: Rgb): Rgb {
  const f = (t: number) => (t > (6 / 29) ** 3 ? Math.cbrt(t) : t / (3 * (6 / 29) ** 2) + 4 / 29);
  const [fx, fy, fz] = times(XYZ, lin).map((v, i) => f(v / WHITE[i]));
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}

/** CIELAB lightness L*: how light the colour prints in grey. */
export function lightness(hex: string): number {
  return lab(linearRgb(hex))[0];
}

export type Deficiency = 'protan' | 'deutan' | 'tritan';

const MACHADO: Record<Deficiency, Rgb[]> = {
  protan: [
    [0.152286, 1.052583, -0.204868],
    [0.114503, 0.786281, 0.099216],
    [-0.003882, -0.048116, 1.051998],
  ],
  deutan: [
    [0.367322, 0.860646, -0.227968],
    [0.280085, 0.672501, 0.047413],
    [-0.01182, 0.04294, 0.968881],
  ],
  tritan: [
    [1.255528, -0.076749, -0.178779],
    [-0.078411, 0.930809, 0.147602],
    [0.004733, 0.691367, 0.3039],
  ],
};

/** The CIE 1976 distance between two colours, as seen with normal vision or a full deficiency of one cone type. */
export function distance(a: string, b: string, as?: Deficiency): number {
  const seen = (hex: string) => {
    const lin = linearRgb(hex);
    return lab(as ? (times(MACHADO[as], lin).map((v) => Math.min(1, Math.max(0, v))) as Rgb) : lin);
  };
  const [p, q] = [seen(a), seen(b)];
  return Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
}
