/** A small valid scenario and readers shared by the scenario rule tests (invented example). */
import { expect } from "vitest";
import { parseScenario, type ScenarioIssue } from "../../../core/scenario";
import type { Scenario } from "../../../core/scenario/types";
import { fourPortScenarioRaw } from "../../helpers/four-port-scenario";

export type Raw = Record<string, any>;

/** The shared 4-port base scenario, named for these tests (invented example). */
export function baseRaw(): Raw {
  return fourPortScenarioRaw("Rule test diffuser");
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
