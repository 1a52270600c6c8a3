/**
 * Node-side file I/O shared by the command line (core/cli), the desktop main process (electron/) and
 * the headless printer (core/cli/node/headless/): one reader and one writer. It applies core's pure text
 * rules (core/scenario/jsonText.ts) so every path reads a file the same way.
 */
export { readInputFile, readInputFileSync, notRegularFileReason, fsErrorReason, MAX_INPUT_BYTES } from "./readInput";
export type { FileIdentity, ReadInputOutcome, ReadInputOptions } from "./readInput";
export { writeFileAtomic, tempPathFor, OutputRefusedError } from "./atomicWrite";
export type { AtomicWriteOptions } from "./atomicWrite";
export { parseJsonText, formatByteSize, MAX_JSON_DEPTH } from "../../scenario/jsonText";
