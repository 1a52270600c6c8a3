/**
 * Reading input bytes and JSON text, the same way for every command and the app: the size cap, UTF-8
 * only (byte-order mark dropped, UTF-16 and invalid UTF-8 refused), nesting depth capped before parsing
 * and duplicate object keys refused with their path. UTF-8 and UTF-16 byte patterns: The Unicode
 * Standard, version 15, section 3.10 and 23.8 (byte order mark U+FEFF); JSON text: RFC 8259 (2017).
 */
import { describe, it, expect } from "vitest";
import {
  MAX_INPUT_BYTES,
  MAX_JSON_DEPTH,
  decodeInputBytes,
  formatByteSize,
  parseJsonText,
  stripBom,
  tooLargeMessage,
} from "../../../core/scenario";
import { firstDuplicateKey, jsonNestingDepth } from "../../../core/scenario/json-text";

const UTF16 = "is UTF-16 text; save it as UTF-8 and open it again";
const NOT_UTF8 = "is not UTF-8 text (save it as UTF-8)";

function decoded(bytes: number[], max?: number): string {
  const r = decodeInputBytes(Uint8Array.from(bytes), max);
  expect(r.ok, r.ok ? "" : r.message).toBe(true);
  return r.ok ? r.value : "";
}

function refusedBytes(bytes: number[], max?: number): string {
  const r = decodeInputBytes(Uint8Array.from(bytes), max);
  expect(r.ok, `bytes ${bytes.join(",")} must be refused`).toBe(false);
  return r.ok ? "" : r.message;
}

function refusedText(text: string, max?: number): string {
  const r = parseJsonText(text, max);
  expect(r.ok, `text ${JSON.stringify(text.slice(0, 40))} must be refused`).toBe(false);
  return r.ok ? "" : r.message;
}

describe("formatByteSize and the size message (binary units: IEC 80000-13:2008 kibi/mebi, shown as kB/MB)", () => {
  it("writes bytes below 1024, rounded kB below 1 MiB, whole or one-decimal MB above", () => {
    expect(formatByteSize(0)).toBe("0 bytes");
    expect(formatByteSize(1023)).toBe("1023 bytes");
    expect(formatByteSize(1024)).toBe("1 kB");
    expect(formatByteSize(2048)).toBe("2 kB");
    expect(formatByteSize(1536)).toBe("2 kB");
    expect(formatByteSize(1024 * 1024 - 1)).toBe("1024 kB");
    expect(formatByteSize(1024 * 1024)).toBe("1 MB");
    expect(formatByteSize(5 * 1024 * 1024)).toBe("5 MB");
    expect(formatByteSize(7.3 * 1024 * 1024)).toBe("7.3 MB");
  });

  it("names both sizes in the refusal, with the 5 MB cap by default", () => {
    expect(MAX_INPUT_BYTES).toBe(5 * 1024 * 1024);
    expect(tooLargeMessage(6 * 1024 * 1024)).toBe("is 6 MB, larger than the 5 MB Brinefield reads; refused unread");
    expect(tooLargeMessage(2048, 1024)).toBe("is 2 kB, larger than the 1 kB Brinefield reads; refused unread");
  });
});

describe("decodeInputBytes", () => {
  it("accepts input exactly at the cap and refuses one byte over it, unread", () => {
    expect(decoded([0x7b, 0x7d], 2)).toBe("{}");
    expect(refusedBytes([0x7b, 0x20, 0x7d], 2)).toBe(tooLargeMessage(3, 2));
  });

  it("caps input at 5 MB by default, before looking at the bytes", () => {
    // One byte over 5 MiB is not a whole number of MiB, so it is written with one decimal.
    expect(decodeInputBytes(new Uint8Array(MAX_INPUT_BYTES + 1))).toEqual({
      ok: false,
      message: "is 5.0 MB, larger than the 5 MB Brinefield reads; refused unread",
    });
    expect(parseJsonText(" ".repeat(MAX_INPUT_BYTES + 1))).toEqual({
      ok: false,
      message: "is 5.0 MB, larger than the 5 MB Brinefield reads; refused unread",
    });
  });

  it("decodes UTF-8 (multi-byte characters kept) and drops a UTF-8 byte-order mark", () => {
    expect(decoded([0x22, 0xc3, 0xa9, 0x22])).toBe('"é"');
    expect(decoded([0xef, 0xbb, 0xbf, 0x7b, 0x7d])).toBe("{}");
    expect(decoded([0x7b])).toBe("{");
    expect(decoded([])).toBe("");
  });

  it("refuses UTF-16 by either byte-order mark, even with no zero bytes after it", () => {
    expect(refusedBytes([0xff, 0xfe, 0x41, 0x42])).toBe(UTF16);
    expect(refusedBytes([0xfe, 0xff, 0x41, 0x42])).toBe(UTF16);
  });

  it("refuses UTF-16 by the zero byte beside an ASCII character, in either byte order", () => {
    expect(refusedBytes([0x7b, 0x00, 0x7d, 0x00])).toBe(UTF16);
    expect(refusedBytes([0x00, 0x7b, 0x00, 0x7d])).toBe(UTF16);
    expect(refusedBytes([0x7b, 0x00])).toBe(UTF16);
    expect(refusedBytes([0x00, 0x7b])).toBe(UTF16);
  });

  it("does not take a lone zero byte for UTF-16 (needs two bytes to tell)", () => {
    expect(decoded([0x00])).toBe("\u0000");
  });

  it("refuses invalid UTF-8, including half a byte-order mark (0xFF or 0xFE beside ASCII)", () => {
    expect(refusedBytes([0xc3, 0x28])).toBe(NOT_UTF8);
    expect(refusedBytes([0xff, 0x41])).toBe(NOT_UTF8);
    expect(refusedBytes([0x41, 0xfe])).toBe(NOT_UTF8);
    expect(refusedBytes([0xfe, 0x41])).toBe(NOT_UTF8);
    expect(refusedBytes([0x41, 0xff])).toBe(NOT_UTF8);
  });
});

