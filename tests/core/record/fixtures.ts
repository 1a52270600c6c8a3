/** Invented scenarios for the record and intake tests. */
import { parseScenario } from "../../../core/scenario/parse";
import type { Scenario } from "../../../core/scenario/types";

export const BASE = {
  format: "brinefield-scenario",
  version: 1,
  name: "Record test: four-port diffuser",
  discharge: { flow: 0.25, salinity: 65, temperature: 22 },
  ambient: { depth: 15, salinity: 36, temperature: 20, currentSpeed: 0.1, currentDirection: 90 },
  diffuser: {
    layout: "line",
    portCount: 4,
    portDiameter: 0.12,
    portAngle: 60,
    portHeight: 1,
    portSpacing: 5,
    portAzimuth: 0,
    diffuserAzimuth: 90,
  },
  mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxIncrease: 2 }] },
  options: { addSlackWater: false },
} as const;

type Raw = Record<string, unknown>;

/** The base scenario with fields replaced (one level deep per section). */
export function scenarioWith(patch: {
  ambient?: Raw;
  mixingZone?: Raw;
  intake?: Raw;
  plant?: Raw;
  discharge?: Raw | null;
  options?: Raw;
}): Scenario {
  const raw: Raw = {
    ...BASE,
    ambient: { ...BASE.ambient, ...(patch.ambient ?? {}) },
    mixingZone: { ...BASE.mixingZone, ...(patch.mixingZone ?? {}) },
    options: { ...BASE.options, ...(patch.options ?? {}) },
    ...(patch.intake ? { intake: patch.intake } : {}),
  };
  if (patch.plant) {
    raw.plant = patch.plant;
    raw.discharge = { temperature: 22 };
  }
  const p = parseScenario(raw);
  if (!p.ok) throw new Error(p.issues.map((i) => i.message).join("; "));
  return p.scenario;
}

export function parseIssues(patch: { ambient?: Raw; mixingZone?: Raw; intake?: Raw }): string[] {
  const p = parseScenario({
    ...BASE,
    ambient: { ...BASE.ambient, ...(patch.ambient ?? {}) },
    mixingZone: { ...BASE.mixingZone, ...(patch.mixingZone ?? {}) },
    ...(patch.intake ? { intake: patch.intake } : {}),
  });
  return p.ok ? [] : p.issues.map((i) => i.message);
}
