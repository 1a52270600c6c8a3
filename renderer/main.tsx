/** Entry: the capture route for the report printer, or the app. */
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { App } from "./App";
import { CaptureView } from "./capture/CaptureView";
import "./styles.css";

const params = new URLSearchParams(window.location.search);
const root = createRoot(document.getElementById("root")!);

if (params.get("capture") === "3d") {
  document.body.classList.add("capture");
  root.render(<CaptureView unitSystem={params.get("units") === "us" ? "us" : "si"} />);
} else {
  root.render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
}
