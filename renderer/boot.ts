/**
 * Entry of the page. Before React and the rest of the app load, the core worker is started and sent the
 * first document (the first demo scenario, as renderer/state/use-document-history.ts opens it), so the
 * worker's start-up and first run overlap the app's own; then the app (renderer/main.tsx) loads.
 */
import { DEMO_SCENARIOS } from "./demos";
import { sendFirstRun, startEngineWorker } from "./engine/engine-worker";
import "./styles.css";

// The 3D capture route for the report printer runs core itself and needs no worker.
if (new URLSearchParams(window.location.search).get("capture") !== "3d") {
  const first = DEMO_SCENARIOS[0];
  if (first) sendFirstRun(first.file);
  else startEngineWorker();
}

void import("./main");
