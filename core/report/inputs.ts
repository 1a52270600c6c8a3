/**
 * The report's inputs tables: each input as the user wrote it in the scenario file (with their units)
 * beside the SI value Brinefield used after reading it. A field left out of the file shows "(default)"
 * with the value applied, so a reviewer sees every number that went into the run.
 */
import type { Scenario } from "../scenario/types";
import { html, join, raw, reportNumber, type RawHtml } from "./format";

/** Value at a dotted path in a plain object (numeric segments index arrays); undefined when absent. */
export function valueAtPath(root: unknown, path: string): unknown {
  let v: unknown = root;
  for (const key of path.split(".")) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  return v;
}

/** A raw file value as entered: numbers are shown as written (no rounding), strings verbatim. */
export function asEntered(value: unknown): string {
  if (value === undefined) return "(default)";
  if (value === null) return "null";
  if (typeof value === "number") return String(value);
  if (typeof value === "string") return value;
  if (typeof value === "boolean") return value ? "true" : "false";
  return JSON.stringify(value);
}

interface InputRow {
  readonly label: string;
  /** Path in the raw file. */
  readonly path: string;
  /** Shown under "As entered" when the file leaves the field out (default "(default)"). */
  readonly whenAbsent?: string;
  /** SI value used (number, text, or null when it does not apply). */
  readonly si: number | string | null;
  readonly unit: string;
}

function rowsHtml(file: unknown, rows: readonly InputRow[]): RawHtml {
  return join(
    rows.map((r) => {
      const entered = valueAtPath(file, r.path);
      const si = typeof r.si === "number" ? reportNumber(r.si) : (r.si ?? "—");
      const cls = entered === undefined ? ` class="default"` : "";
      return html`<tr${raw(cls)}><td>${r.label}</td><td class="path">${r.path}</td><td class="entered">${entered === undefined && r.whenAbsent ? r.whenAbsent : asEntered(entered)}</td><td class="num">${si}</td><td>${r.unit}</td></tr>`;
    }),
  );
}

function table(caption: string, body: RawHtml): RawHtml {
  return html`<table class="inputs"><caption>${caption}</caption><thead><tr><th>Input</th><th>Field</th><th>As entered</th><th>SI value used</th><th>SI unit</th></tr></thead><tbody>${body}</tbody></table>`;
}

/** All inputs tables for a read scenario. */
export function inputsHtml(file: unknown, s: Scenario): RawHtml {
  return join([
    ...dischargeTables(file, s),
    ...plantTables(file, s),
    ...ambientTables(file, s),
    ...diffuserTables(file, s),
    ...mixingZoneTables(file, s),
    ...optionTables(file, s),
  ]);
}

/** The discharge and its constituents. */
function dischargeTables(file: unknown, s: Scenario): RawHtml[] {
  const parts: RawHtml[] = [];
  const d = s.discharge;
  const fromPlant = s.plant ? "(from the plant below)" : undefined;
  const dischargeRows: InputRow[] = [
    { label: "Total brine flow", path: "discharge.flow", si: d.flow, unit: "m³/s", whenAbsent: fromPlant },
    {
      label: "Brine salinity (Absolute Salinity)",
      path: "discharge.salinity",
      si: d.salinity,
      unit: "g/kg",
      whenAbsent: fromPlant,
    },
    { label: "Brine temperature", path: "discharge.temperature", si: d.temperature, unit: "°C", whenAbsent: fromPlant },
  ];
  parts.push(table("Discharge", rowsHtml(file, dischargeRows)));
  if (d.constituents.length > 0) {
    const rows = d.constituents.map(
      (c, i) =>
        html`<tr><td>${c.name}</td><td class="path">discharge.constituents.${String(i)}</td><td class="num">${reportNumber(c.concentration)}</td><td class="num">${reportNumber(c.background)}</td><td>${c.unit}</td></tr>`,
    );
    parts.push(
      html`<table class="inputs"><caption>Constituents in the discharge (kept in the unit entered)</caption><thead><tr><th>Constituent</th><th>Field</th><th>In the discharge</th><th>Background</th><th>Unit</th></tr></thead><tbody>${join(rows)}</tbody></table>`,
    );
  }
  return parts;
}

/** The desalination plant the discharge is derived from, when the scenario has one. */
function plantTables(file: unknown, s: Scenario): RawHtml[] {
  const parts: RawHtml[] = [];
  if (s.plant) {
    const p = s.plant;
    const rows: InputRow[] = [
      { label: "Product-water flow", path: "plant.productFlow", si: p.productFlow, unit: "m³/s" },
      { label: "Recovery ratio", path: "plant.recovery", si: p.recovery, unit: "–" },
      { label: "Feed salinity", path: "plant.feedSalinity", si: p.feedSalinity, unit: "g/kg" },
      { label: "Salt rejection", path: "plant.saltRejection", si: p.saltRejection, unit: "–" },
      { label: "Feed temperature", path: "plant.feedTemperature", si: p.feedTemperature ?? null, unit: "°C" },
    ];
    p.blending.forEach((b, i) => {
      rows.push(
        { label: `Blend "${b.name}" flow`, path: `plant.blending.${i}.flow`, si: b.flow, unit: "m³/s" },
        { label: `Blend "${b.name}" salinity`, path: `plant.blending.${i}.salinity`, si: b.salinity, unit: "g/kg" },
        {
          label: `Blend "${b.name}" temperature`,
          path: `plant.blending.${i}.temperature`,
          si: b.temperature,
          unit: "°C",
        },
      );
    });
    parts.push(table("Desalination plant (the discharge is derived from it)", rowsHtml(file, rows)));
  }
  return parts;
}

