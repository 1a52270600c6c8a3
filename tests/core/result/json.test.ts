/**
 * JSON output keeps unbounded range bounds explicit: JSON has no infinity and JSON.stringify writes
 * ±Infinity as null, which a reader takes for "no bound" or zero. Range arrays (`range`, `…Range`) carry
 * "Infinity" / "-Infinity" instead; everything else is plain JSON.
 */
import { describe, it, expect } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { jsonText, jsonRangeReplacer, rangeBoundJson } from "../../../core/result/json";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";

const root = join(__dirname, "../../..");

/** The sandy-shelf demo with one wide, slow port: densimetric Froude number well under 20. */
function slowPortFile(): Record<string, any> {
  const raw = JSON.parse(readFileSync(join(root, "demo-scenarios/sandy-shelf.json"), "utf8"));
  raw.diffuser = {
    layout: "single",
    portCount: 1,
    portDiameter: 0.6,
    portAngle: 60,
    portHeight: 1,
  };
  raw.discharge.flow = 0.05;
  delete raw.ambientCases;
  return raw;
}

/** Every array under a range key in a parsed JSON document. */
function ranges(v: unknown, key = "", out: unknown[][] = []): unknown[][] {
  if (Array.isArray(v)) {
    if (key === "range" || key.endsWith("Range")) out.push(v);
    else v.forEach((x) => ranges(x, key, out));
  } else if (v && typeof v === "object") for (const [k, x] of Object.entries(v)) ranges(x, k, out);
  return out;
}

describe("jsonText()", () => {
  it("writes unbounded range bounds as strings and leaves other values alone", () => {
    const text = jsonText({
      range: [20, Infinity],
      dilutionRange: [-Infinity, 3],
      other: [Infinity],
      margin: 2,
      nested: { range: [0, 1] },
    });
    expect(JSON.parse(text), "explicit bounds").toEqual({
      range: [20, "Infinity"],
      dilutionRange: ["-Infinity", 3],
      other: [null],
      margin: 2,
      nested: { range: [0, 1] },
    });
    expect(text.endsWith("}\n"), "one final newline").toBe(true);
    expect(rangeBoundJson(Number.NaN), "NaN named").toBe("NaN");
    expect(jsonRangeReplacer("range", "text"), "non-arrays untouched").toBe("text");
  });

  it("keeps the Froude-number range of a slow port explicit in a result", () => {
    const parsed = parseScenario(slowPortFile());
    if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
    const r = runScenario(parsed.scenario);
    expect(
      r.warnings.some((w) => w.range && !Number.isFinite(w.range[1])),
      "an open-ended range is among the warnings",
    ).toBe(true);
    const all = ranges(JSON.parse(jsonText(r)));
    expect(all.length > 0, "ranges present").toBe(true);
    for (const g of all) expect(g.includes(null), `no null bound in ${JSON.stringify(g)}`).toBe(false);
    expect(
      all.some((g) => g.includes("Infinity")),
      "Infinity written out",
    ).toBe(true);
  });

  it("is what `brinefield run --json` prints", () => {
    const dir = mkdtempSync(join(tmpdir(), "brinefield-json-"));
    const file = join(dir, "slow.json");
    writeFileSync(file, JSON.stringify(slowPortFile()));
    const out = spawnSync(process.execPath, [join(root, "core/cli/launcher.mjs"), "run", file, "--json"], {
      cwd: root,
      encoding: "utf8",
    });
    expect(out.status, out.stderr).toBe(0);
    const all = ranges(JSON.parse(out.stdout));
    for (const g of all) expect(g.includes(null), `no null bound in ${JSON.stringify(g)}`).toBe(false);
    expect(
      all.some((g) => g.includes("Infinity")),
      "Infinity written out",
    ).toBe(true);
  });
});
