/**
 * Common unit strings are read without a mathjs instance (core/units/plain-units.ts).
 * mathjs stays the reference: every unit the fast path holds, alone, raised to a power and divided by
 * another, is converted both ways and must give the very same double as mathjs's Unit, for values across
 * many magnitudes. Anything the fast path does not hold must be left to mathjs.
 */
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { plainConvert as convert, plainUnitNames as names } from "../../../core/units/plain-units";
import {
  mathjsConvert as mathjs,
  mathjsQuantity as mathjsText,
  normaliseUnitText,
  quantityToSI,
  QUANTITY_KINDS,
} from "../../../core/units/units";

/** Values across magnitudes and signs, from a fixed-seed generator, plus round and demo-like values. */
function values(): number[] {
  const out = [0, 1, -1, 2, 3, 5000, 3785.411784, 38.5, 0.15, 0.42, 24, 1852, 1e-3, 1e7, 123456.789];
  let state = 12345;
  for (let i = 0; i < 40; i++) {
    state = (state * 1103515245 + 12345) % 2 ** 31;
    const mantissa = state / 2 ** 31;
    out.push((mantissa - 0.3) * 10 ** ((i % 12) - 5));
  }
  return out;
}

/** mathjs's answer, or the text of what it threw. */
function reference(value: number, from: string, to: string): number | string {
  try {
    return mathjs(value, from, to);
  } catch (err) {
    return err instanceof Error ? err.message : String(err);
  }
}

function expressions(): string[] {
  const units = names();
  const out: string[] = [];
  for (const a of units) {
    out.push(a, `${a}^2`, `${a}^3`);
    for (const b of units) out.push(`${a}/${b}`, `${a}^3/${b}`, `${a}/${b}^2`);
  }
  return out;
}

const TARGETS = [
  ...new Set(
    Object.values(QUANTITY_KINDS)
      .flatMap((k) => [k.si, k.us])
      .filter((u) => u !== ""),
  ),
  "m^3/day",
  "L/s",
  "knot",
  "km",
  "mm",
  "kg/m^3",
];

describe("plain units against mathjs", () => {
  it("every unit the fast path holds is a unit mathjs knows, with the same factor to the last bit", () => {
    const xs = values();
    let compared = 0;
    for (const from of expressions()) {
      for (const to of [...TARGETS, ...names()]) {
        const fast = convert(1, from, to);
        if (fast === null) continue; // different kinds or offsets: left to mathjs
        for (const x of xs) {
          const ours = convert(x, from, to);
          const theirs = reference(x, from, to);
          if (!Object.is(ours, theirs)) {
            expect.fail(`${x} ${from} → ${to}: fast path ${String(ours)}, mathjs ${String(theirs)}`);
          }
          compared++;
        }
      }
    }
    expect(compared, "conversions compared").toBeGreaterThan(10_000);
  });

  it("leaves to mathjs what it does not hold: other units, kinds that differ, offsets between units", () => {
    expect(convert(1, "furlong", "m"), "a unit it does not hold").toBeNull();
    expect(convert(1, "m", "s"), "a length is not a time").toBeNull();
    expect(convert(20, "degC", "degF"), "°C to °F needs the offset").toBeNull();
    expect(convert(1, "m^3/day/s", "m^3/s"), "more than one division").toBeNull();
    expect(convert(1, "m^0.5", "m"), "a power that is not a digit").toBeNull();
    expect(convert(1, "kg m", "kg m"), "implicit products").toBeNull();
  });

  it("reads every unit string of the demo scenarios exactly as mathjs does", () => {
    const dir = join(__dirname, "../../../demo-scenarios");
    const strings = new Set<string>();
    const walk = (v: unknown): void => {
      if (typeof v === "string") strings.add(v);
      else if (Array.isArray(v)) v.forEach(walk);
      else if (v && typeof v === "object") Object.values(v).forEach(walk);
    };
    for (const f of readdirSync(dir).filter((n) => n.endsWith(".json"))) {
      walk(JSON.parse(readFileSync(join(dir, f), "utf8")) as unknown);
    }
    let checked = 0;
    for (const text of strings) {
      if (!/^[-+]?[\d.]/.test(text)) continue;
      for (const [kind, k] of Object.entries(QUANTITY_KINDS) as [keyof typeof QUANTITY_KINDS, { si: string }][]) {
        if (k.si === "") continue;
        const ours = quantityToSI(text, kind);
        let theirs: number | null = null;
        try {
          theirs = mathjsText(normaliseUnitText(text.trim()), k.si);
        } catch {
          theirs = null;
        }
        if (theirs === null || !Number.isFinite(theirs)) continue;
        expect(ours.ok, `${text} as ${kind}`).toBe(true);
        if (ours.ok) expect(Object.is(ours.value, theirs), `${text} as ${kind}: ${ours.value} vs ${theirs}`).toBe(true);
        checked++;
      }
    }
    expect(checked, "demo unit strings checked").toBeGreaterThan(10);
  });

  it("keeps mathjs's messages for what it cannot read", () => {
    const unknown = quantityToSI("3 furlongs", "length");
    expect(unknown.ok, "an unknown unit is refused").toBe(false);
    if (!unknown.ok) expect(unknown.message).toBe('has a unit Brinefield does not know ("furlongs")');
    const wrongKind = quantityToSI("12 m", "flow");
    expect(wrongKind.ok, "a length is not a flow").toBe(false);
    if (!wrongKind.ok) expect(wrongKind.message).toBe("is not a flow (expected a unit convertible to m³/s)");
  });
});
