/** Plain-text lines for the record and the intake (the CLI summary and any text export). */
import type { BrinefieldResult } from "../result/contract";
import { formatNumber } from "../units";
import { formatElapsed } from "./time";

const n = (v: number | null | undefined, unit = "") =>
  v === null || v === undefined || !Number.isFinite(v) ? "—" : `${formatNumber(v, 4)}${unit ? ` ${unit}` : ""}`;

export function recordLines(r: BrinefieldResult): string[] {
  const rec = r.record;
  if (!rec) return [];
  const o = r.overall;
  const rule =
    rec.percentOfTime !== null
      ? `the limit must be met for at least ${formatNumber(rec.percentOfTime)} % of the time`
      : "every step must meet the limit (no timeCompliance set)";
  return [
    "",
    `Ambient record: ${rec.steps} steps over ${n(rec.durationHours, "h")}${rec.start ? ` from ${rec.start}` : ""}; ${rule}.`,
    `  Met for ${n(rec.meetsPercent, "%")} of the time; exceeded ${n(rec.exceedsPercent, "%")}; outside scope ${n(rec.outsideScopePercent, "%")}; refused ${n(rec.refusedPercent, "%")} (outside-scope and refused steps count as not meeting).`,
    `  Edge dilution over time: min ${n(rec.edgeDilution.min)}, p5 ${n(rec.edgeDilution.p5)}, p50 ${n(rec.edgeDilution.p50)}, p95 ${n(rec.edgeDilution.p95)}.`,
    `  Worst step: ${formatElapsed(rec.worstStep.time)} from the start, edge dilution ${n(rec.worstStep.edgeDilution)} (${rec.worstStep.verdict}); longest unbroken period not meeting: ${n(rec.longestExceedanceHours, "h")}.`,
    ...rec.refusals.map((m) => `  refused: ${m}`),
    `  ${rec.note}`,
    "",
    `OVERALL VERDICT: ${o.verdict} — governing: ${o.governingCase} (edge dilution ${n(o.edgeDilution)}, margin ${n(o.margin)})`,
  ];
}

export function intakeLines(r: BrinefieldResult): string[] {
  const k = r.intake;
  if (!k) return [];
  const out = [
    "",
    `Plant intake ${n(k.distance, "m")} from the diffuser centre, bearing ${n(k.bearing, "°")}, ${n(k.heightAboveSeabed, "m")} above the seabed (worst: ${k.governingCase}):`,
    `  dilution ${k.dilution === null ? "— (no brine reaches it)" : n(k.dilution)}, salinity increase ${n(k.salinityIncrease, "g/kg")}, ${k.inDenseLayer ? "inside" : "not inside"} the dense layer — ${k.method}${k.upstreamReach !== null ? ` (layer reaches ${n(k.upstreamReach, "m")} upstream)` : ""}.`,
  ];
  if (k.overTime)
    out.push(
      `  Over time: salinity increase p50 ${n(k.overTime.salinityIncrease.p50, "g/kg")}, p95 ${n(k.overTime.salinityIncrease.p95, "g/kg")}, max ${n(k.overTime.salinityIncrease.max, "g/kg")}; brine reaches the intake ${n(k.overTime.reachedPercent, "%")} of the time.`,
    );
  if (k.recirculation)
    out.push(
      `  With the brine drawn back in (steady plant balance): feed ${n(k.recirculation.feedSalinity, "g/kg")}, brine ${n(k.recirculation.brineSalinity, "g/kg")} at ${n(k.recirculation.brineFlow, "m³/s")}.`,
    );
  if (k.verdict)
    out.push(
      `  Intake limit ${n(k.maxSalinityIncrease, "g/kg")}: ${k.verdict} (judged increase ${n(k.judgedSalinityIncrease, "g/kg")}).`,
    );
  return out;
}
