/// <reference lib="webworker" />
/**
 * The Study panel's Web Worker: every study is a loop around the one core pipeline, run here so the
 * interface stays responsive. Progress is posted every few runs; the panel cancels by terminating.
 */
import { parseScenario } from "../../core/scenario/parse";
import { evaluateScenario } from "../../core/study/evaluate";
import { evaluatePoints } from "../../core/study/evaluate-point";
import { runMonteCarloChunk } from "../../core/study/montecarlo";
import { compareVariant, studyVariants } from "../../core/study/compare";
import { parseStudy } from "../../core/study/study-file";
import type { StudyReply, StudyRequest } from "./messages";
import { runRecordSteps } from "../../core/record/run";

const scope = self as unknown as DedicatedWorkerGlobalScope;
const PROGRESS_EVERY = 10;

function post(m: StudyReply, transfer: Transferable[] = []): void {
  scope.postMessage(m, transfer);
}

function handle(req: StudyRequest): void {
  const progress = (done: number) => {
    if (done % PROGRESS_EVERY === 0) post({ id: req.id, kind: "progress", done });
  };
  switch (req.kind) {
    case "prepare": {
      const r = parseScenario(req.file);
      if (!r.ok) post({ id: req.id, kind: "error", message: r.issues.map((i) => i.message).join("\n") });
      else post({ id: req.id, kind: "prepared", scenario: r.scenario });
      return;
    }
    case "compare": {
      const st = parseStudy({
        format: "brinefield-study",
        version: 1,
        name: "Study panel",
        base: req.file,
        variants: req.variants,
      });
      if (!st.ok) {
        post({ id: req.id, kind: "error", message: st.issues.map((i) => i.message).join("\n") });
        return;
      }
      const v = studyVariants(st.study, req.file, parseScenario);
      if (!v.ok) {
        post({ id: req.id, kind: "error", message: v.issues.map((i) => i.message).join("\n") });
        return;
      }
      const rows = v.variants.flatMap((x, i) => {
        const r = compareVariant(x, evaluateScenario);
        post({ id: req.id, kind: "progress", done: i + 1 });
        return r;
      });
      post({ id: req.id, kind: "compared", rows });
      return;
    }
    case "points":
      const points = evaluatePoints(req.scenario, req.overrides, evaluateScenario, progress);
      post({ id: req.id, kind: "points", points });
      return;
    case "record-steps": {
      const outcomes = runRecordSteps(req.scenario, evaluateScenario, req.indices, progress);
      post({ id: req.id, kind: "record-steps", outcomes });
      return;
    }
    case "monte-carlo": {
      const { scenario, plan, start, end } = req;
      const chunk = runMonteCarloChunk(scenario, plan, start, end, evaluateScenario, progress);
      const arrays = [...chunk.edgeDilution, ...chunk.margin, ...(chunk.requiredDilution ?? []), ...chunk.pass];
      post(
        { id: req.id, kind: "monte-carlo", chunk },
        arrays.map((a) => a.buffer),
      );
      return;
    }
  }
}

scope.addEventListener("message", (event: MessageEvent<StudyRequest>) => {
  try {
    handle(event.data);
  } catch (err) {
    post({ id: event.data.id, kind: "error", message: err instanceof Error ? err.message : String(err) });
  }
});
