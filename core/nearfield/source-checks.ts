/**
 * Port-level checks of one round jet, before any near-field method runs (stage "source"). Each check names
 * where its criterion comes from, or says "common practice, no source".
 */
import { warning, type ResultWarning } from "../warnings";
import type { AmbientColumn, JetSource } from "./types";
import { publishedRiseHeights } from "./length-scale";
import { SHARQAWY_2010_VISCOSITY_SOURCE, viscosityFromST } from "../correlations/sharqawy-2010-viscosity";

/** Port Reynolds number below which laboratory jet laws are doubtful. */
export const MIN_PORT_REYNOLDS = 1e4;
export const REYNOLDS_SOURCE =
  "Abdel-Rahman, Al-Fahed & Chakroun (1996), Mech. Res. Commun. 23(3):313–324: near-field centreline decay " +
  "constant 6.11 at Re = 19 400 but 1.35 at Re = 1 430; keep Re ≳ 10⁴";

/** Visible edge spreading angle of a round jet from its axis, degrees (common practice, no source). */
export const JET_EDGE_SPREAD_ANGLE = 12;
/** Port height below which the bed crowds the jet, in port diameters (common practice, no source). */
export const MIN_PORT_HEIGHT_DIAMETERS = 2;
/** Fraction of the depth the rise may use before a near-surface warning (common practice, no source). */
export const SURFACE_MARGIN = 0.9;

/** Port-level warnings for one jet; never throws. */
export function jetSourceWarnings(jet: JetSource, column: AmbientColumn): ResultWarning[] {
  const stage = "source";
  const out: ResultWarning[] = [];

  // 1. Surface contact: largest upper-edge rise of any dataset plus port height against the depth.
  const rises = publishedRiseHeights(jet);
  if (rises.length > 0 && column.depth > 0) {
    const top = rises.reduce((a, b) => (b.height > a.height ? b : a));
    const reach = top.height + Math.max(0, jet.portHeight);
    const beyond = jet.angle > 60 ? " (the port is steeper than any dataset, so the true rise is likely higher)" : "";
    const sum =
      `upper-edge rise ${top.height.toFixed(2)} m + port height ${jet.portHeight.toFixed(2)} m = ` +
      `${reach.toFixed(2)} m`;
    if (reach >= column.depth) {
      out.push(
        warning(
          "jet-reaches-surface",
          "serious",
          `The jet reaches the surface: ${sum} ≥ water depth ${column.depth.toFixed(2)} m${beyond}. ` +
            `Near-field results assume deep water.`,
          {
            parameter: "ambient.depth",
            value: column.depth,
            range: [reach, Infinity],
            source: top.source,
            stage,
          },
        ),
      );
    } else if (reach >= SURFACE_MARGIN * column.depth) {
      out.push(
        warning(
          "jet-near-surface",
          "warning",
          `The jet's upper edge comes within ${(column.depth - reach).toFixed(2)} m of the surface: ` +
            `${sum}, over ${SURFACE_MARGIN * 100} % of the ${column.depth.toFixed(2)} m depth ` +
            `(margin: common practice, no source)${beyond}.`,
          {
            parameter: "ambient.depth",
            value: column.depth,
            range: [reach / SURFACE_MARGIN, Infinity],
            source: top.source,
            stage,
          },
        ),
      );
    }
  }

  // 2. Seabed attachment: shallow angle or a port close to the bed.
  if (jet.angle < JET_EDGE_SPREAD_ANGLE) {
    out.push(
      warning(
        "seabed-attachment-shallow-angle",
        "warning",
        `Discharge angle ${jet.angle.toFixed(1)}° is below about ${JET_EDGE_SPREAD_ANGLE}°, the spreading ` +
          `angle of a jet's lower edge, so the lower edge heads for the bed from the start and the jet ` +
          `may attach to it (common practice, no source).`,
        { parameter: "diffuser.portAngle", value: jet.angle, range: [JET_EDGE_SPREAD_ANGLE, 90], stage },
      ),
    );
  }
  const minHeight = MIN_PORT_HEIGHT_DIAMETERS * jet.diameter;
  if (jet.portHeight < minHeight) {
    out.push(
      warning(
        "seabed-attachment-low-port",
        "warning",
        `Port height ${jet.portHeight.toFixed(2)} m is less than ${MIN_PORT_HEIGHT_DIAMETERS} port ` +
          `diameters (${minHeight.toFixed(2)} m): the bed limits entrainment into the jet's underside ` +
          `and may draw it down (common practice, no source).`,
        { parameter: "diffuser.portHeight", value: jet.portHeight, range: [minHeight, Infinity], stage },
      ),
    );
  }

  // 3. Port Reynolds number, viscosity of the discharge from its salinity and temperature.
  const nu = viscosityFromST(jet.salinity, jet.temperature) / jet.density;
  const reynolds = (jet.velocity * jet.diameter) / nu;
  if (Number.isFinite(reynolds) && reynolds < MIN_PORT_REYNOLDS) {
    out.push(
      warning(
        "port-reynolds-low",
        "warning",
        `Port Reynolds number U·d/ν = ${reynolds.toPrecision(3)} is below 10⁴ ` +
          `(ν = ${nu.toExponential(2)} m²/s at ${jet.salinity.toFixed(1)} g/kg, ` +
          `${jet.temperature.toFixed(1)} °C): laboratory turbulent-jet laws may not hold.`,
        {
          parameter: "port.reynolds",
          value: reynolds,
          range: [MIN_PORT_REYNOLDS, Infinity],
          source: `${REYNOLDS_SOURCE}; viscosity: ${SHARQAWY_2010_VISCOSITY_SOURCE}`,
          stage,
        },
      ),
    );
  }

  // The usual exit-velocity band is checked once per port by the port stage (core/multiport/port-hydraulics.ts).
  return out;
}
