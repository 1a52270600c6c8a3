/**
 * jetSourceWarnings(): the exact rules of the port-level checks — where each threshold sits, which side of
 * it warns, and the code, severity, parameter, value, range, source and numbers of every warning.
 *
 * Rise heights: Roberts, Ferrier & Daviero (1997), J. Hydraulic Eng. 123(8):693–699, y_t = 2.2 dF at 60°
 * (quoted from secondary sources) and Lai & Lee (2012), J. Hydro-environment Research 6:9–28, abstract,
 * 2.08 dF at 60°. Reynolds number floor 10⁴: Abdel-Rahman, Al-Fahed & Chakroun (1996), Mech. Res. Commun.
 * 23(3):313–324. The 90 % surface margin, the 12° edge-spreading angle and the two-diameter port height are
 * common practice, no source.
 */
import { describe, expect, it } from "vitest";
import { denseJet, uniformColumn, type JetOptions } from "../../helpers/jets";
import {
  JET_EDGE_SPREAD_ANGLE,
  MIN_PORT_HEIGHT_DIAMETERS,
  MIN_PORT_REYNOLDS,
  REYNOLDS_SOURCE,
  SURFACE_MARGIN,
  jetSourceWarnings,
} from "../../../core/nearfield/source-checks";
import { publishedRiseHeights } from "../../../core/nearfield/length-scale";
import { ROBERTS_1997_SOURCE } from "../../../core/correlations/roberts-1997-inclined-dense-jet";
import { SHARQAWY_2010_VISCOSITY_SOURCE, viscosityFromST } from "../../../core/correlations/sharqawy-2010-viscosity";
import type { JetSource } from "../../../core/nearfield/types";

const makeJet = (p: JetOptions = {}): JetSource => denseJet({ azimuth: 0, portHeight: 1, ...p });
const warn = (jet: JetSource, depth: number, code: string) =>
  jetSourceWarnings(jet, uniformColumn(depth)).find((w) => w.code === code);
const codes = (jet: JetSource, depth: number) => jetSourceWarnings(jet, uniformColumn(depth)).map((w) => w.code);

describe("surface contact: the largest published upper-edge rise plus the port height against the depth", () => {
  const jet = makeJet(); // d = 0.2 m, F = 25: rise 2.2·5 = 11 m (Roberts et al. 1997) above a 1 m port
  const rise = Math.max(...publishedRiseHeights(jet).map((r) => r.height));
  const reach = rise + 1;

  it("uses the constants the messages quote", () => {
    expect([SURFACE_MARGIN, JET_EDGE_SPREAD_ANGLE, MIN_PORT_HEIGHT_DIAMETERS, MIN_PORT_REYNOLDS], "thresholds").toEqual(
      [0.9, 12, 2, 1e4],
    );
    expect(rise, "2.2 dF").toBeCloseTo(11, 12);
  });

  it("reaches the surface when the reach equals the depth (serious), with the sum in the message", () => {
    expect(warn(jet, reach, "jet-reaches-surface"), "at the depth").toEqual({
      code: "jet-reaches-surface",
      severity: "serious",
      message:
        `The jet reaches the surface: upper-edge rise 11.00 m + port height 1.00 m = 12.00 m ≥ water depth ` +
        `12.00 m. Near-field results assume deep water.`,
      parameter: "ambient.depth",
      value: reach,
      range: [reach, Infinity],
      source: ROBERTS_1997_SOURCE,
      stage: "source",
    });
    expect(codes(jet, reach), "not also near the surface").not.toContain("jet-near-surface");
  });

  it("comes near the surface from 90 % of the depth, with the margin left in the message", () => {
    const depth = 12.5;
    expect(warn(jet, depth, "jet-near-surface"), "within 0.5 m").toEqual({
      code: "jet-near-surface",
      severity: "warning",
      message:
        "The jet's upper edge comes within 0.50 m of the surface: upper-edge rise 11.00 m + port height 1.00 m = " +
        "12.00 m, over 90 % of the 12.50 m depth (margin: common practice, no source).",
      parameter: "ambient.depth",
      value: depth,
      range: [reach / 0.9, Infinity],
      source: ROBERTS_1997_SOURCE,
      stage: "source",
    });
    expect(codes(jet, reach + 1e-9), "just deeper than the reach").toContain("jet-near-surface");
    expect(codes(jet, reach / 0.9 - 1e-9), "just inside 90 %").toContain("jet-near-surface");
    expect(codes(jet, reach / 0.9 + 1e-9), "just outside 90 %").not.toContain("jet-near-surface");
    // Exactly 90 %: F = 20 gives a 2.2·0.2·20 = 8.8 m rise; a port 0.2 m up reaches 9 m = 0.9 × 10 m.
    const f20 = makeJet({ F: 20 });
    const rise20 = Math.max(...publishedRiseHeights(f20).map((r) => r.height));
    const exact = { ...f20, portHeight: 9 - rise20 };
    expect(rise20 + exact.portHeight, "reach is exactly 0.9 × depth").toBe(0.9 * 10);
    expect(codes(exact, 10), "at exactly 90 %").toContain("jet-near-surface");
  });

  it("adds that a steeper port likely rises higher than any dataset (above 60° only)", () => {
    const steep = makeJet({ angle: 75 });
    expect(warn(steep, 12, "jet-reaches-surface")!.message, "75°").toContain(
      "≥ water depth 12.00 m (the port is steeper than any dataset, so the true rise is likely higher). ",
    );
    expect(warn(steep, 12.5, "jet-near-surface")!.message, "75°").toContain(
      "(margin: common practice, no source) (the port is steeper than any dataset, so the true rise is likely higher).",
    );
    expect(warn(jet, 12, "jet-reaches-surface")!.message, "60°").not.toContain("steeper");
  });

  it("counts a port below the bed as on the bed, and skips the check without depth or without a dense jet", () => {
    const sunk = makeJet({ portHeight: -0.5 });
    expect(warn(sunk, 11, "jet-reaches-surface")!.message, "reach = rise + 0").toContain(
      "upper-edge rise 11.00 m + port height -0.50 m = 11.00 m ≥ water depth 11.00 m",
    );
    expect(codes(jet, 0), "no depth").toEqual([]);
    const light = { ...makeJet(), reducedGravity: -0.1 };
    expect(
      codes(light, 1.5).filter((c) => c.startsWith("jet-")),
      "no published rise for a light jet",
    ).toEqual([]);
  });

  it("uses the Lai & Lee (2012) 15° rise for a flatter port", () => {
    const flat = makeJet({ angle: 10 });
    expect(warn(flat, 3, "jet-reaches-surface")!.message, "0.44·5 = 2.20 m").toContain(
      "upper-edge rise 2.20 m + port height 1.00 m = 3.20 m",
    );
  });
});

