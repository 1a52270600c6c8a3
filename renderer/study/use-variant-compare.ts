/**
 * Comparing the study's variants on the study workers, and exporting the study file and the compared
 * rows. A failed export is shown as the section's problem; the rows stay until the next comparison.
 */
import { useState } from "react";
import { flattenRow, type FlatRow } from "../../core/study/compare";
import type { StudyTask } from "../../core/study/worker-protocol";
import { exportFile } from "../platform/host";
import type { ScenarioFile } from "../state/scenario-state";
import { serialiseDocument, suggestedDocumentName, type StudyPart } from "../state/study-document";
import type { RunJob } from "./sections";
import { variantsCsv } from "./variants-csv";

export function useVariantCompare(
  scenarioFile: ScenarioFile,
  study: StudyPart | null,
  runJob: RunJob,
  onNotice: ((message: string) => void) | undefined,
) {
  const [rows, setRows] = useState<FlatRow[]>([]);
  const [compared, setCompared] = useState<{ study: StudyPart; base: ScenarioFile } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

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

  const stale = compared !== null && (compared.study !== study || compared.base !== scenarioFile);
  return { rows, stale, problem, setProblem, run, exportStudy, exportCsv };
}
