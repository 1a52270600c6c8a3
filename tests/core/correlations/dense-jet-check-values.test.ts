/**
 * Walks the dense-jet length-scale check-value tables (tests/check-values/roberts-1997-*.json,
 * lai-lee-2012-*.json, lai-lee-2013-*.json). Each case names its source and tolerance in the table; each
 * skipped item gives its reason there.
 */
import { describe, expect, it } from "vitest";
import { roberts1997CoefficientsAtAngle } from "../../../core/correlations/roberts-1997-inclined-dense-jet";
import { laiLee2012CoefficientsAtAngle } from "../../../core/correlations/lai-lee-2012-inclined-dense-jet";
import {
  crossflowFroudeFromSpeeds,
  momentumLengthRatioFromCrossflowFroude,
} from "../../../core/correlations/lai-lee-2013-crossflow-regime";
import type { DenseJetCoefficients } from "../../../core/correlations/dense-jet-dataset";
import roberts1997 from "../../check-values/roberts-1997-inclined-dense-jet.json";
import laiLee2012 from "../../check-values/lai-lee-2012-inclined-dense-jet.json";
import laiLee2013 from "../../check-values/lai-lee-2013-crossflow-regime.json";

interface CheckCase {
  function?: string;
  inputs: number[];
  output?: string;
  expected: number;
  tolerance: { absolute?: number; relative?: number };
  provenance: string;
}
interface CheckTable {
  name: string;
  function: string;
  cases: CheckCase[];
  skip: { what: string; reason: string }[];
}

type Implementation = (...args: number[]) => number | DenseJetCoefficients | null;

const implementations: Record<string, Implementation> = {
  roberts1997CoefficientsAtAngle: (angle) => roberts1997CoefficientsAtAngle(angle),
  laiLee2012CoefficientsAtAngle: (angle) => laiLee2012CoefficientsAtAngle(angle),
  crossflowFroudeFromSpeeds: (ua, u, f) => crossflowFroudeFromSpeeds(ua, u, f),
  momentumLengthRatioFromCrossflowFroude: (fc) => momentumLengthRatioFromCrossflowFroude(fc),
};

function evaluate(table: CheckTable, c: CheckCase): number | null {
  const name = c.function ?? table.function;
  const got = implementations[name](...c.inputs);
  if (got === null) return null;
  if (typeof got === "number") return got;
  const value = got[c.output as keyof DenseJetCoefficients];
  return typeof value === "number" ? value : null;
}

const tables = [roberts1997, laiLee2012, laiLee2013] as unknown as CheckTable[];

describe("dense-jet check-value tables", () => {
  for (const table of tables) {
    describe(table.name, () => {
      it("has cases, each naming an implemented function and a provenance", () => {
        expect(table.cases.length, "a table without cases checks nothing").toBeGreaterThan(0);
        for (const c of table.cases) {
          const name = c.function ?? table.function;
          expect(implementations[name], `no implementation for ${name}`).toBeTypeOf("function");
          expect(c.provenance.length, "every check value names its source").toBeGreaterThan(10);
        }
      });
      it("gives a reason for every skipped item", () => {
        for (const s of table.skip) {
          expect(s.reason.length, `skip "${s.what}" needs a reason`).toBeGreaterThan(10);
        }
      });
      table.cases.forEach((c, index) => {
        const field = c.output ? "." + c.output : "";
        const label = `${c.function ?? table.function}(${c.inputs.join(", ")})${field}`;
        it(`case ${index + 1}: ${label} ≈ ${c.expected}`, () => {
          const got = evaluate(table, c);
          const { relative: rel } = c.tolerance;
          const relative = rel !== undefined ? rel * Math.abs(c.expected) : 0;
          const allowed = c.tolerance.absolute ?? relative;
          expect(allowed, "every case needs a tolerance").toBeGreaterThan(0);
          expect(got, `${c.provenance} — no value returned`).not.toBeNull();
          const error = Math.abs((got as number) - c.expected);
          expect(error, `${c.provenance} — got ${got}`).toBeLessThanOrEqual(allowed);
        });
      });
    });
  }
});
