/**
 * Records and the intake: import an ambient record from CSV or a paste (saved in the scenario as
 * `ambient.record`), the time share of `mixingZone.timeCompliance`, and the plant's `intake`.
 */
import { useRef, useState } from "react";
import { setField } from "../state/actions";
import { getAtPath } from "../state/scenario-state";
import { useEditor } from "./EditorContext";
import { QuantityField, SectionIssues } from "./fields";
import { recordFromCsv, RECORD_COLUMNS } from "../../core/record/csv";
import { readDroppedFile } from "../platform/host";

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
  const [pasteOpen, setPasteOpen] = useState(false);
  const [pasteText, setPasteText] = useState("");
  const [errors, setErrors] = useState<string[]>([]);
  const fileInput = useRef<HTMLInputElement | null>(null);

  const importText = (text: string, source: string) => {
    const r = recordFromCsv(text, source);
    if (!r.ok) {
      setErrors([r.message]);
      return;
    }
    setErrors([]);
    // The whole record is replaced: columns the new one lacks are removed (the patch merges otherwise).
    const value = Object.fromEntries(RECORD_COLUMNS.map((c) => [c, r.record[c]]));
    editor.perform(setField, { path: "ambient.record", value });
    setPasteOpen(false);
    setPasteText("");
  };
  return { pasteOpen, setPasteOpen, pasteText, setPasteText, errors, setErrors, fileInput, importText };
}

/** Load, paste or remove the ambient record; import errors are listed under the buttons. */
function RecordImport(props: { readonly importer: ReturnType<typeof useRecordImport>; readonly steps: number }) {
  const editor = useEditor();
  const { steps } = props;
  const { pasteOpen, setPasteOpen, pasteText, setPasteText, errors, setErrors, fileInput, importText } = props.importer;
  return (
    <>
      <div className="button-row">
        <button
          type="button"
          className="link-button"
          onClick={() => fileInput.current?.click()}
          data-command="record-load"
        >
          Load record CSV…
        </button>
        <button
          type="button"
          className="link-button"
          onClick={() => setPasteOpen((o) => !o)}
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
        <input
          ref={fileInput}
          type="file"
          accept=".csv,.tsv,.txt,text/csv"
          hidden
          data-role="record-csv-input"
          onChange={(event) => {
            const file = event.target.files?.[0];
            if (file) {
              readDroppedFile(file).then(
                (opened) => importText(opened.text, file.name),
                (error: unknown) =>
                  setErrors([`${file.name}: ${error instanceof Error ? error.message : String(error)}`]),
              );
            }
            event.target.value = "";
          }}
        />
      </div>
      {pasteOpen ? (
        <div className="paste-box">
          <label htmlFor="record-paste">
            Paste the record with a header naming the columns, units in brackets: time (h), currentSpeed (m/s),
            currentDirection (deg), and optionally depth (m), salinity (g/kg), temperature (degC)
          </label>
          <textarea
            id="record-paste"
            rows={6}
            value={pasteText}
            onChange={(e) => setPasteText(e.target.value)}
            spellCheck={false}
            data-role="record-paste-text"
          />
          <div className="button-row">
            <button
              type="button"
              onClick={() => importText(pasteText, "pasted record")}
              data-command="record-use-paste"
            >
              Use this record
            </button>
            <button type="button" className="link-button" onClick={() => setPasteOpen(false)}>
              Cancel
            </button>
          </div>
        </div>
      ) : null}
      {errors.length ? (
        <div className="section-issues" role="alert" data-role="record-errors">
          {errors.map((e, i) => (
            <div key={i}>{e}</div>
          ))}
        </div>
      ) : null}
    </>
  );
}
