/**
 * The engine's state rule: a successful run replaces what is shown; a failed run keeps the last good
 * result on screen, marked stale, with the issues for the fields. runFile() never throws.
 */
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import {
  applyResponse,
  exportBlocked,
  issuesByPath,
  nextRequest,
  type EngineState,
} from "../../../renderer/engine/use-engine";
import { runFile, withoutPathPrefix } from "../../../renderer/engine/run-file";
import { blankScenario } from "../../../renderer/state/scenario-state";

const empty: EngineState = {
  result: null,
  scenario: null,
  issues: [],
  error: null,
  stale: false,
  running: true,
  ms: null,
  inWorker: true,
};

describe("runFile()", () => {
  it("runs a valid scenario through core and returns the result with the centreline path", () => {
    const response = runFile(7, blankScenario());
    expect(response.ok, "blank scenario runs").toBe(true);
    if (!response.ok) return;
    expect(response.id, "id echoed").toBe(7);
    const integral = response.result.nearField.find((m) => m.method === "integral");
    expect((integral?.path ?? []).length, "the 3D view gets a path").toBeGreaterThan(2);
  });
  it("returns issues by path for a bad field instead of throwing", () => {
    const file = { ...blankScenario(), diffuser: { ...(blankScenario()["diffuser"] as object), portAngle: "abc" } };
    const response = runFile(1, file);
    expect(response.ok, "bad angle fails").toBe(false);
    if (response.ok) return;
    expect(
      response.issues.map((i) => i.path),
      "issue at the field's path",
    ).toContain("diffuser.portAngle");
    expect(
      response.issues.every((i) => !i.message.startsWith(`${i.path}: `)),
      "field messages do not repeat the path",
    ).toBe(true);
  });
  it("reports a file that is not a scenario at all", () => {
    const response = runFile(1, "not an object");
    expect(response.ok, "a string is not a scenario").toBe(false);
  });
  it("runs every bundled demo scenario", () => {
    const dir = join(__dirname, "../../../demo-scenarios");
    const names = readdirSync(dir).filter((f) => f.endsWith(".json"));
    expect(names.length, "demo scenarios are bundled").toBeGreaterThan(0);
    for (const name of names) {
      const response = runFile(1, JSON.parse(readFileSync(join(dir, name), "utf8")));
      expect(response.ok ? "ok" : response.message, `${name} runs`).toBe("ok");
    }
  });
});

describe("applyResponse()", () => {
  const good = runFile(1, blankScenario());
  const bad = runFile(2, { ...blankScenario(), ambient: { depth: -3 } });

  it("shows a successful run", () => {
    const next = applyResponse(empty, good);
    expect(next.result, "result shown").not.toBeNull();
    expect(next.stale || next.running || next.error !== null, "fresh, finished, no error").toBe(false);
  });
  it("keeps the last good result when a later run fails, and marks it stale", () => {
    const shown = applyResponse(empty, good);
    const next = applyResponse(shown, bad);
    expect(next.result, "last good result kept").toBe(shown.result);
    expect(next.stale, "marked stale").toBe(true);
    expect(next.error, "message shown").not.toBeNull();
    expect(next.issues.length, "issues for the fields").toBeGreaterThan(0);
  });
  it("is not stale when there never was a result", () => {
    expect(applyResponse(empty, bad).stale, "nothing to be stale").toBe(false);
  });
});

describe("withoutPathPrefix() and issuesByPath()", () => {
  it("strips a leading path from a message once", () => {
    expect(withoutPathPrefix("a.b", "a.b: must be positive"), "prefix removed").toBe("must be positive");
    expect(withoutPathPrefix("a.b", "must be positive"), "no prefix").toBe("must be positive");
  });
  it("groups messages by path", () => {
    const map = issuesByPath([
      { path: "x", message: "one" },
      { path: "x", message: "two" },
      { path: "y", message: "three" },
    ]);
    expect(map.get("x"), "two messages at x").toEqual(["one", "two"]);
  });
  it("shows a cross-field problem on the field just changed, naming its own field in words", () => {
    const raw = { ...blankScenario() } as Record<string, any>;
    raw.ambient = { ...raw.ambient, depth: 1 };
    raw.diffuser = { ...raw.diffuser, portHeight: 2 };
    const run = runFile(3, raw);
    expect(run.ok, "a port above the surface is refused").toBe(false);
    if (run.ok) return;
    const byDepth = issuesByPath(run.issues, "ambient.depth");
    expect(byDepth.get("ambient.depth")?.join(" "), "on the depth the user typed").toMatch(
      /^port height above the seabed 2 m: must leave the port below the surface/,
    );
    expect(byDepth.has("diffuser.portHeight"), "not also on the port height").toBe(false);
    const byHeight = issuesByPath(run.issues, "diffuser.portHeight");
    expect(byHeight.get("diffuser.portHeight")?.join(" "), "on the port height when that was typed").toMatch(
      /^2 must leave the port below the surface/,
    );
    const unrelated = issuesByPath(run.issues, "mixingZone.radius");
    expect(unrelated.has("diffuser.portHeight"), "an unrelated edit leaves it at home").toBe(true);
  });
  it("shows a too-fast port jet on a flow typed as 12 MGD, not on the port diameter", () => {
    const raw = { ...blankScenario() } as Record<string, any>;
    raw.discharge = { ...raw.discharge, flow: "12 MGD" };
    raw.diffuser = { ...raw.diffuser, portDiameter: 0.1, portCount: 1, layout: "single" };
    const run = runFile(4, raw);
    expect(run.ok, "0.53 m³/s through one 0.1 m port is refused").toBe(false);
    if (run.ok) return;
    const map = issuesByPath(run.issues, "discharge.flow");
    expect(map.get("discharge.flow")?.join(" "), "on the flow").toMatch(/exit velocity/);
    expect(map.has("diffuser.portDiameter"), "not on the diameter").toBe(false);
  });
});

describe("exportBlocked()", () => {
  const good = runFile(1, blankScenario());
  if (!good.ok) throw new Error(good.message);
  const shown = applyResponse(empty, good);
  it("allows an export when the results on screen are those of the inputs as they stand", () => {
    expect(exportBlocked(shown), "fresh results").toBeNull();
  });
  it("refuses while the inputs have errors: the results belong to an earlier version", () => {
    const failed = applyResponse(shown, runFile(2, { ...blankScenario(), diffuser: { portAngle: "abc" } }));
    expect(failed.result, "the old results are still on screen").toBe(shown.result);
    expect(exportBlocked(failed), "says why").toMatch(/inputs have errors/);
  });
  it("refuses while the latest edit is still being calculated", () => {
    expect(exportBlocked({ ...shown, running: true }), "says to wait").toMatch(/Still calculating/);
  });
  it("refuses when there are no results at all", () => {
    expect(exportBlocked(empty), "nothing to export").toMatch(/No results/);
  });
});

describe("nextRequest(): results while typing", () => {
  it("sends the first change at once: nothing in flight, a newer file than the last sent", () => {
    expect(nextRequest(false, 1, 0), "first edit goes out immediately (no debounce)").toBe(1);
  });
  it("holds edits while a run is in flight, then sends only the newest when it returns", () => {
    expect(nextRequest(true, 4, 1), "a run is in flight: wait").toBeNull();
    expect(nextRequest(false, 4, 1), "reply came: one request, for the newest file (edits 2 and 3 coalesced)").toBe(4);
  });
  it("sends nothing when the newest file has already been sent", () => {
    expect(nextRequest(false, 4, 4), "up to date").toBeNull();
  });
});