describe("stripBom", () => {
  it("drops one leading U+FEFF and nothing else", () => {
    expect(stripBom("\ufeff{}")).toBe("{}");
    expect(stripBom("{}")).toBe("{}");
    expect(stripBom("\ufeff\ufeff1")).toBe("\ufeff1");
    expect(stripBom("{\ufeff}")).toBe("{\ufeff}");
  });
});

describe("jsonNestingDepth", () => {
  it("counts [ and { outside strings, and stops once past the limit", () => {
    expect(jsonNestingDepth("1")).toBe(0);
    expect(jsonNestingDepth('{"a":[1,{"b":[]}]}')).toBe(4);
    expect(jsonNestingDepth("[][][]")).toBe(1);
    expect(jsonNestingDepth("[[[]],[]]")).toBe(3);
    expect(jsonNestingDepth('[{"a":{}},{}]')).toBe(3);
    expect(jsonNestingDepth("{}{}{}")).toBe(1);
    expect(jsonNestingDepth('["[[[{{{"]')).toBe(1);
    expect(jsonNestingDepth("[[[[[[", 2)).toBe(3);
  });

  it("skips escaped quotes inside strings", () => {
    expect(jsonNestingDepth('["a\\"[[[", 1]')).toBe(1);
    expect(jsonNestingDepth('["\\\\", [2]]')).toBe(2);
  });
});

describe("firstDuplicateKey", () => {
  it("names the first repeated key by its dotted path through objects and array indices", () => {
    expect(firstDuplicateKey('{"a":1,"a":2}')).toBe("a");
    expect(firstDuplicateKey('{"ambient":{"depth":1,"depth":2}}')).toBe("ambient.depth");
    expect(firstDuplicateKey('{"p":[{"s":1},{"s":1},{"t":1},{"s":1,"s":2}]}')).toBe("p.3.s");
    expect(firstDuplicateKey('{"x":[[1],[2,{"k":0,"k":0}]]}')).toBe("x.1.1.k");
  });

  it("finds none where keys repeat only across objects or as string values", () => {
    expect(firstDuplicateKey('{"a":{"k":1},"b":{"k":1}}')).toBeNull();
    expect(firstDuplicateKey('{"a":"a","b":"a"}')).toBeNull();
    expect(firstDuplicateKey('["a","a"]')).toBeNull();
    expect(firstDuplicateKey("[1,2]")).toBeNull();
    expect(firstDuplicateKey('"a"')).toBeNull();
  });

  it("reads escaped quotes inside keys and values", () => {
    expect(firstDuplicateKey('{"a\\"b":1,"x":"q\\"","a\\"b":2}')).toBe('a"b');
    expect(firstDuplicateKey('{"a\\"":1,"a":2}')).toBeNull();
  });
});

describe("parseJsonText", () => {
  it("parses JSON and drops a byte-order mark", () => {
    expect(parseJsonText('\ufeff{"a":[1,2]}')).toEqual({ ok: true, value: { a: [1, 2] } });
  });

  it("checks the size after the byte-order mark: exactly at the cap read, one over refused", () => {
    expect(parseJsonText("\ufeff[1]", 3)).toEqual({ ok: true, value: [1] });
    expect(refusedText("[10]", 3)).toBe(tooLargeMessage(4, 3));
  });

  it("refuses empty and blank text", () => {
    expect(refusedText("")).toBe("is empty (expected JSON)");
    expect(refusedText(" \n\t ")).toBe("is empty (expected JSON)");
    expect(refusedText("\ufeff")).toBe("is empty (expected JSON)");
  });

  it("refuses text decoded from UTF-16 elsewhere (a zero character first or second, or a reversed mark)", () => {
    expect(refusedText("\u0000{")).toBe(UTF16);
    expect(refusedText("{\u0000}")).toBe(UTF16);
    expect(refusedText("\ufffe{}")).toBe(UTF16);
    // U+FFFE inside a string is a character like any other; only a leading one marks swapped UTF-16.
    expect(parseJsonText('"a\ufffe"')).toEqual({ ok: true, value: "a\ufffe" });
  });

  it(`accepts nesting exactly ${MAX_JSON_DEPTH} deep and refuses one level more`, () => {
    expect(MAX_JSON_DEPTH).toBe(64);
    const nest = (n: number) => "[".repeat(n) + "]".repeat(n);
    expect(parseJsonText(nest(64)).ok).toBe(true);
    expect(refusedText(nest(65))).toBe("is nested more than 64 levels deep; no Brinefield file is");
  });

  it("reports a syntax error with the parser's first line", () => {
    const m = refusedText('{"a":}');
    expect(m.startsWith("is not valid JSON: ")).toBe(true);
    expect(m.length).toBeGreaterThan("is not valid JSON: ".length + 10);
    expect(m).toMatch(/^is not valid JSON: .*(JSON|token|position)/);
    expect(m.length).toBeLessThanOrEqual("is not valid JSON: ".length + 200);
    const long = refusedText(`{"a": "${"x".repeat(400)}" "b"}\n`);
    expect(long.startsWith("is not valid JSON: ")).toBe(true);
    expect(long.length).toBeLessThanOrEqual("is not valid JSON: ".length + 200);
    expect(long).not.toContain("\n");
  });

  it("refuses a duplicate key naming its path", () => {
    expect(refusedText('{"diffuser":{"portCount":2,"portCount":4}}')).toBe(
      "diffuser.portCount: is given twice; each key may appear once",
    );
  });
});
