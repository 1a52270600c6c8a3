/**
 * Walks the far-field, multiport and compliance check-value tables. Every case names its source and
 * tolerance in the table; skipped cases carry a reason.
 */
import { describe, expect, it } from "vitest";
import { entrainmentFromRichardson } from "../../../core/farfield/turner-1986-entrainment";
import { brooksDilutionFromDistance } from "../../../core/farfield/brooks-1960-diffusion";
import { linePlumeDilutionFromFlux } from "../../../core/multiport/line-plume";
import { requiredDilutionFromLimit } from "../../../core/compliance/required-dilution";
import turner from "../../check-values/turner-1986-entrainment.json";
import brooks from "../../check-values/brooks-1960-diffusion.json";
import linePlume from "../../check-values/line-plume.json";
import required from "../../check-values/required-dilution.json";

interface CheckTable {
  name: string;
  function: string;
  cases: {
    inputs: number[];
    expected: number;
    tolerance: { absolute?: number; relative?: number };
    provenance: string;
  }[];
  skip: { reason: string }[];
}

const implementations: Record<string, (...args: number[]) => number> = {
  entrainmentFromRichardson: (ri) => entrainmentFromRichardson(ri),
  brooksDilutionFromDistance: (x, b, u) =>
    brooksDilutionFromDistance({ distance: x, initialWidth: b, currentSpeed: u }),
  linePlumeDilutionFromFlux: (q, g, z) => linePlumeDilutionFromFlux(q, g, z),
  requiredDilutionFromLimit: (cd, cb, cl) => requiredDilutionFromLimit(cd, cb, cl),
};

describe("beyond-the-near-field check-value tables", () => {
  for (const table of [turner, brooks, linePlume, required] as unknown as CheckTable[]) {
    describe(`${table.name} (${table.function})`, () => {
      it("names an implemented function and has cases", () => {
        expect(implementations[table.function], `no implementation for ${table.function}`).toBeTypeOf("function");
        expect(table.cases.length, "a table without cases checks nothing").toBeGreaterThan(0);
      });
      it("gives a reason for every skipped case", () => {
        for (const s of table.skip) expect(s.reason.length, "skip entries need a reason").toBeGreaterThan(10);
      });
      table.cases.forEach((c, i) => {
        it(`case ${i + 1}: ${table.function}(${c.inputs.join(", ")}) ≈ ${c.expected}`, () => {
          const got = implementations[table.function](...c.inputs);
          const allowed = c.tolerance.absolute ?? (c.tolerance.relative ?? 0) * Math.abs(c.expected);
          expect(allowed, "every case needs a tolerance").toBeGreaterThan(0);
          expect(Math.abs(got - c.expected), `${c.provenance} — got ${got}`).toBeLessThanOrEqual(allowed);
        });
      });
    });
  }
});
