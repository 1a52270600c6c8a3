/**
 * The far-field stage calls the range check of the shear entrainment law E(Ri) (Turner 1986, J. Fluid
 * Mech. 173:431–471; fitted for Ri ≥ 0, from memory) with the Richardson number it uses, and hands on what
 * the check returns. The stage's own closures keep that Ri at or above 0 (the normal-flow root on a slope,
 * or critical flow Ri = 1 on a flat bed), so no scenario makes the check fire today: the check is replaced
 * here by a recording stand-in to see the wiring.
 */
import { describe, expect, it, vi } from "vitest";
import { farFieldStage } from "../../../core/farfield/stage";
import { equilibriumRichardsonFromSlope } from "../../../core/farfield/gravity-current";
import { warning } from "../../../core/warnings";
import { beyondInputFixture, scenarioFixture } from "./fixtures";

const seen = vi.hoisted(() => ({ ri: [] as number[] }));

vi.mock("../../../core/farfield/turner-1986-entrainment", async (importOriginal) => {
  const real = await importOriginal<typeof import("../../../core/farfield/turner-1986-entrainment")>();
  return {
    ...real,
    entrainmentFromRichardsonValidityIssues: (ri: number) => {
      seen.ri.push(ri);
      return [warning("stand-in-turner-check", "info", `checked Ri = ${ri}`, { value: ri, stage: "far-field" })];
    },
  };
});

function stageOnSlope(bedSlope: number) {
  seen.ri.length = 0;
  return farFieldStage(beyondInputFixture(scenarioFixture({ ambient: { bedSlope } })));
}

describe("farFieldStage() and the Turner (1986) range check", () => {
  it("checks the critical-flow Ri = 1 used on a flat bed and hands the check's warning on", () => {
    const out = stageOnSlope(0);
    expect(seen.ri, "the Ri handed to E(Ri)").toContain(1);
    expect(
      out.warnings.map((w) => w.code),
      "the check's warning reaches the stage",
    ).toContain("stand-in-turner-check");
  });
  it("checks the normal-flow Ri on a 0.12 slope", () => {
    stageOnSlope(0.12);
    expect(seen.ri, "Ri = (C_D + E(Ri))/tanβ").toContain(equilibriumRichardsonFromSlope(0.12));
  });
});
