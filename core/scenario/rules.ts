/**
 * The scenario rules, in one place: field bounds (declared once in bounds.ts) and the cross-field rules
 * (the port below the surface in every ambient case, a plausible exit velocity, a diffuser long enough for
 * its ports, ports that do not overlap, …). Every path that builds a scenario to compute ends here — the
 * file reader (`normaliseScenario`), overrides of sweeps, studies, Monte Carlo draws and design candidates
 * (`withOverrides`), the app's edits — so a broken scenario gets the same message wherever it comes from.
 */
import type { AmbientInput, Scenario } from "./types";
import { FIELD_BOUNDS, withinBounds, type BoundedPath, type FieldBounds } from "./bounds";
import { expectationFor } from "./fields";
import { USUAL_EXIT_VELOCITY_TEXT } from "../constants";
import { issue, type ScenarioIssue } from "./issue";
import { formatNumber } from "../units";

/** Highest port exit velocity accepted as input, m/s (see the exit-velocity rule below). */
export const MAX_EXIT_VELOCITY = 30;

function checkBound(out: ScenarioIssue[], path: string, b: FieldBounds, value: number): void {
  if (!withinBounds(b, value)) out.push(issue(path, value, expectationFor(b)));
}

function ambientBounds(out: ScenarioIssue[], a: AmbientInput, prefix: string, isCase: boolean): void {
  const at = (field: string) => `${prefix}.${field}`;
  const B = FIELD_BOUNDS;
  checkBound(out, at("depth"), B["ambient.depth"], a.depth);
  checkBound(out, at("currentSpeed"), B["ambient.currentSpeed"], a.currentSpeed);
  checkBound(out, at("currentDirection"), B["ambient.currentDirection"], a.currentDirection);
  if (!isCase) {
    checkBound(out, at("bedSlope"), B["ambient.bedSlope"], a.bedSlope);
    checkBound(out, at("bedSlopeAzimuth"), B["ambient.bedSlopeAzimuth"], a.bedSlopeAzimuth);
  }
  a.profile.forEach((p, i) => {
    const sal = a.uniform ? at("salinity") : `${prefix}.profile.${i}.salinity`;
    const tem = a.uniform ? at("temperature") : `${prefix}.profile.${i}.temperature`;
    if (!a.uniform || i === a.profile.length - 1) {
      checkBound(out, sal, B["ambient.salinity"], p.salinity);
      checkBound(out, tem, B["ambient.temperature"], p.temperature);
    }
  });
}

/** Fields that set the port exit velocity: a too-fast jet is reported on whichever of them was changed. */
const EXIT_VELOCITY_FIELDS = [
  "discharge.flow",
  "plant.productFlow",
  "plant.recovery",
  "diffuser.portCount",
  "diffuser.flowSplit",
  "diffuser.contraction",
  "diffuser.risers.count",
  "diffuser.risers.portsPerRiser",
] as const;

