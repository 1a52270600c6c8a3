/**
 * Worker entry used when the CLI runs from source (tests, tsx) rather than from the esbuild bundle:
 * the bundle starts workers on itself, source runs start them here.
 */
import { runWorkerThread } from "./worker";

runWorkerThread();
