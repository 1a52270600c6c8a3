/**
 * Study tab, variants: the study document's named variants, each edited with the same input sections
 * and units as the Design tab (an edit becomes an override of the base scenario), compared under every
 * ambient case with a margin chart and a table that fits the screen. Variants live in the document, so
 * they are saved, autosaved, undone and kept across tab switches; any variant opens as a scenario.
 */
import { useMemo, useState } from "react";
import { parseScenario } from "../../core/scenario/parse";
import { fieldBounds } from "../../core/scenario/bounds";
import { siToDisplay, type UnitSystem } from "../../core/units";
import { flattenRow, type FlatRow } from "../../core/study/compare";
import { exportFile } from "../platform/host";
import { AmbientSection } from "../inputs/AmbientSection";
import { DiffuserSection } from "../inputs/DiffuserSection";
import { DischargeSection } from "../inputs/DischargeSection";
import { EditorContext, type Editor } from "../inputs/EditorContext";
import { MixingZoneSection } from "../inputs/MixingZoneSection";
import type { Action } from "../state/actions";
import { documentFromFile, getAtPath, scenarioName, type ScenarioFile } from "../state/scenarioState";
import {
  freshVariantName,
  newStudyPart,
  overridesBetween,
  pathWords,
  serialiseDocument,
  suggestedDocumentName,
  variantScenario,
  withVariant,
  type StudyPart,
  type StudyVariantDoc,
} from "../state/studyDocument";
import type { StudyTask } from "../../core/study/worker-protocol";
import type { RunJob } from "./sections";
import { variantsCsv } from "./variantsCsv";
import { CompareView } from "./CompareView";

interface VariantsProps {
  readonly active: boolean;
  readonly scenarioFile: ScenarioFile;
  readonly study: StudyPart | null;
  readonly unitSystem: UnitSystem;
  readonly busy: boolean;
  readonly runJob: RunJob;
  readonly onStudyChange?: (next: StudyPart | null, key: string) => void;
  readonly onOpenAsScenario?: (file: ScenarioFile) => void;
  readonly onNotice?: (message: string) => void;
}

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

