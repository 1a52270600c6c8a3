/**
 * The file format's own checks, before normalising: the words each refusal uses, with the field's path,
 * and the bounds of fractions, salinities (g/kg, psu and mg/L) and lists on both sides. The bounds are
 * the project's screening conventions (common practice, no source); the psu and mg/L caps are the g/kg
 * cap itself and 1200 × it (a brine's density stays below 1200 kg/m³: Sharqawy, Lienhard & Zubair 2010,
 * Desalination and Water Treatment 16:354–380, eq. 8 gives about 1090 kg/m³ at 120 g/kg, 20 °C).
 */
import { describe, it, expect } from "vitest";
import { salinity, scenarioFileSchema, scenarioJsonSchema } from "../../../core/scenario/schema";
import { accepted, baseRaw, edited, refusedMessages, type Raw } from "./rule-fixtures";

/** The one message of a scenario refused after `edit`. */
function only(edit: (r: Raw) => void): string {
  const m = refusedMessages(edited(edit));
  expect(m, m.join(" | ")).toHaveLength(1);
  return m[0]!;
}

const plant = (p: Raw) => (r: Raw) => {
  delete r.discharge;
  r.diffuser.portDiameter = 0.3;
  r.plant = { productFlow: 0.5, recovery: 0.5, feedSalinity: 36, feedTemperature: 20, ...p };
};

describe("fractions", () => {
  const RECOVERY = 'must be a recovery ratio (a fraction) greater than 0 and at most 0.9, e.g. 0.45 or "45 %"';
  const REJECTION = 'must be a salt rejection (a fraction) from 0 to 1, e.g. 0.45 or "45 %"';

  it("recovery: above 0 (excluded) up to 0.9 (included), as a number or a percentage", () => {
    expect(only(plant({ recovery: 0 }))).toBe(`plant.recovery: 0 ${RECOVERY}`);
    expect(only(plant({ recovery: 0.91 }))).toBe(`plant.recovery: 0.91 ${RECOVERY}`);
    expect(only(plant({ recovery: "-5 %" }))).toBe(`plant.recovery: "-5 %" ${RECOVERY}`);
    expect(accepted(edited(plant({ recovery: 0.9 }))).plant!.recovery).toBe(0.9);
    expect(accepted(edited(plant({ recovery: "45 %" }))).plant!.recovery).toBeCloseTo(0.45, 15);
    expect(accepted(edited(plant({ recovery: 0.01, productFlow: 0.005 }))).plant!.recovery).toBe(0.01);
  });

  it("salt rejection: from 0 to 1, both included", () => {
    expect(accepted(edited(plant({ saltRejection: 0 }))).plant!.saltRejection).toBe(0);
    expect(accepted(edited(plant({ saltRejection: 1 }))).plant!.saltRejection).toBe(1);
    expect(only(plant({ saltRejection: 1.01 }))).toBe(`plant.saltRejection: 1.01 ${REJECTION}`);
    expect(only(plant({ saltRejection: -0.01 }))).toBe(`plant.saltRejection: -0.01 ${REJECTION}`);
  });

  it("a string that is no fraction gives the reader's reason first; a non-finite number only the range", () => {
    expect(only(plant({ saltRejection: "most" }))).toBe(
      `plant.saltRejection: "most" must be a plain number or a percentage (e.g. 0.45 or "45 %"); ${REJECTION}`,
    );
    expect(only(plant({ saltRejection: Number.POSITIVE_INFINITY }))).toBe(`plant.saltRejection: Infinity ${REJECTION}`);
    expect(only(plant({ saltRejection: true }))).toBe(`plant.saltRejection: true ${REJECTION}`);
  });

  it("contraction from 0.5 and discharge coefficient from 0.3, both up to 1", () => {
    expect(accepted(edited((r) => (r.diffuser.contraction = 0.5))).diffuser.contraction).toBe(0.5);
    expect(only((r) => (r.diffuser.contraction = 0.49))).toBe(
      'diffuser.contraction: 0.49 must be a contraction coefficient (effective/nominal area) (a fraction) from 0.5 to 1, e.g. 0.45 or "45 %"',
    );
    expect(accepted(edited((r) => (r.diffuser.dischargeCoefficient = 0.3))).diffuser.dischargeCoefficient).toBe(0.3);
    expect(only((r) => (r.diffuser.dischargeCoefficient = 1.01))).toMatch(
      /^diffuser\.dischargeCoefficient: 1\.01 must be a port discharge coefficient \(a fraction\) from 0\.3 to 1/,
    );
  });
});

