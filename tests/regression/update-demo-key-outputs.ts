/** Rewrites tests/regression/demo-key-outputs.json from the current code (see demo-key-outputs.ts). */
import { writeFileSync } from "node:fs";
import { demoKeyOutputs, RECORD_FILE } from "./demo-key-outputs";

writeFileSync(RECORD_FILE, JSON.stringify(demoKeyOutputs(), null, 2) + "\n");
console.log(`wrote ${RECORD_FILE}`);
