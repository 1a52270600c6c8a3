/**
 * The range checks of the properties formulas reach the result: the pressure-from-depth check from the
 * properties stage, and the checks of the two salinity conversions (practical salinity and TDS to g/kg),
 * made while reading the file, through the properties stage's warnings and `runScenario`.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";
import { propertiesFromScenario } from "../../../core/properties/stage";
import { FIELD_BOUNDS } from "../../../core/scenario/bounds";
import { scenarioFixture } from "../farfield/fixtures";
import { addConversionWarnings } from "../../../core/scenario/issue";
import { salinityFromTdsValidityIssues } from "../../../core/properties/salinity-from-tds";
import type { ResultWarning } from "../../../core/warnings";

const demo = JSON.parse(readFileSync(join(__dirname, "../../../demo-scenarios/island-cove.json"), "utf8"));

/** The island-cove demo with the plant replaced by a discharge whose salinity is written as given. */
function withDischargeSalinity(salinity: string) {
  const raw = structuredClone(demo);
  delete raw.plant;
  delete raw.ambientCases;
  raw.discharge = { flow: "0.1 m^3/s", salinity, temperature: "25 degC" };
  const parsed = parseScenario(raw);
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
  return parsed.scenario;
}

const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);

describe("practical salinity outside the PSS-78 range (2–42; UNESCO 1981, Tech. Pap. Mar. Sci. 36, range from memory)", () => {
  it("warns through the properties stage and runScenario for a 75 psu brine, naming the field", () => {
    const scenario = withDischargeSalinity("75 psu");
    const stage = propertiesFromScenario(scenario).warnings.find((w) => w.code === "practical-salinity-out-of-range");
    expect(stage?.parameter, "the warning names the field it came from").toBe("discharge.salinity");
    expect(stage?.value, "the practical salinity as given").toBe(75);
    expect(stage?.range, "PSS-78 range").toEqual([2, 42]);
    expect(codes(runScenario(scenario).warnings), "runScenario collects it").toContain(
      "practical-salinity-out-of-range",
    );
  });
  it("stays quiet for 38 psu seawater", () => {
    const scenario = withDischargeSalinity("38 psu");
    expect(codes(runScenario(scenario).warnings), "inside 2–42").not.toContain("practical-salinity-out-of-range");
  });
  it("names each profile point it came from", () => {
    const raw = structuredClone(demo);
    delete raw.ambientCases;
    raw.ambient.profile = [
      { depth: 0, salinity: "1 psu", temperature: "24 degC" },
      { depth: 10, salinity: "0.5 psu", temperature: "24 degC" },
    ];
    delete raw.ambient.salinity;
    delete raw.ambient.temperature;
    const parsed = parseScenario(raw);
    if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
    const found = propertiesFromScenario(parsed.scenario).warnings.filter(
      (w) => w.code === "practical-salinity-out-of-range",
    );
    expect(
      found.map((w) => [w.parameter, w.value]),
      "one per profile point, each named",
    ).toEqual([
      ["ambient.profile.0.salinity", 1],
      ["ambient.profile.1.salinity", 0.5],
    ]);
  });
});

describe("TDS above the density's range (0–120 g/kg ≈ 0–131 000 mg/L; Nayar et al. 2016, Desalination 390:1–24)", () => {
  it("warns through the properties stage and runScenario for a 150 000 mg/L brine", () => {
    const scenario = withDischargeSalinity("150000 mg/L");
    const stage = propertiesFromScenario(scenario).warnings.find((w) => w.code === "tds-out-of-range");
    expect(stage?.parameter, "names the field").toBe("discharge.salinity");
    expect(stage?.value, "TDS as given, mg/L").toBe(150000);
    expect(codes(runScenario(scenario).warnings), "runScenario collects it").toContain("tds-out-of-range");
  });
  it("stays quiet for an 80 000 mg/L brine", () => {
    expect(codes(runScenario(withDischargeSalinity("80000 mg/L")).warnings), "inside the range").not.toContain(
      "tds-out-of-range",
    );
  });
});

describe("depth outside the pressure-from-depth range (0–10 000 m; IOC, SCOR & IAPSO 2010, TEOS-10 Manual)", () => {
  const deep = (depth: number) =>
    scenarioFixture({
      ambient: {
        depth,
        profile: [
          { depth: 0, salinity: 35, temperature: 10 },
          { depth, salinity: 35, temperature: 10 },
        ],
      },
    });
  it("warns through the properties stage for a 10 500 m column, at the seabed", () => {
    const w = propertiesFromScenario(deep(10500)).warnings.find((x) => x.code === "depth-out-of-range");
    expect(w?.value, "the deepest depth converted").toBe(10500);
  });
  it("stays quiet for a 15 m column", () => {
    expect(codes(propertiesFromScenario(deep(15)).warnings), "inside the range").not.toContain("depth-out-of-range");
  });
  it("cannot be reached from a scenario file: the file's water depth is capped inside the range", () => {
    const cap = FIELD_BOUNDS["ambient.depth"];
    expect(cap.max, "schema cap on ambient.depth, m").toBeLessThanOrEqual(10000);
  });
});

describe("addConversionWarnings()", () => {
  it("keeps one warning per code and field, the value farthest outside (a record converts one field many times)", () => {
    const ctx = { issues: [], conversions: [], warnings: [] as ResultWarning[] };
    for (const tds of [140000, 160000, 135000])
      addConversionWarnings(ctx, "ambient.record.salinity", salinityFromTdsValidityIssues(tds));
    expect(
      ctx.warnings.map((w) => w.value),
      "the worst of the three",
    ).toEqual([160000]);
  });
});
