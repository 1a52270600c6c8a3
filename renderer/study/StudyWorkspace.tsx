/** The Study tab's workspace: the caution and the study tools, which load on first use. */
import { Suspense, lazy } from "react";
import { CAUTION } from "../../core/result/contract";
import type { UnitSystem } from "../../core/units";
import type { ScenarioFile } from "../state/scenario-state";
import type { StudyPart } from "../state/study-document";

// The Study tab loads on first use (its own workers and charts stay out of the first screen).
const StudyPanel = lazy(() => import("./StudyPanel").then((m) => ({ default: m.StudyPanel })));

interface StudyWorkspaceProps {
  readonly active: boolean;
  /** The tab panel's attributes while the Study tab is selected. */
  readonly panel: object;
  readonly scenarioFile: ScenarioFile;
  readonly study: StudyPart | null;
  readonly unitSystem: UnitSystem;
  readonly onStudyChange: (next: StudyPart | null, key: string) => void;
  readonly onOpenAsScenario: (file: ScenarioFile) => void;
  readonly onApplyDesign: (diffuser: Record<string, unknown>) => void;
  readonly onNotice: (message: string) => void;
}

export function StudyWorkspace({ active, panel, ...studyProps }: StudyWorkspaceProps) {
  return (
    <main className="study-workspace" hidden={!active} {...panel}>
      {active ? (
        <p className="caution" data-role="caution">
          {CAUTION}
        </p>
      ) : null}
      <Suspense fallback={<div className="placeholder">Loading study tools…</div>}>
        <StudyPanel active={active} {...studyProps} />
      </Suspense>
    </main>
  );
}
