/** The Study tab's reading of the document: core's normalised scenario, or why it cannot be read. */
import { useEffect, useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import type { ScenarioFile } from "../state/scenario-state";
import { sharedReaderPool } from "./worker-pool";

/** Reads the document in a worker whenever it changes while `active` (debounced: typing should not queue work). */
export function useStudyScenario(
  scenarioFile: ScenarioFile,
  active: boolean,
): { scenario: Scenario | null; scenarioError: string | null } {
  const [scenario, setScenario] = useState<Scenario | null>(null);
  const [scenarioError, setScenarioError] = useState<string | null>(null);

  useEffect(() => {
    if (!active) return; // read again when the tab is shown
    let live = true;
    let started = false;
    // The page's reader worker stays alive between reads (no worker start-up for each edit).
    const reader = sharedReaderPool();
    const t = setTimeout(() => {
      started = true;
      reader.stopIfRunning();
      reader
        .run([{ kind: "prepare", file: scenarioFile }])
        .then(([r]) => {
          if (!live || r?.kind !== "prepared") return;
          setScenario(r.scenario);
          setScenarioError(null);
        })
        .catch((e: unknown) => {
          if (!live) return;
          setScenario(null);
          setScenarioError(e instanceof Error ? e.message : String(e));
        });
    }, 300);
    return () => {
      live = false;
      clearTimeout(t);
      // A newer document or leaving the tab: stop reading the old one rather than let it run on.
      if (started) reader.stopIfRunning();
    };
  }, [scenarioFile, active]);

  return { scenario, scenarioError };
}
