import { describe, expect, it } from "vitest";
import { createCloseGuard, type CloseChoice } from "../../electron/close-guard";

function setup(choice: CloseChoice | (() => Promise<CloseChoice>)) {
  const calls: string[] = [];
  const guard = createCloseGuard({
    confirm: async (title) => {
      calls.push(`confirm:${title}`);
      return typeof choice === "function" ? choice() : choice;
    },
    requestSave: () => calls.push("save"),
    closeWindow: () => calls.push("close"),
    onDiscard: () => {
      calls.push("discard");
    },
  });
  return { guard, calls };
}

const tick = () => new Promise((r) => setTimeout(r, 0));

describe("createCloseGuard()", () => {
  it("lets a clean window close without asking", () => {
    const { guard, calls } = setup("cancel");
    expect(guard.onCloseRequested(), "allowed").toBe(true);
    expect(calls, "no dialog").toEqual([]);
  });

  it("asks before closing a dirty window; Cancel keeps it open", async () => {
    const { guard, calls } = setup("cancel");
    guard.setDocumentState({ dirty: true, title: "Outfall A" });
    expect(guard.onCloseRequested(), "close prevented").toBe(false);
    await tick();
    expect(calls, "asked once, nothing else").toEqual(["confirm:Outfall A"]);
  });

  it("Don't Save clears the autosave and then closes", async () => {
    const { guard, calls } = setup("discard");
    guard.setDocumentState({ dirty: true, title: "A" });
    guard.onCloseRequested();
    await tick();
    expect(calls, "discard before close").toEqual(["confirm:A", "discard", "close"]);
    expect(guard.onCloseRequested(), "the real close goes through").toBe(true);
  });

  it("Save asks the renderer to save and closes only after the save succeeded", async () => {
    const { guard, calls } = setup("save");
    guard.setDocumentState({ dirty: true, title: "A" });
    guard.onCloseRequested();
    await tick();
    expect(calls, "save requested, not closed yet").toEqual(["confirm:A", "save"]);
    guard.onSaveResult({ kind: "saved", path: "/x.json" });
    expect(calls.at(-1), "closed after save").toBe("close");
  });

  it("Save then a cancelled save dialog keeps the window open; a later save does not close it", async () => {
    const { guard, calls } = setup("save");
    guard.setDocumentState({ dirty: true, title: "A" });
    guard.onCloseRequested();
    await tick();
    guard.onSaveResult({ kind: "cancelled" });
    guard.onSaveResult({ kind: "saved", path: "/x.json" });
    expect(calls.includes("close"), "never closed").toBe(false);
  });

  it("reset() forgets a finished close, so a new window asks again", async () => {
    const { guard, calls } = setup("discard");
    guard.setDocumentState({ dirty: true, title: "A" });
    guard.onCloseRequested();
    await tick();
    guard.reset();
    guard.setDocumentState({ dirty: true, title: "B" });
    expect(guard.onCloseRequested(), "new dirty window is held").toBe(false);
    await tick();
    const asked = calls.filter((c) => c.startsWith("confirm"));
    expect(asked, "asked for both").toEqual(["confirm:A", "confirm:B"]);
  });

  it("shows one dialog even if close is requested repeatedly", async () => {
    let release: (c: CloseChoice) => void = () => undefined;
    const { guard, calls } = setup(() => new Promise<CloseChoice>((r) => (release = r)));
    guard.setDocumentState({ dirty: true, title: "A" });
    guard.onCloseRequested();
    guard.onCloseRequested();
    release("cancel");
    await tick();
    expect(calls.filter((c) => c.startsWith("confirm")).length, "one dialog").toBe(1);
  });
});
