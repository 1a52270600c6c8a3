/** The plain-text screening summary printed by `brinefield run`. */
import type { BrinefieldResult } from "../result/contract";
import type { Scenario } from "../scenario/types";
import type { NearFieldMethodResult } from "../nearfield/types";
import { formatNumber as f } from "../units";
import { densityNumber } from "../report/format";
import { intakeLines, recordLines } from "../record/text";

const n = (v: number | null | undefined, unit = "", digits = 3): string =>
  v === null || v === undefined || !Number.isFinite(v) ? "—" : `${f(v, digits)}${unit ? ` ${unit}` : ""}`;

function wrap(text: string, width = 96, indent = ""): string {
  const words = text.split(/\s+/);
  const lines: string[] = [];
  let line = indent;
  for (const w of words) {
    if (line.length + w.length + 1 > width && line.trim()) {
      lines.push(line);
      line = indent;
    }
    line += (line.trim() ? " " : "") + w;
  }
  if (line.trim()) lines.push(line);
  return lines.join("\n");
}

function table(rows: string[][]): string {
  const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => (r[c] ?? "").length)));
  return rows
    .map((r) => "  " + r.map((cell, c) => (c === 0 ? cell.padEnd(widths[c]!) : cell.padStart(widths[c]!))).join("   "))
    .join("\n");
}

export function summaryText(s: Scenario, r: BrinefieldResult): string {
  const rule = "─".repeat(96);
  return (
    [
      rule,
      wrap(r.caution),
      rule,
      "",
      `Brinefield ${r.program.version} — screening summary: ${r.scenarioName}   (inputs ${r.inputsHash})`,
      "",
      ...inputLines(s, r),
      ...densityAndPortLines(r),
      ...nearFieldLines(r),
      ...mixingZoneLines(r),
      ...blendAndBasinLines(r),
      ...complianceLines(r),
      ...intakeLines(r),
      ...ambientCaseLines(r),
      ...warningLines(r),
      "",
      rule,
      wrap(r.caution),
      rule,
    ].join("\n") + "\n"
  );
}

/** The inputs in SI, and the unit conversions applied to them. */
function inputLines(s: Scenario, r: BrinefieldResult): string[] {
  const out: string[] = [];
  out.push("Inputs (SI)");
  const d = s.diffuser;
  const a = s.ambient;
  const top = a.profile[0]!;
  const bottom = a.profile[a.profile.length - 1]!;
  out.push(
    table([
      ["Brine flow", n(s.discharge.flow, "m³/s", 4) + (s.plant ? "  (from plant mass balance)" : "")],
      ["Brine salinity / temperature", `${n(s.discharge.salinity, "g/kg")} / ${n(s.discharge.temperature, "°C")}`],
      ["Water depth", n(a.depth, "m")],
      [
        "Ambient salinity / temperature",
        a.uniform
          ? `${n(top.salinity, "g/kg")} / ${n(top.temperature, "°C")} (uniform)`
          : `${n(top.salinity, "g/kg")} / ${n(top.temperature, "°C")} at surface, ${n(bottom.salinity, "g/kg")} / ${n(bottom.temperature, "°C")} at ${n(bottom.depth, "m")}`,
      ],
      [
        "Current",
        a.currentSpeed > 0
          ? `${n(a.currentSpeed, "m/s")} toward ${n(a.currentDirection, "°")} from north`
          : "none (stagnant)",
      ],
      [
        "Diffuser",
        `${d.layout}, ${d.portCount} port${d.portCount > 1 ? "s" : ""} of ${n(d.portDiameter, "m")}${d.portCount > 1 && d.layout === "line" ? ` at ${n(d.portSpacing, "m")} spacing` : ""}`,
      ],
      ["Port angle / height / azimuth", `${n(d.portAngle, "°")} / ${n(d.portHeight, "m")} / ${n(d.portAzimuth, "°")}`],
      ["Mixing-zone radius", n(s.mixingZone.radius, "m")],
    ]),
  );
  if (r.conversions.length) {
    out.push("", "Conversions applied");
    for (const c of r.conversions) out.push(wrap(`- ${c}`, 96, "  "));
  }
  return out;
}

