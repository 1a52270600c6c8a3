/**
 * The ambient cases every path runs — `run`, the report, compare, sweep, Monte Carlo, design and the app:
 *
 * 1. "stated": the scenario's own ambient (always the first case);
 * 2. every listed ambient case, in file order; a case sets only the fields it gives (`sets`) and takes
 *    every other field from the stated ambient;
 * 3. "slack water": the stated ambient with zero current (a stagnant ambient is often the governing case
 *    for a dense jet — common practice, no source), added unless `options.addSlackWater` is false. When
 *    the stated ambient is already stagnant it is the same water, and its result is reused.
 *
 * A change to an `ambient.*` field (a study variant, a sweep axis, a Monte Carlo draw) applies to the
 * stated ambient and to every case that does not set that field itself: see `withOverrides`.
 * Each case becomes a scenario of its own: the case's ambient replaces `ambient`, `ambientCases` is empty.
 */
import type { AmbientCaseField, AmbientInput, Scenario } from "../scenario/types";
import type { CaseKind } from "../result/contract";
import { ScenarioError } from "../scenario/parse";
import { recordSteps } from "../record/steps";

export const STATED_CASE = "stated";
export const SLACK_WATER_CASE = "slack water";

export interface CaseSpec {
  readonly name: string;
  readonly kind: CaseKind;
  readonly weight: number;
  /** True for the slack-water case added automatically (not listed in the scenario). */
  readonly addedSlackWater: boolean;
  /** The ambient fields this case keeps as its own when the stated ambient changes. */
  readonly keeps: readonly AmbientCaseField[];
  /** Index of an earlier case with the very same water, whose result is reused; null otherwise. */
  readonly sameAs: number | null;
  readonly scenario: Scenario;
  /** A record step whose water breaks a scenario rule: the rule's message (core/record). */
  readonly refused?: string;
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

/**
 * The cases of a scenario: stated, listed, slack water (see the file header) — or, when the scenario has
 * an ambient record, the record's steps (core/record/steps.ts), which replace all of them.
 */
export function expandCases(s: Scenario): CaseSpec[] {
  if (s.ambient.record) return recordSteps(s).map((st) => (st.refused ? { ...st.spec, refused: st.refused } : st.spec));
  const cases: CaseSpec[] = [
    { name: STATED_CASE, kind: "stated", weight: 1, addedSlackWater: false, keeps: [], sameAs: null, scenario: s },
    ...s.ambientCases.map((c): CaseSpec => ({
      name: c.name,
      kind: "listed",
      weight: c.weight,
      addedSlackWater: false,
      keeps: c.sets,
      sameAs: null,
      scenario: scenarioForAmbient(s, c),
    })),
  ];
  if (s.options.addSlackWater) {
    cases.push({
      name: SLACK_WATER_CASE,
      kind: "slack-water",
      weight: 0,
      addedSlackWater: true,
      keeps: ["currentSpeed"],
      sameAs: s.ambient.currentSpeed === 0 ? 0 : null,
      scenario: scenarioForAmbient(s, { ...s.ambient, currentSpeed: 0 }),
    });
  }
  return cases;
}

/**
 * Runs every case with `runOne` — the one case runner of every path — reusing the result of an earlier
 * case with the same water. Errors propagate: a case that breaks a rule refuses the whole scenario (its
 * ScenarioError then names the case).
 */
export function runCases<R>(cases: readonly CaseSpec[], runOne: (c: CaseSpec, index: number) => R): R[] {
  const out: R[] = [];
  cases.forEach((c, i) => {
    if (c.sameAs !== null && c.sameAs < i) {
      out.push(out[c.sameAs]!);
      return;
    }
    try {
      out.push(runOne(c, i));
    } catch (err) {
      if (i > 0 && err instanceof ScenarioError) {
        throw new ScenarioError(err.issues.map((x) => ({ ...x, message: `${x.message} (ambient case "${c.name}")` })));
      }
      throw err;
    }
  });
  return out;
}

/** A sentence saying which cases were run and whether slack water was added. */
export function describeCases(cases: readonly CaseSpec[], s: Scenario): string {
  // Quoted: a case name may itself contain a comma ("Slack water, summer").
  const names = cases.map((c) => `“${c.name}”`).join(", ");
  const slack = cases.find((c) => c.addedSlackWater);
  if (slack) {
    const same = slack.sameAs !== null ? " (the stated water is already stagnant, so it is the same case)" : "";
    return `Ambient cases: ${names}. A slack-water case (the stated water with zero current) was added${same}; set options.addSlackWater to false to leave it out.`;
  }
  return `Ambient cases: ${names}.${s.options.addSlackWater ? "" : " No slack-water case (options.addSlackWater is false)."}`;
}

/**
 * For changes to `ambient.*` fields: which cases keep their own value (the change applies to the stated
 * ambient and every other case). One sentence per case and field; empty when every case follows.
 */
export function keptValueNotes(s: Scenario, paths: readonly string[]): string[] {
  const out: string[] = [];
  const cases = expandCases(s);
  for (const path of paths) {
    if (!path.startsWith("ambient.")) continue;
    const field = path.slice("ambient.".length) as AmbientCaseField;
    for (const c of cases) {
      if (c.keeps.includes(field)) {
        const why = c.addedSlackWater ? "zero current, by definition" : "its own value, set in ambientCases";
        out.push(
          `Case "${c.name}" keeps ${why}, for ${path}; the change applies to the stated conditions and the cases that do not set it.`,
        );
      }
    }
  }
  return out;
}
