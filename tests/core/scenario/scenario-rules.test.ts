/**
 * The scenario rules every path ends in (file, app edit, sweep, study, Monte Carlo draw, design
 * candidate): field bounds declared once and the cross-field rules, checked on normalised scenarios
 * changed the way an override changes them. The bounds and the 30 m/s exit-velocity cap are the
 * project's screening conventions (common practice, no source); a port's flow area is π·d²/4 (geometry).
 */
import { describe, it, expect } from "vitest";
import { scenarioRuleIssues, MAX_EXIT_VELOCITY } from "../../../core/scenario/rules";
import { FIELD_BOUNDS, fieldBounds, withinBounds, type FieldBounds } from "../../../core/scenario/bounds";
import { expectationFor } from "../../../core/scenario/fields";
import { USUAL_EXIT_VELOCITY_TEXT } from "../../../core/constants";
import type { AmbientCase, DiffuserInput, Scenario } from "../../../core/scenario/types";
import { accepted, baseRaw } from "./rule-fixtures";

const base: Scenario = accepted(baseRaw());

function withDiffuser(d: Partial<DiffuserInput>, s: Scenario = base): Scenario {
  return { ...s, diffuser: { ...s.diffuser, ...d } };
}

function messages(s: Scenario): string[] {
  return scenarioRuleIssues(s).map((i) => i.message);
}

function lowCase(depth: number, extra: Partial<AmbientCase> = {}): AmbientCase {
  return { ...base.ambient, name: "low", weight: 1, sets: ["depth"], depth, ...extra };
}

describe("withinBounds and fieldBounds", () => {
  const depth = FIELD_BOUNDS["ambient.depth"];
  const angle = FIELD_BOUNDS["diffuser.portAngle"];
  const ports = FIELD_BOUNDS["diffuser.portCount"];

  it("excludes an exclusive minimum, includes an inclusive one and the maximum, refuses beyond", () => {
    expect(withinBounds(depth, 0)).toBe(false);
    expect(withinBounds(depth, 1e-9)).toBe(true);
    expect(withinBounds(depth, 1000)).toBe(true);
    expect(withinBounds(depth, 1000.0001)).toBe(false);
    expect(withinBounds(angle, 0)).toBe(true);
    expect(withinBounds(angle, -1e-9)).toBe(false);
    expect(withinBounds(angle, 90)).toBe(true);
    expect(withinBounds(angle, 90.0001)).toBe(false);
  });

  it("refuses non-finite values and fractional counts", () => {
    expect(withinBounds(angle, Number.NaN)).toBe(false);
    expect(withinBounds(angle, Number.POSITIVE_INFINITY)).toBe(false);
    expect(withinBounds(ports, 1.5)).toBe(false);
    expect(withinBounds(ports, 2)).toBe(true);
    expect(withinBounds(angle, 1.5)).toBe(true);
  });

  it("looks up own keys of the table only", () => {
    expect(fieldBounds("ambient.depth")).toBe(depth);
    expect(fieldBounds("toString")).toBeUndefined();
    expect(fieldBounds("__proto__")).toBeUndefined();
  });
});

describe("expectationFor: the words of each form of bound", () => {
  it("quantity, salinity, count and fraction forms", () => {
    expect(expectationFor(FIELD_BOUNDS["diffuser.portAngle"])).toBe(
      'must be a port angle above horizontal from 0 to 90 ° (e.g. 60 or "60 deg")',
    );
    expect(expectationFor(FIELD_BOUNDS["ambient.depth"])).toBe(
      'must be a positive water depth up to 1000 m (e.g. 12 or "40 ft")',
    );
    expect(expectationFor(FIELD_BOUNDS["ambient.salinity"])).toBe(
      'must be an ambient salinity from 0 to 80 g/kg Absolute Salinity (e.g. 68, "68 g/kg", "36 psu" or "40000 mg/L")',
    );
    expect(expectationFor(FIELD_BOUNDS["diffuser.portCount"])).toBe("must be a whole number of ports from 1 to 1000");
    expect(expectationFor(FIELD_BOUNDS["ambient.bedSlope"])).toBe(
      'must be a bed slope (rise over run) (a fraction) from 0 to 0.5, e.g. 0.45 or "45 %"',
    );
    const recovery: FieldBounds = {
      form: "fraction",
      kind: "ratio",
      what: "recovery",
      min: 0,
      max: 0.9,
      exclusiveMin: true,
    };
    expect(expectationFor(recovery)).toBe(
      'must be a recovery (a fraction) greater than 0 and at most 0.9, e.g. 0.45 or "45 %"',
    );
  });
});