describe("quantities", () => {
  it("a string the unit reader cannot read gives its reason, then the expected range", () => {
    expect(only((r) => (r.diffuser.portAngle = "steep"))).toMatch(
      /^diffuser\.portAngle: "steep" .+; must be a port angle above horizontal from 0 to 90 ° \(e\.g\. 60 or "60 deg"\)$/,
    );
  });

  it("out of range gives the expected range alone, on both sides of an exclusive minimum", () => {
    expect(only((r) => (r.ambient.depth = 0))).toBe(
      'ambient.depth: 0 must be a positive water depth up to 1000 m (e.g. 12 or "40 ft")',
    );
    expect(only((r) => (r.diffuser.portDiameter = 0.004))).toBe(
      'diffuser.portDiameter: 0.004 must be a port diameter from 0.005 to 3 m (e.g. 0.2 or "8 in")',
    );
    const tiny = edited((r) => {
      r.diffuser.portDiameter = 0.005;
      r.discharge.flow = 1e-4;
    });
    expect(accepted(tiny).diffuser.portDiameter).toBe(0.005);
  });

  it("includes both ends of an inclusive range and refuses just outside", () => {
    const ANGLE = 'must be a port angle above horizontal from 0 to 90 ° (e.g. 60 or "60 deg")';
    expect(accepted(edited((r) => (r.diffuser.portAngle = 0))).diffuser.portAngle).toBe(0);
    expect(accepted(edited((r) => (r.diffuser.portAngle = 90))).diffuser.portAngle).toBe(90);
    // 1° = π/180 rad (BIPM 2019 SI Brochure, non-SI units accepted for use with the SI).
    expect(accepted(edited((r) => (r.diffuser.portAngle = "1.5707963267948966 rad"))).diffuser.portAngle).toBeCloseTo(
      90,
      10,
    );
    expect(only((r) => (r.diffuser.portAngle = -0.01))).toBe(`diffuser.portAngle: -0.01 ${ANGLE}`);
    expect(only((r) => (r.diffuser.portAngle = 90.01))).toBe(`diffuser.portAngle: 90.01 ${ANGLE}`);
    expect(accepted(edited((r) => (r.mixingZone.radius = 20000))).mixingZone.radius).toBe(20000);
  });

  it("counts are whole numbers within their range", () => {
    const PORTS = "must be a whole number of ports from 1 to 1000";
    expect(only((r) => (r.diffuser.portCount = 2.5))).toBe(`diffuser.portCount: 2.5 ${PORTS}`);
    expect(only((r) => (r.diffuser.portCount = "4"))).toBe(`diffuser.portCount: "4" ${PORTS}`);
    expect(only((r) => (r.diffuser.portCount = 1001))).toBe(`diffuser.portCount: 1001 ${PORTS}`);
    const risers = (count: number, portsPerRiser: number) => (r: Raw) => {
      delete r.diffuser.layout;
      delete r.diffuser.portCount;
      r.diffuser.risers = { count, portsPerRiser, spacing: 1 };
      r.diffuser.length = 1000;
    };
    expect(only(risers(201, 1))).toBe("diffuser.risers.count: 201 must be a whole number of risers from 1 to 200");
    expect(only(risers(1, 13))).toBe(
      "diffuser.risers.portsPerRiser: 13 must be a whole number of ports per riser from 1 to 12",
    );
  });

  it("describes each quantity field in the JSON Schema with its SI unit and an example", () => {
    const text = JSON.stringify(scenarioFileSchemaJson());
    expect(text).toContain('port diameter in m (number) or a string with a unit, e.g. 0.2 or \\"8 in\\"');
    expect(text).toContain('recovery ratio: a fraction (number) or a percentage string such as \\"45 %\\"');
    expect(text).toContain(
      "ambient salinity: number in g/kg (Absolute Salinity), or a string in g/kg, psu (practical) or mg/L (TDS)",
    );
  });
});

