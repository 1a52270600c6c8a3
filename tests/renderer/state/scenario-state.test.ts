/**
 * The document state: the raw scenario file, changed only through updateScenario() and actions. Every
 * change returns a new state (the old one is untouched), marks the document dirty and keeps it plain,
 * serialisable data that core can parse.
 */
import { describe, expect, it } from "vitest";
import { MAX_SCENARIO_TEXT, parseScenario } from "../../../core/scenario/parse";
import {
  blankScenario,
  documentFromFile,
  fileFromText,
  getAtPath,
  mergePatch,
  patchAtPath,
  serialiseScenario,
  suggestedFileName,
  updateScenario,
} from "../../../renderer/state/scenario-state";
import {
  addProfileRow,
  appendArrayItem,
  removeArrayItem,
  replaceProfile,
  setAmbientMode,
  setDischargeSource,
  setField,
  setLayout,
} from "../../../renderer/state/actions";

const deepFreeze = <T>(value: T): T => {
  if (typeof value === "object" && value !== null) {
    Object.values(value).forEach(deepFreeze);
    Object.freeze(value);
  }
  return value;
};

describe("updateScenario()", () => {
  it("returns a new, dirty state with a higher revision and never mutates the old one", () => {
    const before = deepFreeze(documentFromFile(blankScenario(), "a.json"));
    const after = updateScenario(before, { diffuser: { portAngle: 45 } });
    expect(after, "a new object").not.toBe(before);
    expect(after.dirty, "edited documents are dirty").toBe(true);
    expect(after.revision, "revision counts edits").toBe(before.revision + 1);
    expect(getAtPath(before.file, "diffuser.portAngle"), "the frozen original keeps its value").toBe(60);
    expect(getAtPath(after.file, "diffuser.portAngle"), "the new state has the edit").toBe(45);
    expect(after.path, "the file location is kept").toBe("a.json");
  });

  it("merges objects key by key, replaces arrays whole, and deletes keys set to undefined", () => {
    const merged = mergePatch(
      { a: { b: 1, c: 2 }, list: [1, 2, 3], gone: true },
      { a: { c: 5 }, list: [9], gone: undefined },
    );
    expect(merged, "deep merge").toEqual({ a: { b: 1, c: 5 }, list: [9] });
  });

  it("keeps the document plain JSON (survives a save and reopen unchanged)", () => {
    const state = updateScenario(documentFromFile(blankScenario()), {
      name: "Round trip",
      diffuser: { portDiameter: "8 in" },
    });
    expect(JSON.parse(serialiseScenario(state.file)), "saved text parses back to the same object").toEqual(state.file);
    expect(serialiseScenario(state.file).endsWith("\n"), "files end with a newline").toBe(true);
  });
});

describe("paths", () => {
  const file = { ambient: { profile: [{ depth: 0 }, { depth: 10, salinity: 38 }] } };
  it("reads nested objects and array elements by dotted path", () => {
    expect(getAtPath(file, "ambient.profile.1.salinity"), "array index in a path").toBe(38);
    expect(getAtPath(file, "ambient.missing.x"), "absent paths read as undefined").toBeUndefined();
  });
  it("builds a patch that changes one array element and keeps its siblings and other keys", () => {
    const patched = mergePatch(file, patchAtPath(file, "ambient.profile.1.depth", 12));
    expect(patched, "only the one value changed").toEqual({
      ambient: { profile: [{ depth: 0 }, { depth: 12, salinity: 38 }] },
    });
    expect(file.ambient.profile[1].depth, "the source is not mutated").toBe(10);
  });
});

