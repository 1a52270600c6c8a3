/**
 * Near-field method "integral" for a discharge lighter than the receiving water: the same integral jet
 * model (core/nearfield/integral.ts — the same equations, entrainment closure and solver; the buoyancy
 * force simply points up) read for a rising plume. The plume ends at the surface (the centreline reaches
 * it) or is trapped by the stratification; the trap level is where its buoyancy changes sign (event
 * "neutral-buoyancy"), and the field there takes the centreline dilution the plume had on reaching it —
 * the extra mixing of its overshoot to the maximum rise is not counted (cautious). `maxRiseHeight` is the
 * highest point of the plume's upper edge, as for dense jets, at most the surface.
 */
import { nearFieldIntegral, type IntegralOptions } from "../nearfield/integral";
import type { AmbientColumn, JetSource, NearFieldMethodResult } from "../nearfield/types";
import { warning, type ResultWarning } from "../warnings";
import { bulkBuoyancyFrequencySquared } from "./plume-laws";
import type { RisingField } from "./types";

export const RISING_INTEGRAL_BIAS =
  "For a rising plume the integral model's entrainment closure (Lee & Cheung 1990) reproduces the classical " +
  "pure-jet and pure-plume dilution laws and the trap height of a plume in linear stratification (checked in " +
  "the tests against Fischer et al. 1979 and Morton, Taylor & Turner 1956). No correction is applied. At the " +
  "trap level the dilution on first reaching neutral buoyancy is used; the overshoot's extra mixing is not counted.";

/** Warning codes of the dense-jet reading that do not apply to a rising plume. */
const DENSE_ONLY = new Set([
  "integral-positively-buoyant",
  "integral-no-impact",
  "jet-reaches-surface",
  "jet-trapped",
  "jet-momentum-exhausted",
  // Ranges of the inclined dense-jet laboratory data the model was compared with: not the rising case.
  "integral-froude-outside-validation",
  "integral-angle-outside-validation",
]);

export function risingIntegral(
  jet: JetSource,
  column: AmbientColumn,
  options: IntegralOptions = {},
): NearFieldMethodResult & { risingField: RisingField } {
  const r = nearFieldIntegral(jet, column, { ...options, includePath: true });
  const surface = column.depth - jet.portHeight;
  const events = r.events ?? [];
  const path = r.path ?? [];
  const warnings: ResultWarning[] = r.warnings.filter((w) => !DENSE_ONLY.has(w.code));
  const notes = (r.notes ?? []).filter((n) => !/impact|near field: impact/i.test(n));
  if (!r.available || path.length < 2) {
    return {
      ...r,
      bias: RISING_INTEGRAL_BIAS,
      risingField: {
        kind: "none",
        height: 0,
        dilution: 1,
        distance: 0,
        halfWidth: 0,
        trapHeight: null,
        buoyancyFrequency: 0,
      },
    };
  }
  const last = path[path.length - 1]!;
  const reachedSurface = events.some(
    (e) => e.kind === "surface-contact" && e.z >= surface - 1e-6 * Math.max(1, surface),
  );
  const neutral = events.filter((e) => e.kind === "neutral-buoyancy");
  const n2 = bulkBuoyancyFrequencySquared(column, jet.portHeight);
  let field: RisingField;
  const plan = (x: number, y: number) => Math.hypot(x, y);
  const halfWidthAt = (s: number) => {
    let best = path[0]!;
    for (const p of path) if (Math.abs(p.s - s) < Math.abs(best.s - s)) best = p;
    return best.halfWidth;
  };
  if (reachedSurface) {
    const top = events.filter((e) => e.kind === "surface-contact").reduce((a, b) => (b.s > a.s ? b : a));
    const hw = halfWidthAt(top.s);
    field = {
      kind: "surface",
      height: surface,
      dilution: top.dilution,
      distance: plan(top.x, top.y) + hw,
      halfWidth: hw,
      trapHeight: null,
      buoyancyFrequency: n2 > 0 ? Math.sqrt(n2) : 0,
    };
    notes.push(
      `Reaches the surface ${surface.toFixed(2)} m above the port with centreline dilution ${top.dilution.toFixed(1)}; the surface field starts at the plume's edge.`,
    );
  } else if (neutral.length > 0) {
    // The first sign change on the way up: where the plume's buoyancy is spent (the trap level).
    const n = neutral[0]!;
    const hw = halfWidthAt(n.s);
    field = {
      kind: "trapped",
      height: n.z,
      dilution: n.dilution,
      distance: plan(n.x, n.y) + hw,
      halfWidth: hw,
      trapHeight: n.z,
      buoyancyFrequency: Math.sqrt(Math.max(0, n2)),
    };
    notes.push(
      `Trapped by the stratification: buoyancy vanishes ${n.z.toFixed(2)} m above the port (centreline dilution ${n.dilution.toFixed(1)}); the upper edge overshoots to ${(r.maxRiseHeight ?? n.z).toFixed(2)} m and the plume spreads as a layer near the trap level.`,
    );
  } else {
    // Stopped without reaching the surface or a trap level (length or step limits): keep the last point,
    // and say the result does not apply.
    field = {
      kind: "none",
      height: last.z,
      dilution: last.dilution,
      distance: plan(last.x, last.y),
      halfWidth: last.halfWidth,
      trapHeight: null,
      buoyancyFrequency: 0,
    };
    warnings.push(
      warning(
        "rising-plume-no-end",
        "serious",
        "The rising plume reached neither the surface nor a trap level within the model's limits; its dilutions do not apply.",
        {
          stage: "integral",
        },
      ),
    );
  }
  const maxRise = Math.min(r.maxRiseHeight ?? field.height, surface);
  return {
    ...r,
    maxRiseHeight: maxRise,
    returnDistance: null,
    impactDistance: null,
    impactDilution: null,
    nearFieldDistance: field.distance,
    nearFieldDilution: field.dilution,
    dilutionRange: null,
    impactDilutionFluxAveraged: null,
    nearFieldDilutionFluxAveraged: null,
    entrainedFlow: null,
    bias: RISING_INTEGRAL_BIAS,
    warnings,
    notes,
    // Past the field's start (the overshoot above a trap level) the path's extra mixing is not counted.
    path:
      options.includePath === false
        ? undefined
        : path.map((p) => (p.dilution > field.dilution ? { ...p, dilution: field.dilution } : p)),
    risingField: field,
  };
}