describe("seabed attachment: shallow angle or low port", () => {
  it("warns below 12°, not at 12°", () => {
    expect(warn(makeJet({ angle: 11.9 }), 30, "seabed-attachment-shallow-angle"), "11.9°").toEqual({
      code: "seabed-attachment-shallow-angle",
      severity: "warning",
      message:
        "Discharge angle 11.9° is below about 12°, the spreading angle of a jet's lower edge, so the lower edge " +
        "heads for the bed from the start and the jet may attach to it (common practice, no source).",
      parameter: "diffuser.portAngle",
      value: 11.9,
      range: [12, 90],
      stage: "source",
    });
    expect(codes(makeJet({ angle: 12 }), 30), "12°").not.toContain("seabed-attachment-shallow-angle");
  });

  it("warns below two port diameters above the bed, not at two", () => {
    expect(warn(makeJet({ portHeight: 0.39 }), 30, "seabed-attachment-low-port"), "0.39 m < 0.40 m").toEqual({
      code: "seabed-attachment-low-port",
      severity: "warning",
      message:
        "Port height 0.39 m is less than 2 port diameters (0.40 m): the bed limits entrainment into the jet's " +
        "underside and may draw it down (common practice, no source).",
      parameter: "diffuser.portHeight",
      value: 0.39,
      range: [0.4, Infinity],
      stage: "source",
    });
    expect(codes(makeJet({ portHeight: 0.4 }), 30), "0.40 m").not.toContain("seabed-attachment-low-port");
  });
});

describe("port Reynolds number U·d/ν below 10⁴ (Abdel-Rahman et al. 1996)", () => {
  it("quotes Re, ν, salinity and temperature, with the viscosity's source", () => {
    const jet = makeJet({ U: 0.5, d: 0.01, salinity: 45, temperature: 18 });
    const nu = viscosityFromST(45, 18) / jet.density;
    const re = (0.5 * 0.01) / nu;
    expect(warn(jet, 30, "port-reynolds-low"), "low Re").toEqual({
      code: "port-reynolds-low",
      severity: "warning",
      message:
        `Port Reynolds number U·d/ν = ${re.toPrecision(3)} is below 10⁴ (ν = ${nu.toExponential(2)} m²/s at ` +
        "45.0 g/kg, 18.0 °C): laboratory turbulent-jet laws may not hold.",
      parameter: "port.reynolds",
      value: re,
      range: [1e4, Infinity],
      source: `${REYNOLDS_SOURCE}; viscosity: ${SHARQAWY_2010_VISCOSITY_SOURCE}`,
      stage: "source",
    });
    expect(nu, "seawater at 18 °C: about 1e-6 m²/s (kinematic)").toBeGreaterThan(0.8e-6);
    expect(nu, "seawater at 18 °C: about 1e-6 m²/s (kinematic)").toBeLessThan(1.5e-6);
  });

  it("sits at 10⁴: just below warns, just above does not", () => {
    const d = 0.02;
    const base = makeJet({ U: 1, d, portHeight: 1 });
    const nu = viscosityFromST(base.salinity, base.temperature) / base.density;
    const u10k = (1e4 * nu) / d;
    const at = (u: number) => ({ ...base, velocity: u });
    expect(codes(at(u10k * 0.999), 30), "Re = 9990").toContain("port-reynolds-low");
    expect(codes(at(u10k * 1.001), 30), "Re = 10 010").not.toContain("port-reynolds-low");
    // Exactly 10⁴ is not below 10⁴: find the velocity whose Re rounds to exactly 10⁴.
    const exact = [0, -1, 1, -2, 2].map((k) => u10k * (1 + k * 2 ** -52)).find((u) => (u * d) / nu === 1e4);
    expect(exact, "a velocity with Re = 10⁴ exactly").toBeDefined();
    expect(codes(at(exact!), 30), "Re = 10⁴").not.toContain("port-reynolds-low");
  });

  it("says nothing when Re cannot be computed", () => {
    const jet = { ...makeJet(), velocity: Number.NaN };
    expect(codes(jet, 30), "NaN velocity").not.toContain("port-reynolds-low");
  });
});
