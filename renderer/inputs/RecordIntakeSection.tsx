/**
 * Records and the intake: import an ambient record from CSV or a paste (saved in the scenario as
 * `ambient.record`), the time share of `mixingZone.timeCompliance`, and the plant's `intake`.
 */
import { setField } from "../state/actions";
import { getAtPath } from "../state/scenario-state";
import { useEditor } from "./EditorContext";
import { QuantityField, SectionIssues } from "./fields";
import { recordFromCsv, RECORD_COLUMNS } from "../../core/record/csv";
import { ImportFileInput, PasteBoxAndErrors, useTextImport, type TextImport } from "./TextImport";

export function RecordIntakeSection() {
  const editor = useEditor();
  const record = getAtPath(editor.file, "ambient.record") as { time?: unknown[] } | undefined;
  const steps = Array.isArray(record?.time) ? record.time.length : 0;
  const intake = getAtPath(editor.file, "intake");
  const importer = useRecordImport();

  return (
    <section className="input-section" aria-labelledby="sec-record">
      <header>
        <h2 id="sec-record">Record over time and intake</h2>
      </header>
      <p className="hint" data-role="record-steps">
        {steps > 0
          ? `Ambient record: ${steps} steps (they replace the ambient cases; each step is screened as a quasi-steady state).`
          : "No ambient record: the stated conditions and the ambient cases are screened."}
      </p>
      <RecordImport importer={importer} steps={steps} />
      <div className="field-grid">
        <QuantityField
          path="mixingZone.timeCompliance.percentOfTime"
          label="Limit met for at least"
          kind="ratio"
          unitText="% of the time"
          placeholder="every step"
          hint="with a record"
        />
        <QuantityField
          path="intake.distance"
          label="Intake distance"
          kind="length"
          hint="from the diffuser centre"
          placeholder="no intake"
        />
        <QuantityField path="intake.bearing" label="Intake bearing" kind="angle" hint="clockwise from north" />
        <QuantityField path="intake.heightAboveSeabed" label="Intake height" kind="length" hint="above the seabed" />
        <QuantityField
          path="intake.maxSalinityIncrease"
          label="Intake limit"
          kind="salinity"
          hint="max salinity increase (optional)"
          placeholder="none"
        />
      </div>
      {intake !== undefined ? (
        <button
          type="button"
          className="link-button"
          onClick={() => editor.perform(setField, { path: "intake", value: undefined })}
          data-command="intake-remove"
        >
          Remove intake
        </button>
      ) : null}
      <SectionIssues
        path="intake"
        shownPaths={["intake.distance", "intake.bearing", "intake.heightAboveSeabed", "intake.maxSalinityIncrease"]}
      />
    </section>
  );
}

/** State of the record import (paste box and CSV file); a good import replaces `ambient.record` whole. */
function useRecordImport() {
  const editor = useEditor();
  return useTextImport((text, source) => {
    const r = recordFromCsv(text, source);
    if (!r.ok) return [r.message];
    // The whole record is replaced: columns the new one lacks are removed (the patch merges otherwise).
    const value = Object.fromEntries(RECORD_COLUMNS.map((c) => [c, r.record[c]]));
    editor.perform(setField, { path: "ambient.record", value });
    return [];
  });
}

/** Load, paste or remove the ambient record; import errors are listed under the buttons. */
function RecordImport(props: { readonly importer: TextImport; readonly steps: number }) {
  const editor = useEditor();
  const { importer, steps } = props;
  return (
    <>
      <div className="button-row">
        <button
          type="button"
          className="link-button"
          onClick={() => importer.fileInput.current?.click()}
          data-command="record-load"
        >
          Load record CSV…
        </button>
        <button
          type="button"
          className="link-button"
          onClick={() => importer.setPasteOpen((o) => !o)}
          data-command="record-paste"
        >
          Paste record…
        </button>
        {steps > 0 ? (
          <button
            type="button"
            className="link-button"
            onClick={() => editor.perform(setField, { path: "ambient.record", value: undefined })}
            data-command="record-remove"
          >
            Remove record
          </button>
        ) : null}
        <ImportFileInput importer={importer} role="record-csv-input" />
      </div>
      <PasteBoxAndErrors
        importer={importer}
        id="record-paste"
        label={
          "Paste the record with a header naming the columns, units in brackets: time (h), currentSpeed (m/s), " +
          "currentDirection (deg), and optionally depth (m), salinity (g/kg), temperature (degC)"
        }
        rows={6}
        useLabel="Use this record"
        source="pasted record"
        textRole="record-paste-text"
        useCommand="record-use-paste"
        errorsRole="record-errors"
      />
    </>
  );
}
