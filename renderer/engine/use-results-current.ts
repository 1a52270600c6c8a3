/**
 * Exports pair the results with the inputs, so they wait for the latest edit's run to finish. An export
 * asked for while a run is in flight starts when it ends; a blocked or failed one reaches the status line.
 */
import { useCallback, useEffect, useRef } from "react";
import type { BrinefieldResult } from "../../core/result/contract";
import { exportBlocked, type EngineState } from "./use-engine";

export function useWhenResultsCurrent(
  engine: Pick<EngineState, "result" | "error" | "running">,
  flash: (message: string) => void,
): (run: (result: BrinefieldResult) => Promise<string>) => void {
  const engineRef = useRef(engine);
  engineRef.current = engine;
  const pendingExport = useRef<(() => void) | null>(null);
  const whenResultsCurrent = useCallback(
    (run: (result: BrinefieldResult) => Promise<string>) => {
      const attempt = () => {
        const current = engineRef.current;
        if (current.running) {
          pendingExport.current = attempt;
          return;
        }
        const why = exportBlocked(current);
        if (why !== null || !current.result) return flash(why ?? "No results to export yet.");
        void run(current.result).then(
          (message) => message && flash(message),
          (e: unknown) => flash(String(e)),
        );
      };
      attempt();
    },
    [flash],
  );
  useEffect(() => {
    if (engine.running || !pendingExport.current) return;
    const attempt = pendingExport.current;
    pendingExport.current = null;
    attempt();
  }, [engine.running]);
  return whenResultsCurrent;
}
