/**
 * The inputs hash: FNV-1a (Fowler, Noll & Vo; offset basis 0x811c9dc5, prime 0x01000193, as published in
 * draft-eastlake-fnv, IETF) in two 32-bit lanes over the canonical JSON of the normalised inputs (keys
 * sorted, RFC 8259 text). Lane one is plain 32-bit FNV-1a, so its published test vectors apply
 * ("" → 811c9dc5, "a" → e40c292c, "foobar" → bf9cf968; vectors quoted from memory); the second lane is
 * the project's own.
 */
import { describe, it, expect } from "vitest";
import { hashText, inputsHash } from "../../../core/scenario/hash";
import type { Scenario } from "../../../core/scenario/types";
import { accepted, baseRaw, edited } from "./rule-fixtures";

/** Canonical JSON: keys sorted at every level, written by JSON.stringify (undefined members left out). */
function canonical(v: unknown): string {
  const sorted = (x: unknown): unknown => {
    if (Array.isArray(x)) return x.map(sorted);
    if (x === null || typeof x !== "object") return x;
    const o = x as Record<string, unknown>;
    return Object.fromEntries(
      Object.keys(o)
        .sort()
        .map((k) => [k, sorted(o[k])]),
    );
  };
  return JSON.stringify(sorted(v));
}

const asScenario = (o: Record<string, unknown>) => ({ ambientCases: [], ...o }) as unknown as Scenario;

describe("hashText", () => {
  it("has plain 32-bit FNV-1a in its low lane (published test vectors)", () => {
    expect(hashText("").slice(8)).toBe("811c9dc5");
    expect(hashText("a").slice(8)).toBe("e40c292c");
    expect(hashText("foobar").slice(8)).toBe("bf9cf968");
  });

  it("starts its high lane from 0x050c5d1f and pads both lanes to 8 hex digits", () => {
    expect(hashText("")).toBe("050c5d1f811c9dc5");
    // High lane: the same FNV-1a step over each code unit + 0x9e37 (evaluated independently in Python).
    expect(hashText("a")).toBe("7a17cd85e40c292c");
    expect(hashText("foobar")).toBe("29c49da6bf9cf968");
    for (const t of ["a", "foobar", "{}", "é", "x".repeat(1000)]) expect(hashText(t)).toMatch(/^[0-9a-f]{16}$/);
  });

  it("changes with every character, including the last, and with order", () => {
    expect(hashText("ab")).not.toBe(hashText("ba"));
    expect(hashText("abc")).not.toBe(hashText("abd"));
    expect(hashText("abc")).not.toBe(hashText("ab"));
    expect(hashText("a").slice(0, 8)).not.toBe(hashText("b").slice(0, 8));
  });
});

describe("inputsHash", () => {
  it("is the first 12 hex digits of the hash of the canonical JSON of the inputs", () => {
    const o = { b: 1, a: [true, null, "x", { d: 2.5, c: -3 }], e: { z: "é", y: 1e21 } };
    expect(inputsHash(asScenario(o))).toBe(hashText(canonical({ ambientCases: [], ...o })).slice(0, 12));
    const s = accepted(baseRaw());
    const { name: _n, description: _d, conversions: _c, ...rest } = s;
    expect(inputsHash(s)).toBe(hashText(canonical(rest)).slice(0, 12));
    const withCase = accepted(edited((r) => (r.ambientCases = [{ name: "c", currentSpeed: 0.3 }])));
    const { name: _n2, conversions: _c2, ...physics } = withCase;
    const cases = withCase.ambientCases.map(({ sets: _s, ...c }) => c);
    expect(inputsHash(withCase)).toBe(hashText(canonical({ ...physics, ambientCases: cases })).slice(0, 12));
  });

  it("writes non-finite numbers and undefined array items as null, and leaves undefined members out", () => {
    const base = inputsHash(asScenario({ v: [null, null, null], w: 1 }));
    expect(inputsHash(asScenario({ v: [Number.NaN, Number.POSITIVE_INFINITY, undefined], w: 1, u: undefined }))).toBe(
      base,
    );
    expect(inputsHash(asScenario({ u: undefined, w: 1 }))).toBe(inputsHash(asScenario({ w: 1 })));
    expect(inputsHash(asScenario({ w: 1, v: "null" }))).not.toBe(inputsHash(asScenario({ w: 1, v: null })));
  });

  it("writes nothing for a hole in an array, as Array.prototype.join does", () => {
    const holey = [1, , 2];
    expect(inputsHash(asScenario({ v: holey }))).toBe(hashText('{"ambientCases":[],"v":[1,,2]}').slice(0, 12));
  });

  it("does not depend on key order, the name, the description, the notes or which fields a case sets", () => {
    const s = accepted(baseRaw());
    const h = inputsHash(s);
    const reordered = Object.fromEntries(Object.entries(s).reverse()) as unknown as Scenario;
    expect(inputsHash(reordered)).toBe(h);
    expect(inputsHash({ ...s, name: "other", description: "words", conversions: ["note"] })).toBe(h);
    const withCase = accepted(edited((r) => (r.ambientCases = [{ name: "c", currentSpeed: 0.1 }])));
    const caseSets = { ...withCase, ambientCases: withCase.ambientCases.map((c) => ({ ...c, sets: [] })) };
    expect(inputsHash(caseSets)).toBe(inputsHash(withCase));
  });

  it("changes with any physical input, with the case list and with strings and booleans", () => {
    const h = inputsHash(accepted(baseRaw()));
    const changed = [
      edited((r) => (r.ambient.currentSpeed = 0.11)),
      edited((r) => (r.diffuser.portAngle = 45)),
      edited((r) => (r.mixingZone.radius = 101)),
      edited((r) => (r.ambientCases = [{ name: "c" }])),
      edited((r) => (r.options = { addSlackWater: false })),
      edited((r) => (r.options = { farField: "gravity-current" })),
    ].map((raw) => inputsHash(accepted(raw)));
    expect(new Set([h, ...changed]).size).toBe(changed.length + 1);
  });
});
