/**
 * Node-side file I/O shared by the command line (core/cli), the desktop main process (electron/) and
 * the headless printer (core/cli/node/headless/): one reader and one writer. It applies core's pure text
 * rules (core/scenario/json-text.ts) so every path reads a file the same way.
 */
export { readInputFile, readInputFileSync, notRegularFileReason, fsErrorReason, MAX_INPUT_BYTES } from "./read-input";
export type { FileIdentity, ReadInputOutcome, ReadInputOptions } from "./read-input";
export { writeFileAtomic, tempPathFor, OutputRefusedError } from "./atomic-write";
export type { AtomicWriteOptions } from "./atomic-write";
export { parseJsonText, formatByteSize, MAX_JSON_DEPTH } from "../../scenario/json-text";
