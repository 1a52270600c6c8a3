/** The Design tab: the inputs, the 3D view over the charts, and the results with the caution. */
import type { Scenario } from "../core/scenario/types";
import type { UnitSystem } from "../core/units";
import { ChartPanel } from "./charts/ChartPanel";
import type { ChartChoice } from "./charts/use-chart-choice";
import type { EngineState } from "./engine/use-engine";
import { InputsColumn } from "./inputs/InputsColumn";
import type { RecordRun } from "./record/use-record-run";
import { ResultsColumn } from "./results/ResultsColumn";
import { View3dPanel } from "./view3d/View3dPanel";

interface DesignWorkspaceProps {
  /** The tab panel's attributes. */
  readonly panel: object;
  readonly engine: EngineState;
  readonly recordRun: RecordRun;
  readonly normalised: Scenario | null;
  readonly unitSystem: UnitSystem;
  readonly chart: ChartChoice;
  readonly resetSignal: number;
  readonly documentKey: number;
}

export function DesignWorkspace(props: DesignWorkspaceProps) {
  const { panel, engine, recordRun, normalised, unitSystem, chart, resetSignal, documentKey } = props;
  return (
    <main className="workspace" {...panel}>
      <InputsColumn />
      <section className="centre" aria-label="Views">
        <View3dPanel
          result={engine.result}
          scenario={engine.scenario}
          unitSystem={unitSystem}
          error={engine.error}
          resetSignal={resetSignal}
          documentKey={documentKey}
        />
        <ChartPanel choice={chart} result={engine.result} scenario={engine.scenario} unitSystem={unitSystem} />
      </section>
      <ResultsColumn engine={engine} recordRun={recordRun} normalised={normalised} unitSystem={unitSystem} />
    </main>
  );
}
