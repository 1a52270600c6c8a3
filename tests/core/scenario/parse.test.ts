import { describe, it, expect } from "vitest";
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { parseScenario, parseScenarioText, MAX_SCENARIO_TEXT } from "../../../core/scenario/parse";
import { inputsHash } from "../../../core/scenario/hash";
import { scenarioJsonSchema } from "../../../core/scenario/schema";
import { assertRelative } from "../../helpers/assert";

const root = join(__dirname, "../../..");
const demoDir = join(root, "demo-scenarios");
const demos = readdirSync(demoDir).filter((f) => f.endsWith(".json"));
const shelf = () => JSON.parse(readFileSync(join(demoDir, "sandy-shelf.json"), "utf8"));

function messages(raw: unknown): string[] {
  const r = parseScenario(raw);
  expect(r.ok, "the scenario should have been rejected").toBe(false);
  return r.ok ? [] : r.issues.map((i) => i.message);
}

describe("parseScenario()", () => {
  it.each(demos)("accepts the demo scenario %s", (file) => {
    const r = parseScenarioText(readFileSync(join(demoDir, file), "utf8"));
    expect(r.ok, `demo ${file} must parse: ${r.ok ? "" : r.issues.map((i) => i.message).join("; ")}`).toBe(true);
  });

  it("converts typed units to SI (mathjs units; MGD and knot defined by the project)", () => {
    const raw = shelf();
    raw.discharge.flow = "12 MGD"; // 1 US gallon = 3.785411784 L exactly (US statute)
    raw.diffuser.portDiameter = "8 in"; // 1 in = 0.0254 m exactly (international inch)
    raw.ambient.currentSpeed = "0.5 knot"; // 1 knot = 1852 m/h exactly (international nautical mile)
    const r = parseScenario(raw);
    expect(r.ok, "scenario with unit strings parses").toBe(true);
    if (!r.ok) return;
    assertRelative(r.scenario.discharge.flow, (12e6 * 3.785411784e-3) / 86400, 1e-12, "12 MGD in m³/s");
    assertRelative(r.scenario.diffuser.portDiameter, 0.2032, 1e-12, "8 in in m");
    assertRelative(r.scenario.ambient.currentSpeed, 1852 / 3600 / 2, 1e-12, "0.5 knot in m/s");
  });

  it("converts practical salinity with the TEOS-10 reference-composition factor 35.16504/35 and says so", () => {
    const raw = shelf();
    raw.ambient.salinity = "35 psu"; // SR = 35.16504/35 × SP (IOC, SCOR & IAPSO 2010, TEOS-10 manual)
    const r = parseScenario(raw);
    expect(r.ok, "psu salinity parses").toBe(true);
    if (!r.ok) return;
    assertRelative(r.scenario.ambient.profile[0]!.salinity, 35.16504, 1e-12, "35 psu → 35.16504 g/kg");
    expect(
      r.scenario.conversions.some((c) => c.includes("practical salinity")),
      "the conversion is reported",
    ).toBe(true);
  });

  it("converts total dissolved solids in mg/L through density and says so", () => {
    const raw = shelf();
    raw.discharge.salinity = "68000 mg/L";
    const r = parseScenario(raw);
    expect(r.ok, "TDS salinity parses").toBe(true);
    if (!r.ok) return;
    // g/kg = (mg/L)/(kg/m³); brine near 1050 kg/m³ → about 64.8 g/kg (definition of the units).
    const s = r.scenario.discharge.salinity;
    expect(s > 63 && s < 66.5, `68000 mg/L should be about 64–66 g/kg, got ${s}`).toBe(true);
    expect(
      r.scenario.conversions.some((c) => c.includes("total dissolved solids")),
      "the conversion is reported",
    ).toBe(true);
  });

  it("rejects bad inputs with the path, the value given and what is expected", () => {
    const cases: [string, (o: any) => void, RegExp][] = [
      [
        "negative diameter",
        (o) => (o.diffuser.portDiameter = "-0.2 m"),
        /^diffuser\.portDiameter: "-0\.2 m" must be a port diameter from/,
      ],
      ["missing field", (o) => delete o.diffuser.portDiameter, /^diffuser\.portDiameter: is missing/],
      ["wrong type", (o) => (o.diffuser.portAngle = true), /^diffuser\.portAngle: true must be/],
      [
        "unknown unit",
        (o) => (o.discharge.flow = "3 furlongs"),
        /^discharge\.flow: "3 furlongs" has a unit Brinefield does not know/,
      ],
      ["negative flow", (o) => (o.discharge.flow = -1), /^discharge\.flow: -1 must be a positive total brine flow/],
      ["angle out of range", (o) => (o.diffuser.portAngle = 120), /^diffuser\.portAngle: 120 must be a port angle/],
      [
        "depth smaller than port height",
        (o) => (o.ambient.depth = 1),
        /^diffuser\.portHeight: 1\.5 must leave the port below the surface/,
      ],
      ["NaN", (o) => (o.discharge.flow = Number.NaN), /^discharge\.flow: NaN must be/],
      [
        "absurd port count",
        (o) => (o.diffuser.portCount = 1e308),
        /^diffuser\.portCount: 1e\+308 must be a whole number of ports from 1 to 1000/,
      ],
      ["misspelt field", (o) => (o.diffuser.portDiamter = 0.2), /^diffuser\.portDiamter: 0\.2 is not a field/],
      ["wrong unit kind", (o) => (o.ambient.depth = "3 kg"), /^ambient\.depth: "3 kg" is not a length/],
      [
        "unknown constituent in a limit",
        (o) => (o.mixingZone.limits[0].constituent = "boron"),
        /^mixingZone\.limits\.0\.constituent: "boron"/,
      ],
      [
        "flow split of the wrong length",
        (o) => (o.diffuser.flowSplit = [1, 2]),
        /^diffuser\.flowSplit: "2 values" must list one share per port \(24\)/,
      ],
    ];
    for (const [what, mutate, pattern] of cases) {
      const raw = shelf();
      mutate(raw);
      const ms = messages(raw);
      expect(
        ms.some((m) => pattern.test(m)),
        `${what}: got ${JSON.stringify(ms)}`,
      ).toBe(true);
    }
  });

  it("says a file from a newer format version is newer instead of misreading it", () => {
    const raw = { ...shelf(), version: 2 };
    expect(messages(raw)[0], "newer version message").toMatch(/newer than this Brinefield understands/);
  });

  it("refuses a file that is not a scenario, not JSON, or too large", () => {
    expect(messages({ ...shelf(), format: "something-else" })[0], "format").toMatch(/not a Brinefield scenario file/);
    const notJson = parseScenarioText("{ not json");
    expect(notJson.ok === false && notJson.issues[0]!.message, "JSON syntax").toMatch(/is not valid JSON/);
    const huge = parseScenarioText(" ".repeat(MAX_SCENARIO_TEXT + 1));
    expect(huge.ok === false && huge.issues[0]!.message, "size limit").toMatch(/refused unread/);
  });

  it("computes brine from plant data by the trade's mass balance (common practice, no source)", () => {
    const raw = shelf();
    delete raw.discharge.flow;
    delete raw.discharge.salinity;
    raw.plant = { productFlow: 1, recovery: 0.4, feedSalinity: 36, saltRejection: 1 };
    let r = parseScenario(raw);
    expect(r.ok, "plant scenario parses").toBe(true);
    if (!r.ok) return;
    // Full rejection at 40 % recovery: brine flow = Qp(1−r)/r = 1.5, salinity 1/(1−r) = 1.667× feed.
    assertRelative(r.scenario.discharge.flow, 1.5, 1e-12, "brine flow at r = 0.4");
    assertRelative(r.scenario.discharge.salinity / 36, 1 / 0.6, 1e-12, "concentration factor at r = 0.4");
    raw.plant.recovery = 0.5;
    r = parseScenario(raw);
    if (!r.ok) throw new Error("plant at r = 0.5 must parse");
    assertRelative(r.scenario.discharge.salinity, 72, 1e-12, "salinity doubles at r = 0.5");
  });

  it("hashes inputs: same physics → same hash; any input change → new hash; name and key order do not matter", () => {
    const a = parseScenario(shelf());
    const renamed = { ...shelf(), name: "Another name" };
    const reordered = Object.fromEntries(Object.entries(shelf()).reverse());
    const changed = shelf();
    changed.diffuser.portAngle = 45;
    const [h, hRenamed, hReordered, hChanged] = [
      a,
      parseScenario(renamed),
      parseScenario(reordered),
      parseScenario(changed),
    ].map((r) => (r.ok ? inputsHash(r.scenario) : ""));
    expect(hRenamed, "renaming keeps the hash").toBe(h);
    expect(hReordered, "key order keeps the hash").toBe(h);
    expect(hChanged, "a changed angle changes the hash").not.toBe(h);
  });

  it("keeps the exported JSON Schema file in step with the schema", () => {
    const onDisk = JSON.parse(readFileSync(join(root, "core/scenario/scenario.schema.json"), "utf8"));
    expect(onDisk, "run `npx brinefield schema --out core/scenario/scenario.schema.json`").toEqual(
      scenarioJsonSchema(),
    );
  });

  it("freezes the normalised scenario", () => {
    const r = parseScenario(shelf());
    if (!r.ok) throw new Error("demo must parse");
    expect(Object.isFrozen(r.scenario.diffuser), "diffuser frozen").toBe(true);
    expect(Object.isFrozen(r.scenario.ambient.profile[0]), "profile points frozen").toBe(true);
  });
});
