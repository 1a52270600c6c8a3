/**
 * The ambient cases a study runs the pipeline under. A scenario with no `ambientCases` has one case,
 * its base ambient ("base"). Unless `options.addSlackWater` is false, a "slack water" case is added —
 * the base ambient with zero current — because a stagnant ambient is often the governing case for a
 * dense jet (common practice, no source). It is not added when a listed case already has zero current.
 * Each case becomes a scenario of its own: the case's ambient replaces `ambient`, `ambientCases` is empty.
 */
import type { AmbientInput, Scenario } from "../scenario/types";

export const SLACK_WATER_CASE = "slack water";
export const BASE_CASE = "base";

export interface StudyCase {
  readonly name: string;
  readonly weight: number;
  /** True for the slack-water case added by the study (not listed in the scenario). */
  readonly addedSlackWater: boolean;
  readonly scenario: Scenario;
}

export function scenarioForAmbient(s: Scenario, ambient: AmbientInput): Scenario {
  const a: AmbientInput = {
    depth: ambient.depth,
    profile: ambient.profile,
    uniform: ambient.uniform,
    currentSpeed: ambient.currentSpeed,
    currentDirection: ambient.currentDirection,
    bedSlope: ambient.bedSlope,
    bedSlopeAzimuth: ambient.bedSlopeAzimuth,
  };
  return Object.freeze({ ...s, ambient: Object.freeze(a), ambientCases: Object.freeze([]) });
}

export function expandCases(s: Scenario): StudyCase[] {
  const cases: StudyCase[] =
    s.ambientCases.length === 0
      ? [{ name: BASE_CASE, weight: 1, addedSlackWater: false, scenario: scenarioForAmbient(s, s.ambient) }]
      : s.ambientCases.map((c) => ({
          name: c.name,
          weight: c.weight,
          addedSlackWater: false,
          scenario: scenarioForAmbient(s, c),
        }));
  const hasSlack = cases.some((c) => c.scenario.ambient.currentSpeed === 0);
  if (s.options.addSlackWater && !hasSlack) {
    cases.push({
      name: SLACK_WATER_CASE,
      weight: 0,
      addedSlackWater: true,
      scenario: scenarioForAmbient(s, { ...s.ambient, currentSpeed: 0 }),
    });
  }
  return cases;
}

/** A sentence saying which cases a study ran and whether slack water was added. */
export function describeCases(cases: readonly StudyCase[], s: Scenario): string {
  const names = cases.map((c) => c.name).join(", ");
  if (cases.some((c) => c.addedSlackWater)) {
    return (
      `Ambient cases: ${names}. A slack-water case (zero current) was added; ` +
      "set options.addSlackWater to false to leave it out."
    );
  }
  if (!s.options.addSlackWater) {
    return `Ambient cases: ${names}. No slack-water case (options.addSlackWater is false).`;
  }
  return (
    `Ambient cases: ${names} ` + "(a listed case already has zero current, so no slack-water case was added)."
  );
}