function scenarioFileSchemaJson(): unknown {
  return scenarioJsonSchema();
}

describe("the JSON Schema export", () => {
  it("is draft 2020-12, input side (numbers or strings with units), titled and described", () => {
    // Typed loosely: the export is plain JSON.
    const js = scenarioJsonSchema() as Record<string, any>;
    expect(js.$schema).toBe("https://json-schema.org/draft/2020-12/schema");
    expect(js.title).toBe("Brinefield scenario");
    expect(js.description).toBe("A brine outfall screening scenario (format version 1).");
    const diameter = js.properties.diffuser.properties.portDiameter;
    expect(diameter.type).toEqual(["number", "string"]);
    expect(js.properties.ambient.properties.basin.description).toBe(
      "Enclosed water: {volume, flushingTime} or {volume, exchangeFlow}; a well-mixed box model raises the background",
    );
    expect(js.required).toEqual(["format", "version", "name", "ambient", "diffuser", "mixingZone"]);
  });
});

describe("salinities", () => {
  const AMBIENT =
    'must be an ambient salinity from 0 to 80 g/kg Absolute Salinity (e.g. 68, "68 g/kg", "36 psu" or "40000 mg/L")';

  it("g/kg from 0 to the cap, both included", () => {
    expect(accepted(edited((r) => (r.ambient.salinity = "80 g/kg"))).ambient.profile[0]!.salinity).toBe(80);
    expect(only((r) => (r.ambient.salinity = "80.1 g/kg"))).toBe(`ambient.salinity: "80.1 g/kg" ${AMBIENT}`);
    expect(only((r) => (r.ambient.salinity = -0.1))).toBe(`ambient.salinity: -0.1 ${AMBIENT}`);
  });

  it("psu up to the cap in practical salinity", () => {
    const discharge = (v: unknown) => (r: Raw) => (r.discharge.salinity = v);
    expect(accepted(edited(discharge("150 psu"))).discharge.salinity).toBeCloseTo((150 * 35.16504) / 35, 10);
    expect(only(discharge("160.5 psu"))).toBe(
      'discharge.salinity: "160.5 psu" must be a discharge salinity from 0 to 160 g/kg Absolute Salinity (e.g. 68, "68 g/kg", "36 psu" or "40000 mg/L")',
    );
  });

  it("psu and mg/L from 0, both included, on the scale written", () => {
    for (const v of ["0 psu", "0 mg/L"])
      expect(accepted(edited((r) => (r.ambient.salinity = v))).ambient.profile[0]!.salinity).toBe(0);
    for (const v of ["-1 psu", "-1 mg/L"])
      expect(only((r) => (r.ambient.salinity = v))).toBe(`ambient.salinity: ${JSON.stringify(v)} ${AMBIENT}`);
    // 80 psu is within the cap as written; its Absolute Salinity (80.38 g/kg) is then over it.
    expect(only((r) => (r.ambient.salinity = "80 psu"))).toBe(`ambient.salinity: ${(80 * 35.16504) / 35} ${AMBIENT}`);
  });

  it("mg/L up to 1200 × the cap, read before the density conversion", () => {
    expect(accepted(edited((r) => (r.ambient.salinity = "40000 mg/L"))).ambient.profile[0]!.salinity).toBeGreaterThan(
      38,
    );
    expect(only((r) => (r.ambient.salinity = "96001 mg/L"))).toBe(`ambient.salinity: "96001 mg/L" ${AMBIENT}`);
    // At the cap the schema lets it through; the converted value (about 89 g/kg) is then over 80 g/kg.
    expect(only((r) => (r.ambient.salinity = "96000 mg/L"))).toMatch(/^ambient\.salinity: 8\d\.\d+ must be an ambient/);
  });

  it("an unreadable salinity gives the reader's reason and the range", () => {
    expect(only((r) => (r.ambient.salinity = "salty"))).toMatch(
      /^ambient\.salinity: "salty" .+; must be an ambient salinity/,
    );
  });

  it("calls itself a salinity when no name is given", () => {
    const r = salinity(0, 10).safeParse(11);
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toBe(
      'must be a salinity from 0 to 10 g/kg Absolute Salinity (e.g. 68, "68 g/kg", "36 psu" or "40000 mg/L")',
    );
  });
});

