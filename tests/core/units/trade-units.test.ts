/**
 * The trade's ways of writing plant flows and fractions. Conversion factors are exact by definition:
 * 1 day = 86 400 s; 1 L = 1e-3 m³ (SI Brochure, BIPM 2019, table 8); 1 US gallon = 3.785411784 L
 * (NIST SP 811, 2008, appendix B). MLD (megalitres per day) and MGD (million US gallons per day) are the
 * trade's shorthands for plant capacity (common practice, no source).
 */
import { describe, expect, it } from "vitest";
import { quantityToSI } from "../../../core/units";
import { parseScenario } from "../../../core/scenario/parse";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { assertRelative } from "../../helpers/assert";

const DAY = 86_400;

function si(text: string, kind: Parameters<typeof quantityToSI>[1]): number {
  const r = quantityToSI(text, kind);
  if (!r.ok) throw new Error(`${text}: ${r.message}`);
  return r.value;
}

describe("flows in the units of the trade", () => {
  it.each([
    ["150000 m3/d", 150_000 / DAY],
    ["150000 m^3/d", 150_000 / DAY],
    ["150000 m³/d", 150_000 / DAY],
    ["150000 m3/day", 150_000 / DAY],
    ["6250 m3/h", 6250 / 3600],
    ["40 MLD", (40e6 * 1e-3) / DAY],
    ["40 ML/d", (40e6 * 1e-3) / DAY],
    ["12 MGD", (12e6 * 3.785411784e-3) / DAY],
    ["300 L/s", 0.3],
    ["0.5 m3/s", 0.5],
  ])("reads %s as a flow", (text, expected) => {
    assertRelative(si(text, "flow"), expected, 1e-12, text);
  });

  it("refuses a flow given as a length, naming what was expected", () => {
    const r = quantityToSI("12 m", "flow");
    expect(r.ok, "12 m is not a flow").toBe(false);
    if (!r.ok) expect(r.message, "names the expected unit").toMatch(/m³\/s/);
  });

  it("still reads an ordinary dm, mm or cm length (the d-for-day rule only applies after a slash)", () => {
    assertRelative(si("250 mm", "smallLength"), 0.25, 1e-12, "250 mm");
    assertRelative(si("3 dm", "smallLength"), 0.3, 1e-12, "3 dm");
  });
});

describe("fractions as percentages", () => {
  it.each([
    ["45 %", 0.45],
    ["45%", 0.45],
    ["99.6 %", 0.996],
    ["0.45", 0.45],
  ])("reads %s as a fraction", (text, expected) => {
    assertRelative(si(text, "ratio"), expected, 1e-12, text);
  });

  it("refuses a unit on a fraction, saying a percentage is accepted", () => {
    const r = quantityToSI("45 m", "ratio");
    expect(r.ok, "45 m is not a fraction").toBe(false);
    if (!r.ok) expect(r.message, "offers the percentage form").toMatch(/45 %/);
  });
});

describe("a scenario written in the trade's units", () => {
  const root = join(__dirname, "../../..");
  const base = () =>
    JSON.parse(readFileSync(join(root, "demo-scenarios", "island-cove.json"), "utf8")) as Record<string, any>;

  it("accepts 150000 m3/d product flow at 45 % recovery and gives the same brine as SI numbers", () => {
    // A large plant needs a long diffuser: 20 ports of 0.25 m keep the exit velocity near 2 m/s.
    const bigDiffuser = (raw: Record<string, any>) =>
      Object.assign(raw.diffuser, { portCount: 20, portDiameter: 0.25, portSpacing: 6 });
    const typed = base();
    bigDiffuser(typed);
    typed.plant.productFlow = "150000 m3/d";
    typed.plant.recovery = "45 %";
    typed.plant.saltRejection = "99.6 %";
    const plain = base();
    bigDiffuser(plain);
    plain.plant.productFlow = 150_000 / DAY;
    plain.plant.recovery = 0.45;
    plain.plant.saltRejection = 0.996;
    const a = parseScenario(typed);
    const b = parseScenario(plain);
    expect(a.ok, a.ok ? "" : a.issues.map((i) => i.message).join("; ")).toBe(true);
    expect(b.ok, "SI numbers parse").toBe(true);
    if (!a.ok || !b.ok) return;
    // Brine flow Qb = Qp (1 − r)/r (plant mass balance, common practice, no source).
    assertRelative(a.scenario.discharge.flow, ((150_000 / DAY) * 0.55) / 0.45, 1e-12, "brine flow from the plant");
    assertRelative(a.scenario.discharge.flow, b.scenario.discharge.flow, 1e-12, "same brine flow either way");
    assertRelative(
      a.scenario.discharge.salinity,
      b.scenario.discharge.salinity,
      1e-12,
      "same brine salinity either way",
    );
  });

  it("accepts 40 MLD as a brine flow", () => {
    const raw = base();
    delete raw.plant;
    raw.discharge = { ...raw.discharge, flow: "40 MLD", salinity: 70, temperature: 25 };
    raw.diffuser.portDiameter = 0.3;
    const r = parseScenario(raw);
    expect(r.ok, r.ok ? "" : r.issues.map((i) => i.message).join("; ")).toBe(true);
    if (r.ok) assertRelative(r.scenario.discharge.flow, 40_000 / DAY, 1e-12, "40 MLD in m³/s");
  });

  it("refuses 90 % recovery and more with the field's range", () => {
    const raw = base();
    raw.plant.recovery = "95 %";
    const r = parseScenario(raw);
    expect(r.ok, "95 % is above the 0.9 limit").toBe(false);
    if (!r.ok) expect(r.issues[0]?.path, "reported on the recovery").toBe("plant.recovery");
  });

  it("names the flow among the fields behind a too-fast port jet, so the app can show it where the flow was typed", () => {
    const raw = base();
    delete raw.plant;
    raw.discharge = { ...raw.discharge, flow: "12 MGD", salinity: 70, temperature: 25 };
    const r = parseScenario(raw);
    expect(r.ok, "12 MGD through the cove's small ports is too fast").toBe(false);
    if (r.ok) return;
    const jet = r.issues.find((i) => /exit velocity/.test(i.message));
    expect(jet?.related, "the flow is one of the fields behind the exit velocity").toContain("discharge.flow");
  });

  it("names the water depth behind a port above the surface", () => {
    const raw = base();
    raw.ambient.depth = 1;
    const r = parseScenario(raw);
    expect(r.ok, "1 m of water is too shallow").toBe(false);
    if (r.ok) return;
    const top = r.issues.find((i) => i.path === "diffuser.portHeight");
    expect(top?.related, "the depth is named").toContain("ambient.depth");
  });
});

describe("the micro sign", () => {
  it("reads µg/L (micro sign or Greek mu) as ug/L: 1 µg/L = 0.001 mg/L (SI prefixes, BIPM 2019 SI Brochure)", async () => {
    const { convertUnit } = await import("../../../core/units/units");
    expect(convertUnit(1, "\u00b5g/L", "mg/L")).toBeCloseTo(0.001, 15);
    expect(convertUnit(1, "\u03bcg/L", "mg/L")).toBeCloseTo(0.001, 15);
    expect(convertUnit(2, "mg/L", "\u00b5g/L")).toBeCloseTo(2000, 9);
  });
});
