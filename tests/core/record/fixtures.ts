/** Invented scenarios for the record and intake tests. */
import { parseScenario } from "../../../core/scenario/parse";
import type { Scenario } from "../../../core/scenario/types";
import { fourPortScenarioRaw } from "../../helpers/four-port-scenario";

export const BASE: Record<string, any> = {
  ...fourPortScenarioRaw("Record test: four-port diffuser"),
  options: { addSlackWater: false },
};

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
