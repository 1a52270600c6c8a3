/** One variant: its name, its changes from the base in words, and the Design tab's fields on its scenario. */
import { useMemo } from "react";
import { parseScenario } from "../../core/scenario/parse";
import type { UnitSystem } from "../../core/units";
import { AmbientSection } from "../inputs/AmbientSection";
import { DiffuserSection } from "../inputs/DiffuserSection";
import { DischargeSection } from "../inputs/DischargeSection";
import { EditorContext, type Editor } from "../inputs/EditorContext";
import { MixingZoneSection } from "../inputs/MixingZoneSection";
import type { Action } from "../state/actions";
import { documentFromFile, type ScenarioFile } from "../state/scenario-state";
import {
  overridesBetween,
  variantScenario,
  withVariant,
  type StudyPart,
  type StudyVariantDoc,
} from "../state/study-document";
import { ChangedMarker, VariantChanges } from "./VariantChanges";

interface EditorProps {
  readonly active: boolean;
  readonly base: ScenarioFile;
  readonly study: StudyPart;
  readonly index: number;
  readonly variant: StudyVariantDoc;
  readonly unitSystem: UnitSystem;
  readonly onChange: (next: StudyPart, key: string) => void;
  readonly onProblem: (message: string | null) => void;
  readonly onDuplicate: () => void;
  readonly onRemove: () => void;
  readonly onOpen?: () => void;
}

/** The input sections' editor on a variant's scenario: an edit becomes the variant's overrides of the base. */
function useVariantEditor({
  base,
  study,
  index,
  variant,
  unitSystem,
  onChange,
  onProblem,
}: Pick<EditorProps, "base" | "study" | "index" | "variant" | "unitSystem" | "onChange" | "onProblem">) {
  const built = useMemo(() => variantScenario(base, variant), [base, variant]);
  const file = built.ok ? built.file : base;
  const read = useMemo(() => parseScenario(file), [file]);
  const issues = useMemo(() => {
    const map = new Map<string, string[]>();
    if (!read.ok) for (const i of read.issues) map.set(i.path, [...(map.get(i.path) ?? []), i.message]);
    return map;
  }, [read]);
  const editor: Editor = useMemo(
    () => ({
      file,
      unitSystem,
      issues,
      normalised: read.ok ? read.scenario : null,
      perform<I>(action: Action<I>, input: I) {
        const next = action.perform(documentFromFile(file), input);
        const diff = overridesBetween(base, next.file);
        if (!diff.ok) {
          onProblem(`${variant.name}: ${diff.message}.`);
          return;
        }
        onProblem(null);
        const path =
          typeof input === "object" && input !== null && "path" in input
            ? String((input as { path: unknown }).path)
            : "";
        onChange(
          withVariant(study, index, { ...variant, overrides: diff.overrides }),
          `variant:${index}:${action.name}:${path}`,
        );
      },
    }),
    [file, unitSystem, issues, read, base, study, index, variant, onChange, onProblem],
  );
  return { built, read, editor };
}

export function VariantEditor(props: EditorProps) {
  const { active, base, study, index, variant, onChange, onDuplicate, onRemove, onOpen } = props;
  const { built, read, editor } = useVariantEditor(props);
  const changes = Object.entries(variant.overrides);
  const reset = (path: string) => {
    const rest = Object.fromEntries(changes.filter(([p]) => p !== path));
    onChange(withVariant(study, index, { ...variant, overrides: rest }), `variant:${index}:reset:${path}`);
  };
  const changedPaths = new Set(Object.keys(variant.overrides));

  return (
    <div className="variant-editor" data-role="variant-editor">
      <div className="variant-editor-head">
        <label className="inline-field">
          Variant name
          <input
            value={variant.name}
            data-field="variant-name"
            onChange={(e) =>
              onChange(withVariant(study, index, { ...variant, name: e.target.value }), `variant:${index}:name`)
            }
          />
        </label>
        <div className="button-row">
          <button type="button" onClick={onDuplicate} data-command="variant-duplicate">
            Duplicate
          </button>
          <button type="button" onClick={onRemove} data-command="variant-remove">
            Remove
          </button>
          {onOpen ? (
            <button
              type="button"
              onClick={onOpen}
              data-command="variant-open-as-scenario"
              title="Open this variant's full scenario as a new, unsaved scenario"
            >
              Open as scenario
            </button>
          ) : null}
        </div>
      </div>
      {!built.ok ? <div className="study-error">{built.message}</div> : null}
      <VariantChanges base={base} changes={changes} broken={!read.ok} onReset={reset} />
      {active ? (
        <EditorContext.Provider value={editor}>
          <div className="variant-fields inputs" data-changed-paths={[...changedPaths].join(" ")}>
            <ChangedMarker paths={changedPaths} />
            <DischargeSection />
            <AmbientSection />
            <DiffuserSection />
            <MixingZoneSection />
          </div>
        </EditorContext.Provider>
      ) : null}
    </div>
  );
}
