/**
 * Importing a table as text, from a paste box or a CSV file: the state both imports keep (box open,
 * pasted text, errors, the hidden file input) and the pieces they draw. What a good import does is the
 * caller's `apply`, which returns the errors (none when the import was used).
 */
import { useRef, useState, type Dispatch, type RefObject, type SetStateAction } from "react";
import { readDroppedFile } from "../platform/host";

export interface TextImport {
  readonly pasteOpen: boolean;
  readonly setPasteOpen: Dispatch<SetStateAction<boolean>>;
  readonly pasteText: string;
  readonly setPasteText: (text: string) => void;
  readonly errors: readonly string[];
  readonly fileInput: RefObject<HTMLInputElement | null>;
  /** Applies a text; on success the paste box closes and empties. */
  readonly importText: (text: string, source: string) => void;
  /** Reads a chosen file and applies its text; a file that cannot be read is listed as an error. */
  readonly importFile: (file: File) => void;
}

export function useTextImport(apply: (text: string, source: string) => readonly string[]): TextImport {
  const [pasteOpen, setPasteOpen] = useState(false);
  const [pasteText, setPasteText] = useState("");
  const [errors, setErrors] = useState<readonly string[]>([]);
  const fileInput = useRef<HTMLInputElement | null>(null);

  const importText = (text: string, source: string) => {
    const found = apply(text, source);
    setErrors(found);
    if (found.length === 0) {
      setPasteOpen(false);
      setPasteText("");
    }
  };
  const importFile = (file: File) => {
    readDroppedFile(file).then(
      (opened) => importText(opened.text, file.name),
      (error: unknown) => setErrors([`${file.name}: ${error instanceof Error ? error.message : String(error)}`]),
    );
  };
  return { pasteOpen, setPasteOpen, pasteText, setPasteText, errors, fileInput, importText, importFile };
}

/** The hidden file input behind a "Load … CSV" button. */
export function ImportFileInput({ importer, role }: { readonly importer: TextImport; readonly role: string }) {
  return (
    <input
      ref={importer.fileInput}
      type="file"
      accept=".csv,.tsv,.txt,text/csv"
      hidden
      data-role={role}
      onChange={(event) => {
        const file = event.target.files?.[0];
        if (file) importer.importFile(file);
        event.target.value = "";
      }}
    />
  );
}

/** The paste box (shown while open) and the import errors under it. */
export function PasteBoxAndErrors(props: {
  readonly importer: TextImport;
  /** id of the text area. */
  readonly id: string;
  readonly label: string;
  readonly rows: number;
  readonly useLabel: string;
  /** Source named in errors from a pasted text. */
  readonly source: string;
  readonly textRole?: string;
  readonly useCommand?: string;
  readonly errorsRole?: string;
}) {
  const { pasteOpen, setPasteOpen, pasteText, setPasteText, errors, importText } = props.importer;
  return (
    <>
      {pasteOpen ? (
        <div className="paste-box">
          <label htmlFor={props.id}>{props.label}</label>
          <textarea
            id={props.id}
            rows={props.rows}
            value={pasteText}
            onChange={(e) => setPasteText(e.target.value)}
            spellCheck={false}
            data-role={props.textRole}
          />
          <div className="button-row">
            <button type="button" onClick={() => importText(pasteText, props.source)} data-command={props.useCommand}>
              {props.useLabel}
            </button>
            <button type="button" className="link-button" onClick={() => setPasteOpen(false)}>
              Cancel
            </button>
          </div>
        </div>
      ) : null}
      {errors.length ? (
        <div className="section-issues" role="alert" data-role={props.errorsRole}>
          {errors.map((e, i) => (
            <div key={i}>{e}</div>
          ))}
        </div>
      ) : null}
    </>
  );
}