/** Every rule a normalised scenario breaks, as issues naming the path (empty when it may be computed). */
export function scenarioRuleIssues(s: Scenario): ScenarioIssue[] {
  const out: ScenarioIssue[] = [];
  const d = s.diffuser;

  // --- field bounds (the same declaration the file schema is built from) --------------------------------
  fieldBoundIssues(out, s);
  if (out.length > 0) return out;

  // --- port layout ----------------------------------------------------------------------------------------
  if (d.layout === "single" && d.portCount !== 1)
    out.push(
      issue(
        "diffuser.portCount",
        d.portCount,
        'must be 1 for layout "single" (use "line" or "rosette" for more ports)',
      ),
    );
  if (d.layout === "line" && d.portCount > 1) {
    if (!(d.portSpacing > 0)) {
      out.push(
        issue(
          "diffuser.portSpacing",
          d.portSpacing,
          "expected the spacing between ports (m) for a diffuser with more than one port",
        ),
      );
    } else if (d.portSpacing < d.portDiameterNominal) {
      out.push(
        issue(
          "diffuser.portSpacing",
          d.portSpacing,
          `must be more than the port diameter (${formatNumber(d.portDiameterNominal)} m): the ports would overlap`,
          ["diffuser.portDiameter"],
        ),
      );
    }
  }
  if (d.layout === "rosette" && d.risers && d.risers.count * d.risers.portsPerRiser !== d.portCount)
    out.push(
      issue(
        "diffuser.portCount",
        d.portCount,
        `must equal risers.count × risers.portsPerRiser = ${d.risers.count * d.risers.portsPerRiser} (or be left out)`,
      ),
    );
  const naturalLength =
    d.layout === "rosette"
      ? Math.max(0, ((d.risers?.count ?? 1) - 1) * (d.risers?.spacing ?? 0))
      : Math.max(0, (d.portCount - 1) * d.portSpacing);
  if (d.length + 1e-9 < naturalLength)
    out.push(
      issue("diffuser.length", d.length, `must be at least the port layout's length ${formatNumber(naturalLength)} m`, [
        "diffuser.portCount",
        "diffuser.portSpacing",
        "diffuser.risers.count",
        "diffuser.risers.spacing",
      ]),
    );
  if (d.flowSplit.length !== d.portCount) {
    out.push(
      issue("diffuser.flowSplit", `${d.flowSplit.length} values`, `must list one share per port (${d.portCount})`),
    );
    return out;
  }

  // --- exit velocity ----------------------------------------------------------------------------------
  // Port exit velocity bounds: the trade designs for about 2–6 m/s (common practice, no source); anything
  // above 30 m/s (over 45 m of velocity head) is taken as an input mistake, not a design to screen.
  const flow = s.discharge.flow;
  if (Number.isFinite(flow)) {
    const area = (Math.PI * d.portDiameter * d.portDiameter) / 4;
    const fastest = (Math.max(...d.flowSplit) * flow) / area;
    if (fastest > MAX_EXIT_VELOCITY)
      out.push(
        issue(
          "diffuser.portDiameter",
          d.portDiameterNominal,
          `with a total flow of ${formatNumber(flow)} m³/s over ${d.portCount} port${d.portCount === 1 ? "" : "s"} gives a port exit velocity of ${formatNumber(fastest)} m/s; Brinefield screens exit velocities up to ${MAX_EXIT_VELOCITY} m/s (usual designs: about ${USUAL_EXIT_VELOCITY_TEXT}) — check the flow, the port count and the diameter`,
          EXIT_VELOCITY_FIELDS,
        ),
      );
  }

  // --- the port below the surface, under the stated conditions and in every ambient case ----------------
  const top = d.portHeight + d.portDiameter / 2;
  if (top >= s.ambient.depth)
    out.push(
      issue(
        "diffuser.portHeight",
        d.portHeight,
        `must leave the port below the surface: water depth is ${formatNumber(s.ambient.depth)} m`,
        ["ambient.depth", "diffuser.portDiameter"],
      ),
    );
  s.ambientCases.forEach((c, i) => {
    if (top >= c.depth && c.depth !== s.ambient.depth)
      out.push(
        issue(
          `ambientCases.${i}.depth`,
          c.depth,
          `must leave the port below the surface in ambient case "${c.name}": the port's top is ${formatNumber(top)} m above the seabed`,
          ["diffuser.portHeight", "diffuser.portDiameter"],
        ),
      );
  });
  return out;
}

/** Every bounded field of the normalised scenario within its declared bounds (FIELD_BOUNDS). */
function fieldBoundIssues(out: ScenarioIssue[], s: Scenario): void {
  const d = s.diffuser;
  const B = FIELD_BOUNDS;
  ambientBounds(out, s.ambient, "ambient", false);
  s.ambientCases.forEach((c, i) => ambientBounds(out, c, `ambientCases.${i}`, true));
  if (!s.plant) {
    checkBound(out, "discharge.flow", B["discharge.flow"], s.discharge.flow);
    checkBound(out, "discharge.salinity", B["discharge.salinity"], s.discharge.salinity);
    checkBound(out, "discharge.temperature", B["discharge.temperature"], s.discharge.temperature);
  }
  const diffuserFields: [BoundedPath, number][] = [
    ["diffuser.portCount", d.portCount],
    ["diffuser.portDiameter", d.portDiameterNominal],
    ["diffuser.portAngle", d.portAngle],
    ["diffuser.portHeight", d.portHeight],
    ["diffuser.portAzimuth", d.portAzimuth],
    ["diffuser.diffuserAzimuth", d.diffuserAzimuth],
    ["diffuser.length", d.length],
  ];
  for (const [path, v] of diffuserFields) checkBound(out, path, B[path], v);
  if (d.layout !== "single" && d.portCount > 1 && d.portSpacing !== 0)
    checkBound(out, "diffuser.portSpacing", B["diffuser.portSpacing"], d.portSpacing);
  checkBound(out, "mixingZone.radius", B["mixingZone.radius"], s.mixingZone.radius);
}
