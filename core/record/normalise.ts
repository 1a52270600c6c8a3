/**
 * From the file's `ambient.record` (schema-checked, every value in SI except salinity and time) to the
 * normalised `AmbientRecord`: times to seconds from the start, salinities to Absolute Salinity, every
 * column the length of `time`, times strictly increasing. Problems come back as issues naming the path.
 */
import type { AmbientRecord } from "../scenario/types";
import { issue, type ScenarioIssue } from "../scenario/issue";
import { parseTime } from "./time";

type SalinityLike = { readonly basis: "absolute" | "practical" | "tds"; readonly value: number; readonly raw: unknown };

export interface RawRecord {
  readonly time: readonly (number | string)[];
  readonly currentSpeed: readonly number[];
  readonly currentDirection: readonly number[];
  readonly depth?: readonly number[];
  readonly salinity?: readonly SalinityLike[];
  readonly temperature?: readonly number[];
}

/**
 * `resolveSalinity(value, temperature)` converts one salinity to g/kg (the scenario reader's own rule);
 * `statedTemperature` is used for psu/TDS conversions when the record has no temperature column.
 */
export function normaliseRecord(
  raw: RawRecord,
  statedTemperature: number,
  resolveSalinity: (s: SalinityLike, temperature: number) => number,
): { record: AmbientRecord | null; issues: ScenarioIssue[]; notes: string[] } {
  const issues: ScenarioIssue[] = [];
  const notes: string[] = [];
  const n = raw.time.length;
  const columns = ["currentSpeed", "currentDirection", "depth", "salinity", "temperature"] as const;
  for (const c of columns) {
    const col = raw[c];
    if (col && col.length !== n)
      issues.push(issue(`ambient.record.${c}`, `${col.length} values`, `must list one value per time (${n} times)`));
  }
  const seconds: number[] = [];
  let kind: "seconds" | "date-time" | null = null;
  let start: string | undefined;
  let origin = 0;
  for (let i = 0; i < n; i++) {
    const t = parseTime(raw.time[i]);
    if (!t.ok) {
      issues.push(issue(`ambient.record.time.${i}`, raw.time[i], t.message));
      if (issues.length > 20) break;
      continue;
    }
    if (kind === null) {
      kind = t.kind;
      if (t.kind === "date-time") {
        start = t.text;
        origin = t.value;
      }
    } else if (kind !== t.kind) {
      issues.push(
        issue(
          `ambient.record.time.${i}`,
          raw.time[i],
          "must be written the same way as the first time: all date-times, or all seconds/durations from the start",
        ),
      );
      break;
    }
    seconds.push(t.kind === "date-time" ? (t.value - origin) / 1000 : t.value);
    const k = seconds.length - 1;
    if (k > 0 && !(seconds[k]! > seconds[k - 1]!)) {
      issues.push(
        issue(
          `ambient.record.time.${i}`,
          raw.time[i],
          "must be later than the time before it (times strictly increasing)",
        ),
      );
      break;
    }
  }
  if (issues.length) return { record: null, issues, notes };
  const temperature = raw.temperature ? [...raw.temperature] : undefined;
  let salinity: number[] | undefined;
  if (raw.salinity) {
    let converted = 0;
    salinity = raw.salinity.map((s, i) => {
      if (s.basis !== "absolute") converted++;
      return resolveSalinity(s, temperature ? temperature[i]! : statedTemperature);
    });
    if (converted > 0)
      notes.push(
        `ambient.record.salinity: ${converted} value(s) converted to Absolute Salinity (g/kg) by the same rule as ambient.salinity`,
      );
  }
  if (kind === "date-time") notes.push(`ambient.record.time: date-times taken as seconds from the first, ${start}`);
  const record: AmbientRecord = {
    time: seconds,
    currentSpeed: [...raw.currentSpeed],
    currentDirection: [...raw.currentDirection],
    ...(raw.depth ? { depth: [...raw.depth] } : {}),
    ...(salinity ? { salinity } : {}),
    ...(temperature ? { temperature } : {}),
    ...(start !== undefined ? { start } : {}),
  };
  return { record, issues, notes };
}
