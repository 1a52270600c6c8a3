/**
 * The study document: a study file opens with its base scenario and variants, saves back to a file that
 * core's study reader and compare accept, and an edit on a variant's full scenario becomes overrides of
 * the base (read back to the same scenario).
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import {
  documentFromText,
  overridesBetween,
  pathWords,
  serialiseDocument,
  suggestedDocumentName,
  variantScenario,
} from "../../../renderer/state/study-document";
import { documentFromFile, updateScenario, patchAtPath } from "../../../renderer/state/scenario-state";
import { parseStudy } from "../../../core/study/study-file";
import { studyVariants } from "../../../core/study/compare";
import { parseScenario } from "../../../core/scenario/parse";

const root = join(__dirname, "../../..");
const base = JSON.parse(readFileSync(join(root, "demo-scenarios/island-cove.json"), "utf8")) as Record<string, unknown>;
const studyText = JSON.stringify({
  format: "brinefield-study",
  version: 1,
  name: "Options",
  base,
  variants: [{ name: "deeper", overrides: { "ambient.depth": "25 m" } }],
  sweep: { vary: [{ path: "ambient.currentSpeed", from: 0, to: 0.5, steps: 3 }] },
});

describe("study documents", () => {
  it("open with the base as the document's scenario and the variants as its study part", () => {
    const r = documentFromText(studyText);
    if (!r.ok) throw new Error(r.message);
    expect(r.file).toEqual(base);
    expect(r.study?.name).toBe("Options");
    expect(r.study?.variants).toEqual([{ name: "deeper", overrides: { "ambient.depth": "25 m" } }]);
  });

  it("save to a study file that core reads back to the same variants (sweep kept)", () => {
    const r = documentFromText(studyText);
    if (!r.ok) throw new Error(r.message);
    const doc = { ...documentFromFile(r.file), study: r.study };
    const text = serialiseDocument(doc);
    const st = parseStudy(JSON.parse(text));
    if (!st.ok) throw new Error(st.issues.map((i) => i.message).join("; "));
    expect(st.study.sweep, "the sweep block survives").toEqual({
      vary: [{ path: "ambient.currentSpeed", from: 0, to: 0.5, steps: 3 }],
    });
    const v = studyVariants(st.study, st.study.base, parseScenario);
    if (!v.ok) throw new Error("variants");
    expect(v.variants.map((x) => [x.name, x.scenario?.ambient.depth])).toEqual([
      ["base", 18],
      ["deeper", 25],
    ]);
    expect(suggestedDocumentName(doc)).toBe("options.brinefield-study.json");
  });

  it("turn an edit of the variant's scenario into overrides that rebuild it", () => {
    const variant = { name: "v", overrides: { "ambient.depth": "25 m" } };
    const built = variantScenario(base, variant);
    if (!built.ok) throw new Error(built.message);
    const edited = updateScenario(documentFromFile(built.file), patchAtPath(built.file, "diffuser.portCount", 4)).file;
    const diff = overridesBetween(base, edited);
    if (!diff.ok) throw new Error(diff.message);
    expect(diff.overrides).toEqual({ "ambient.depth": "25 m", "diffuser.portCount": 4 });
    const rebuilt = variantScenario(base, { name: "v", overrides: diff.overrides });
    expect(rebuilt.ok && rebuilt.file).toEqual(edited);
  });

  it("say plainly when an edit cannot be an override (a value removed from a section)", () => {
    const edited = JSON.parse(JSON.stringify(base)) as { diffuser: Record<string, unknown> };
    delete edited.diffuser["portSpacing"];
    const diff = overridesBetween(base, edited);
    expect(diff.ok).toBe(false);
    if (!diff.ok) expect(diff.message).toMatch(/removes diffuser\.portSpacing.*open the variant as a scenario/);
  });

  it("name override paths in words", () => {
    expect(pathWords("ambient.depth")).toBe("water depth");
    expect(pathWords("diffuser.portCount")).toBe("ports");
  });

  it("refuse a study whose base is a separate file, and anything that is neither scenario nor study", () => {
    const byPath = documentFromText(
      JSON.stringify({ format: "brinefield-study", version: 1, name: "x", base: "site.json" }),
    );
    expect(byPath.ok).toBe(false);
    const other = documentFromText(JSON.stringify({ format: "something" }));
    expect(!other.ok && other.message).toMatch(/not a Brinefield scenario.*"brinefield-study"/);
  });
});