/** The receiving water: stated conditions, the profile when not uniform, further ambient cases. */
function ambientTables(file: unknown, s: Scenario): RawHtml[] {
  const parts: RawHtml[] = [];
  const a = s.ambient;
  const bottom = a.profile[a.profile.length - 1]!;
  const ambientRows: InputRow[] = [
    { label: "Water depth at the diffuser", path: "ambient.depth", si: a.depth, unit: "m" },
    {
      label: a.uniform ? "Ambient salinity (uniform)" : "Ambient salinity at the seabed",
      path: "ambient.salinity",
      si: bottom.salinity,
      unit: "g/kg",
    },
    {
      label: a.uniform ? "Ambient temperature (uniform)" : "Ambient temperature at the seabed",
      path: "ambient.temperature",
      si: bottom.temperature,
      unit: "°C",
    },
    { label: "Current speed", path: "ambient.currentSpeed", si: a.currentSpeed, unit: "m/s" },
    {
      label: "Current direction (towards, from north)",
      path: "ambient.currentDirection",
      si: a.currentDirection,
      unit: "°",
    },
    { label: "Bed slope (rise/run)", path: "ambient.bedSlope", si: a.bedSlope, unit: "–" },
    { label: "Downslope azimuth", path: "ambient.bedSlopeAzimuth", si: a.bedSlopeAzimuth, unit: "°" },
  ];
  parts.push(table("Receiving water", rowsHtml(file, ambientRows)));
  if (!a.uniform) {
    const rows: InputRow[] = [];
    a.profile.forEach((p, i) => {
      rows.push(
        { label: `Profile point ${i + 1} depth`, path: `ambient.profile.${i}.depth`, si: p.depth, unit: "m" },
        {
          label: `Profile point ${i + 1} salinity`,
          path: `ambient.profile.${i}.salinity`,
          si: p.salinity,
          unit: "g/kg",
        },
        {
          label: `Profile point ${i + 1} temperature`,
          path: `ambient.profile.${i}.temperature`,
          si: p.temperature,
          unit: "°C",
        },
      );
    });
    parts.push(table("Ambient profile", rowsHtml(file, rows)));
  }
  if (s.ambientCases.length > 0) {
    const rows = s.ambientCases.map((c) => {
      const b = c.profile[c.profile.length - 1]!;
      return html`<tr><td>${c.name}</td><td class="num">${reportNumber(c.weight)}</td><td class="num">${reportNumber(c.depth)}</td><td class="num">${reportNumber(b.salinity)}</td><td class="num">${reportNumber(b.temperature)}</td><td class="num">${reportNumber(c.currentSpeed)}</td><td class="num">${reportNumber(c.currentDirection)}</td></tr>`;
    });
    parts.push(
      html`<table class="inputs"><caption>Further ambient cases (SI; seabed values)</caption><thead><tr><th>Case</th><th>Weight</th><th>Depth (m)</th><th>Salinity (g/kg)</th><th>Temperature (°C)</th><th>Current (m/s)</th><th>Direction (°)</th></tr></thead><tbody>${join(rows)}</tbody></table>`,
    );
  }
  return parts;
}

/** The diffuser, with its risers when it has them. */
function diffuserTables(file: unknown, s: Scenario): RawHtml[] {
  const parts: RawHtml[] = [];
  const f = s.diffuser;
  const diffuserRows: InputRow[] = [
    { label: "Layout", path: "diffuser.layout", si: f.layout, unit: "" },
    { label: "Number of ports", path: "diffuser.portCount", si: f.portCount, unit: "–" },
    { label: "Port diameter (nominal)", path: "diffuser.portDiameter", si: f.portDiameterNominal, unit: "m" },
    { label: "Contraction coefficient", path: "diffuser.contraction", si: f.contraction, unit: "–" },
    { label: "Port angle above horizontal", path: "diffuser.portAngle", si: f.portAngle, unit: "°" },
    { label: "Port height above the seabed", path: "diffuser.portHeight", si: f.portHeight, unit: "m" },
    { label: "Port spacing", path: "diffuser.portSpacing", si: f.portSpacing, unit: "m" },
    { label: "Port azimuth (from north)", path: "diffuser.portAzimuth", si: f.portAzimuth, unit: "°" },
    { label: "Diffuser axis azimuth", path: "diffuser.diffuserAzimuth", si: f.diffuserAzimuth, unit: "°" },
    { label: "Diffuser length", path: "diffuser.length", si: f.length, unit: "m" },
    {
      label: "Port discharge coefficient",
      path: "diffuser.dischargeCoefficient",
      si: f.dischargeCoefficient ?? null,
      unit: "–",
    },
  ];
  if (f.risers) {
    diffuserRows.push(
      { label: "Risers", path: "diffuser.risers.count", si: f.risers.count, unit: "–" },
      { label: "Ports per riser", path: "diffuser.risers.portsPerRiser", si: f.risers.portsPerRiser, unit: "–" },
      { label: "Riser spacing", path: "diffuser.risers.spacing", si: f.risers.spacing, unit: "m" },
    );
  }
  parts.push(table("Diffuser", rowsHtml(file, diffuserRows)));
  return parts;
}

