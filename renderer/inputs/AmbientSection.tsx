/** Receiving water: depth, uniform or profiled salinity and temperature, current and bed slope. */
import { addProfileRow, removeArrayItem, replaceProfile, setAmbientMode } from "../state/actions";
import { getAtPath } from "../state/scenario-state";
import { useEditor } from "./EditorContext";
import { QuantityField, SectionIssues } from "./fields";
import { parseProfileText } from "./profile-text";
import { ImportFileInput, PasteBoxAndErrors, useTextImport, type TextImport } from "./TextImport";

export function AmbientSection() {
  const editor = useEditor();
  const profile = getAtPath(editor.file, "ambient.profile");
  const isProfile = Array.isArray(profile);
  const importer = useProfileImport();

  return (
    <section className="input-section" aria-labelledby="sec-ambient">
      <header>
        <h2 id="sec-ambient">Receiving water</h2>
        <div className="segmented" role="radiogroup" aria-label="Water column">
          <button
            type="button"
            role="radio"
            aria-checked={!isProfile}
            onClick={() => editor.perform(setAmbientMode, { mode: "uniform" })}
          >
            Uniform
          </button>
          <button
            type="button"
            role="radio"
            aria-checked={isProfile}
            onClick={() => editor.perform(setAmbientMode, { mode: "profile" })}
          >
            Profile
          </button>
        </div>
      </header>
      <div className="field-grid">
        <QuantityField path="ambient.depth" label="Water depth at diffuser" kind="length" />
        {!isProfile ? (
          <>
            <QuantityField path="ambient.salinity" label="Salinity" kind="salinity" />
            <QuantityField path="ambient.temperature" label="Temperature" kind="temperature" />
          </>
        ) : null}
        <QuantityField
          path="ambient.currentSpeed"
          label="Current speed"
          kind="speed"
          hint="depth-averaged; 0 = still water"
        />
        <QuantityField
          path="ambient.currentDirection"
          label="Current toward"
          kind="angle"
          hint="clockwise from north"
        />
        <QuantityField
          path="ambient.bedSlope"
          label="Bed slope"
          kind="ratio"
          hint="rise/run, e.g. 0.02"
          placeholder="0 (flat)"
        />
        <QuantityField
          path="ambient.bedSlopeAzimuth"
          label="Bed slopes down toward"
          kind="angle"
          hint="clockwise from north"
          placeholder="0"
        />
      </div>
      {isProfile ? (
        <div className="sub-table">
          <h3>Profile (depth below surface)</h3>
          <ProfileTable rows={profile.length} />
          <ProfileImport importer={importer} />
        </div>
      ) : null}
      <SectionIssues
        path="ambient"
        shownPaths={[
          "ambient.depth",
          "ambient.salinity",
          "ambient.temperature",
          "ambient.currentSpeed",
          "ambient.currentDirection",
          "ambient.bedSlope",
          "ambient.bedSlopeAzimuth",
          ...(isProfile
            ? profile.flatMap((_, i) => ["depth", "salinity", "temperature"].map((k) => `ambient.profile.${i}.${k}`))
            : []),
        ]}
      />
    </section>
  );
}

/** State of the profile import (paste box and CSV file), kept while the water column switches mode. */
function useProfileImport() {
  const editor = useEditor();
  return useTextImport((text) => {
    const parsed = parseProfileText(text);
    if (parsed.errors.length === 0) editor.perform(replaceProfile, { rows: parsed.rows });
    return parsed.errors;
  });
}

/** One editable row per profile point: depth, salinity, temperature and a remove button. */
function ProfileTable({ rows }: { readonly rows: number }) {
  const editor = useEditor();
  return (
    <table className="profile-table">
      <thead>
        <tr>
          <th scope="col">#</th>
          <th scope="col">Depth</th>
          <th scope="col">Salinity</th>
          <th scope="col">Temperature</th>
          <th />
        </tr>
      </thead>
      <tbody>
        {Array.from({ length: rows }, (_, i) => (
          <tr key={i}>
            <td className="muted">{i + 1}</td>
            <td>
              <QuantityField path={`ambient.profile.${i}.depth`} label={`Depth, row ${i + 1}`} kind="length" />
            </td>
            <td>
              <QuantityField path={`ambient.profile.${i}.salinity`} label={`Salinity, row ${i + 1}`} kind="salinity" />
            </td>
            <td>
              <QuantityField
                path={`ambient.profile.${i}.temperature`}
                label={`Temperature, row ${i + 1}`}
                kind="temperature"
              />
            </td>
            <td>
              <button
                type="button"
                className="icon-button"
                aria-label={`Remove row ${i + 1}`}
                onClick={() => editor.perform(removeArrayItem, { path: "ambient.profile", index: i })}
              >
                ×
              </button>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Add a row, paste rows from a spreadsheet or load a CSV file; errors from either are listed. */
function ProfileImport({ importer }: { readonly importer: TextImport }) {
  const editor = useEditor();
  return (
    <>
      <div className="button-row">
        <button type="button" className="link-button" onClick={() => editor.perform(addProfileRow, undefined)}>
          + Add row
        </button>
        <button type="button" className="link-button" onClick={() => importer.setPasteOpen((o) => !o)}>
          Paste from spreadsheet…
        </button>
        <button type="button" className="link-button" onClick={() => importer.fileInput.current?.click()}>
          Load CSV…
        </button>
        <ImportFileInput importer={importer} role="profile-csv-input" />
      </div>
      <PasteBoxAndErrors
        importer={importer}
        id="profile-paste"
        label={'Paste rows: depth, salinity, temperature (header optional; units in brackets, e.g. "depth (ft)")'}
        rows={5}
        useLabel="Use these rows"
        source="pasted rows"
      />
    </>
  );
}