export function VariantsSection({
  active,
  scenarioFile,
  study,
  unitSystem,
  busy,
  runJob,
  onStudyChange,
  onOpenAsScenario,
  onNotice,
}: VariantsProps) {
  const [selected, setSelected] = useState(0);
  const [rows, setRows] = useState<FlatRow[]>([]);
  const [compared, setCompared] = useState<{ study: StudyPart; base: ScenarioFile } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const variants = study?.variants ?? [];
  const index = Math.min(selected, Math.max(0, variants.length - 1));
  const variant: StudyVariantDoc | undefined = variants[index];
  const change = (next: StudyPart | null, key: string) => onStudyChange?.(next, key);

  const startStudy = () => {
    change(newStudyPart(scenarioFile), "start");
    setSelected(0);
  };
  const addVariant = () => {
    if (!study) return startStudy();
    change({ ...study, variants: [...study.variants, { name: freshVariantName(study), overrides: {} }] }, "add");
    setSelected(study.variants.length);
  };
  const duplicate = () => {
    if (!study || !variant) return;
    const copy = { ...variant, name: freshVariantName(study, `${variant.name} copy`) };
    change(
      { ...study, variants: [...study.variants.slice(0, index + 1), copy, ...study.variants.slice(index + 1)] },
      "duplicate",
    );
    setSelected(index + 1);
  };
  const remove = () => {
    if (!study || !variant) return;
    change({ ...study, variants: study.variants.filter((_, k) => k !== index) }, "remove");
    setSelected(Math.max(0, index - 1));
  };

  const run = async () => {
    if (!study) return;
    setProblem(null);
    const specs = study.variants.map((v) => ({ name: v.name, overrides: v.overrides }));
    const task: StudyTask = { kind: "compare", file: scenarioFile, variants: specs };
    const r = await runJob("Comparing variants", specs.length + 1, [task], (replies) =>
      replies[0]?.kind === "compared" ? replies[0].rows : [],
    );
    if (r) {
      setRows(r.map(flattenRow));
      setCompared({ study, base: scenarioFile });
    }
  };

  const exportStudy = () => {
    if (!study) return;
    const doc = { file: scenarioFile, study, path: null, dirty: false, revision: 0 };
    void exportFile(suggestedDocumentName(doc), serialiseDocument(doc), [
      { name: "Brinefield study", extensions: ["json"] },
    ])
      .then((done) => done && onNotice?.("Study file exported: `brinefield compare` and `brinefield report` read it."))
      .catch((error: unknown) =>
        setProblem(`Could not export: ${error instanceof Error ? error.message : String(error)}`),
      );
  };
  const exportCsv = () => {
    void exportFile("brinefield-variants.csv", variantsCsv(rows, undefined, (compared?.study ?? study)?.name), [
      { name: "CSV", extensions: ["csv"] },
    ]).catch((error: unknown) =>
      setProblem(`Could not export: ${error instanceof Error ? error.message : String(error)}`),
    );
  };
  const openVariant = () => {
    if (!variant) return;
    const built = variantScenario(scenarioFile, variant);
    if (!built.ok) return setProblem(`${variant.name}: ${built.message}`);
    onOpenAsScenario?.({ ...built.file, name: `${scenarioName(scenarioFile)} — ${variant.name}` });
  };

  const stale = compared !== null && (compared.study !== study || compared.base !== scenarioFile);

  return (
    <section className="study-variants" data-role="study-variants">
      <div className="variants-head">
        <h3>Variants</h3>
        {study ? (
          <label className="inline-field">
            Study name
            <input
              value={study.name}
              data-field="study-name"
              onChange={(e) => change({ ...study, name: e.target.value }, "name")}
            />
          </label>
        ) : null}
        <div className="button-row">
          <button type="button" onClick={addVariant} data-command="variant-add">
            Add variant
          </button>
          <button
            type="button"
            disabled={busy || !study || variants.length === 0}
            onClick={() => void run()}
            data-command="study-compare"
          >
            Compare
          </button>
          <button
            type="button"
            disabled={!study}
            onClick={exportStudy}
            data-command="study-export"
            title="Save a copy of the study file (base scenario and variants) without changing the document"
          >
            Export study file…
          </button>
          <button type="button" disabled={rows.length === 0} onClick={exportCsv} data-command="study-compare-csv">
            Export CSV
          </button>
        </div>
      </div>
      {!study ? (
        <div className="study-start" data-role="study-start">
          <p>
            A study keeps this scenario as its base and adds named variants — a deeper site, more ports, another current
            — each edited with the same fields and units as the Design tab. Save writes one study file (the base
            scenario inside it) that <code>brinefield compare</code> and <code>brinefield report</code> read.
          </p>
          <button type="button" onClick={startStudy} data-command="study-start">
            Start a study from this scenario
          </button>
        </div>
      ) : (
        <div className="variant-layout">
          <nav className="variant-list" aria-label="Variants">
            <ul>
              {variants.map((v, i) => {
                const n = Object.keys(v.overrides).length;
                return (
                  <li key={i}>
                    <button
                      type="button"
                      aria-current={i === index ? "true" : undefined}
                      onClick={() => setSelected(i)}
                      data-variant={v.name}
                    >
                      <span className="variant-name">{v.name}</span>
                      <span className="variant-count">
                        {n === 0 ? "no changes" : `${n} change${n === 1 ? "" : "s"}`}
                      </span>
                    </button>
                  </li>
                );
              })}
            </ul>
            {variants.length === 0 ? <p className="study-note">No variants: add one.</p> : null}
            <p className="study-note">
              Every variant runs under every ambient case; an ambient change applies to the stated conditions and to
              every case that does not set that field itself.
            </p>
          </nav>
          {variant ? (
            <VariantEditor
              key={index}
              active={active}
              base={scenarioFile}
              study={study}
              index={index}
              variant={variant}
              unitSystem={unitSystem}
              onChange={change}
              onProblem={setProblem}
              onDuplicate={duplicate}
              onRemove={remove}
              onOpen={onOpenAsScenario ? openVariant : undefined}
            />
          ) : (
            <div />
          )}
        </div>
      )}
      {problem ? (
        <div className="study-error" role="alert">
          {problem}
        </div>
      ) : null}
      {rows.length > 0 ? <CompareView rows={rows} unitSystem={unitSystem} stale={stale} /> : null}
    </section>
  );
}

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

/** One variant: its name, its changes from the base in words, and the Design tab's fields on its scenario. */
function VariantEditor({
  active,
  base,
  study,
  index,
  variant,
  unitSystem,
  onChange,
  onProblem,
  onDuplicate,
  onRemove,
  onOpen,
}: EditorProps) {
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
                  onClick={() => reset(path)}
                  aria-label={`Reset ${pathWords(path)} to the base value`}
                >
                  reset
                </button>
              </li>
            ))}
          </ul>
        )}
        {!read.ok ? (
          <p className="study-error">
            This variant breaks a scenario rule (marked in red below); Compare shows it as refused.
          </p>
        ) : null}
      </div>
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

/** Marks the fields a variant changes (a CSS rule per changed path; the inputs carry data-path). */
function ChangedMarker({ paths }: { paths: ReadonlySet<string> }) {
  if (paths.size === 0) return null;
  const fields = [...paths].map((p) => `.variant-fields .field:has([data-path="${p.replace(/["\\]/g, "")}"])`);
  const css =
    `${fields.map((f) => `${f} input`).join(",\n")} { background: #fff4d6; border-color: #b7791f; }\n` +
    `${fields.map((f) => `${f} > label::after`).join(",\n")} { content: " · changed"; color: #7a4b00; font-weight: 600; }`;
  return <style>{css}</style>;
}
