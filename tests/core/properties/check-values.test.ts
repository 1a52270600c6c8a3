/**
 * Walks the properties check-value tables (tests/check-values/teos10-*.json, sharqawy-*.json, nayar-*.json).
 * Every case carries its own source and tolerance in the table; skipped cases carry a reason.
 */
import { describe, expect, it } from "vitest";
import {
  absoluteSalinityFromPractical,
  densitySharqawy2010,
  densitySharqawyNayar,
  densityTeos10,
} from "../../../core/properties";
import teos10Density from "../../check-values/teos10-density.json";
import teos10Salinity from "../../check-values/teos10-salinity.json";
import sharqawyDensity from "../../check-values/sharqawy-2010-density.json";
import nayarDensity from "../../check-values/nayar-2016-density.json";

interface CheckCase {
  inputs: number[];
  expected: number;
  tolerance: { absolute?: number; relative?: number };
  provenance: string;
}
interface CheckTable {
  name: string;
  function: string;
  cases: CheckCase[];
  skip: { reason: string }[];
}

const implementations: Record<string, (...args: number[]) => number> = {
  densityTeos10: (sa, t, p) => densityTeos10(sa, t, p),
  absoluteSalinityFromPractical: (sp) => absoluteSalinityFromPractical(sp),
  densitySharqawy2010: (s, t) => densitySharqawy2010(s, t),
  densitySharqawyNayar: (s, t, p) => densitySharqawyNayar(s, t, p),
};

const tables = [teos10Density, teos10Salinity, sharqawyDensity, nayarDensity] as unknown as CheckTable[];

describe("properties check-value tables", () => {
  for (const table of tables) {
    describe(`${table.name} (${table.function})`, () => {
      it("names an implemented function and has at least one case", () => {
        expect(implementations[table.function], `no implementation for ${table.function}`).toBeTypeOf("function");
        expect(table.cases.length, "a table without cases checks nothing").toBeGreaterThan(0);
      });
      it("gives a reason for every skipped case", () => {
        for (const s of table.skip) expect(s.reason.length, "skip entries need a reason").toBeGreaterThan(10);
      });
      table.cases.forEach((c, index) => {
        it(`case ${index + 1}: ${table.function}(${c.inputs.join(", ")}) ≈ ${c.expected}`, () => {
          const got = implementations[table.function](...c.inputs);
          const allowed =
            c.tolerance.absolute ??
            (c.tolerance.relative !== undefined ? c.tolerance.relative * Math.abs(c.expected) : 0);
          expect(allowed, "every case needs a tolerance").toBeGreaterThan(0);
          expect(Math.abs(got - c.expected), `${c.provenance} — got ${got}`).toBeLessThanOrEqual(allowed);
        });
      });
    });
  }
});
