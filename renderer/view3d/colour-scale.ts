/**
 * The dilution colour scale: a computed, perceptually uniform ramp from deep blue-violet (low dilution,
 * strong brine) through teal to pale yellow (high dilution). It is a straight line in lightness and a
 * smooth turn in hue in the OKLab space, with chroma limited to what sRGB can show, so equal steps in
 * dilution (on a log axis) look like equal steps in colour and the ramp reads correctly in greyscale.
 *
 * OKLab: Ottosson, B. (2020) "A perceptual color space for image processing" (published matrices).
 * sRGB transfer function: IEC 61966-2-1:1999.
 */

export type Rgb = readonly [number, number, number]; // each 0–1, gamma-encoded sRGB

const L_LOW = 0.3;
const L_HIGH = 0.93;
const HUE_LOW = 290; // degrees in OKLCh: blue-violet
const HUE_HIGH = 100; // degrees in OKLCh: yellow
const CHROMA_TARGET = 0.15;

export function oklabToLinearSrgb(L: number, a: number, b: number): Rgb {
  const l = (L + 0.3963377774 * a + 0.2158037573 * b) ** 3;
  const m = (L - 0.1055613458 * a - 0.0638541728 * b) ** 3;
  const s = (L - 0.0894841775 * a - 1.291485548 * b) ** 3;
  return [
    4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s,
    -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s,
    -0.0041960863 * l - 0.7034186147 * m + 1.707614701 * s,
  ];
}

export function linearSrgbToOklab(r: number, g: number, b: number): [number, number, number] {
  const l = Math.cbrt(0.4122214708 * r + 0.5363137492 * g + 0.0514459929 * b);
  const m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
  const s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
  return [
    0.2104542553 * l + 0.793617785 * m - 0.0040720468 * s,
    1.9779984951 * l - 2.428592205 * m + 0.4505937099 * s,
    0.0259040371 * l + 0.7827717662 * m - 0.808675766 * s,
  ];
}

export function srgbEncode(linear: number): number {
  return linear <= 0.0031308 ? 12.92 * linear : 1.055 * linear ** (1 / 2.4) - 0.055;
}

export function srgbDecode(encoded: number): number {
  return encoded <= 0.04045 ? encoded / 12.92 : ((encoded + 0.055) / 1.055) ** 2.4;
}

function inGamut(rgb: Rgb): boolean {
  const eps = 1e-6; // rounding slack of the published matrices
  return rgb.every((c) => c >= -eps && c <= 1 + eps);
}

/** OKLab coordinates of the ramp at t in [0, 1] (before any gamut limit). */
function rampLch(t: number): { L: number; C: number; h: number } {
  const u = Math.min(1, Math.max(0, t));
  // Chroma eases off at both ends where sRGB cannot hold saturated very dark or very light colours.
  const C = CHROMA_TARGET * (0.55 + 0.45 * Math.sin(Math.PI * u));
  return { L: L_LOW + (L_HIGH - L_LOW) * u, C, h: HUE_LOW + (HUE_HIGH - HUE_LOW) * u };
}

/** OKLab point of the ramp at t, with chroma reduced (bisection) until the colour fits sRGB. */
export function rampOklab(t: number): [number, number, number] {
  const { L, C, h } = rampLch(t);
  const rad = (h * Math.PI) / 180;
  const at = (c: number): [number, number, number] => [L, c * Math.cos(rad), c * Math.sin(rad)];
  let [lo, hi] = [0, C];
  if (inGamut(oklabToLinearSrgb(...at(hi)))) return at(hi);
  for (let i = 0; i < 30; i++) {
    const mid = (lo + hi) / 2;
    if (inGamut(oklabToLinearSrgb(...at(mid)))) lo = mid;
    else hi = mid;
  }
  return at(lo);
}

/** sRGB colour (gamma-encoded, 0–1) of the ramp at t in [0, 1]. */
export function rampColour(t: number): Rgb {
  const linear = oklabToLinearSrgb(...rampOklab(t));
  return [0, 1, 2].map((i) => srgbEncode(Math.min(1, Math.max(0, linear[i])))) as unknown as Rgb;
}

export function rgbToHex(rgb: Rgb): string {
  return (
    "#" +
    rgb
      .map((c) =>
        Math.round(Math.min(1, Math.max(0, c)) * 255)
          .toString(16)
          .padStart(2, "0"),
      )
      .join("")
  );
}

/** A dilution domain [low, high] on a log axis, widened to round numbers (1, 2, 5 × 10ⁿ). */
export interface DilutionDomain {
  readonly low: number;
  readonly high: number;
}

function niceBelow(value: number): number {
  const exp = Math.floor(Math.log10(value));
  const base = 10 ** exp;
  for (const f of [5, 2, 1]) if (f * base <= value) return f * base;
  return base;
}

function niceAbove(value: number): number {
  const exp = Math.floor(Math.log10(value));
  const base = 10 ** exp;
  for (const f of [1, 2, 5, 10]) if (f * base >= value) return f * base;
  return 10 * base;
}

export function dilutionDomain(values: readonly number[]): DilutionDomain {
  const finite = values.filter((v) => Number.isFinite(v) && v > 0);
  const low = Math.max(1, finite.length ? Math.min(...finite) : 1);
  let high = finite.length ? Math.max(...finite) : 10;
  if (high <= low * 1.5) high = low * 10; // a flat field still gets a readable scale
  return { low: niceBelow(low), high: niceAbove(high) };
}

/** Position of a dilution on the scale, 0–1 (log axis, clamped). */
export function dilutionToUnit(dilution: number, domain: DilutionDomain): number {
  if (!(dilution > 0)) return 0;
  const t = Math.log(dilution / domain.low) / Math.log(domain.high / domain.low);
  return Math.min(1, Math.max(0, t));
}

export function dilutionColour(dilution: number, domain: DilutionDomain): Rgb {
  return rampColour(dilutionToUnit(dilution, domain));
}

/** Tick values for the legend: 1, 2, 5 × 10ⁿ inside the domain. */
export function dilutionTicks(domain: DilutionDomain): number[] {
  const ticks: number[] = [];
  for (let exp = Math.floor(Math.log10(domain.low)); exp <= Math.ceil(Math.log10(domain.high)); exp++) {
    for (const f of [1, 2, 5]) {
      const v = f * 10 ** exp;
      if (v >= domain.low * 0.999 && v <= domain.high * 1.001) ticks.push(v);
    }
  }
  return ticks;
}

/** CSS linear-gradient stops for a legend bar. */
export function rampGradientCss(direction = "to right", steps = 16): string {
  const stops = Array.from(
    { length: steps + 1 },
    (_, i) => `${rgbToHex(rampColour(i / steps))} ${((i / steps) * 100).toFixed(1)}%`,
  );
  return `linear-gradient(${direction}, ${stops.join(", ")})`;
}
