/** A small valid scenario and readers shared by the scenario rule tests (invented example). */
import { expect } from "vitest";
import { parseScenario, type ScenarioIssue } from "../../../core/scenario";
import type { Scenario } from "../../../core/scenario/types";

export type Raw = Record<string, any>;

/** A 4-port line diffuser, 0.25 m³/s of 65 g/kg brine in 15 m of 36 g/kg water (invented example). */
export function baseRaw(): Raw {
  return {
    format: "brinefield-scenario",
    version: 1,
    name: "Rule test diffuser",
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
  };
}

/** The base scenario after `edit`. */
export function edited(edit: (r: Raw) => void): Raw {
  const r = baseRaw();
  edit(r);
  return r;
}

/** The normalised scenario; fails the test with the issues when refused. */
export function accepted(raw: unknown): Scenario {
  const r = parseScenario(raw);
  expect(r.ok, r.ok ? "" : r.issues.map((i) => i.message).join(" | ")).toBe(true);
  if (!r.ok) throw new Error("refused");
  return r.scenario;
}

/** The issues of a refused scenario; fails the test when it was accepted. */
export function refusedIssues(raw: unknown): readonly ScenarioIssue[] {
  const r = parseScenario(raw);
  expect(r.ok, "the scenario must be refused").toBe(false);
  return r.ok ? [] : r.issues;
}

/** The messages of a refused scenario. */
export function refusedMessages(raw: unknown): string[] {
  return refusedIssues(raw).map((i) => i.message);
}
