/// <reference lib="webworker" />
/** The core worker: parses and runs scenarios off the UI thread so typing never waits for physics. */
import { runFile } from "./engine/run-file";
import type { EngineRequest } from "./engine/messages";

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.addEventListener("message", (event: MessageEvent<EngineRequest>) => {
  const { id, file } = event.data;
  scope.postMessage(runFile(id, file));
});