/** The mixing zone's radius and limits, as entered and as used. */
function mixingZoneTables(file: unknown, s: Scenario): RawHtml[] {
  const parts: RawHtml[] = [];
  const limitRows = s.mixingZone.limits.map((l, i) => {
    const rawLimit = valueAtPath(file, `mixingZone.limits.${i}`) as Record<string, unknown> | undefined;
    const entered =
      rawLimit?.maxIncrease !== undefined
        ? `increase ≤ ${asEntered(rawLimit.maxIncrease)}`
        : rawLimit?.maxConcentration !== undefined
          ? `concentration ≤ ${asEntered(rawLimit.maxConcentration)}`
          : "—";
    const used =
      l.maxIncrease !== undefined
        ? `increase ≤ ${reportNumber(l.maxIncrease)}`
        : l.maxConcentration !== undefined
          ? `concentration ≤ ${reportNumber(l.maxConcentration)}`
          : "—";
    return html`<tr><td>${l.constituent}</td><td class="entered">${entered}</td><td>${used}</td><td>${l.unit}</td><td>${l.background !== undefined ? reportNumber(l.background) : "ambient"}</td><td>${l.basis ?? "—"}</td></tr>`;
  });
  parts.push(
    html`<table class="inputs"><caption>Mixing zone: radius ${reportNumber(s.mixingZone.radius)} m (entered: ${asEntered(valueAtPath(file, "mixingZone.radius"))})</caption><thead><tr><th>Limit on</th><th>As entered</th><th>Used</th><th>Unit</th><th>Background</th><th>Basis</th></tr></thead><tbody>${join(limitRows)}</tbody></table>`,
  );
  return parts;
}

/** Options, uncertain inputs and the unit conversions applied while reading. */
function optionTables(file: unknown, s: Scenario): RawHtml[] {
  const parts: RawHtml[] = [];
  const optionRows: InputRow[] = [
    {
      label: "Near-field dilution carried to the edge",
      path: "options.nearFieldForEdge",
      si: s.options.nearFieldForEdge,
      unit: "",
    },
    { label: "Method beyond the near field", path: "options.farField", si: s.options.farField, unit: "" },
    {
      label: "Add a slack-water case to studies",
      path: "options.addSlackWater",
      si: String(s.options.addSlackWater),
      unit: "",
    },
  ];
  parts.push(table("Options", rowsHtml(file, optionRows)));
  if (s.uncertainty && s.uncertainty.inputs.length > 0) {
    const rows = s.uncertainty.inputs.map(
      (u) =>
        html`<tr><td class="path">${u.path}</td><td>${u.distribution}</td><td>${Object.entries(u.params)
          .map(([k, v]) => `${k} = ${reportNumber(v)}`)
          .join(", ")}</td></tr>`,
    );
    parts.push(
      html`<table class="inputs"><caption>Uncertain inputs (SI parameters)</caption><thead><tr><th>Input</th><th>Distribution</th><th>Parameters</th></tr></thead><tbody>${join(rows)}</tbody></table>`,
    );
  }
  if (s.conversions.length > 0) {
    parts.push(
      html`<p class="note"><strong>Conversions applied while reading the file:</strong></p><ul class="conversions">${join(s.conversions.map((c) => html`<li>${c}</li>`))}</ul>`,
    );
  }
  return parts;
}

/** Fallback when the file could not be read as a scenario: every leaf as entered, no SI column. */
export function rawInputsHtml(file: unknown): RawHtml {
  const rows: RawHtml[] = [];
  const walk = (v: unknown, path: string) => {
    if (v !== null && typeof v === "object") {
      for (const [k, child] of Object.entries(v as Record<string, unknown>)) walk(child, path ? `${path}.${k}` : k);
    } else {
      rows.push(html`<tr><td class="path">${path}</td><td class="entered">${asEntered(v)}</td></tr>`);
    }
  };
  walk(file, "");
  return html`<table class="inputs"><caption>Inputs as entered (the file could not be re-read, so SI values are not shown)</caption><thead><tr><th>Field</th><th>As entered</th></tr></thead><tbody>${join(rows)}</tbody></table>`;
}
