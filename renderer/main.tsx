/** Entry: the capture route for the report printer, or the app. */
import { StrictMode, Suspense, lazy } from "react";
import { createRoot } from "react-dom/client";
import { App } from "./App";
import { startEngineWorker } from "./engine/engine-worker";
import "./styles.css";

// The 3D capture route (three.js) loads only when asked for.
const CaptureView = lazy(() => import("./capture/CaptureView").then((m) => ({ default: m.CaptureView })));

const params = new URLSearchParams(window.location.search);
const root = createRoot(document.getElementById("root")!);

if (params.get("capture") === "3d") {
  document.body.classList.add("capture");
  root.render(
    <Suspense fallback={null}>
      <CaptureView unitSystem={params.get("units") === "us" ? "us" : "si"} />
    </Suspense>,
  );
} else {
  // The core worker starts loading now, while React renders the first screen.
  startEngineWorker();
  root.render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
}
