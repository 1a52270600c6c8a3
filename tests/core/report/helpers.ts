/**
 * Shared helpers of the report tests: the demo scenarios, an in-memory CliIO, `brinefield run --json`
 * for a file, and a reader for the report's traced number cells (`data-path` attributes).
 */
import { readFileSync, readdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { join, resolve } from "node:path";
import type { CliIO } from "../../../core/cli/command";
import { command as runCommand } from "../../../core/cli/commands/run";
import type { BrinefieldResult } from "../../../core/result/contract";

export const ROOT = fileURLToPath(new URL("../../../", import.meta.url));
export const DEMO_DIR = join(ROOT, "demo-scenarios");

/** Every demo scenario file (the lead's three, plus any added later). */
export function demoScenarioPaths(): string[] {
  return readdirSync(DEMO_DIR)
    .filter((f) => f.endsWith(".json"))
    .map((f) => join(DEMO_DIR, f))
    .filter((p) => (JSON.parse(readFileSync(p, "utf8")) as { format?: string }).format === "brinefield-scenario");
}

export interface MemoryIO extends CliIO {
  readonly out: string[];
  readonly err: string[];
  readonly files: Map<string, string | Uint8Array>;
}

/** A CliIO that reads real files and keeps writes in memory, keyed by absolute path. */
export function memoryIO(cwd = ROOT): MemoryIO {
  const out: string[] = [];
  const err: string[] = [];
  const files = new Map<string, string | Uint8Array>();
  return {
    out,
    err,
    files,
    cwd,
    stdout: (t: string) => void out.push(t),
    stderr: (t: string) => void err.push(t),
    readFile: (p: string) => {
      const abs = resolve(cwd, p);
      const mem = files.get(abs);
      return typeof mem === "string" ? mem : readFileSync(abs, "utf8");
    },
    writeFile: (p: string, data: string | Uint8Array) => void files.set(resolve(cwd, p), data),
    isTTY: false,
    cores: 1,
  };
}

/** The result exactly as `brinefield run <file> --json` prints it. */
export async function runJson(path: string): Promise<BrinefieldResult> {
  const io = memoryIO();
  const code = await runCommand.run([path, "--json"], io);
  if (code !== 0) throw new Error(`run --json exited ${code}: ${io.err.join("")}`);
  return JSON.parse(io.out.join("")) as BrinefieldResult;
}

/** Every element carrying data-path in the report, with the text it prints. */
export function tracedNumbers(html: string): { path: string; text: string }[] {
  const out: { path: string; text: string }[] = [];
  const re = /<(td|span|strong)[^>]*\sdata-path="([^"]+)"[^>]*>([^<]*)<\/\1>/g;
  for (const m of html.matchAll(re)) out.push({ path: m[2]!, text: m[3]! });
  return out;
}

/** The inner HTML of the table with the given id. */
export function tableById(html: string, id: string): string | null {
  const m = new RegExp(`<table id="${id}"[\\s\\S]*?</table>`).exec(html);
  return m ? m[0] : null;
}

/** Value at a dotted path (numeric segments index arrays). */
export function at(root: unknown, path: string): unknown {
  let v: unknown = root;
  for (const k of path.split(".")) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<string, unknown>)[k];
  }
  return v;
}
