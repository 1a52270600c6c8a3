/**
 * A short, stable hash of the normalised inputs, printed on results and reports so a result can be
 * reproduced: equal inputs give equal hashes; any change of a physical input changes it. Keys are
 * sorted before hashing so field order in the file does not matter. FNV-1a, 64-bit (two 32-bit lanes);
 * an identifier, not a security measure.
 */
import type { Scenario } from "./types";

function canonical(v: unknown): string {
  if (v === null || typeof v !== "object") return JSON.stringify(v) ?? "null";
  if (Array.isArray(v)) return `[${v.map(canonical).join(",")}]`;
  const keys = Object.keys(v as object).sort();
  return `{${keys
    .filter((k) => (v as Record<string, unknown>)[k] !== undefined)
    .map((k) => `${JSON.stringify(k)}:${canonical((v as Record<string, unknown>)[k])}`)
    .join(",")}}`;
}

export function hashText(text: string): string {
  // FNV-1a 64-bit offset basis 0xcbf29ce484222325 and prime 0x100000001b3, in 32-bit halves.
  let h0 = 0x84222325;
  let h1 = 0xcbf29ce4;
  for (let i = 0; i < text.length; i++) {
    let c = text.charCodeAt(i);
    for (let b = 0; b < 2; b++) {
      h0 ^= c & 0xff;
      c >>>= 8;
      // multiply (h1:h0) by 0x100000001b3 = 2^40 + 0x1b3
      const lo = h0 * 0x1b3;
      const hi = h1 * 0x1b3 + (h0 << 8) + Math.floor(lo / 0x100000000);
      h0 = lo >>> 0;
      h1 = hi >>> 0;
    }
  }
  return (h1 >>> 0).toString(16).padStart(8, "0") + (h0 >>> 0).toString(16).padStart(8, "0");
}

/** Hash of everything that affects results: the normalised scenario without its display name. */
export function inputsHash(s: Scenario): string {
  const { name: _name, description: _d, conversions: _c, ...physics } = s;
  return hashText(canonical(physics)).slice(0, 12);
}
