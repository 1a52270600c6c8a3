/**
 * Runtime validation of everything that crosses IPC into main. The renderer is treated as untrusted:
 * a payload must match one `HostRequest` variant exactly (unknown kinds and extra keys are rejected),
 * strings are length-limited, paths must be absolute and NUL-free, suggested names must be plain file
 * names. The schema is checked against the TypeScript contract at compile time (see the bottom).
 */
import { isAbsolute } from "node:path";
import { z } from "zod";
import type { HostRequest } from "./contract";
import { MAX_EXPORT_BYTES, MAX_SCENARIO_BYTES, formatBytes } from "./file-store";

/** Longest path accepted (Windows long paths reach 32 767; real scenario paths are far shorter). */
export const MAX_PATH_CHARS = 4096;
/** Longest suggested file name (most file systems allow 255 bytes). */
export const MAX_FILE_NAME_CHARS = 255;
export const MAX_TITLE_CHARS = 300;

const noNul = (s: string) => !s.includes("\0");
// Control characters (C0 and DEL) never belong in a file name or a window title.
// eslint-disable-next-line no-control-regex -- the pattern matches control characters on purpose, to remove or refuse them
const CONTROL_CHARS = /[\u0000-\u001f\u007f]/;

const absolutePath = z
  .string()
  .min(1, "path is empty")
  .max(MAX_PATH_CHARS, `path is longer than ${MAX_PATH_CHARS} characters`)
  .refine(noNul, "path contains a NUL character")
  .refine((p) => isAbsolute(p), "path must be absolute");

const fileName = z
  .string()
  .min(1, "file name is empty")
  .max(MAX_FILE_NAME_CHARS, `file name is longer than ${MAX_FILE_NAME_CHARS} characters`)
  .refine((s) => !CONTROL_CHARS.test(s), "file name contains control characters")
  .refine((s) => !/[\\/]/.test(s), "file name must not contain a folder")
  .refine((s) => s !== "." && s !== "..", "file name must not be . or ..");

/**
 * Where to save: an absolute path, or just a file name (a file dropped on the window has no path);
 * main shows a Save dialog for a bare name or any path the user has not chosen before.
 */
const savePath = z.union([absolutePath, fileName], { error: "path must be absolute or a bare file name" });

function textUpTo(maxBytes: number, what: string) {
  // UTF-8 needs at least one byte per UTF-16 unit, so the cheap length check comes first and the byte
  // count only runs on strings that could fit.
  const message = `${what} is larger than ${formatBytes(maxBytes)}`;
  return z
    .string()
    .max(maxBytes, message)
    .refine((s) => Buffer.byteLength(s, "utf8") <= maxBytes, message);
}

const extension = z
  .string()
  .regex(/^(\*|[A-Za-z0-9][A-Za-z0-9_-]{0,15})$/, "file extension must be letters, digits, _ or -");
const fileFilter = z.strictObject({
  name: z.string().min(1).max(100),
  extensions: z.array(extension).min(1).max(20),
});
const filters = z.array(fileFilter).max(10);

export const hostRequestSchema = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("open-scenario") }),
  z.strictObject({ kind: z.literal("open-path"), path: absolutePath }),
  z.strictObject({
    kind: z.literal("save-file"),
    path: savePath.nullable(),
    text: textUpTo(MAX_SCENARIO_BYTES, "scenario"),
    suggestedName: fileName,
    filters,
  }),
  z.strictObject({
    kind: z.literal("export-file"),
    suggestedName: fileName,
    text: textUpTo(MAX_EXPORT_BYTES, "export"),
    filters,
  }),
  z.strictObject({ kind: z.literal("print-pdf"), suggestedName: fileName }),
  z.strictObject({ kind: z.literal("recent-files") }),
  z.strictObject({ kind: z.literal("autosave-write"), text: textUpTo(MAX_SCENARIO_BYTES, "unsaved work") }),
  z.strictObject({ kind: z.literal("autosave-read") }),
  z.strictObject({ kind: z.literal("autosave-clear") }),
  z.strictObject({
    kind: z.literal("set-document-state"),
    dirty: z.boolean(),
    title: z
      .string()
      .max(MAX_TITLE_CHARS, `title is longer than ${MAX_TITLE_CHARS} characters`)
      .refine((s) => !CONTROL_CHARS.test(s), "title contains control characters"),
  }),
]);

type Validated = z.infer<typeof hostRequestSchema>;
// Compile-time guard: every contract request is accepted by the schema and vice versa.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type DeepMutable<T> = T extends readonly (infer U)[]
  ? DeepMutable<U>[]
  : { -readonly [K in keyof T]: DeepMutable<T[K]> };
const schemaMatchesContract: Same<DeepMutable<HostRequest>, DeepMutable<Validated>> = true;
void schemaMatchesContract;

export type ParsedRequest = { ok: true; request: HostRequest } | { ok: false; message: string };

/** Validate an IPC payload; the message names the first problem, never echoing large input. */
export function parseHostRequest(payload: unknown): ParsedRequest {
  const result = hostRequestSchema.safeParse(payload);
  if (result.success) return { ok: true, request: result.data };
  const issue = result.error.issues[0];
  const where = issue && issue.path.length > 0 ? `${issue.path.join(".")}: ` : "";
  let what = issue?.message ?? "invalid request";
  const atKind = issue !== undefined && (issue.path.length === 0 || issue.path.join(".") === "kind");
  const badKind = issue?.code === "invalid_union" && atKind;
  if (badKind || (issue?.code === "invalid_value" && issue.path[0] === "kind")) {
    what = "unknown request kind";
  } else if (issue?.code === "unrecognized_keys") {
    what = `unexpected field(s) ${issue.keys.map((k) => JSON.stringify(k.slice(0, 40))).join(", ")}`;
  }
  return { ok: false, message: `Rejected host request: ${where}${what.slice(0, 200)}.` };
}
