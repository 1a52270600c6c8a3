/**
 * The edge dilution is continuous as the current goes to zero, and no far-field chain runs away from the
 * others in a current. These are properties of the physics (a vanishing current cannot change the answer
 * discontinuously; a layer carried by the current has little velocity difference across its top, Ellison &
 * Turner 1959), checked on the demo scenarios and on a sloping-bed case.
 */
import { readFileSync, readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";

const demoDir = join(dirname(fileURLToPath(import.meta.url)), "../../../demo-scenarios");
const demos = readdirSync(demoDir)
  .filter((f) => f.endsWith(".json"))
  .sort();

/** A sloping bed (slope 0.1), three 0.25 m ports in 20 m of water — the steep-slope case. */
const slopingBed = {
  format: "brinefield-scenario",
  version: 1,
  name: "sloping bed",
  discharge: { flow: "0.5 m^3/s", salinity: "70 g/kg", temperature: "20 degC" },
  ambient: {
    depth: "20 m",
    salinity: "35 g/kg",
    temperature: "20 degC",
    currentSpeed: 0,
    currentDirection: 90,
    bedSlope: 0.1,
    bedSlopeAzimuth: 90,
  },
  diffuser: {
    layout: "line",
    portCount: 3,
    portDiameter: "0.25 m",
    portAngle: 60,
    portHeight: "1 m",
    portSpacing: "5 m",
    portAzimuth: 90,
    diffuserAzimuth: 0,
  },
  mixingZone: { radius: "100 m", limits: [{ constituent: "salinity", maxIncrease: "2 g/kg" }] },
};

type Raw = Record<string, any>;
const cases: [string, Raw][] = [
  ...demos.map((f) => [f, JSON.parse(readFileSync(join(demoDir, f), "utf8"))] as [string, Raw]),
  ["sloping bed 0.1", slopingBed],
  [
    "sloping bed 0.1, current across the slope",
    { ...slopingBed, ambient: { ...slopingBed.ambient, currentDirection: 0 } },
  ],
];

function runAt(raw: Raw, currentSpeed: number) {
  const copy = { ...raw, ambientCases: [], ambient: { ...raw.ambient, currentSpeed } };
  const p = parseScenario(copy);
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
  return runScenario(p.scenario);
}

describe("edge dilution as the current goes to zero", () => {
  for (const [name, raw] of cases) {
    it(`${name}: 0, 1 and 2 mm/s give edge dilutions within 10 % of each other, every chain likewise`, () => {
      const still = runAt(raw, 0);
      for (const u of [0.001, 0.002]) {
        const slow = runAt(raw, u);
        const rel = slow.mixingZone.dilution / still.mixingZone.dilution;
        expect(
          Math.abs(rel - 1),
          `${name}: edge at ${u} m/s vs still water (${slow.mixingZone.dilution.toFixed(1)} vs ${still.mixingZone.dilution.toFixed(1)})`,
        ).toBeLessThan(0.1);
        for (const alt of slow.mixingZone.alternatives) {
          const nfMethod = alt.method.split(" ")[0];
          const stillAlt = still.mixingZone.alternatives.find((a) => a.method.startsWith(nfMethod));
          expect(stillAlt, `${name}: ${nfMethod} chain exists in still water`).toBeDefined();
          const r = alt.dilution / stillAlt!.dilution;
          expect(Math.abs(r - 1), `${name}: ${alt.method} at ${u} m/s vs still water`).toBeLessThan(0.1);
        }
      }
    });
  }
});

describe("far-field chains in a 0.3 m/s current", () => {
  for (const [name, raw] of cases) {
    it(`${name}: no chain in mixingZone.alternatives gives more than 4× another at the edge`, () => {
      const r = runAt(raw, 0.3);
      const d = r.mixingZone.alternatives.map((a) => a.dilution);
      expect(d.length, "at least one chain").toBeGreaterThan(0);
      const spread = Math.max(...d) / Math.min(...d);
      expect(
        spread,
        `${name}: ${r.mixingZone.alternatives.map((a) => `${a.method} ${a.dilution.toFixed(1)}`).join("; ")}`,
      ).toBeLessThanOrEqual(4);
    });
  }
});
