/**
 * A short, stable hash of the normalised inputs, printed on results and reports so a result can be
 * reproduced: equal inputs give equal hashes; any change of a physical input changes it. Keys are
 * sorted before hashing so field order in the file does not matter. FNV-1a in two 32-bit lanes;
 * an identifier, not a security measure.
 */
import type { Scenario } from "./types";

// Study loops hash a new scenario every run, yet most of it (diffuser, limits, options) is the same frozen
// objects run after run: the canonical text of an object frozen all the way down is remembered per object.
const frozenText = new WeakMap<object, string>();
// Set by each call of canonical(): whether the value just written is frozen all the way down.
let deepFrozen = true;

function canonical(v: unknown): string {
  if (v === null || typeof v !== "object") {
    deepFrozen = true;
    return JSON.stringify(v) ?? "null";
  }
  const known = frozenText.get(v);
  if (known !== undefined) {
    deepFrozen = true;
    return known;
  }
  let frozen = Object.isFrozen(v);
  let text: string;
  if (Array.isArray(v)) {
    text = `[${v
      .map((e) => {
        const t = canonical(e);
        frozen &&= deepFrozen;
        return t;
      })
      .join(",")}]`;
  } else {
    const o = v as Record<string, unknown>;
    const parts: string[] = [];
    for (const k of Object.keys(o).sort()) {
      if (o[k] === undefined) continue;
      parts.push(`${JSON.stringify(k)}:${canonical(o[k])}`);
      frozen &&= deepFrozen;
    }
    text = `{${parts.join(",")}}`;
  }
  if (frozen) frozenText.set(v, text);
  deepFrozen = frozen;
  return text;
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
