/**
 * The scope rules behind the "outside-scope" verdict (README "Verdicts and ambient cases"; the verdict
 * contract is common practice of a screening tool, no source): a jet whose upper edge reaches the
 * surface, a surface warning, no near-field method covering the case, or a serious properties warning
 * each make a case outside-scope, with a reason a reader can check by hand.
 */
import { describe, it, expect } from "vitest";
import {
  complianceWithScope,
  methodNotCovering,
  scopeReasons,
  SURFACE_WARNING_CODES,
} from "../../../core/compliance/scope";
import { nullNearFieldResult, type NearFieldMethodResult } from "../../../core/nearfield/types";
import { warning, type ResultWarning } from "../../../core/warnings";
import type { ComplianceResult } from "../../../core/result/contract";

function method(
  name: "length-scale" | "integral",
  rise: number | null,
  extra: Partial<NearFieldMethodResult> = {},
): NearFieldMethodResult {
  return {
    ...nullNearFieldResult(name, "test source", "test bias", []),
    available: true,
    notAvailableReason: null,
    maxRiseHeight: rise,
    ...extra,
  };
}
const unavailable = (name: "length-scale" | "integral", why: string) => nullNearFieldResult(name, "s", "b", [], why);
const base = { depth: 10, portHeight: 1 };

describe("scopeReasons()", () => {
  it("names a jet whose upper edge reaches the surface, with the sum a reader can redo", () => {
    // port height 1 m + rise 9 m = 10 m, in 10 m of water: at the surface.
    const r = scopeReasons({ ...base, nearField: [method("length-scale", 9), method("integral", 3)], warnings: [] });
    expect(r, "one reason").toHaveLength(1);
    expect(r[0], "the method, the sum and the depth").toBe(
      "The jet reaches the water surface (length-scale): its upper edge rises to 10 m above the seabed (port height 1 m + rise 9 m) in 10 m of water.",
    );
  });

  it("keeps a jet whose upper edge stays below the surface in scope", () => {
    expect(
      scopeReasons({ ...base, nearField: [method("length-scale", 8.99), method("integral", 8.9)], warnings: [] }),
      "1 + 8.99 < 10",
    ).toEqual([]);
  });

  it("ignores the rise of a method that is not available or gives no finite rise", () => {
    const off = { ...method("length-scale", 50), available: false, notAvailableReason: "angle outside the data" };
    const r = scopeReasons({
      ...base,
      nearField: [off, method("integral", Number.POSITIVE_INFINITY), method("integral", null)],
      warnings: [],
    });
    expect(r, "no surface reason from unusable rises").toEqual([]);
  });

  it("takes a surface warning as a reason unless it is only information", () => {
    expect([...SURFACE_WARNING_CODES].sort(), "the surface codes").toEqual([
      "jet-reaches-surface",
      "layer-reaches-surface",
      "surface-contact",
    ]);
    const seen = (severity: "info" | "warning" | "serious", code = "layer-reaches-surface") =>
      scopeReasons({
        ...base,
        nearField: [method("integral", 2)],
        warnings: [warning(code, severity, `layer ${severity}`, { stage: "far-field" })],
      });
    expect(seen("warning"), "a warning counts").toEqual(["layer warning"]);
    expect(seen("serious"), "a serious warning counts").toEqual(["layer serious"]);
    expect(seen("info"), "information does not").toEqual([]);
    expect(seen("warning", "edge-inside-near-field"), "other codes do not").toEqual([]);
  });

  it("reads a surface warning carried by a near-field method itself", () => {
    const m = method("integral", 2, {
      warnings: [warning("surface-contact", "warning", "touches the surface", { stage: "integral" })],
    });
    expect(scopeReasons({ ...base, nearField: [m], warnings: [] }), "method warning read").toEqual([
      "touches the surface",
    ]);
  });

  it("says so when no near-field method covers the case, listing each method's reason", () => {
    const serious = warning("angle-outside-data", "serious", "angle 5° outside 15°–60°", { stage: "integral" });
    const r = scopeReasons({
      ...base,
      nearField: [unavailable("length-scale", "no dataset"), method("integral", 2)],
      warnings: [serious],
    });
    expect(r, "both methods out").toEqual([
      "No near-field method covers the case: length-scale not available (no dataset); integral does not apply: angle 5° outside 15°–60°.",
    ]);
    expect(scopeReasons({ ...base, nearField: [], warnings: [] }), "no method at all").toEqual([
      "No near-field method covers the case.",
    ]);
  });

  it("keeps the case in scope while one method covers it, and reads a serious warning only for its own stage", () => {
    const seriousLs = warning("x", "serious", "length-scale out", { stage: "length-scale" });
    const r = scopeReasons({
      ...base,
      nearField: [method("length-scale", 2), method("integral", 2)],
      warnings: [seriousLs],
    });
    expect(r, "integral still covers").toEqual([]);
    const warnOnly = warning("y", "warning", "rough", { stage: "integral" });
    expect(
      scopeReasons({
        ...base,
        nearField: [unavailable("length-scale", "no"), method("integral", 2)],
        warnings: [warnOnly],
      }),
      "a plain warning leaves integral covering",
    ).toEqual([]);
  });

  it("takes a serious properties warning as a reason, and only that stage's", () => {
    const props = warning("eos-range", "serious", "salinity outside the equation of state", { stage: "properties" });
    const other = warning("z", "serious", "far-field note", { stage: "far-field" });
    const notSerious = warning("w", "warning", "properties note", { stage: "properties" });
    expect(
      scopeReasons({ ...base, nearField: [method("integral", 2)], warnings: [props, other, notSerious] }),
      "properties only",
    ).toEqual(["salinity outside the equation of state"]);
  });

  it("lists a reason once however often it is raised", () => {
    const w: ResultWarning = warning("jet-reaches-surface", "warning", "at the surface", { stage: "integral" });
    const m = method("integral", 2, { warnings: [w] });
    expect(scopeReasons({ ...base, nearField: [m], warnings: [w, w] }), "deduplicated").toEqual(["at the surface"]);
  });
});

