// Worker entry when the CLI runs from TypeScript source (tests, tsx) instead of the esbuild bundle:
// registers tsx in this thread, then loads the TypeScript worker body. The bundle never uses this file.
import { register } from "tsx/esm/api";

register();
await import("./entry.ts");
