/** Diffuser: layout (single port, line, rosette), port geometry, and a plan sketch. */
import { defaultDiffuserAzimuth } from "../../core/scenario/normalise";
import type { DiffuserInput } from "../../core/scenario/types";
import { setLayout } from "../state/actions";
import { getAtPath, isPlainObject } from "../state/scenario-state";
import { useEditor } from "./EditorContext";
import { ChoiceField, CountField, QuantityField, SectionIssues } from "./fields";
import { DiffuserSketch } from "./DiffuserSketch";
import { siNumber } from "./quantity-text";

const LAYOUTS = [
  { value: "single", label: "Single port" },
  { value: "line", label: "Line of ports" },
  { value: "rosette", label: "Rosette risers" },
] as const;

/** A drawable diffuser from the raw fields, falling back to neutral values where a field is unreadable. */
export function sketchDiffuser(file: unknown): DiffuserInput {
  const d = getAtPath(file, "diffuser");
  const raw = isPlainObject(d) ? d : {};
  const layout = raw["layout"] === "line" || raw["layout"] === "rosette" ? raw["layout"] : "single";
  const count = Math.max(1, Math.min(200, Math.floor(siNumber(raw["portCount"], "ratio", 1))));
  const spacing = siNumber(raw["portSpacing"], "length", 5);
  const risersRaw = isPlainObject(raw["risers"]) ? raw["risers"] : null;
  const risers = risersRaw
    ? {
        count: Math.max(1, Math.min(50, Math.floor(siNumber(risersRaw["count"], "ratio", 1)))),
        portsPerRiser: Math.max(1, Math.min(12, Math.floor(siNumber(risersRaw["portsPerRiser"], "ratio", 1)))),
        spacing: siNumber(risersRaw["spacing"], "length", spacing),
        portAzimuths: Array.isArray(risersRaw["portAzimuths"])
          ? risersRaw["portAzimuths"].map((a) => siNumber(a, "angle", 0))
          : [],
      }
    : undefined;
  const portCount =
    layout === "rosette" && risers ? risers.count * risers.portsPerRiser : layout === "single" ? 1 : count;
  const length = layout === "rosette" && risers ? (risers.count - 1) * risers.spacing : (portCount - 1) * spacing;
  const diameter = siNumber(raw["portDiameter"], "smallLength", 0.2);
  return {
    layout,
    portCount,
    portDiameter: diameter,
    portDiameterNominal: diameter,
    contraction: 1,
    portAngle: siNumber(raw["portAngle"], "angle", 60),
    portHeight: siNumber(raw["portHeight"], "length", 1),
    portSpacing: spacing,
    portAzimuth: siNumber(raw["portAzimuth"], "angle", 0),
    diffuserAzimuth: siNumber(
      raw["diffuserAzimuth"],
      "angle",
      defaultDiffuserAzimuth(siNumber(raw["portAzimuth"], "angle", 0)),
    ),
    length: siNumber(raw["length"], "length", length),
    flowSplit: [],
    ...(risers ? { risers } : {}),
  };
}

export function DiffuserSection() {
  const editor = useEditor();
  const layout = getAtPath(editor.file, "diffuser.layout");
  // Core's reading fills in defaults (e.g. the diffuser axis); the raw fields stand in while it has errors.
  const diffuser = editor.normalised?.diffuser ?? sketchDiffuser(editor.file);
  const azimuths = getAtPath(editor.file, "diffuser.risers.portAzimuths");
  return (
    <section className="input-section" aria-labelledby="sec-diffuser">
      <header>
        <h2 id="sec-diffuser">Diffuser</h2>
      </header>
      <DiffuserSketch
        diffuser={diffuser}
        currentDirection={siNumber(getAtPath(editor.file, "ambient.currentDirection"), "angle", 0)}
        currentSpeed={siNumber(getAtPath(editor.file, "ambient.currentSpeed"), "speed", 0)}
        unitSystem={editor.unitSystem}
      />
      <div className="field-grid">
        <ChoiceField
          path="diffuser.layout"
          label="Layout"
          options={LAYOUTS}
          fallback="single"
          onChoose={(value) => editor.perform(setLayout, { layout: value })}
        />
        {layout === "line" ? <CountField path="diffuser.portCount" label="Number of ports" /> : null}
        <QuantityField path="diffuser.portDiameter" label="Port diameter" kind="smallLength" />
        <QuantityField path="diffuser.portAngle" label="Port angle" kind="angle" hint="above horizontal, 0–90" />
        <QuantityField path="diffuser.portHeight" label="Port height" kind="length" hint="above seabed" />
        {layout !== "rosette" ? (
          <QuantityField path="diffuser.portAzimuth" label="Port azimuth" kind="angle" hint="clockwise from north" />
        ) : null}
        {layout === "line" ? <QuantityField path="diffuser.portSpacing" label="Port spacing" kind="length" /> : null}
        {layout !== "single" ? (
          <QuantityField
            path="diffuser.diffuserAzimuth"
            label="Diffuser axis"
            kind="angle"
            hint="clockwise from north"
            placeholder="⊥ to ports"
          />
        ) : null}
        {layout === "rosette" ? (
          <>
            <CountField path="diffuser.risers.count" label="Risers" />
            <CountField path="diffuser.risers.portsPerRiser" label="Ports per riser" />
            <QuantityField path="diffuser.risers.spacing" label="Riser spacing" kind="length" />
          </>
        ) : null}
        <QuantityField
          path="diffuser.dischargeCoefficient"
          label="Discharge coefficient"
          kind="ratio"
          placeholder="optional"
          hint="for head loss"
        />
        <QuantityField
          path="diffuser.contraction"
          label="Contraction coefficient"
          kind="ratio"
          placeholder="1 (none)"
        />
      </div>
      {layout === "rosette" && Array.isArray(azimuths) ? (
        <div className="sub-table">
          <h3>Port azimuths on each riser</h3>
          <div className="row-fields">
            {azimuths.map((_, i) => (
              <QuantityField key={i} path={`diffuser.risers.portAzimuths.${i}`} label={`Port ${i + 1}`} kind="angle" />
            ))}
          </div>
        </div>
      ) : null}
      <SectionIssues
        path="diffuser"
        shownPaths={[
          "diffuser.layout",
          "diffuser.portCount",
          "diffuser.portDiameter",
          "diffuser.portAngle",
          "diffuser.portHeight",
          "diffuser.portAzimuth",
          "diffuser.portSpacing",
          "diffuser.diffuserAzimuth",
          "diffuser.risers.count",
          "diffuser.risers.portsPerRiser",
          "diffuser.risers.spacing",
          "diffuser.dischargeCoefficient",
          "diffuser.contraction",
          ...(Array.isArray(azimuths) ? azimuths.map((_, i) => `diffuser.risers.portAzimuths.${i}`) : []),
        ]}
      />
    </section>
  );
}
