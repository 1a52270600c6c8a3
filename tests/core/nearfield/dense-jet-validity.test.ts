/**
 * The length-scale method calls the range check of every published dataset it uses at the port's angle
 * (`DenseJetDataset.validityIssues`: `laiLee2012CoefficientsAtAngleValidityIssues`,
 * `roberts1997CoefficientsAtAngleValidityIssues`), and the result collects them. Angles no dataset covers
 * are the method's own angle-coverage rule ("angle-outside-studied-range"), not these checks.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";

const demo = JSON.parse(readFileSync(join(__dirname, "../../../demo-scenarios/island-cove.json"), "utf8"));

function runWithPort(portDiameter: string) {
  const raw = structuredClone(demo);
  delete raw.ambientCases;
  raw.diffuser.portDiameter = portDiameter;
  const parsed = parseScenario(raw);
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
  return runScenario(parsed.scenario);
}

// Lai & Lee (2012), J. Hydro-environment Res. 6:9–28, abstract: coefficients source-independent for F ≥ 25
// (rise) and F ≥ 20 (dilution). Roberts, Ferrier & Daviero (1997), J. Hydraulic Eng. 123(8):693–699: 60°
// laws, held to the same F ≥ 20 bound (their own range not traced).
describe("a 60° port below the asymptotic Froude range, through runScenario", () => {
  it("carries both datasets' Froude warnings for a 5 in port (F below 20)", () => {
    const r = runWithPort("5 in");
    expect(r.port.froude < 20, `F = ${r.port.froude}`).toBe(true);
    const codes = r.warnings.map((w) => w.code);
    expect(codes, "Roberts et al. (1997) check").toContain("roberts-1997-froude-below-asymptotic");
    expect(codes, "Lai & Lee (2012) check").toContain("lai-lee-2012-froude-not-asymptotic");
  });
  it("carries neither for the demo's 4 in port (F above 25)", () => {
    const r = runWithPort("4 in");
    expect(r.port.froude > 25, `F = ${r.port.froude}`).toBe(true);
    const codes = r.warnings.map((w) => w.code);
    expect(codes, "inside both ranges").not.toContain("roberts-1997-froude-below-asymptotic");
    expect(codes, "inside both ranges").not.toContain("lai-lee-2012-froude-not-asymptotic");
  });
});