describe("the words of every bounded field, as the file reader says them", () => {
  it.each([
    ["ambient.depth", 'must be a positive water depth up to 1000 m (e.g. 12 or "40 ft")'],
    ["ambient.temperature", 'must be an ambient temperature from -2 to 60 °C (e.g. 20 or "20 degC")'],
    ["ambient.currentDirection", 'must be a current direction from 0 to 360 ° (e.g. 60 or "60 deg")'],
    ["ambient.bedSlopeAzimuth", 'must be a downslope direction from 0 to 360 ° (e.g. 60 or "60 deg")'],
    ["discharge.flow", 'must be a positive total brine flow up to 100 m³/s (e.g. 0.5 or "12 MGD")'],
    [
      "discharge.salinity",
      'must be a discharge salinity from 0 to 160 g/kg Absolute Salinity (e.g. 68, "68 g/kg", "36 psu" or "40000 mg/L")',
    ],
    ["discharge.temperature", 'must be a discharge temperature from -2 to 60 °C (e.g. 20 or "20 degC")'],
    ["diffuser.portHeight", 'must be a port height above the seabed from 0 to 100 m (e.g. 12 or "40 ft")'],
    ["diffuser.portAzimuth", 'must be a port azimuth from 0 to 360 ° (e.g. 60 or "60 deg")'],
    ["diffuser.diffuserAzimuth", 'must be a diffuser axis azimuth from 0 to 360 ° (e.g. 60 or "60 deg")'],
    ["diffuser.length", 'must be a diffuser length from 0 to 10000 m (e.g. 12 or "40 ft")'],
    ["mixingZone.radius", 'must be a positive mixing-zone radius up to 20000 m (e.g. 12 or "40 ft")'],
    [
      "plant.blendRatio",
      'must be a blend ratio (total blending flow ÷ brine flow) from 0 to 100 (e.g. 0.45 or "45 %")',
    ],
  ])("%s", (path, words) => {
    expect(expectationFor(fieldBounds(path)!)).toBe(words);
  });
});

describe("field bounds on a normalised scenario", () => {
  it("accepts the base scenario", () => {
    expect(scenarioRuleIssues(base)).toEqual([]);
  });

  it("reports a uniform ambient's salinity and temperature once, at the uniform field", () => {
    const profile = base.ambient.profile.map((p) => ({ ...p, salinity: 81, temperature: 61 }));
    expect(messages({ ...base, ambient: { ...base.ambient, profile } })).toEqual([
      `ambient.salinity: 81 ${expectationFor(FIELD_BOUNDS["ambient.salinity"])}`,
      `ambient.temperature: 61 ${expectationFor(FIELD_BOUNDS["ambient.temperature"])}`,
    ]);
  });

  it("reports each profile point of a non-uniform ambient by its index", () => {
    const profile = [
      { depth: 0, salinity: 36, temperature: 20 },
      { depth: 7, salinity: 90, temperature: 20 },
      { depth: 15, salinity: 37, temperature: -3 },
    ];
    const issues = scenarioRuleIssues({ ...base, ambient: { ...base.ambient, profile, uniform: false } });
    expect(issues.map((i) => i.path)).toEqual(["ambient.profile.1.salinity", "ambient.profile.2.temperature"]);
  });

  it("checks current, direction, bed slope and its azimuth of the stated ambient", () => {
    const a = { ...base.ambient, currentSpeed: 5.01, currentDirection: 361, bedSlope: 0.51, bedSlopeAzimuth: -1 };
    expect(scenarioRuleIssues({ ...base, ambient: a }).map((i) => i.path)).toEqual([
      "ambient.currentSpeed",
      "ambient.currentDirection",
      "ambient.bedSlope",
      "ambient.bedSlopeAzimuth",
    ]);
    expect(messages({ ...base, ambient: { ...base.ambient, currentSpeed: 6 } })).toEqual([
      'ambient.currentSpeed: 6 must be a current speed from 0 to 5 m/s (e.g. 0.1 or "0.2 knot")',
    ]);
  });

  it("checks ambient cases by their index, without the bed slope a case cannot set", () => {
    const c = lowCase(1001, { currentSpeed: 7, bedSlope: 0.9 });
    expect(scenarioRuleIssues({ ...base, ambientCases: [lowCase(10), c] }).map((i) => i.path)).toEqual([
      "ambientCases.1.depth",
      "ambientCases.1.currentSpeed",
    ]);
  });

  it("checks the discharge when given directly, not when computed from a plant", () => {
    const hot = { ...base, discharge: { ...base.discharge, temperature: 61, flow: 0, salinity: 161 } };
    expect(scenarioRuleIssues(hot).map((i) => i.path)).toEqual([
      "discharge.flow",
      "discharge.salinity",
      "discharge.temperature",
    ]);
    const plant = { productFlow: 0.25, recovery: 0.5, feedSalinity: 36, saltRejection: 0.997, blending: [] };
    expect(scenarioRuleIssues({ ...hot, discharge: { ...hot.discharge, flow: 0.25 }, plant })).toEqual([]);
  });

  it("checks every diffuser field, the mixing-zone radius, and stops before the cross-field rules", () => {
    const s = withDiffuser({
      portCount: 1.5,
      portDiameterNominal: 3.1,
      portAngle: 91,
      portHeight: 101,
      portAzimuth: 361,
      diffuserAzimuth: 361,
      length: 10001,
    });
    expect(scenarioRuleIssues({ ...s, mixingZone: { ...s.mixingZone, radius: 0 } }).map((i) => i.path)).toEqual([
      "diffuser.portCount",
      "diffuser.portDiameter",
      "diffuser.portAngle",
      "diffuser.portHeight",
      "diffuser.portAzimuth",
      "diffuser.diffuserAzimuth",
      "diffuser.length",
      "mixingZone.radius",
    ]);
  });

  it("checks the port spacing only for a multi-port diffuser that states one", () => {
    expect(messages(withDiffuser({ portSpacing: 1001 }))).toEqual([
      'diffuser.portSpacing: 1001 must be a positive port spacing up to 1000 m (e.g. 12 or "40 ft")',
    ]);
    expect(messages(withDiffuser({ layout: "single", portCount: 1, flowSplit: [1], portSpacing: 1001 }))).toEqual([]);
    expect(messages(withDiffuser({ layout: "line", portCount: 1, flowSplit: [1], portSpacing: 1001 }))).toEqual([]);
  });
});

