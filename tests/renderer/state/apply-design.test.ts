/** Applying a design from the design search to the document: the whole diffuser block, one undo step. */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { historyPush, historyStart, historyUndo } from "../../../renderer/state/history";
import { applyDesign } from "../../../renderer/state/actions";
import { documentFromFile } from "../../../renderer/state/scenario-state";
import { parseScenario } from "../../../core/scenario/parse";
import { designDiffuserBlock } from "../../../core/study/design-rank";
import { exitVelocity } from "../../../core/study/design";

const cove = JSON.parse(
  readFileSync(fileURLToPath(new URL("../../../demo-scenarios/island-cove.json", import.meta.url)), "utf8"),
);

describe("applyDesign", () => {
  const parsed = parseScenario(cove);
  if (!parsed.ok) throw new Error("demo must parse");
  const s = parsed.scenario;
  const single = designDiffuserBlock(
    {
      portCount: 1,
      portDiameter: 0.155,
      portAngle: 45,
      portSpacing: 0,
      portHeight: 1,
      length: 0,
      exitVelocity: exitVelocity(s.discharge.flow, 1, 0.155, 1),
    },
    s,
    cove.diffuser,
  );

  it("replaces the two-port line with a single port, leaving no spacing behind, and the result reads", () => {
    const next = applyDesign.perform(documentFromFile(cove), { diffuser: single });
    const d = next.file["diffuser"] as Record<string, unknown>;
    expect(d, "the design's block exactly").toEqual(single);
    expect("portSpacing" in d, "no spacing from the old line").toBe(false);
    expect(parseScenario(next.file).ok, "the document still reads").toBe(true);
    expect(next.dirty, "an edit").toBe(true);
  });

  it("is one undo step back to the previous diffuser", () => {
    const h0 = historyStart(documentFromFile(cove));
    const h1 = historyPush(h0, applyDesign.perform(h0.present, { diffuser: single }), "apply-design:", 0);
    expect(h1.past.length, "one step").toBe(1);
    expect(historyUndo(h1).present.file["diffuser"], "the old block back").toEqual(cove.diffuser);
  });
});