describe("the words of the file format's refusals", () => {
  const constituent = { name: "Boron", concentration: 5, unit: "mg/L" };
  const point = { depth: 0, salinity: 36, temperature: 20 };

  it.each<[string, (r: Raw) => void, string]>([
    ["text", (r) => (r.name = 5), "name: 5 must be text (scenario name)"],
    ["empty text", (r) => (r.name = ""), 'name: "" must not be empty (scenario name)'],
    ["long text", (r) => (r.name = "x".repeat(201)), "must be at most 200 characters (scenario name)"],
    [
      "concentration type",
      (r) => (r.discharge.constituents = [{ ...constituent, concentration: "5" }]),
      'discharge.constituents.0.concentration: "5" must be a number in the constituent\'s unit',
    ],
    [
      "concentration sign",
      (r) => (r.discharge.constituents = [{ ...constituent, concentration: -1 }]),
      "discharge.constituents.0.concentration: -1 must not be negative",
    ],
    [
      "concentration size",
      (r) => (r.discharge.constituents = [{ ...constituent, concentration: 2e9 }]),
      "discharge.constituents.0.concentration: 2000000000 is implausibly large (over 1e9)",
    ],
    [
      "background type",
      (r) => (r.discharge.constituents = [{ ...constituent, background: "1" }]),
      'discharge.constituents.0.background: "1" must be a number in the constituent\'s unit',
    ],
    [
      "background sign",
      (r) => (r.discharge.constituents = [{ ...constituent, background: -1 }]),
      "discharge.constituents.0.background: -1 must not be negative",
    ],
    [
      "constituent count",
      (r) => (r.discharge.constituents = Array.from({ length: 51 }, (_, i) => ({ ...constituent, name: `c${i}` }))),
      "must list at most 50 constituents",
    ],
    [
      "blending count",
      plant({
        blending: Array.from({ length: 21 }, (_, i) => ({ name: `s${i}`, flow: 0.01, salinity: 36, temperature: 20 })),
      }),
      "must list at most 20 blending streams",
    ],
    [
      "empty profile",
      (r) => (delete r.ambient.salinity, delete r.ambient.temperature, (r.ambient.profile = [])),
      "ambient.profile: [] must have at least one point",
    ],
    [
      "long profile",
      (r) => (
        delete r.ambient.salinity,
        delete r.ambient.temperature,
        (r.ambient.profile = Array.from({ length: 501 }, (_, i) => ({ ...point, depth: i / 50 })))
      ),
      "must have at most 500 points",
    ],
    [
      "case weight type",
      (r) => (r.ambientCases = [{ name: "a", weight: "1" }]),
      'ambientCases.0.weight: "1" must be a number',
    ],
    [
      "case weight sign",
      (r) => (r.ambientCases = [{ name: "a", weight: -1 }]),
      "ambientCases.0.weight: -1 must not be negative",
    ],
    [
      "case count",
      (r) => (r.ambientCases = Array.from({ length: 51 }, (_, i) => ({ name: `c${i}` }))),
      "must list at most 50 cases",
    ],
    ["layout", (r) => (r.diffuser.layout = "star"), 'diffuser.layout: "star" must be "single", "line" or "rosette"'],
    ["share type", (r) => (r.diffuser.flowSplit = [1, 1, "1", 1]), 'diffuser.flowSplit.2: "1" must be a number'],
    ["share sign", (r) => (r.diffuser.flowSplit = [1, 1, -1, 1]), "diffuser.flowSplit.2: -1 must not be negative"],
    [
      "limit type",
      (r) => (r.mixingZone.limits = [{ constituent: "salinity", maxIncrease: true }]),
      "mixingZone.limits.0.maxIncrease: true must be a number or a string with a unit",
    ],
    [
      "limit type",
      (r) => (r.mixingZone.limits = [{ constituent: "salinity", maxConcentration: null }]),
      "mixingZone.limits.0.maxConcentration: null must be a number or a string with a unit",
    ],
    [
      "background type",
      (r) => (r.mixingZone.limits = [{ constituent: "salinity", maxIncrease: 2, background: [] }]),
      "mixingZone.limits.0.background: [] must be a number or a string with a unit",
    ],
    [
      "no limits",
      (r) => (r.mixingZone.limits = []),
      "mixingZone.limits: [] must list at least one limit (salinity at least)",
    ],
    [
      "near field",
      (r) => (r.options = { nearFieldForEdge: "best" }),
      'options.nearFieldForEdge: "best" must be "conservative", "length-scale" or "integral"',
    ],
    [
      "far field",
      (r) => (r.options = { farField: "best" }),
      'options.farField: "best" must be "conservative", "gravity-current" or "passive-diffusion"',
    ],
    [
      "slack water",
      (r) => (r.options = { addSlackWater: "yes" }),
      'options.addSlackWater: "yes" must be true or false',
    ],
    [
      "uncertain path",
      (r) => (r.uncertainty = { inputs: [{ path: "diffuser.portAngle", distribution: "normal", sd: 1 }] }),
      'uncertainty.inputs.0.path: "diffuser.portAngle" must be one of ambient.currentSpeed, ambient.currentDirection, ambient.salinity, ambient.temperature, ambient.depth, discharge.salinity, discharge.temperature, discharge.flow',
    ],
    [
      "distribution",
      (r) => (r.uncertainty = { inputs: [{ path: "ambient.depth", distribution: "beta" }] }),
      'uncertainty.inputs.0.distribution: "beta" must be "normal", "uniform", "lognormal" or "triangular"',
    ],
    [
      "plain number type",
      (r) => (r.uncertainty = { inputs: [{ path: "ambient.depth", distribution: "normal", sd: "1" }] }),
      'uncertainty.inputs.0.sd: "1" must be number',
    ],
    ["missing list", (r) => (r.uncertainty = {}), "uncertainty.inputs: is missing; expected: array"],
  ])("%s", (_what, edit, message) => {
    const m = only(edit);
    if (message.includes(": ")) expect(m).toBe(message);
    else expect(m.endsWith(message), m).toBe(true);
  });

  it("reports its own range and unit checks as custom issues, passed on word for word", () => {
    const codes = (edit: (r: Raw) => void) =>
      scenarioFileSchema.safeParse(edited(edit)).error!.issues.map((i) => [i.code, i.path.join(".")]);
    expect(codes((r) => (r.diffuser.portAngle = "steep"))).toEqual([["custom", "diffuser.portAngle"]]);
    expect(codes((r) => (r.diffuser.portAngle = 91))).toEqual([["custom", "diffuser.portAngle"]]);
    expect(codes((r) => (r.ambient.bedSlope = "steep"))).toEqual([["custom", "ambient.bedSlope"]]);
    expect(codes((r) => (r.ambient.bedSlope = 0.9))).toEqual([["custom", "ambient.bedSlope"]]);
  });

  it("format and version words of the schema itself", () => {
    const wrongFormat = scenarioFileSchema.safeParse({ ...baseRaw(), format: "other" });
    expect(wrongFormat.error!.issues.map((i) => i.message)).toEqual(['must be "brinefield-scenario"']);
    const wrongVersion = scenarioFileSchema.safeParse({ ...baseRaw(), version: 2 });
    expect(wrongVersion.error!.issues.map((i) => i.message)).toEqual(["must be 1"]);
  });
});
