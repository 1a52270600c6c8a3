/**
 * A variant's changes from the base scenario in words, each with the base value and a reset, and the
 * marker that highlights the changed fields in the variant's inputs.
 */
import { fieldBounds } from "../../core/scenario/bounds";
import { siToDisplay } from "../../core/units";
import { getAtPath, type ScenarioFile } from "../state/scenario-state";
import { pathWords } from "../state/study-document";

/** A value as entered, with the SI unit when it is a bare number of a field with a unit. */
function valueText(path: string, value: unknown): string {
  if (value === undefined) return "not set";
  if (typeof value === "number") {
    const b = fieldBounds(path);
    const unit = b && b.form === "quantity" ? siToDisplay(1, b.kind, "si").unit : b?.form === "salinity" ? "g/kg" : "";
    return unit ? `${value} ${unit}` : String(value);
  }
  if (typeof value === "string") return value;
  return JSON.stringify(value);
}

interface ChangesProps {
  readonly base: ScenarioFile;
  readonly changes: readonly (readonly [string, unknown])[];
  /** The variant breaks a scenario rule. */
  readonly broken: boolean;
  readonly onReset: (path: string) => void;
}

/** The list of a variant's overrides, each against the base scenario's value. */
export function VariantChanges({ base, changes, broken, onReset }: ChangesProps) {
  return (
    <div className="variant-changes" data-role="variant-changes">
      <b>Changes from the base scenario</b>
      {changes.length === 0 ? (
        <p className="study-note">None yet: change any field below (typed units are kept, as on the Design tab).</p>
      ) : (
        <ul>
          {changes.map(([path, value]) => (
            <li key={path} data-change={path}>
              <span className="change-what">{pathWords(path)}</span>: {valueText(path, value)}{" "}
              <span className="change-base">(base {valueText(path, getAtPath(base, path))})</span>{" "}
              <button
                type="button"
                className="link-button"
                onClick={() => onReset(path)}
                aria-label={`Reset ${pathWords(path)} to the base value`}
              >
                reset
              </button>
            </li>
          ))}
        </ul>
      )}
      {broken ? (
        <p className="study-error">
          This variant breaks a scenario rule (marked in red below); Compare shows it as refused.
        </p>
      ) : null}
    </div>
  );
}

/** Marks the fields a variant changes (a CSS rule per changed path; the inputs carry data-path). */
export function ChangedMarker({ paths }: { paths: ReadonlySet<string> }) {
  if (paths.size === 0) return null;
  const fields = [...paths].map((p) => `.variant-fields .field:has([data-path="${p.replace(/["\\]/g, "")}"])`);
  const css =
    `${fields.map((f) => `${f} input`).join(",\n")} { background: #fff4d6; border-color: #b7791f; }\n` +
    `${fields.map((f) => `${f} > label::after`).join(",\n")} { content: " · changed"; color: #7a4b00; font-weight: 600; }`;
  return <style>{css}</style>;
}
