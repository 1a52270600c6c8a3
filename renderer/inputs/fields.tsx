/**
 * Input fields bound to a scenario path. Each shows its unit, accepts a typed unit ("8 in"), and shows
 * core's parse issue for its path inline, in words.
 */
import { useId, useState, type ReactNode } from "react";
import type { QuantityKind } from "../../core/units";
import { setField } from "../state/actions";
import { getAtPath } from "../state/scenario-state";
import { issuesUnder, useEditor } from "./EditorContext";
import { fieldView, storedValueInField } from "./quantity-text";

function FieldShell(props: {
  id: string;
  label: ReactNode;
  errors: readonly string[];
  hint?: string;
  children: ReactNode;
  wide?: boolean;
}) {
  const errorId = `${props.id}-error`;
  return (
    <div className={`field${props.errors.length ? " has-error" : ""}${props.wide ? " wide" : ""}`}>
      <label htmlFor={props.id}>{props.label}</label>
      {props.children}
      {props.errors.length ? (
        <div className="field-error" id={errorId} role="alert">
          {props.errors.join("; ")}
        </div>
      ) : props.hint ? (
        <div className="field-hint">{props.hint}</div>
      ) : null}
    </div>
  );
}

/** Marks an input invalid and ties it to its inline error, so a screen reader reads the error with it. */
function invalidProps(id: string, errors: readonly string[]) {
  return { "aria-invalid": errors.length > 0, "aria-describedby": errors.length ? `${id}-error` : undefined };
}

export interface QuantityFieldProps {
  readonly path: string;
  readonly label: string;
  readonly kind: QuantityKind;
  readonly hint?: string;
  /** Placeholder when the value is optional and absent. */
  readonly placeholder?: string;
  /** Unit to show for a free-unit quantity (a constituent's "mg/L"); plain numbers are taken in it. */
  readonly unitText?: string;
}

export function QuantityField({ path, label, kind, hint, placeholder, unitText }: QuantityFieldProps) {
  const editor = useEditor();
  const id = useId();
  const raw = getAtPath(editor.file, path);
  // While typing, the field keeps the unit it showed when the edit began (so clearing "5000 m³/day" and
  // typing 6000 still means m³/day).
  const [editing, setEditing] = useState<{ text: string; unitIn: string | null; unit: string } | null>(null);
  const view = fieldView(raw, kind, editor.unitSystem);
  const unit = unitText ?? (editing ? editing.unit : view.unit);
  const errors = issuesUnder(editor.issues, path, true);
  const shown = editing?.text ?? view.text;
  const beside = editing === null ? view.beside : null;
  const unitTitle = view.enteredIn
    ? `Shown in the unit it was entered in; a plain number is taken in ${unit}. Type a value with another unit to change it.`
    : `Type a number in ${unit || "plain numbers"}, or a value with its own unit`;
  return (
    <FieldShell id={id} label={label} errors={errors} hint={beside ?? hint}>
      <div className="quantity-input">
        <input
          id={id}
          data-path={path}
          type="text"
          inputMode="decimal"
          spellCheck={false}
          autoComplete="off"
          value={shown}
          placeholder={placeholder}
          {...invalidProps(id, errors)}
          onFocus={() => {
            const full = fieldView(raw, kind, editor.unitSystem, 9);
            setEditing({ text: full.text, unitIn: full.enteredIn, unit: full.unit });
          }}
          onBlur={() => setEditing(null)}
          onChange={(event) => {
            const text = event.target.value;
            const unitIn = editing?.unitIn ?? view.enteredIn;
            setEditing({ text, unitIn, unit: editing?.unit ?? view.unit });
            editor.perform(setField, { path, value: storedValueInField(text, kind, editor.unitSystem, unitIn) });
          }}
        />
        <span className="unit" title={unitTitle} data-role="field-unit">
          {unit || "–"}
        </span>
      </div>
    </FieldShell>
  );
}

/** A whole number (port counts). Stored as a number when it is one, else as typed for core to reject. */
export function CountField({ path, label, hint }: { path: string; label: string; hint?: string }) {
  const editor = useEditor();
  const id = useId();
  const raw = getAtPath(editor.file, path);
  const [editing, setEditing] = useState<string | null>(null);
  const errors = issuesUnder(editor.issues, path, true);
  return (
    <FieldShell id={id} label={label} errors={errors} hint={hint}>
      <div className="quantity-input">
        <input
          id={id}
          data-path={path}
          type="text"
          inputMode="numeric"
          value={editing ?? (raw === undefined ? "" : String(raw))}
          {...invalidProps(id, errors)}
          onFocus={() => setEditing(raw === undefined ? "" : String(raw))}
          onBlur={() => setEditing(null)}
          onChange={(event) => {
            setEditing(event.target.value);
            const text = event.target.value.trim();
            const n = Number(text);
            editor.perform(setField, { path, value: text === "" ? undefined : Number.isFinite(n) ? n : text });
          }}
        />
        <span className="unit">ports</span>
      </div>
    </FieldShell>
  );
}

export function TextField({
  path,
  label,
  wide,
  placeholder,
}: {
  path: string;
  label: string;
  wide?: boolean;
  placeholder?: string;
}) {
  const editor = useEditor();
  const id = useId();
  const raw = getAtPath(editor.file, path);
  const errors = issuesUnder(editor.issues, path, true);
  return (
    <FieldShell id={id} label={label} errors={errors} wide={wide}>
      <input
        id={id}
        data-path={path}
        type="text"
        value={typeof raw === "string" ? raw : raw === undefined ? "" : String(raw)}
        placeholder={placeholder}
        {...invalidProps(id, errors)}
        onChange={(event) =>
          editor.perform(setField, { path, value: event.target.value === "" ? undefined : event.target.value })
        }
      />
    </FieldShell>
  );
}

export function ChoiceField<T extends string>(props: {
  path: string;
  label: string;
  options: readonly { value: T; label: string }[];
  onChoose?: (value: T) => void;
  fallback?: T;
}) {
  const editor = useEditor();
  const id = useId();
  const raw = getAtPath(editor.file, props.path);
  const errors = issuesUnder(editor.issues, props.path, true);
  const value = typeof raw === "string" ? raw : (props.fallback ?? "");
  return (
    <FieldShell id={id} label={props.label} errors={errors}>
      <select
        id={id}
        data-path={props.path}
        value={value}
        {...invalidProps(id, errors)}
        onChange={(event) => {
          const next = event.target.value as T;
          if (props.onChoose) props.onChoose(next);
          else editor.perform(setField, { path: props.path, value: next });
        }}
      >
        {props.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}

/** Issues at a section path not already shown by a field (e.g. "diffuser" or "ambient.profile"). */
export function SectionIssues({ path, shownPaths }: { path: string; shownPaths: readonly string[] }) {
  const editor = useEditor();
  const messages: string[] = [];
  for (const [p, list] of editor.issues) {
    if ((p === path || p.startsWith(path + ".")) && !shownPaths.includes(p)) {
      messages.push(...list.map((m) => (p === path ? m : `${p.slice(path.length + 1)}: ${m}`)));
    }
  }
  if (messages.length === 0) return null;
  return (
    <div className="section-issues" role="alert">
      {messages.map((m, i) => (
        <div key={i}>{m}</div>
      ))}
    </div>
  );
}
