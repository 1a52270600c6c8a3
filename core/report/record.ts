/** Report sections for an ambient record (compliance over time, charts) and for the plant's intake. */
import type { BrinefieldResult } from "../result/contract";
import { html, join, raw, reportNumber, type RawHtml } from "./format";
import { recordDilutionSvg, recordDurationSvg, recordIncreaseSvg } from "../record/charts";
import { formatElapsed } from "../record/time";

export function recordHtml(result: BrinefieldResult): RawHtml {
  const rec = result.record;
  if (!rec) return html``;
  const rule =
    rec.percentOfTime !== null
      ? `The limit must be met for at least ${reportNumber(rec.percentOfTime)} % of the record's time (mixingZone.timeCompliance); the margin is the edge dilution reached or bettered for that share of the time divided by the required dilution.`
      : "No time share is set: every step must meet the limit; the margin is the worst step's.";
  const rows: [string, string][] = [
    ["Steps", `${rec.steps} over ${reportNumber(rec.durationHours)} h${rec.start ? ` from ${rec.start}` : ""}`],
    ["Share of time meeting the limit (meetsPercent)", `${reportNumber(rec.meetsPercent)} %`],
    [
      "Share exceeding / outside scope / refused",
      `${reportNumber(rec.exceedsPercent)} % / ${reportNumber(rec.outsideScopePercent)} % / ${reportNumber(rec.refusedPercent)} % (outside-scope and refused steps count as not meeting)`,
    ],
    [
      "Edge dilution min / p5 / p50 / p95",
      `${reportNumber(rec.edgeDilution.min)} / ${reportNumber(rec.edgeDilution.p5)} / ${reportNumber(rec.edgeDilution.p50)} / ${reportNumber(rec.edgeDilution.p95)}`,
    ],
    [
      "Worst step",
      `${formatElapsed(rec.worstStep.time)} from the start: edge dilution ${reportNumber(rec.worstStep.edgeDilution)}, ${rec.worstStep.verdict}`,
    ],
    ["Longest unbroken period not meeting", `${reportNumber(rec.longestExceedanceHours)} h`],
  ];
  return html`<p>${rule}</p>
<p class="note">${rec.note}</p>
<table id="record-table"><tbody>${join(rows.map(([k, v]) => html`<tr><th>${k}</th><td>${v}</td></tr>`))}</tbody></table>
${rec.refusals.length ? html`<p class="note">Refused steps: ${rec.refusals.join(" ")}</p>` : html``}
<figure>${raw(recordDilutionSvg(rec))}<figcaption>Edge dilution against time with the required dilution; periods not meeting the limit shaded.</figcaption></figure>
<figure>${raw(recordIncreaseSvg(rec))}<figcaption>Salinity increase at the mixing-zone edge against time with the allowed increase; periods not meeting the limit shaded.</figcaption></figure>
<figure>${raw(recordDurationSvg(rec))}<figcaption>Duration curve: edge dilution against the percentage of the record's time it is equalled or exceeded.</figcaption></figure>`;
}

export function intakeHtml(result: BrinefieldResult): RawHtml {
  const k = result.intake;
  if (!k) return html``;
  const rows: [string, string][] = [
    [
      "Position",
      `${reportNumber(k.distance)} m from the diffuser centre toward ${reportNumber(k.bearing)}°, ${reportNumber(k.heightAboveSeabed)} m above the seabed`,
    ],
    ["Dilution at the intake (worst)", k.dilution === null ? "no brine reaches it" : reportNumber(k.dilution)],
    ["Salinity increase at the intake (worst)", `${reportNumber(k.salinityIncrease)} g/kg (${k.governingCase})`],
    ["Inside the dense layer", k.inDenseLayer ? "yes" : "no"],
    [
      "Rule applied",
      k.method + (k.upstreamReach !== null ? `; the layer reaches ${reportNumber(k.upstreamReach)} m upstream` : ""),
    ],
  ];
  if (k.overTime)
    rows.push([
      "Over time",
      `salinity increase p50 ${reportNumber(k.overTime.salinityIncrease.p50)}, p95 ${reportNumber(k.overTime.salinityIncrease.p95)}, max ${reportNumber(k.overTime.salinityIncrease.max)} g/kg; brine reaches the intake ${reportNumber(k.overTime.reachedPercent)} % of the time`,
    ]);
  if (k.recirculation)
    rows.push([
      "Plant balance with the brine drawn back in",
      `feed ${reportNumber(k.recirculation.feedSalinity)} g/kg, brine ${reportNumber(k.recirculation.brineSalinity)} g/kg at ${reportNumber(k.recirculation.brineFlow)} m³/s`,
    ]);
  if (k.verdict)
    rows.push([
      "Intake limit",
      `${reportNumber(k.maxSalinityIncrease)} g/kg: ${k.verdict} (judged increase ${reportNumber(k.judgedSalinityIncrease)} g/kg)`,
    ]);
  return html`<table id="intake-table"><tbody>${join(rows.map(([a, b]) => html`<tr><th>${a}</th><td>${b}</td></tr>`))}</tbody></table>
<p class="note">${k.source}</p>`;
}
