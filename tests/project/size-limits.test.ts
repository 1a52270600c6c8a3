/**
 * Size limits (see DEVELOPERS.md, rule 2): no source file and no function of core/, renderer/ or electron/
 * over 400 and 120 lines, so each file and function can be read at once.
 * Functions are found with the TypeScript parser (declarations, methods, arrow functions and function
 * expressions); a function's length counts every line from its first to its last, comments included.
 * Checked as a test so the limits stay true.
 *
 * There is no allow-list: a file or function over the limit is split by concept before it is merged.
 */
import { describe, expect, it } from "vitest";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import ts from "typescript";

const root = join(__dirname, "../..");
export const MAX_FILE_LINES = 400;
export const MAX_FUNCTION_LINES = 120;

/** Folders both limits cover. */
const LIMIT_DIRS = ["core", "renderer", "electron"];

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const e of readdirSync(dir)) {
    const p = join(dir, e);
    if (statSync(p).isDirectory()) out.push(...sourceFiles(p));
    else if (/\.tsx?$/.test(e) && !e.endsWith(".d.ts")) out.push(p);
  }
  return out;
}

/** Lines of a text, not counting a final newline. */
export function lineCount(text: string): number {
  const n = text.split("\n").length;
  return text.endsWith("\n") ? n - 1 : n;
}

/** Every function in a source text longer than `max` lines: its name (or position) and its length. */
export function longFunctions(fileName: string, text: string, max: number): { name: string; lines: number }[] {
  const sf = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, true);
  const out: { name: string; lines: number }[] = [];
  const visit = (node: ts.Node): void => {
    if (ts.isFunctionLike(node) && "body" in node && node.body) {
      const start = sf.getLineAndCharacterOfPosition(node.getStart(sf)).line;
      const end = sf.getLineAndCharacterOfPosition(node.getEnd()).line;
      const lines = end - start + 1;
      if (lines > max) out.push({ name: functionName(node, sf, start), lines });
    }
    ts.forEachChild(node, visit);
  };
  visit(sf);
  return out;
}

function functionName(node: ts.Node, sf: ts.SourceFile, line: number): string {
  const named = node as { name?: ts.Node };
  if (named.name) return named.name.getText(sf);
  const parent = node.parent;
  if (parent && ts.isVariableDeclaration(parent)) return parent.name.getText(sf);
  if (parent && ts.isPropertyAssignment(parent)) return parent.name.getText(sf);
  return `(anonymous, line ${line + 1})`;
}

describe("size limits of core/, renderer/ and electron/", () => {
  const files = LIMIT_DIRS.flatMap((dir) => sourceFiles(join(root, dir)));

  it(`has no source file over ${MAX_FILE_LINES} lines`, () => {
    const long = files
      .map((f) => ({ file: relative(root, f), lines: lineCount(readFileSync(f, "utf8")) }))
      .filter((f) => f.lines > MAX_FILE_LINES);
    expect(long).toEqual([]);
  });

  it(`has no function over ${MAX_FUNCTION_LINES} lines`, () => {
    const long = files.flatMap((f) =>
      longFunctions(f, readFileSync(f, "utf8"), MAX_FUNCTION_LINES).map((fn) => ({
        key: `${relative(root, f)}#${fn.name}`,
        lines: fn.lines,
      })),
    );
    expect(long, "functions over the limit").toEqual([]);
  });

  it("finds a long function and counts lines the way the limits mean them", () => {
    // The checker itself must be able to fail: a 122-line function is found, a 120-line one is not.
    const body = (n: number) => `function f() {\n${"  x++;\n".repeat(n - 2)}}\n`;
    expect(longFunctions("a.ts", body(122), 120)).toEqual([{ name: "f", lines: 122 }]);
    expect(longFunctions("a.ts", body(120), 120)).toEqual([]);
    const arrow = `export const g = () => {\n${"  y++;\n".repeat(130)}};\n`;
    expect(longFunctions("b.ts", arrow, 120)).toEqual([{ name: "g", lines: 132 }]);
    expect(lineCount("a\nb\n")).toBe(2);
  });
});
