/**
 * Reading a scenario: JSON text → format/version check (with migrations) → schema validation (zod) →
 * normalisation to SI → a frozen `Scenario`. Never throws for bad input: every problem comes back as an
 * issue naming the path, the value given and what is expected.
 */
import type { z } from "zod";
import { scenarioFileSchema, SCENARIO_FORMAT, SCENARIO_VERSION } from "./schema";
import { normaliseScenario, issue, type ScenarioIssue } from "./normalise";
import type { Scenario } from "./types";
import { MAX_INPUT_BYTES, parseJsonText } from "./json-text";

export type { ScenarioIssue } from "./normalise";

export type ParseOutcome =
  | { readonly ok: true; readonly scenario: Scenario; readonly notes: readonly string[] }
  | { readonly ok: false; readonly issues: readonly ScenarioIssue[] };

/** Largest scenario file Brinefield reads (a profile of 500 points is ~40 kB): the one input cap. */
export const MAX_SCENARIO_TEXT = MAX_INPUT_BYTES;
const MAX_ISSUES = 40;

/**
 * Migrations from older format versions, keyed by the version they upgrade FROM. Version 1 is the first
 * published format, so the table is empty; each future version adds one pure function here and a note.
 */
export const SCENARIO_MIGRATIONS: Readonly<
  Record<number, { readonly note: string; readonly migrate: (raw: Record<string, unknown>) => Record<string, unknown> }>
> = {};

/** An error carrying scenario issues, for callers that prefer exceptions (the pipeline, the CLI). */
export class ScenarioError extends Error {
  constructor(readonly issues: readonly ScenarioIssue[]) {
    super(issues.map((i) => i.message).join("\n"));
    this.name = "ScenarioError";
  }
}

function valueAt(raw: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = raw;
  for (const k of path) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<PropertyKey, unknown>)[k];
  }
  return v;
}

function zodIssueToScenarioIssue(raw: unknown, zi: z.core.$ZodIssue): ScenarioIssue[] {
  const path = zi.path.map(String).join(".");
  if (zi.code === "unrecognized_keys") {
    return zi.keys.map((k) =>
      issue(
        path ? `${path}.${k}` : k,
        valueAt(raw, [...zi.path, k]),
        "is not a field of this section; check the spelling (see the format in README.md)",
      ),
    );
  }
  const value = valueAt(raw, zi.path);
  let expectation = zi.message;
  if (zi.code === "invalid_type" && /^Invalid input/.test(expectation)) expectation = `must be ${zi.expected}`;
  if (value === undefined && zi.code === "invalid_type")
    expectation = `expected: ${expectation.replace(/^must be /, "")}`;
  return [issue(path, value, expectation)];
}

/** Validates and normalises a scenario object (already parsed from JSON). */
export function parseScenario(raw: unknown): ParseOutcome {
  if (raw === null || typeof raw !== "object" || Array.isArray(raw)) {
    return { ok: false, issues: [issue("", typeof raw, 'must be a JSON object with "format": "brinefield-scenario"')] };
  }
  let obj = raw as Record<string, unknown>;
  const notes: string[] = [];
  if (obj.format !== SCENARIO_FORMAT) {
    return {
      ok: false,
      issues: [issue("format", obj.format, `must be "${SCENARIO_FORMAT}": this is not a Brinefield scenario file`)],
    };
  }
  const version = obj.version;
  if (typeof version !== "number" || !Number.isInteger(version) || version < 1) {
    return {
      ok: false,
      issues: [
        issue(
          "version",
          version,
          `must be a format version number (this Brinefield reads version ${SCENARIO_VERSION})`,
        ),
      ],
    };
  }
  if (version > SCENARIO_VERSION) {
    return {
      ok: false,
      issues: [
        issue(
          "version",
          version,
          `is newer than this Brinefield understands (it reads up to version ${SCENARIO_VERSION}); the file was written by a newer Brinefield — update Brinefield rather than risk misreading it`,
        ),
      ],
    };
  }
  for (let v = version; v < SCENARIO_VERSION; v++) {
    const m = SCENARIO_MIGRATIONS[v];
    if (!m)
      return { ok: false, issues: [issue("version", version, `has no migration to version ${SCENARIO_VERSION}`)] };
    obj = m.migrate(obj);
    notes.push(`Migrated from format version ${v} to ${v + 1}: ${m.note}`);
  }
  const parsed = scenarioFileSchema.safeParse(obj);
  if (!parsed.success) {
    const seen = new Set<string>();
    const issues = parsed.error.issues
      .flatMap((zi) => zodIssueToScenarioIssue(obj, zi))
      .filter((i) => (seen.has(i.message) ? false : (seen.add(i.message), true)));
    return { ok: false, issues: issues.slice(0, MAX_ISSUES) };
  }
  const { scenario, issues } = normaliseScenario(parsed.data);
  if (!scenario) return { ok: false, issues: issues.slice(0, MAX_ISSUES) };
  return { ok: true, scenario, notes };
}

/** Reads scenario JSON text: size limit, nesting depth, JSON syntax, duplicate keys, then `parseScenario`. */
export function parseScenarioText(text: string): ParseOutcome {
  if (typeof text !== "string") return { ok: false, issues: [issue("", typeof text, "must be text")] };
  const json = parseJsonText(text);
  if (!json.ok) return { ok: false, issues: [{ path: "", value: undefined, message: `(file): ${json.message}` }] };
  return parseScenario(json.value);
}

/** Like parseScenario but throws ScenarioError; for callers inside loops that already validated. */
export function scenarioFromRaw(raw: unknown): Scenario {
  const r = parseScenario(raw);
  if (!r.ok) throw new ScenarioError(r.issues);
  return r.scenario;
}