describe("cross-field rules", () => {
  it("a single-port layout has one port", () => {
    const issues = scenarioRuleIssues(withDiffuser({ layout: "single" }));
    expect(issues.map((i) => i.message)).toEqual([
      'diffuser.portCount: 4 must be 1 for layout "single" (use "line" or "rosette" for more ports)',
    ]);
  });

  it("a line of ports needs a spacing, more than the port diameter", () => {
    expect(messages(withDiffuser({ portSpacing: 0 }))).toEqual([
      "diffuser.portSpacing: 0 expected the spacing between ports (m) for a diffuser with more than one port",
    ]);
    const overlap = scenarioRuleIssues(withDiffuser({ portSpacing: 0.1 }));
    expect(overlap).toEqual([
      {
        path: "diffuser.portSpacing",
        value: 0.1,
        message: "diffuser.portSpacing: 0.1 must be more than the port diameter (0.12 m): the ports would overlap",
        related: ["diffuser.portDiameter"],
      },
    ]);
    expect(scenarioRuleIssues(withDiffuser({ portSpacing: 0.12 }))).toEqual([]);
    expect(scenarioRuleIssues(withDiffuser({ layout: "line", portCount: 1, flowSplit: [1], portSpacing: 0 }))).toEqual(
      [],
    );
  });

  it("a rosette's port count is risers × ports per riser", () => {
    const risers = { count: 2, portsPerRiser: 3, spacing: 10, portAzimuths: [0, 120, 240] };
    expect(messages(withDiffuser({ layout: "rosette", risers }))).toEqual([
      "diffuser.portCount: 4 must equal risers.count × risers.portsPerRiser = 6 (or be left out)",
    ]);
    const six = withDiffuser({ layout: "rosette", risers, portCount: 6, flowSplit: new Array<number>(6).fill(1 / 6) });
    expect(scenarioRuleIssues(six)).toEqual([]);
  });

  it("the diffuser is at least as long as its port layout (to within 1e-9 m)", () => {
    const short = scenarioRuleIssues(withDiffuser({ length: 14 }));
    expect(short).toEqual([
      {
        path: "diffuser.length",
        value: 14,
        message: "diffuser.length: 14 must be at least the port layout's length 15 m",
        related: ["diffuser.portCount", "diffuser.portSpacing", "diffuser.risers.count", "diffuser.risers.spacing"],
      },
    ]);
    expect(scenarioRuleIssues(withDiffuser({ length: 15 - 1e-10 }))).toEqual([]);
    expect(scenarioRuleIssues(withDiffuser({ length: 15 }))).toEqual([]);
    const risers = { count: 3, portsPerRiser: 2, spacing: 10, portAzimuths: [0, 180] };
    const rosette = { layout: "rosette" as const, risers, portCount: 6, flowSplit: new Array<number>(6).fill(1 / 6) };
    expect(messages(withDiffuser({ ...rosette, length: 19 }))).toEqual([
      "diffuser.length: 19 must be at least the port layout's length 20 m",
    ]);
    expect(scenarioRuleIssues(withDiffuser({ ...rosette, length: 20 }))).toEqual([]);
    expect(
      scenarioRuleIssues(withDiffuser({ layout: "rosette", risers: undefined, portSpacing: 100, length: 0 })),
    ).toEqual([]);
  });

  it("the flow split lists one share per port, and nothing else is checked without it", () => {
    const s = withDiffuser({ flowSplit: [0.5, 0.5] });
    const fast = { ...s, discharge: { ...s.discharge, flow: 50 } };
    expect(messages(fast)).toEqual(['diffuser.flowSplit: "2 values" must list one share per port (4)']);
  });

  it(`the fastest port's exit velocity is at most ${MAX_EXIT_VELOCITY} m/s`, () => {
    expect(MAX_EXIT_VELOCITY).toBe(30);
    const area = (Math.PI * 0.12 * 0.12) / 4;
    const at = (v: number, d: Partial<DiffuserInput> = {}) => {
      const s = withDiffuser(d);
      return scenarioRuleIssues({
        ...s,
        discharge: { ...s.discharge, flow: (v * area) / Math.max(...s.diffuser.flowSplit) },
      });
    };
    expect(at(29.99)).toEqual([]);
    const over = at(30.01);
    expect(over).toHaveLength(1);
    expect(over[0]!.path).toBe("diffuser.portDiameter");
    expect(over[0]!.value).toBe(0.12);
    expect(over[0]!.message).toBe(
      `diffuser.portDiameter: 0.12 with a total flow of 1.358 m³/s over 4 ports gives a port exit velocity of 30.01 m/s; Brinefield screens exit velocities up to 30 m/s (usual designs: about ${USUAL_EXIT_VELOCITY_TEXT}) — check the flow, the port count and the diameter`,
    );
    expect(over[0]!.related).toEqual([
      "discharge.flow",
      "plant.productFlow",
      "plant.recovery",
      "diffuser.portCount",
      "diffuser.flowSplit",
      "diffuser.contraction",
      "diffuser.risers.count",
      "diffuser.risers.portsPerRiser",
    ]);
    const single = at(40, { layout: "single", portCount: 1, flowSplit: [1] });
    expect(single[0]!.message).toMatch(/ over 1 port gives a port exit velocity of 40 m\/s;/);
    // The largest share sets the fastest port: an uneven split is faster than the mean.
    const uneven = withDiffuser({ flowSplit: [0.1, 0.1, 0.1, 0.7] });
    const flow = (20 * area) / 0.25;
    expect(scenarioRuleIssues({ ...uneven, discharge: { ...uneven.discharge, flow } })).toHaveLength(1);
    expect(scenarioRuleIssues({ ...base, discharge: { ...base.discharge, flow } })).toEqual([]);
  });

  it("the port's top stays below the surface, with the effective diameter", () => {
    const s = withDiffuser({ portDiameter: 0.5, portDiameterNominal: 0.5, portHeight: 1 });
    const at = (depth: number) => scenarioRuleIssues({ ...s, ambient: { ...s.ambient, depth } });
    expect(at(1.25)).toEqual([
      {
        path: "diffuser.portHeight",
        value: 1,
        message: "diffuser.portHeight: 1 must leave the port below the surface: water depth is 1.25 m",
        related: ["ambient.depth", "diffuser.portDiameter"],
      },
    ]);
    expect(at(1.2500001)).toEqual([]);
  });

  it("and in every ambient case that sets its own depth", () => {
    const s = withDiffuser({ portDiameter: 0.5, portDiameterNominal: 0.5, portHeight: 1 });
    expect(scenarioRuleIssues({ ...s, ambientCases: [lowCase(10), lowCase(1.25)] })).toEqual([
      {
        path: "ambientCases.1.depth",
        value: 1.25,
        message:
          'ambientCases.1.depth: 1.25 must leave the port below the surface in ambient case "low": the port\'s top is 1.25 m above the seabed',
        related: ["diffuser.portHeight", "diffuser.portDiameter"],
      },
    ]);
    expect(scenarioRuleIssues({ ...s, ambientCases: [lowCase(1.2500001)] })).toEqual([]);
    // A case at the stated depth is reported once, at the stated ambient.
    const shallow = { ...s, ambient: { ...s.ambient, depth: 1.2 } };
    expect(scenarioRuleIssues({ ...shallow, ambientCases: [lowCase(1.2)] }).map((i) => i.path)).toEqual([
      "diffuser.portHeight",
    ]);
  });
});
