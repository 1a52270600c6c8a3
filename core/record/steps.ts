/**
 * The steps of an ambient record as ambient cases: each step is the stated ambient with the record's
 * columns for that step (current speed and direction always; depth, salinity and temperature when given).
 * A step with a salinity or temperature column has a uniform water column (the column's value, and the
 * stated seabed value for the other); otherwise the stated profile, cut or extended to the step's depth.
 * Each step is computed as a quasi-steady state: no brine is carried from one step to the next.
 */
import type { AmbientInput, ProfilePoint, Scenario } from "../scenario/types";
import type { CaseSpec } from "../cases/expand";
import { scenarioForAmbient } from "../cases/expand";
import { formatElapsed } from "./time";
import { formatNumber } from "../units";

export interface RecordStep {
  readonly index: number;
  /** Seconds from the start of the record. */
  readonly time: number;
  /** Seconds this step stands for (until the next step; the last step repeats the interval before it). */
  readonly duration: number;
  /** Set when the step's water breaks a scenario rule: the rule's message. */
  readonly refused?: string;
  /** Index of an earlier step with the very same water, whose result is reused; null otherwise. */
  readonly sameAs: number | null;
  readonly spec: CaseSpec;
}

function profileToDepth(profile: readonly ProfilePoint[], depth: number): ProfilePoint[] {
  const out: ProfilePoint[] = [];
  for (let i = 0; i < profile.length; i++) {
    const p = profile[i]!;
    if (p.depth < depth) out.push(p);
    else {
      const q = i > 0 ? profile[i - 1]! : p;
      const t = p.depth > q.depth ? (depth - q.depth) / (p.depth - q.depth) : 0;
      out.push({
        depth,
        salinity: q.salinity + t * (p.salinity - q.salinity),
        temperature: q.temperature + t * (p.temperature - q.temperature),
      });
      return out;
    }
  }
  const last = out[out.length - 1]!;
  out.push({ ...last, depth });
  return out;
}

export function stepName(time: number): string {
  return `t = ${formatElapsed(time)}`;
}

/** Seconds each step stands for: until the next step; the last repeats the interval before it (1 s alone). */
export function stepDurations(time: readonly number[]): number[] {
  const n = time.length;
  return time.map((t, i) => (i + 1 < n ? time[i + 1]! - t : n > 1 ? t - time[i - 1]! : 1));
}

/** For each step, the index of the first earlier step with the very same water, or null. */
function sameWaterIndices(s: Scenario): (number | null)[] {
  const rec = s.ambient.record!;
  const seen = new Map<string, number>();
  return rec.time.map((_, i) => {
    const key = `${rec.depth?.[i] ?? ""}|${rec.currentSpeed[i]}|${rec.currentDirection[i]}|${rec.salinity?.[i] ?? ""}|${rec.temperature?.[i] ?? ""}`;
    const earlier = seen.get(key);
    if (earlier === undefined) seen.set(key, i);
    return earlier ?? null;
  });
}

/** The steps of the scenario's record (empty when it has none), or only those at `indices`. */
export function recordSteps(s: Scenario, indices?: readonly number[]): RecordStep[] {
  const rec = s.ambient.record;
  if (!rec) return [];
  const a = s.ambient;
  const durations = stepDurations(rec.time);
  const same = sameWaterIndices(s);
  const top = s.diffuser.portHeight + s.diffuser.portDiameter / 2;
  const bottom = a.profile[a.profile.length - 1]!;
  const which = indices ?? rec.time.map((_, i) => i);
  return which.map((i): RecordStep => {
    const time = rec.time[i]!;
    const depth = rec.depth ? rec.depth[i]! : a.depth;
    let profile: readonly ProfilePoint[];
    let uniform = a.uniform;
    if (rec.salinity || rec.temperature) {
      const sal = rec.salinity ? rec.salinity[i]! : bottom.salinity;
      const tem = rec.temperature ? rec.temperature[i]! : bottom.temperature;
      profile = [
        { depth: 0, salinity: sal, temperature: tem },
        { depth, salinity: sal, temperature: tem },
      ];
      uniform = true;
    } else profile = depth === a.depth ? a.profile : profileToDepth(a.profile, depth);
    const ambient: AmbientInput = {
      ...a,
      depth,
      profile,
      uniform,
      currentSpeed: rec.currentSpeed[i]!,
      currentDirection: rec.currentDirection[i]!,
    };
    const earlier = same[i]!;
    const refused =
      top >= depth
        ? `ambient.record.depth.${i}: ${formatNumber(depth)} m leaves the port's top (${formatNumber(top)} m above the seabed) at or above the surface at step ${stepName(time)}`
        : undefined;
    return {
      index: i,
      time,
      duration: durations[i]!,
      ...(refused ? { refused } : {}),
      sameAs: earlier,
      spec: {
        name: stepName(time),
        kind: "record",
        weight: durations[i]!,
        addedSlackWater: false,
        keeps: [],
        sameAs: earlier,
        scenario: scenarioForAmbient(s, ambient),
      },
    };
  });
}