describe("methodNotCovering()", () => {
  it("gives the unavailable reason, a fallback, the serious warning, or null", () => {
    expect(methodNotCovering(unavailable("integral", "why"), []), "reason").toBe("not available (why)");
    expect(methodNotCovering({ ...unavailable("integral", "why"), notAvailableReason: null }, []), "fallback").toBe(
      "not available (no reason given)",
    );
    const s = warning("k", "serious", "bent over", { stage: "integral" });
    expect(methodNotCovering(method("integral", 1), [s]), "serious of its stage").toBe("does not apply: bent over");
    expect(methodNotCovering(method("integral", 1, { warnings: [s] }), []), "its own serious warning").toBe(
      "does not apply: bent over",
    );
    expect(methodNotCovering(method("length-scale", 1), [s]), "another stage's").toBeNull();
  });
});

describe("complianceWithScope()", () => {
  const c = (pass: boolean): ComplianceResult => ({
    governingConstituent: "salinity",
    requiredDilution: 20,
    pass,
    verdict: pass ? "meets" : "exceeds",
    scopeReasons: [],
    margin: pass ? 1.5 : 0.5,
    constituents: [],
  });
  it("is outside-scope with the reasons whenever there is one, never a pass", () => {
    const r = complianceWithScope(c(true), ["jet at the surface"]);
    expect([r.verdict, r.pass, r.scopeReasons], "outside-scope").toEqual([
      "outside-scope",
      false,
      ["jet at the surface"],
    ]);
    expect(r.margin, "numbers kept").toBe(1.5);
  });
  it("follows the limits otherwise", () => {
    expect(complianceWithScope(c(true), []), "meets").toMatchObject({ verdict: "meets", pass: true, scopeReasons: [] });
    expect(complianceWithScope(c(false), []), "exceeds").toMatchObject({
      verdict: "exceeds",
      pass: false,
      scopeReasons: [],
    });
  });
});
