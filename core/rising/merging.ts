/**
 * Merging of neighbouring rising plumes on a multiport diffuser.
 *
 * Criterion (geometric, as for dense jets): neighbouring plumes merge where a plume's full width equals
 * the spacing between their centrelines. A rising round plume's top-hat radius grows as √2·0.12·z
 * (Fischer et al. 1979, from memory), or is read off the integral path; plumes that merge below the
 * field height rise on as a line source, whose dilution at the field height is the larger of the line-plume
 * law S = 0.27·b^(1/3)·z/q (core/multiport/line-plume.ts) and the plane-jet law S = √(m·z)/(2.38·q)
 * (Fischer et al. 1979, ch. 9, table 9.1, from memory), q and m = U·q the flow and momentum per unit
 * length of diffuser. Roberts, Snyder & Baumgartner
 * (1989) found closely spaced multiport plumes dilute close to a line plume. The merged dilution is the
 * lower of the single-plume and the line-plume value (merging can only lower it here). Ports on one
 * rosette riser are taken as merging at once (their plumes rise from one point; judgement).
 */
import type { Scenario } from "../scenario/types";
import type { JetSource, NearFieldMethodResult } from "../nearfield/types";
import type { MultiportResult } from "../result/contract";
import { portCountFromDiffuser } from "../multiport/port-hydraulics";
import { LINE_PLUME_SOURCE, linePlumeDilutionFromFlux } from "../multiport/line-plume";
import { ROUND_PLUME_TRACER_SPREAD } from "./plume-laws";
import type { RisingField } from "./types";

export const RISING_MERGING_SOURCE =
  `Geometric merging criterion (plume width = spacing) with the line-plume limit (${LINE_PLUME_SOURCE}); ` +
  "multiport buoyant plumes dilute close to a line plume (Roberts, Snyder & Baumgartner 1989)";

export interface RisingMethod {
  readonly nf: NearFieldMethodResult;
  readonly field: RisingField;
}

export interface RisingMerging {
  readonly multiport: MultiportResult;
  readonly methods: RisingMethod[];
}

/** Spacing between neighbouring plume sources seen across the diffuser, m (Infinity for one source). */
function sourceSpacing(scenario: Scenario): number {
  const d = scenario.diffuser;
  if (d.layout === "rosette" && d.risers) return d.risers.count > 1 ? d.risers.spacing : Infinity;
  // Plumes rise nearly vertically: the spacing along the diffuser is what separates them.
  return d.portCount > 1 ? d.portSpacing : Infinity;
}

/** Height at which one method's plume reaches the full width `spacing`, m (Infinity if it never does). */
function mergingHeight(nf: NearFieldMethodResult, field: RisingField, spacing: number): number {
  const path = nf.path;
  if (path && path.length >= 2) {
    for (const p of path) if (2 * p.halfWidth >= spacing) return p.z;
    return Infinity;
  }
  const z = spacing / (2 * Math.SQRT2 * ROUND_PLUME_TRACER_SPREAD);
  return z <= field.height ? z : Infinity;
}

export function risingMultiport(scenario: Scenario, jet: JetSource, methods: readonly RisingMethod[]): RisingMerging {
  const n = portCountFromDiffuser(scenario);
  const d = scenario.diffuser;
  if (n <= 1) {
    return {
      multiport: {
        regime: "single-port",
        merged: false,
        portsUsed: 1,
        reason: "One port: no neighbouring plumes.",
        spacingRatio: null,
        dilutionFactor: 1,
        source: RISING_MERGING_SOURCE,
      },
      methods: [...methods],
    };
  }
  const spacing = sourceSpacing(scenario);
  const riserMerge = d.layout === "rosette" && d.risers !== undefined && d.risers.portsPerRiser > 1;
  const lineLength =
    d.layout === "rosette" && d.risers
      ? Math.max(d.risers.count, 1) * (Number.isFinite(spacing) ? spacing : 0)
      : n * d.portSpacing;
  const q = lineLength > 0 ? scenario.discharge.flow / lineLength : Infinity;
  let worst = 1;
  const notes: string[] = [];
  const out = methods.map((m) => {
    if (m.field.kind === "none") return m;
    // Ports on one riser: one round plume carrying k ports' flow, S ∝ B^(1/3)/Q → × k^(−2/3) (DERIVED).
    const k = riserMerge ? d.risers!.portsPerRiser : 1;
    const sRiser = m.field.dilution * Math.pow(k, -2 / 3);
    const zMerge = mergingHeight(m.nf, m.field, spacing);
    const linesUp = zMerge < m.field.height && Number.isFinite(q);
    if (!linesUp && !riserMerge) return m;
    const sLine = linesUp
      ? Math.max(
          linePlumeDilutionFromFlux(q, jet.reducedGravity, m.field.height),
          planeJetDilution(q, jet.velocity * q, m.field.height),
        )
      : Infinity;
    // A dilution is at least 1 (the undiluted discharge): scaling a weak plume by k^(−2/3) must not go below it.
    const merged = Math.max(1, Math.min(m.field.dilution, sRiser, sLine));
    const factor = merged / m.field.dilution;
    worst = Math.min(worst, factor);
    const parts: string[] = [];
    if (riserMerge)
      parts.push(`the ${k} plumes of each riser rise as one (dilution × ${Math.pow(k, -2 / 3).toFixed(3)})`);
    if (linesUp)
      parts.push(
        `neighbouring plumes merge ${zMerge.toFixed(2)} m above the ports (spacing ${spacing.toFixed(2)} m) and rise as a line plume (q = ${q.toPrecision(3)} m²/s), dilution ${sLine.toFixed(1)} at ${m.field.height.toFixed(2)} m`,
      );
    const note = `Merging (${m.nf.method}): ${parts.join("; ")}; field dilution ${merged.toFixed(1)} (× ${factor.toFixed(3)}).`;
    notes.push(note);
    const field = { ...m.field, dilution: merged, halfWidth: m.field.halfWidth };
    // Along the path the dilution is held at the merged value once it would exceed it (stays non-decreasing).
    const nf: NearFieldMethodResult = {
      ...m.nf,
      path: m.nf.path?.map((p) => (p.dilution > merged ? { ...p, dilution: merged } : p)),
      risingField: field,
      nearFieldDilution: merged,
      maxRiseDilution:
        m.nf.maxRiseDilution === null || m.nf.maxRiseDilution === undefined
          ? null
          : Math.min(m.nf.maxRiseDilution, Math.max(merged, m.nf.maxRiseDilution * factor)),
      notes: [...(m.nf.notes ?? []), note],
    };
    return { nf, field };
  });
  const merged = worst < 1 || notes.length > 0;
  return {
    multiport: {
      regime: merged ? "merged-line-source" : "independent",
      merged,
      portsUsed: n,
      reason: merged
        ? notes.join(" ")
        : `The plumes stay apart up to the ${methods.map((m) => `${m.nf.method} field height ${m.field.height.toFixed(1)} m`).join(", ")} (spacing ${spacing.toFixed(2)} m): each port dilutes as a single plume.`,
      spacingRatio: null,
      dilutionFactor: worst,
      source: RISING_MERGING_SOURCE,
    },
    methods: out,
  };
}

/** Plane-jet centreline dilution S = √(m·z)/(2.38·q), q and m per unit length (at least 1). */
export function planeJetDilution(q: number, m: number, z: number): number {
  if (!(q > 0) || !(m > 0) || !(z > 0)) return 1;
  return Math.max(1, Math.sqrt(m * z) / (2.38 * q));
}
