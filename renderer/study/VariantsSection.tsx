/**
 * Study tab, variants: the study document's named variants, each edited with the same input sections
 * and units as the Design tab (an edit becomes an override of the base scenario), compared under every
 * ambient case with a margin chart and a table that fits the screen. Variants live in the document, so
 * they are saved, autosaved, undone and kept across tab switches; any variant opens as a scenario.
 */
import type { UnitSystem } from "../../core/units";
import { scenarioName, type ScenarioFile } from "../state/scenario-state";
import { variantScenario, type StudyPart } from "../state/study-document";
import type { RunJob } from "./sections";
import { CompareView } from "./CompareView";
import { VariantEditor } from "./VariantEditor";
import { StudyStart, VariantList } from "./VariantList";
import { useVariantCompare } from "./use-variant-compare";
import { useVariantSelection } from "./use-variant-selection";

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
  const change = (next: StudyPart | null, key: string) => onStudyChange?.(next, key);
  const { variants, index, variant, select, startStudy, addVariant, duplicate, remove } = useVariantSelection(
    scenarioFile,
    study,
    change,
  );

  const { rows, stale, problem, setProblem, run, exportStudy, exportCsv } = useVariantCompare(
    scenarioFile,
    study,
    runJob,
    onNotice,
  );
  const openVariant = () => {
    if (!variant) return;
    const built = variantScenario(scenarioFile, variant);
    if (!built.ok) return setProblem(`${variant.name}: ${built.message}`);
    onOpenAsScenario?.({ ...built.file, name: `${scenarioName(scenarioFile)} — ${variant.name}` });
  };

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
        <StudyStart onStart={startStudy} />
      ) : (
        <div className="variant-layout">
          <VariantList variants={variants} index={index} onSelect={select} />
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
