/**
 * Part of normalising a scenario (normalise.ts): the diffuser — layout (single, line, rosette), port count
 * and spacing, flow split, vena-contracta contraction and the risers of a rosette.
 */
import type { DiffuserInput } from "./types";
import type { ScenarioFileParsed } from "./schema";
import { formatNumber } from "../units";
import { issue, type NormaliseContext as Ctx } from "./issue";

/** Ports usually point across the diffuser axis (common practice, no source): default axis ⟂ port azimuth. */
export function defaultDiffuserAzimuth(portAzimuth: number): number {
  return (portAzimuth + 90) % 360;
}

/** The diffuser with its defaults filled in; layout and count problems are added to the issues. */
export function diffuserFromFile(f: ScenarioFileParsed, ctx: Ctx): DiffuserInput {
  const g = f.diffuser;
  let portCount = g.portCount ?? 1;
  const layout = g.layout ?? (g.risers ? "rosette" : portCount > 1 ? "line" : "single");
  if (layout === "rosette") {
    if (!g.risers)
      ctx.issues.push(
        issue("diffuser.risers", undefined, "expected {count, portsPerRiser, spacing} for a rosette diffuser"),
      );
    else {
      const n = g.risers.count * g.risers.portsPerRiser;
      if (g.portCount !== undefined && g.portCount !== n)
        ctx.issues.push(
          issue(
            "diffuser.portCount",
            g.portCount,
            `must equal risers.count × risers.portsPerRiser = ${n} (or be left out)`,
          ),
        );
      portCount = n;
      if (g.risers.count > 1 && g.risers.spacing === undefined)
        ctx.issues.push(issue("diffuser.risers.spacing", undefined, "expected the spacing between risers (m)"));
      if (g.risers.portAzimuths && g.risers.portAzimuths.length !== g.risers.portsPerRiser)
        ctx.issues.push(
          issue(
            "diffuser.risers.portAzimuths",
            g.risers.portAzimuths,
            `must list ${g.risers.portsPerRiser} azimuths, one per port on a riser`,
          ),
        );
    }
  }
  if (layout === "single" && portCount !== 1)
    ctx.issues.push(
      issue("diffuser.portCount", portCount, 'must be 1 for layout "single" (use "line" or "rosette" for more ports)'),
    );
  if (layout === "line" && portCount > 1 && g.portSpacing === undefined)
    ctx.issues.push(
      issue(
        "diffuser.portSpacing",
        undefined,
        "expected the spacing between ports (m) for a diffuser with more than one port",
      ),
    );
  const portSpacing = g.portSpacing ?? 0;
  // Neighbouring ports closer than a port diameter would overlap on the pipe (geometry, no source).
  if (layout === "line" && portCount > 1 && g.portSpacing !== undefined && g.portSpacing < g.portDiameter * (1 - 1e-9))
    ctx.issues.push(
      issue(
        "diffuser.portSpacing",
        g.portSpacing,
        `must be at least the port diameter (${formatNumber(g.portDiameter)} m): closer ports would overlap`,
      ),
    );
  const portAzimuth = g.portAzimuth ?? 0;
  const diffuserAzimuth = g.diffuserAzimuth ?? defaultDiffuserAzimuth(portAzimuth);
  const riserSpacing = g.risers?.spacing ?? 0;
  const naturalLength =
    layout === "rosette"
      ? Math.max(0, ((g.risers?.count ?? 1) - 1) * riserSpacing)
      : Math.max(0, (portCount - 1) * portSpacing);
  const length = g.length ?? naturalLength;
  let flowSplit: number[];
  if (g.flowSplit) {
    const sum = g.flowSplit.reduce((s, v) => s + v, 0);
    if (g.flowSplit.length !== portCount) {
      ctx.issues.push(
        issue("diffuser.flowSplit", `${g.flowSplit.length} values`, `must list one share per port (${portCount})`),
      );
      flowSplit = [];
    } else if (!(sum > 0) || g.flowSplit.some((v) => v <= 0)) {
      ctx.issues.push(
        issue(
          "diffuser.flowSplit",
          g.flowSplit.slice(0, 5),
          "must list positive shares (any scale; they are normalised)",
        ),
      );
      flowSplit = [];
    } else flowSplit = g.flowSplit.map((v) => v / sum);
  } else flowSplit = new Array<number>(portCount).fill(1 / portCount);
  const contraction = g.contraction ?? 1;
  const effectiveDiameter = g.portDiameter * Math.sqrt(contraction);
  if (contraction !== 1)
    ctx.conversions.push(
      `diffuser.portDiameter: vena-contracta contraction ${formatNumber(contraction)} applied to the area → effective diameter ${formatNumber(effectiveDiameter)} m`,
    );
  const riserAzimuths =
    g.risers &&
    (g.risers.portAzimuths ??
      Array.from(
        { length: g.risers.portsPerRiser },
        (_, k) => (portAzimuth + (360 * k) / g.risers!.portsPerRiser) % 360,
      ));

  const diffuser: DiffuserInput = {
    layout,
    portCount,
    portDiameter: effectiveDiameter,
    portDiameterNominal: g.portDiameter,
    contraction,
    portAngle: g.portAngle,
    portHeight: g.portHeight,
    portSpacing,
    portAzimuth,
    diffuserAzimuth,
    length,
    flowSplit,
    dischargeCoefficient: g.dischargeCoefficient,
    risers: g.risers && {
      count: g.risers.count,
      portsPerRiser: g.risers.portsPerRiser,
      spacing: riserSpacing,
      portAzimuths: riserAzimuths ?? [],
    },
  };
  return diffuser;
}
