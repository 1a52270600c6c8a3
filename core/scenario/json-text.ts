/**
 * Turning the bytes of a file into a JSON value, the same way for every command and the app: the size
 * cap, UTF-8 only (a byte-order mark is accepted, UTF-16 is refused with "save as UTF-8"), nesting depth
 * capped before parsing, and duplicate object keys refused with their path. Pure functions over bytes
 * and strings; the Node side (stat, open, bounded read) lives in core/cli/node/ and the app's file drop.
 */

// TextDecoder exists wherever Brinefield runs (Node, browsers, workers); core type-checks against ES2022
// only, so the one member used is declared here.
declare const TextDecoder: new (label: "utf-8", options: { fatal: boolean }) => { decode(bytes: Uint8Array): string };

/** Largest input file Brinefield reads, in bytes (scenario, study or profile). One constant for all. */
export const MAX_INPUT_BYTES = 5 * 1024 * 1024;

/**
 * Deepest nesting of arrays and objects accepted. A scenario is about 5 levels deep and a study with an
 * inline base about 8; 64 leaves room and keeps every recursive walk over the value far from the stack
 * limit (a 10,000-deep file used to overflow it in message building).
 */
export const MAX_JSON_DEPTH = 64;

export type JsonTextOutcome<T> =
  { readonly ok: true; readonly value: T } | { readonly ok: false; readonly message: string };

/** "812 kB", "5 MB", "7.3 MB" (binary units, as file managers show them). */
export function formatByteSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} kB`;
  const mb = bytes / (1024 * 1024);
  return `${Number.isInteger(mb) ? mb.toFixed(0) : mb.toFixed(1)} MB`;
}

/** The message for a file over the size cap; the same words wherever the cap is met. */
export function tooLargeMessage(size: number, max: number = MAX_INPUT_BYTES): string {
  return `is ${formatByteSize(size)}, larger than the ${formatByteSize(max)} Brinefield reads; refused unread`;
}

/**
 * Decodes file bytes as UTF-8 text: a UTF-8 byte-order mark is dropped, UTF-16 (by its byte-order mark
 * or by the zero bytes every ASCII character gets in it) and any invalid UTF-8 are refused.
 */
export function decodeInputBytes(bytes: Uint8Array, max: number = MAX_INPUT_BYTES): JsonTextOutcome<string> {
  if (bytes.length > max) return { ok: false, message: tooLargeMessage(bytes.length, max) };
  const b0 = bytes[0];
  const b1 = bytes[1];
  const utf16Bom = (b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff);
  // JSON text starts with ASCII; in UTF-16 every ASCII character carries a zero byte beside it.
  const utf16Zeros = bytes.length >= 2 && (b0 === 0 || b1 === 0);
  if (utf16Bom || utf16Zeros) return { ok: false, message: "is UTF-16 text; save it as UTF-8 and open it again" };
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return { ok: false, message: "is not UTF-8 text (save it as UTF-8)" };
  }
  return { ok: true, value: stripBom(text) };
}

/** Text without a leading byte-order mark. */
export function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/**
 * Deepest nesting of `[` and `{` outside strings, stopping early once `limit` is passed. Linear and
 * iterative, so it is safe on any input before `JSON.parse` or any recursive walk sees it.
 */
export function jsonNestingDepth(text: string, limit = Number.POSITIVE_INFINITY): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      depth++;
      if (depth > deepest) {
        deepest = depth;
        if (deepest > limit) return deepest;
      }
    } else if (c === 0x5d || c === 0x7d) depth--;
  }
  return deepest;
}

/**
 * The first object key that appears twice in the same object, as a dotted path ("ambient.depth",
 * "ambient.profile.3.salinity"), or null. `text` must already be valid JSON (this only tokenises).
 */
export function firstDuplicateKey(text: string): string | null {
  interface Frame {
    readonly object: boolean;
    readonly keys: Set<string> | null;
    key: string | number;
    expectKey: boolean;
  }
  const stack: Frame[] = [];
  const pathOf = (last: string): string => [...stack.slice(0, -1).map((f) => String(f.key)), last].join(".");
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x22) {
      const start = i;
      for (i++; i < text.length; i++) {
        const d = text.charCodeAt(i);
        if (d === 0x5c) i++;
        else if (d === 0x22) break;
      }
      const top = stack[stack.length - 1];
      if (top?.object && top.expectKey) {
        const key = JSON.parse(text.slice(start, i + 1)) as string;
        if (top.keys!.has(key)) return pathOf(key);
        top.keys!.add(key);
        top.key = key;
        top.expectKey = false;
      }
    } else if (c === 0x7b) stack.push({ object: true, keys: new Set(), key: "", expectKey: true });
    else if (c === 0x5b) stack.push({ object: false, keys: null, key: 0, expectKey: false });
    else if (c === 0x7d || c === 0x5d) stack.pop();
    else if (c === 0x2c) {
      const top = stack[stack.length - 1];
      if (top?.object) top.expectKey = true;
      else if (top) top.key = (top.key as number) + 1;
    }
  }
  return null;
}

/**
 * Parses JSON text the way every Brinefield input is read: BOM dropped, size and nesting depth checked
 * before parsing, syntax errors reported, duplicate keys refused naming the path. Never throws.
 */
export function parseJsonText(text: string, max: number = MAX_INPUT_BYTES): JsonTextOutcome<unknown> {
  const body = stripBom(text);
  if (body.length > max) return { ok: false, message: tooLargeMessage(body.length, max) };
  if (body.trim() === "") return { ok: false, message: "is empty (expected JSON)" };
  if (body.charCodeAt(0) === 0 || body.charCodeAt(1) === 0 || /^\ufffe/.test(body)) {
    return { ok: false, message: "is UTF-16 text; save it as UTF-8 and open it again" };
  }
  const depth = jsonNestingDepth(body, MAX_JSON_DEPTH);
  if (depth > MAX_JSON_DEPTH) {
    return { ok: false, message: `is nested more than ${MAX_JSON_DEPTH} levels deep; no Brinefield file is` };
  }
  let value: unknown;
  try {
    value = JSON.parse(body);
  } catch (err) {
    const detail = err instanceof Error ? err.message.split("\n")[0]!.slice(0, 200) : "syntax error";
    return { ok: false, message: `is not valid JSON: ${detail}` };
  }
  const dup = firstDuplicateKey(body);
  if (dup !== null) return { ok: false, message: `${dup}: is given twice; each key may appear once` };
  return { ok: true, value };
}