describe("actions", () => {
  const start = documentFromFile(blankScenario());

  it("setField stores what the user typed at the path", () => {
    const s = setField.perform(start, { path: "diffuser.portDiameter", value: "8 in" });
    expect(getAtPath(s.file, "diffuser.portDiameter"), "typed unit kept verbatim").toBe("8 in");
  });

  it("setAmbientMode turns uniform water into a two-point profile and back, keeping the values", () => {
    const profile = setAmbientMode.perform(start, { mode: "profile" });
    expect(getAtPath(profile.file, "ambient.salinity"), "uniform keys removed").toBeUndefined();
    expect(getAtPath(profile.file, "ambient.profile"), "surface and bottom points").toEqual([
      { depth: 0, salinity: 38, temperature: 22 },
      { depth: 15, salinity: 38, temperature: 22 },
    ]);
    const back = setAmbientMode.perform(profile, { mode: "uniform" });
    expect(getAtPath(back.file, "ambient.profile"), "profile removed").toBeUndefined();
    expect(getAtPath(back.file, "ambient.salinity"), "surface salinity becomes the uniform value").toBe(38);
  });

  it("profile rows can be added, removed and replaced", () => {
    const profile = setAmbientMode.perform(start, { mode: "profile" });
    const added = addProfileRow.perform(profile, undefined);
    expect((getAtPath(added.file, "ambient.profile") as unknown[]).length, "one more row").toBe(3);
    const removed = removeArrayItem.perform(added, { path: "ambient.profile", index: 0 });
    expect(getAtPath(removed.file, "ambient.profile.0.depth"), "the first row is gone").toBe(15);
    const replaced = replaceProfile.perform(removed, {
      rows: [
        { depth: 0, salinity: 37, temperature: 20 },
        { depth: "30 ft", salinity: 38, temperature: 18 },
      ],
    });
    expect(getAtPath(replaced.file, "ambient.profile.1.depth"), "rows replaced whole").toBe("30 ft");
  });

  it("removeArrayItem ignores an index out of range (returns the same state)", () => {
    expect(removeArrayItem.perform(start, { path: "mixingZone.limits", index: 9 }), "no change").toBe(start);
  });

  it("setLayout fills in what a rosette needs and returns to one port for a single layout", () => {
    const rosette = setLayout.perform(start, { layout: "rosette" });
    expect(getAtPath(rosette.file, "diffuser.risers.portsPerRiser"), "risers added").toBe(4);
    expect(getAtPath(rosette.file, "diffuser.portCount"), "port count = risers × ports per riser").toBe(16);
    const single = setLayout.perform(rosette, { layout: "single" });
    expect(getAtPath(single.file, "diffuser.risers"), "risers removed").toBeUndefined();
    expect(getAtPath(single.file, "diffuser.portCount"), "one port").toBe(1);
  });

  it("setDischargeSource switches between a brine stream and plant data", () => {
    const plant = setDischargeSource.perform(start, { source: "plant" });
    expect(getAtPath(plant.file, "discharge.flow"), "flow now comes from the plant").toBeUndefined();
    expect(getAtPath(plant.file, "plant.recovery"), "plant data added").toBe(0.45);
    expect(getAtPath(plant.file, "discharge.temperature"), "temperature kept").toBe(25);
    const stream = setDischargeSource.perform(plant, { source: "discharge" });
    expect(getAtPath(stream.file, "plant"), "plant removed").toBeUndefined();
    expect(typeof getAtPath(stream.file, "discharge.flow"), "a flow is back").toBe("number");
  });

  it("appendArrayItem adds a limit", () => {
    const s = appendArrayItem.perform(start, {
      path: "mixingZone.limits",
      item: { constituent: "temperature", maxIncrease: 1, unit: "degC" },
    });
    expect(getAtPath(s.file, "mixingZone.limits.1.constituent"), "second limit").toBe("temperature");
  });
});

describe("documents the actions produce are valid scenarios for core", () => {
  const variants = {
    blank: documentFromFile(blankScenario()),
    profile: setAmbientMode.perform(documentFromFile(blankScenario()), { mode: "profile" }),
    plant: setDischargeSource.perform(documentFromFile(blankScenario()), { source: "plant" }),
    line: setLayout.perform(documentFromFile(blankScenario()), { layout: "line" }),
    rosette: setLayout.perform(documentFromFile(blankScenario()), { layout: "rosette" }),
  };
  for (const [name, state] of Object.entries(variants)) {
    it(`${name} scenario parses without issues`, () => {
      const parsed = parseScenario(state.file);
      expect(parsed.ok ? [] : parsed.issues, `parse issues of the ${name} scenario`).toEqual([]);
    });
  }
});

describe("suggestedFileName()", () => {
  it("makes a portable file name from the scenario name", () => {
    expect(
      suggestedFileName({ name: "Sandy shelf — large plant / 24 ports" }),
      "punctuation dropped, spaces to dashes",
    ).toBe("sandy-shelf-large-plant-24-ports.brinefield.json");
    expect(suggestedFileName({}), "unnamed scenario").toBe("untitled-scenario.brinefield.json");
  });
});

describe("fileFromText()", () => {
  it("accepts a saved scenario, fields and all, even when some fields would fail validation", () => {
    const text = serialiseScenario({ ...blankScenario(), ambient: { depth: -3 } });
    const read = fileFromText(text);
    expect(read.ok, "a scenario file opens so its errors can be fixed in the inputs").toBe(true);
    expect(read.ok && read.file["ambient"], "the file as written").toEqual({ depth: -3 });
  });
  it("accepts a byte-order mark before the JSON, as core's reader does", () => {
    expect(fileFromText("\ufeff" + serialiseScenario(blankScenario())).ok, "BOM skipped").toBe(true);
  });
  it("refuses text that is not JSON, such as a dropped picture", () => {
    const read = fileFromText("\u0089PNG\r\n\u001a\n binary");
    expect(read.ok, "not opened").toBe(false);
    expect(!read.ok && read.message, "says why").toMatch(/not valid JSON/);
  });
  it("refuses JSON that is not a Brinefield scenario, naming its format", () => {
    const study = fileFromText(JSON.stringify({ format: "brinefield-study", version: 1 }));
    expect(!study.ok && study.message, "a study file is named as such").toMatch(/brinefield-study/);
    const other = fileFromText(JSON.stringify({ name: "my-package", version: "1.0.0" }));
    expect(!other.ok && other.message, "any other JSON object lacks the format field").toMatch(/no "format" field/);
    expect(fileFromText("[1, 2]").ok, "an array is not a scenario").toBe(false);
  });
  it("refuses text larger than the largest scenario core reads", () => {
    const read = fileFromText(" ".repeat(MAX_SCENARIO_TEXT + 1));
    expect(!read.ok && read.message, "too large").toMatch(/larger than/);
  });
});
