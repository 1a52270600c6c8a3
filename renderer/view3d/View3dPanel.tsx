/** The Design tab's 3D view, or what stands in its place while there are no results. */
import { Suspense, lazy } from "react";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";

// three.js and the 3D view load after the first screen (the inputs and results do not wait for them).
const PlumeView = lazy(() => import("./PlumeView").then((m) => ({ default: m.PlumeView })));

interface View3dPanelProps {
  readonly result: BrinefieldResult | null;
  readonly scenario: Scenario | null;
  readonly unitSystem: UnitSystem;
  readonly error: string | null;
  readonly resetSignal: number;
  readonly documentKey: number;
}

export function View3dPanel({ result, scenario, unitSystem, error, resetSignal, documentKey }: View3dPanelProps) {
  return (
    <div className="view3d-panel">
      {result && scenario ? (
        <Suspense fallback={<div className="placeholder">Loading the 3D view…</div>}>
          <PlumeView
            scenario={scenario}
            result={result}
            unitSystem={unitSystem}
            resetSignal={resetSignal}
            documentKey={documentKey}
          />
        </Suspense>
      ) : (
        <div className="placeholder">{error ? "No results: fix the inputs marked in red." : "Calculating…"}</div>
      )}
    </div>
  );
}
