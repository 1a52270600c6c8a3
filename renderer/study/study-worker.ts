/// <reference lib="webworker" />
/**
 * The Study panel's Web Worker: runs the shared study worker protocol (core/study/worker-protocol.ts, the
 * same handler as the command line's worker threads) so the interface stays responsive. The panel
 * cancels by terminating.
 */
import { handleStudyRequest, type StudyRequest } from "../../core/study/worker-protocol";

const scope = self as unknown as DedicatedWorkerGlobalScope;
const PROGRESS_EVERY = 10;

scope.addEventListener("message", (event: MessageEvent<StudyRequest>) => {
  handleStudyRequest(event.data, (reply, transfer) => scope.postMessage(reply, transfer), PROGRESS_EVERY);
});