/** Densities, reduced gravity and the port's exit conditions. */
function densityAndPortLines(r: BrinefieldResult): string[] {
  const out: string[] = [];
  out.push("", "Densities and port (" + r.densities.equationOfState.name + ")");
  out.push(
    table([
      ["Brine density at the port", `${densityNumber(r.densities.discharge)} kg/m³`],
      ["Ambient density at the port", `${densityNumber(r.densities.ambient)} kg/m³`],
      ["Reduced gravity g′", n(r.densities.reducedGravity, "m/s²", 4)],
      ["Flow per port", n(r.port.flow, "m³/s", 4)],
      ["Port exit velocity", n(r.port.velocity, "m/s")],
      ["Densimetric Froude number F", n(r.port.froude, "")],
      ["Port Reynolds number", n(r.port.reynolds, "", 3)],
    ]),
  );
  out.push(wrap(`Equation of state: ${r.densities.equationOfState.reason}`, 96, "  "));
  return out;
}

/** Each near-field method's key distances and dilutions side by side, with its source, bias and notes. */
function nearFieldLines(r: BrinefieldResult): string[] {
  const out: string[] = [];
  if (r.nearField.length) {
    out.push("", "Near field, per port (centreline dilutions; distances in plan from the port)");
    const m = r.nearField;
    const row = (label: string, pick: (x: NearFieldMethodResult) => string) => [label, ...m.map(pick)];
    const ratio = (pick: (x: NearFieldMethodResult) => number | null | undefined): string => {
      const a0 = pick(m[0]!);
      const a1 = m[1] ? pick(m[1]) : null;
      return a0 && a1 ? f(a1 / a0, 3) : "—";
    };
    out.push(
      table([
        ["", ...m.map((x) => x.method), ...(m.length === 2 ? [`${m[1]!.method}/${m[0]!.method}`] : [])],
        [...row("Max rise of upper edge", (x) => n(x.maxRiseHeight, "m")), ratio((x) => x.maxRiseHeight)],
        [...row("Distance to max rise", (x) => n(x.maxRiseDistance, "m")), ratio((x) => x.maxRiseDistance)],
        [...row("Return to port level", (x) => n(x.returnDistance, "m")), ratio((x) => x.returnDistance)],
        [...row("Seabed impact", (x) => n(x.impactDistance, "m")), ratio((x) => x.impactDistance)],
        [...row("Impact dilution", (x) => n(x.impactDilution)), ratio((x) => x.impactDilution)],
        [
          ...row("Impact dilution range", (x) =>
            x.dilutionRange ? `${f(x.dilutionRange[0], 3)}–${f(x.dilutionRange[1], 3)}` : "—",
          ),
          "",
        ],
        [...row("Near-field end", (x) => n(x.nearFieldDistance, "m")), ratio((x) => x.nearFieldDistance)],
        [...row("Near-field dilution", (x) => n(x.nearFieldDilution)), ratio((x) => x.nearFieldDilution)],
        [...row("Entrained seawater flow", (x) => n(x.entrainedFlow, "m³/s")), ratio((x) => x.entrainedFlow)],
      ]),
    );
    for (const x of m) {
      out.push(wrap(`${x.method}: ${x.source}`, 96, "  "));
      if (x.bias) out.push(wrap(`Known bias: ${x.bias}`, 96, "    "));
      for (const note of x.notes ?? []) out.push(wrap(`Note: ${note}`, 96, "    "));
    }
  }
  return out;
}

/** The multiport regime, and dilution, constituents and footprint at the mixing-zone edge. */
function mixingZoneLines(r: BrinefieldResult): string[] {
  const out: string[] = [];
  if (r.multiport) {
    out.push("", `Multiport: ${r.multiport.regime}${r.multiport.merged ? " (merged)" : ""} — ${r.multiport.reason}`);
  }
  if (r.mixingZone) {
    const z = r.mixingZone;
    out.push(
      "",
      `Mixing-zone edge at ${n(z.radius, "m")}: dilution ${n(z.dilution)} (${z.method}; near field from ${z.nearFieldMethod})`,
    );
    if (z.edgeInsideNearField)
      out.push("  The edge lies inside the near field: the jet's own dilution where it crosses the edge is used.");
    for (const alt of z.alternatives) out.push(`  alternative: ${alt.method} → dilution ${n(alt.dilution)}`);
    out.push(
      table([
        ["Constituent", "discharge", "background", "at edge", "increase"],
        ...z.constituents.map((c) => [
          c.constituent,
          `${n(c.discharge)} ${c.unit}`,
          `${n(c.background)} ${c.unit}`,
          `${n(c.concentration)} ${c.unit}`,
          `${n(c.increase)} ${c.unit}`,
        ]),
      ]),
    );
    if (z.layerThickness !== null) out.push(`  Dense-layer thickness at the edge: ${n(z.layerThickness, "m")}`);
    const risingPlume = r.nearField.some((m) => m.risingField !== undefined);
    out.push(
      `  ${risingPlume ? "Field area (surface or trap level)" : "Seabed footprint"} above the governing limit: ${n(z.footprint.area, "m²")}, furthest ${n(z.footprint.furthestExtent, "m")}`,
    );
    for (const m of r.nearField) {
      const f = m.risingField;
      if (f)
        out.push(
          `  Rising plume (${m.method}): ${f.kind === "trapped" ? `trapped ${n(f.trapHeight, "m")} above the port` : f.kind === "surface" ? "reaches the surface" : "no end point"}, dilution ${n(f.dilution)} where the field starts ${n(f.distance, "m")} from the port`,
        );
    }
  }
  return out;
}

