/**
 * A short, stable hash of the normalised inputs, printed on results and reports so a result can be
 * reproduced: equal inputs give equal hashes; any change of a physical input changes it. Keys are
 * sorted before hashing so field order in the file does not matter. FNV-1a in two 32-bit lanes;
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
  // Two independent 32-bit FNV-1a lanes (offset bases 0x811c9dc5 and 0x050c5d1f, prime 0x01000193) over
  // the UTF-16 code units, with Math.imul: fast, and 64 bits of identifier.
  let h0 = 0x811c9dc5;
  let h1 = 0x050c5d1f;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h0 = Math.imul(h0 ^ c, 0x01000193);
    h1 = Math.imul(h1 ^ (c + 0x9e37), 0x01000193);
  }
  return (h1 >>> 0).toString(16).padStart(8, "0") + (h0 >>> 0).toString(16).padStart(8, "0");
}

/** Hash of everything that affects results: the normalised scenario without its display name. */
export function inputsHash(s: Scenario): string {
  const { name: _name, description: _d, conversions: _c, ...physics } = s;
  return hashText(canonical(physics)).slice(0, 12);
}
