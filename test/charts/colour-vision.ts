/**
 * Test-only colour arithmetic for checking the chart palette: simulation of
 * the common colour-vision deficiencies, CIEDE2000 colour difference and the
 * WCAG contrast ratio. Kept out of src/ because only the palette check needs it.
 */

type Rgb = readonly [number, number, number];
type Matrix = readonly [Rgb, Rgb, Rgb];

/**
 * Machado, Oliveira & Fernandes (2009), "A physiologically-based model for
 * simulation of color vision deficiency", IEEE TVCG 15(6), severity 1.0
 * matrices; they act on linear-light sRGB.
 */
export const deficiencies: Readonly<Record<'protanopia' | 'deuteranopia' | 'tritanopia', Matrix>> = {
  protanopia: [
    [0.152286, 1.052583, -0.204868],
    [0.114503, 0.786281, 0.099216],
    [-0.003882, -0.048116, 1.051998],
  ],
  deuteranopia: [
    [0.367322, 0.860646, -0.227968],
    [0.280085, 0.672501, 0.047413],
    [-0.01182, 0.04294, 0.968881],
  ],
  tritanopia: [
    [1.255528, -0.076749, -0.178779],
    [-0.078411, 0.930809, 0.147602],
    [0.004733, 0.691367, 0.3039],
  ],
};

/** `#rrggbb` to linear-light sRGB in [0, 1] (IEC 61966-2-1 transfer curve). */
export function linearRgb(hex: string): Rgb {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`not a #rrggbb colour: ${hex}`);
  const lin = (h: string | undefined): number => {
    const c = parseInt(h ?? '0', 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  return [lin(m[1]), lin(m[2]), lin(m[3])];
}

export function simulate(rgb: Rgb, matrix: Matrix): Rgb {
  const clamp = (x: number): number => Math.min(1, Math.max(0, x));
  const row = (r: Rgb): number => clamp(r[0] * rgb[0] + r[1] * rgb[1] + r[2] * rgb[2]);
  return [row(matrix[0]), row(matrix[1]), row(matrix[2])];
}

/** WCAG 2.x relative luminance and contrast ratio. */
export function contrastRatio(a: Rgb, b: Rgb): number {
  const y = (c: Rgb): number => 0.2126 * c[0] + 0.7152 * c[1] + 0.0722 * c[2];
  const [hi, lo] = [Math.max(y(a), y(b)), Math.min(y(a), y(b))];
  return (hi + 0.05) / (lo + 0.05);
}

/** Linear sRGB to CIELAB under D65 (sRGB matrix, CIE 1976 L*a*b*). */
export function lab(rgb: Rgb): Rgb {
  const [r, g, b] = rgb;
  const x = (0.4124564 * r + 0.3575761 * g + 0.1804375 * b) / 0.95047;
  const y = 0.2126729 * r + 0.7151522 * g + 0.072175 * b;
  const z = (0.0193339 * r + 0.119192 * g + 0.9503041 * b) / 1.08883;
  const f = (t: number): number => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27 * t + 16) / 116);
  return [116 * f(y) - 16, 500 * (f(x) - f(y)), 200 * (f(y) - f(z))];
}

/**
 * CIEDE2000 colour difference, following Sharma, Wu & Dalal (2005), "The
 * CIEDE2000 color-difference formula: implementation notes, supplementary
 * test data, and mathematical observations", Color Res. Appl. 30(1), eqs. 1-22.
 */
export function deltaE2000(p: Rgb, q: Rgb): number {
  const [l1, a1, b1] = p;
  const [l2, a2, b2] = q;
  const deg = Math.PI / 180;
  const cBar = (Math.hypot(a1, b1) + Math.hypot(a2, b2)) / 2;
  const g = 0.5 * (1 - Math.sqrt(cBar ** 7 / (cBar ** 7 + 25 ** 7)));
  const a1p = (1 + g) * a1;
  const a2p = (1 + g) * a2;
  const c1p = Math.hypot(a1p, b1);
  const c2p = Math.hypot(a2p, b2);
  const hue = (b: number, a: number): number => {
    if (a === 0 && b === 0) return 0;
    const h = Math.atan2(b, a) / deg;
    return h < 0 ? h + 360 : h;
  };
  const h1p = hue(b1, a1p);
  const h2p = hue(b2, a2p);
  const dLp = l2 - l1;
  const dCp = c2p - c1p;
  let dhp = 0;
  if (c1p * c2p !== 0) {
    dhp = h2p - h1p;
    if (dhp > 180) dhp -= 360;
    else if (dhp < -180) dhp += 360;
  }
  const dHp = 2 * Math.sqrt(c1p * c2p) * Math.sin((dhp / 2) * deg);
  const lBarP = (l1 + l2) / 2;
  const cBarP = (c1p + c2p) / 2;
  let hBarP = h1p + h2p;
  if (c1p * c2p !== 0) {
    if (Math.abs(h1p - h2p) <= 180) hBarP /= 2;
    else hBarP = h1p + h2p < 360 ? (hBarP + 360) / 2 : (hBarP - 360) / 2;
  }
  const t =
    1 -
    0.17 * Math.cos((hBarP - 30) * deg) +
    0.24 * Math.cos(2 * hBarP * deg) +
    0.32 * Math.cos((3 * hBarP + 6) * deg) -
    0.2 * Math.cos((4 * hBarP - 63) * deg);
  const dTheta = 30 * Math.exp(-(((hBarP - 275) / 25) ** 2));
  const rc = 2 * Math.sqrt(cBarP ** 7 / (cBarP ** 7 + 25 ** 7));
  const sl = 1 + (0.015 * (lBarP - 50) ** 2) / Math.sqrt(20 + (lBarP - 50) ** 2);
  const sc = 1 + 0.045 * cBarP;
  const sh = 1 + 0.015 * cBarP * t;
  const rt = -Math.sin(2 * dTheta * deg) * rc;
  return Math.sqrt((dLp / sl) ** 2 + (dCp / sc) ** 2 + (dHp / sh) ** 2 + rt * (dCp / sc) * (dHp / sh));
}
