/** Undo and redo over document states, with keystrokes in one field merged into one step. */
import { describe, expect, it } from "vitest";
import {
  historyPush,
  historyRedo,
  historyReplace,
  historyStart,
  historyUndo,
  HISTORY_LIMIT,
} from "../../../renderer/state/history";
import { setField } from "../../../renderer/state/actions";
import { blankScenario, documentFromFile, getAtPath } from "../../../renderer/state/scenario-state";

const start = documentFromFile(blankScenario(), "site.json");
const angle = (h: { present: { file: unknown } }) => getAtPath(h.present.file, "diffuser.portAngle");
const edit = (h: ReturnType<typeof historyStart>, path: string, value: unknown, at: number) =>
  historyPush(h, setField.perform(h.present, { path, value }), `set-field:${path}`, at);

describe("history", () => {
  it("undoes and redoes an edit", () => {
    const h1 = edit(historyStart(start), "diffuser.portAngle", 45, 0);
    const undone = historyUndo(h1);
    expect(angle(undone), "back to 60°").toBe(60);
    expect(angle(historyRedo(undone)), "forward to 45°").toBe(45);
  });

  it("merges quick edits of the same field into one step, but not edits of another field or after a pause", () => {
    let h = historyStart(start);
    h = edit(h, "diffuser.portAngle", 4, 0);
    h = edit(h, "diffuser.portAngle", 45, 200);
    expect(h.past.length, "typing 4 then 5 is one step").toBe(1);
    h = edit(h, "diffuser.portHeight", 2, 300);
    expect(h.past.length, "another field is a new step").toBe(2);
    h = edit(h, "diffuser.portHeight", 3, 5000);
    expect(h.past.length, "after a pause, a new step").toBe(3);
    expect(angle(historyUndo(historyUndo(historyUndo(h)))), "three undos reach the start").toBe(60);
  });

  it("drops the redo branch when a new edit is made after undoing", () => {
    const h = edit(historyUndo(edit(historyStart(start), "diffuser.portAngle", 45, 0)), "diffuser.portAngle", 30, 9000);
    expect(h.future.length, "no redo after a new edit").toBe(0);
    expect(historyRedo(h), "redo does nothing").toBe(h);
  });

  it("does nothing to undo at the start, and records nothing for an action that changed nothing", () => {
    const h = historyStart(start);
    expect(historyUndo(h), "nothing to undo").toBe(h);
    expect(historyPush(h, h.present, "noop", 0), "unchanged state").toBe(h);
  });

  it("keeps the document's current location across undo (saving elsewhere is not undone)", () => {
    const h = historyReplace(edit(historyStart(start), "name", "x", 0), {
      ...edit(historyStart(start), "name", "x", 0).present,
      path: "moved.json",
    });
    expect(historyUndo(h).present.path, "path kept").toBe("moved.json");
  });

  it("keeps at most HISTORY_LIMIT steps", () => {
    let h = historyStart(start);
    for (let i = 0; i < HISTORY_LIMIT + 20; i++) h = edit(h, "diffuser.portAngle", i % 90, i * 5000);
    expect(h.past.length, "bounded history").toBe(HISTORY_LIMIT);
  });
});
