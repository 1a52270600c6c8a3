/** Discharge: given directly (flow, salinity, temperature) or from plant data, plus constituents. */
import { appendArrayItem, removeArrayItem, setDischargeSource } from "../state/actions";
import { getAtPath, isPlainObject } from "../state/scenario-state";
import { useEditor } from "./EditorContext";
import { QuantityField, SectionIssues, TextField } from "./fields";

function constituentUnit(c: unknown): string {
  return isPlainObject(c) && typeof c["unit"] === "string" && c["unit"].trim() !== "" ? c["unit"] : "–";
}

export function DischargeSection() {
  const editor = useEditor();
  const plant = isPlainObject(editor.file["plant"]);
  const constituents = getAtPath(editor.file, "discharge.constituents");
  const blending = getAtPath(editor.file, "plant.blending");
  return (
    <section className="input-section" aria-labelledby="sec-discharge">
      <header>
        <h2 id="sec-discharge">Discharge</h2>
        <div className="segmented" role="radiogroup" aria-label="Discharge given as">
          <button
            type="button"
            role="radio"
            aria-checked={!plant}
            onClick={() => editor.perform(setDischargeSource, { source: "discharge" })}
          >
            Brine stream
          </button>
          <button
            type="button"
            role="radio"
            aria-checked={plant}
            onClick={() => editor.perform(setDischargeSource, { source: "plant" })}
          >
            From plant
          </button>
        </div>
      </header>
      <div className="field-grid">
        {plant ? (
          <>
            <QuantityField path="plant.productFlow" label="Product water flow" kind="flow" />
            <QuantityField
              path="plant.recovery"
              label="Recovery"
              kind="ratio"
              hint="fraction or percent: 0.45 or 45 %"
            />
            <QuantityField path="plant.feedSalinity" label="Feed salinity" kind="salinity" />
            <QuantityField
              path="plant.saltRejection"
              label="Salt rejection"
              kind="ratio"
              hint="fraction or percent: 99.6 %"
            />
            <QuantityField path="plant.feedTemperature" label="Feed temperature" kind="temperature" />
          </>
        ) : (
          <>
            <QuantityField path="discharge.flow" label="Brine flow (total)" kind="flow" />
            <QuantityField path="discharge.salinity" label="Brine salinity" kind="salinity" hint="absolute salinity" />
          </>
        )}
        <QuantityField
          path="discharge.temperature"
          label="Brine temperature"
          kind="temperature"
          placeholder={plant ? "feed temperature" : undefined}
        />
      </div>
      {plant ? <BlendingStreams blending={blending} /> : null}
      <Constituents constituents={constituents} />
      <SectionIssues path="discharge" shownPaths={["discharge.flow", "discharge.salinity", "discharge.temperature"]} />
      {plant ? (
        <SectionIssues
          path="plant"
          shownPaths={[
            "plant.productFlow",
            "plant.recovery",
            "plant.feedSalinity",
            "plant.saltRejection",
            "plant.feedTemperature",
          ]}
        />
      ) : null}
    </section>
  );
}

/** The plant's blending streams, each with a remove button, and a button to add one. */
function BlendingStreams({ blending }: { readonly blending: unknown }) {
  const editor = useEditor();
  return (
    <div className="sub-table">
      <h3>Blending streams</h3>
      {Array.isArray(blending) && blending.length ? (
        blending.map((_, i) => (
          <div className="row-fields" key={i}>
            <TextField path={`plant.blending.${i}.name`} label="Name" />
            <QuantityField path={`plant.blending.${i}.flow`} label="Flow" kind="flow" />
            <QuantityField path={`plant.blending.${i}.salinity`} label="Salinity" kind="salinity" />
            <QuantityField path={`plant.blending.${i}.temperature`} label="Temperature" kind="temperature" />
            <button
              type="button"
              className="icon-button"
              aria-label={`Remove blending stream ${i + 1}`}
              onClick={() => editor.perform(removeArrayItem, { path: "plant.blending", index: i })}
            >
              ×
            </button>
          </div>
        ))
      ) : (
        <p className="muted">None: brine is discharged undiluted.</p>
      )}
      <button
        type="button"
        className="link-button"
        onClick={() =>
          editor.perform(appendArrayItem, {
            path: "plant.blending",
            item: { name: "cooling water", flow: 0, salinity: 38, temperature: 25 },
          })
        }
      >
        + Add blending stream
      </button>
    </div>
  );
}

/** Constituents besides salinity and temperature, in the units the user names. */
function Constituents({ constituents }: { readonly constituents: unknown }) {
  const editor = useEditor();
  return (
    <div className="sub-table">
      <h3>Other constituents</h3>
      {Array.isArray(constituents) && constituents.length ? (
        constituents.map((c, i) => (
          <div className="row-fields" key={i}>
            <TextField path={`discharge.constituents.${i}.name`} label="Name" />
            <QuantityField
              path={`discharge.constituents.${i}.concentration`}
              label="In discharge"
              kind="ratio"
              unitText={constituentUnit(c)}
            />
            <TextField path={`discharge.constituents.${i}.unit`} label="Unit" placeholder="mg/L" />
            <QuantityField
              path={`discharge.constituents.${i}.background`}
              label="Background"
              kind="ratio"
              unitText={constituentUnit(c)}
            />
            <button
              type="button"
              className="icon-button"
              aria-label={`Remove constituent ${i + 1}`}
              onClick={() => editor.perform(removeArrayItem, { path: "discharge.constituents", index: i })}
            >
              ×
            </button>
          </div>
        ))
      ) : (
        <p className="muted">Salinity and temperature only.</p>
      )}
      <button
        type="button"
        className="link-button"
        onClick={() =>
          editor.perform(appendArrayItem, {
            path: "discharge.constituents",
            item: { name: "antiscalant", concentration: 5, unit: "mg/L", background: 0 },
          })
        }
      >
        + Add constituent
      </button>
    </div>
  );
}
