import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { parseStudy, studyJsonSchema } from "../../../core/study/study-file";
import { studyVariants, compareVariant, flattenRow, sortRows } from "../../../core/study/compare";
import { parseScenario } from "../../../core/scenario/parse";
import { evaluateScenario } from "../../../core/study/evaluate";
import { fourPortRaw } from "./fixtures";

const good = () => ({
  format: "brinefield-study",
  version: 1,
  name: "Deeper or more ports",
  base: fourPortRaw(),
  variants: [
    { name: "deeper", overrides: { "ambient.depth": "25 m" } },
    { name: "six ports", overrides: { "diffuser.portCount": 6 } },
  ],
});

describe("parseStudy()", () => {
  it("accepts a valid study", () => {
    expect(parseStudy(good()).ok, "valid study").toBe(true);
  });

  type Study = Record<string, unknown> & { variants: { name: string; overrides: object }[] };
  const sweepOf = (steps: number) => ({ vary: [{ path: "ambient.depth", from: 5, to: 10, steps }] });
  it.each([
    ["format", (s: Study) => (s.format = "brinefield-scenario"), "format"],
    ["version", (s: Study) => (s.version = 2), "version"],
    ["variant name", (s: Study) => (s.variants[1]!.name = ""), "variants.1.name"],
    ["duplicate name", (s: Study) => (s.variants[1]!.name = "deeper"), "variants.1.name"],
    ["reserved name", (s: Study) => (s.variants[0]!.name = "base"), "variants.0.name"],
    [
      "override path",
      (s: Study) => (s.variants[0]!.overrides = { "ambient depth": 3 }),
      "variants.0.overrides.ambient depth",
    ],
    ["unknown key", (s: Study) => (s.extra = 1), "(study)"],
    ["sweep steps", (s: Study) => (s.sweep = sweepOf(0)), "sweep.vary.0.steps"],
  ])("rejects a bad %s, naming the path", (_what, mutate, path) => {
    const s = good() as unknown as Study;
    mutate(s);
    const r = parseStudy(s);
    expect(r.ok, "bad study rejected").toBe(false);
    const paths = r.ok ? [] : r.issues.map((i) => i.path);
    expect(paths, `an issue at ${path}`).toContain(path);
    const message = r.ok ? "" : r.issues.find((i) => i.path === path)!.message;
    const escaped = path.replace(/[.()]/g, "\\$&");
    expect(message, "the message starts with the path").toMatch(new RegExp(`^${escaped}: `));
  });

  it("matches the checked-in JSON Schema core/study/study.schema.json", () => {
    const file = JSON.parse(readFileSync(join(__dirname, "../../../core/study/study.schema.json"), "utf8"));
    expect(file, "regenerate the schema file when the study format changes").toEqual(studyJsonSchema());
  });
});

describe("studyVariants() and compareVariant()", () => {
  it("re-reads each variant through the scenario parser (units, ambient-case inheritance)", () => {
    const study = good();
    (study.base as Record<string, unknown>).ambientCases = [{ name: "spring", currentSpeed: 0.3 }];
    const parsed = parseStudy(study);
    if (!parsed.ok) throw new Error("study should parse");
    const v = studyVariants(parsed.study, study.base, parseScenario);
    if (!v.ok) throw new Error(v.issues.map((i) => i.message).join("; "));
    expect(
      v.variants.map((x) => x.name),
      "base first, then the variants",
    ).toEqual(["base", "deeper", "six ports"]);
    expect(v.variants[1]!.scenario!.ambient.depth, "25 m").toBe(25);
    expect(v.variants[1]!.scenario!.ambientCases[0]!.depth, "the case inherits the variant's depth").toBe(25);
    expect(v.variants[2]!.scenario!.diffuser.length, "6 ports × 5 m spacing → 25 m").toBe(25);
  });

  it("keeps a variant that breaks a scenario rule as refused, with the reader's message", () => {
    const study = good();
    study.variants[1]!.overrides = { "diffuser.portCount": 0 } as never;
    const parsed = parseStudy(study);
    if (!parsed.ok) throw new Error("study should parse");
    const v = studyVariants(parsed.study, study.base, parseScenario);
    if (!v.ok) throw new Error("a rule break is a refused variant, not a study-file problem");
    const bad = v.variants[2]!;
    expect(bad.scenario, "no scenario to compute").toBeNull();
    expect(bad.refused!.join(" "), "the path named").toMatch(/^diffuser\.portCount: 0 must be a whole number of ports/);
    const rows = compareVariant(bad, evaluateScenario);
    expect(
      rows.map((r) => r.verdict),
      "one refused row, never a pass",
    ).toEqual(["refused"]);
  });

  it("refuses override paths that are not own fields of the scenario format, or indices beyond the array", () => {
    for (const path of [
      "constructor",
      "__proto__.x",
      "ambient.toString",
      "ambient.hasOwnProperty",
      "mixingZone.limits.99999999.maxIncrease",
      "ambient.colour",
    ]) {
      const study = good();
      study.variants[1]!.overrides = { [path]: 1 } as never;
      const parsed = parseStudy(study);
      if (!parsed.ok) continue; // the study schema itself refuses some of these
      const v = studyVariants(parsed.study, study.base, parseScenario);
      expect(v.ok, `${path} refused`).toBe(false);
      expect(v.ok ? "" : v.issues[0]!.message, `${path}: variant and path named`).toContain(
        `variants.1 (six ports): ${path}:`,
      );
    }
  });

  it("gives one row per ambient case plus a worst-case row, sortable by any column", () => {
    const parsed = parseStudy(good());
    if (!parsed.ok) throw new Error("study should parse");
    const v = studyVariants(parsed.study, good().base, parseScenario);
    if (!v.ok) throw new Error("variants should parse");
    const rows = v.variants.flatMap((x) => compareVariant(x, evaluateScenario));
    expect(
      rows.map((r) => `${r.variant}/${r.case}`),
      "stated, slack water, overall per variant",
    ).toEqual([
      "base/stated",
      "base/slack water",
      "base/overall",
      "deeper/stated",
      "deeper/slack water",
      "deeper/overall",
      "six ports/stated",
      "six ports/slack water",
      "six ports/overall",
    ]);
    const worst = rows[2]!;
    expect(worst.summary!.margin, "worst case has the lowest margin").toBe(
      Math.min(rows[0]!.summary!.margin, rows[1]!.summary!.margin),
    );
    const flat = rows.map(flattenRow);
    expect(Object.keys(flat[0]!), "per-method columns").toEqual(
      expect.arrayContaining([
        ...["lengthScaleMaxRise", "integralImpactDistance", "integralImpactDilution"],
        ...["edgeDilution", "verdict"],
      ]),
    );
    const sorted = sortRows(flat, "-margin")!;
    for (let i = 1; i < sorted.length; i++) {
      expect((sorted[i - 1]!.margin as number) >= (sorted[i]!.margin as number), "descending margin").toBe(true);
    }
    expect(sortRows(flat, "nonsense"), "unknown column").toBeNull();
  });
});
