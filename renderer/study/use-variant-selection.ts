/**
 * The study's variant list as the Variants section edits it: which variant is selected, and starting a
 * study, adding, duplicating and removing variants (each one change of the study part, one undo step).
 */
import { useState } from "react";
import type { ScenarioFile } from "../state/scenario-state";
import { freshVariantName, newStudyPart, type StudyPart, type StudyVariantDoc } from "../state/study-document";

export function useVariantSelection(
  scenarioFile: ScenarioFile,
  study: StudyPart | null,
  change: (next: StudyPart | null, key: string) => void,
) {
  const [selected, setSelected] = useState(0);
  const variants = study?.variants ?? [];
  const index = Math.min(selected, Math.max(0, variants.length - 1));
  const variant: StudyVariantDoc | undefined = variants[index];

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

  return { variants, index, variant, select: setSelected, startStudy, addVariant, duplicate, remove };
}
