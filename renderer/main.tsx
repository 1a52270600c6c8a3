/** The capture route for the report printer, or the app (loaded by renderer/boot.ts, the page's entry). */
import { StrictMode, Suspense, lazy } from "react";
import { createRoot } from "react-dom/client";
import { App } from "./App";

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
  root.render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
}
