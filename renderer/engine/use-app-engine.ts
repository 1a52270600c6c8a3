/**
 * The results the main window shows: the core worker's run of the document, or, when the scenario has a
 * long ambient record, the record's full result from the study workers in its place.
 */
import { useMemo } from "react";
import { useRecordRun } from "../record/use-record-run";
import { useEngine } from "./use-engine";

export function useAppEngine(file: unknown) {
  const engineRun = useEngine(file);
  // A long ambient record runs on the study workers; its full result then stands for the engine's.
  const recordRun = useRecordRun(engineRun.scenario, engineRun.result);
  const engine = useMemo(
    () =>
      recordRun.result
        ? { ...engineRun, result: recordRun.result }
        : { ...engineRun, running: engineRun.running || recordRun.running },
    [engineRun, recordRun.result, recordRun.running],
  );
  return { engine, recordRun };
}
