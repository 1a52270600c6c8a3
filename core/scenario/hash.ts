/**
 * A short, stable hash of the normalised inputs, printed on results and reports so a result can be
 * reproduced: equal inputs give equal hashes; any change of a physical input changes it. Keys are
 * sorted before hashing so field order in the file does not matter. FNV-1a in two 32-bit lanes over the
 * canonical JSON text of the inputs; an identifier, not a security measure.
 *
 * Study loops hash every run, so the canonical text is fed to the hash piece by piece as it is written
 * instead of being joined into one string first; the hash is that of the joined text.
 */
import type { Scenario } from "./types";

/** Two FNV-1a lanes: offset bases 0x811c9dc5 and 0x050c5d1f, prime 0x01000193, over UTF-16 code units. */
class Fnv64 {
  private h0 = 0x811c9dc5;
  private h1 = 0x050c5d1f;

  feed(text: string): void {
    let h0 = this.h0;
    let h1 = this.h1;
    for (let i = 0; i < text.length; i++) {
      const c = text.charCodeAt(i);
      h0 = Math.imul(h0 ^ c, 0x01000193);
      h1 = Math.imul(h1 ^ (c + 0x9e37), 0x01000193);
    }
    this.h0 = h0;
    this.h1 = h1;
  }

  hex(): string {
    return (this.h1 >>> 0).toString(16).padStart(8, "0") + (this.h0 >>> 0).toString(16).padStart(8, "0");
  }
}

// `"key":` for each member name: scenarios use a few dozen names over and over (bounded, in case of
// free-form keys).
const quotedKeys = new Map<string, string>();
const QUOTED_KEYS_MAX = 4096;

function quotedKey(k: string): string {
  let q = quotedKeys.get(k);
  if (q === undefined) {
    q = `${JSON.stringify(k)}:`;
    if (quotedKeys.size < QUOTED_KEYS_MAX) quotedKeys.set(k, q);
  }
  return q;
}

/**
 * Feeds the canonical JSON of `v` to `out`: object keys sorted, undefined members left out, anything
 * else JSON cannot write (undefined, NaN, ±Infinity) as null.
 */
function feedCanonical(v: unknown, out: Fnv64): void {
  if (typeof v === "number") {
    out.feed(Number.isFinite(v) ? String(v) : "null"); // what JSON.stringify writes for a number
    return;
  }
  if (v === null || typeof v !== "object") {
    out.feed(JSON.stringify(v) ?? "null");
    return;
  }
  if (Array.isArray(v)) {
    out.feed("[");
    for (let i = 0; i < v.length; i++) {
      if (i > 0) out.feed(",");
      if (i in v) feedCanonical(v[i], out); // a hole writes nothing, as Array.prototype.join does
    }
    out.feed("]");
    return;
  }
  const o = v as Record<string, unknown>;
  out.feed("{");
  let first = true;
  for (const k of Object.keys(o).sort()) {
    const member = o[k];
    if (member === undefined) continue;
    if (!first) out.feed(",");
    out.feed(quotedKey(k));
    feedCanonical(member, out);
    first = false;
  }
  out.feed("}");
}

export function hashText(text: string): string {
  const h = new Fnv64();
  h.feed(text);
  return h.hex();
}

/** Hash of everything that affects results: the normalised scenario without its display name. */
export function inputsHash(s: Scenario): string {
  const { name: _name, description: _d, conversions: _c, conversionWarnings: _w, ...rest } = s;
  // Which fields a case sets itself matters to later overrides, not to this scenario's results.
  const physics = { ...rest, ambientCases: rest.ambientCases.map(({ sets: _s, ...c }) => c) };
  const h = new Fnv64();
  feedCanonical(physics, h);
  return h.hex().slice(0, 12);
}