/** The blend note and the enclosed basin's raised background. */
function blendAndBasinLines(r: BrinefieldResult): string[] {
  const out: string[] = [];
  if (r.blend) {
    out.push("", wrap(`Blend: ${r.blend.note}`, 96, "  "));
  }
  if (r.basin) {
    const b = r.basin;
    out.push(
      "",
      wrap(
        `Enclosed basin (${b.method}): salinity background raised by ${n(b.backgroundIncrease, "g/kg")} to ${n(b.raisedBackground, "g/kg")} ` +
          `(exchange flow ${n(b.exchangeFlow, "m³/s")}; 95 % of the rise within ${n(b.timeTo95Percent / 86400, "days")}). The edge uses the raised ` +
          "background; limits stay relative to the natural one: required dilution = (C_discharge − C_raised)/(C_natural + allowed − C_raised).",
        96,
        "  ",
      ),
      wrap(`Assumption: ${b.limits}`, 96, "  "),
    );
  }
  return out;
}

/** The verdict under the stated conditions, per constituent. */
function complianceLines(r: BrinefieldResult): string[] {
  const out: string[] = [];
  if (r.compliance) {
    const c = r.compliance;
    out.push(
      "",
      `Verdict under the stated conditions: ${c.verdict} — governing: ${c.governingConstituent} (margin ${n(c.margin)})`,
    );
    for (const reason of c.scopeReasons) out.push(wrap(`- outside scope: ${reason}`, 96, "  "));
    out.push(
      table([
        ["Constituent", "limit", "required dilution", "edge dilution", "margin", "verdict"],
        ...c.constituents.map((x) => [
          x.constituent,
          x.limit.replace(/\s*\(.*$/s, ""),
          n(x.requiredDilution),
          n(x.edgeDilution),
          n(x.margin),
          c.verdict === "outside-scope" ? "outside-scope" : x.pass ? "meets" : "exceeds",
        ]),
      ]),
    );
  }
  return out;
}

/** The ambient record, or the listed ambient cases and the overall verdict. */
function ambientCaseLines(r: BrinefieldResult): string[] {
  const out: string[] = [];
  if (r.record) out.push(...recordLines(r));
  else if (r.cases?.length) {
    const o = r.overall;
    out.push("", `Ambient cases (the verdict over all of them is the overall verdict)`);
    out.push(
      table([
        ["Case", "edge dilution", "margin", "verdict"],
        ...r.cases.map((k) => [k.name, n(k.edgeDilution), n(k.margin), k.verdict]),
      ]),
    );
    for (const k of r.cases.slice(1))
      for (const reason of k.scopeReasons) out.push(wrap(`- ${k.name}: outside scope: ${reason}`, 96, "  "));
    out.push(
      "",
      `OVERALL VERDICT: ${o.verdict} — governing case: ${o.governingCase} (edge dilution ${n(o.edgeDilution)}, margin ${n(o.margin)})`,
    );
  }
  return out;
}

/** The warnings and what is not modelled. */
function warningLines(r: BrinefieldResult): string[] {
  const out: string[] = [];
  if (r.warnings.length) {
    out.push("", `Warnings (${r.warnings.length})`);
    for (const w of r.warnings)
      out.push(wrap(`[${w.severity}] ${w.message}${w.source ? ` (${w.source})` : ""}`, 96, "  "));
  }
  if (r.mixingZone?.notModelled.length) {
    out.push("", "Not modelled");
    for (const x of r.mixingZone.notModelled) out.push(wrap(`- ${x}`, 96, "  "));
  }
  return out;
}
