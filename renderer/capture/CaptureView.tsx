/**
 * Capture route (`?capture=3d`) for the report printer: reads the scenario JSON text from
 * `window.__brinefieldCapture`, runs core on this thread, draws only the 3D view at the window size, and
 * sets `document.body.dataset.ready = "true"` once the first frame is drawn ("error" if it cannot be).
 */
import { useMemo } from "react";
import type { UnitSystem } from "../../core/units";
import { runFile } from "../engine/run-file";
import { PlumeView } from "../view3d/PlumeView";

function markError(message: string): void {
  document.body.dataset.ready = "error";
  document.body.dataset.error = message;
}

export function CaptureView({ unitSystem }: { unitSystem: UnitSystem }) {
  const outcome = useMemo(() => {
    const text = window.__brinefieldCapture;
    if (typeof text !== "string" || text.trim() === "")
      return { ok: false as const, message: "window.__brinefieldCapture holds no scenario text" };
    let file: unknown;
    try {
      file = JSON.parse(text);
    } catch (error) {
      return { ok: false as const, message: `scenario text is not JSON: ${String(error)}` };
    }
    return runFile(1, file);
  }, []);
  if (!outcome.ok) {
    markError(outcome.message);
    return (
      <div className="capture-error" role="alert">
        {outcome.message}
      </div>
    );
  }
  return (
    <div className="capture-root">
      <PlumeView
        scenario={outcome.scenario}
        result={outcome.result}
        unitSystem={unitSystem}
        compact
        onFirstFrame={() => {
          document.body.dataset.ready = "true";
        }}
      />
    </div>
  );
}
