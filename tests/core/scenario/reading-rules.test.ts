/**
 * Reading a scenario from start to end without throwing: the file check (an object, the format name, a
 * version this build reads), unknown fields, the cap on issues shown, text in, errors for callers that
 * prefer exceptions, and what normalising adds: option defaults, optional sections, uncertain inputs,
 * a frozen result. Format rules are the project's own (common practice, no source).
 */
import { describe, it, expect } from "vitest";
import {
  parseScenario,
  parseScenarioText,
  scenarioFromRaw,
  ScenarioError,
  SCENARIO_MIGRATIONS,
  SCENARIO_VERSION,
  decodeInputBytes,
} from "../../../core/scenario";
import { AMBIENT_CASE_FIELDS } from "../../../core/scenario/types";
import { issue } from "../../../core/scenario/issue";
import { accepted, baseRaw, edited, refusedIssues, refusedMessages } from "./rule-fixtures";

describe("the shape of an issue", () => {
  it("shows the path, the value given (or that it is missing) and what is expected", () => {
    expect(issue("a.b", 2, "must be 1")).toStrictEqual({ path: "a.b", value: 2, message: "a.b: 2 must be 1" });
    expect(issue("a.b", undefined, "expected x").message).toBe("a.b: is missing; expected x");
    expect(issue("", "x", "must be y").message).toBe('(file): "x" must be y');
    expect(issue("n", Number.NaN, "e").message).toBe("n: NaN e");
    expect(issue("n", Number.NEGATIVE_INFINITY, "e").message).toBe("n: -Infinity e");
    expect(issue("n", () => 1, "e").message).toBe("n: () => 1 e");
    expect(issue("n", "y".repeat(100), "e").message).toBe(`n: "${"y".repeat(79)} e`);
  });

  it("lists related fields only when there are some", () => {
    expect("related" in issue("a", 1, "e")).toBe(false);
    expect("related" in issue("a", 1, "e", [])).toBe(false);
    expect(issue("a", 1, "e", ["b"]).related).toEqual(["b"]);
  });
});

describe("the file check", () => {
  it("wants a JSON object", () => {
    const msg = (t: string) => `(file): "${t}" must be a JSON object with "format": "brinefield-scenario"`;
    expect(refusedIssues(null)).toEqual([{ path: "", value: "object", message: msg("object") }]);
    expect(refusedMessages([])).toEqual([msg("object")]);
    expect(refusedMessages(5)).toEqual([msg("number")]);
    expect(refusedMessages("{}")).toEqual([msg("string")]);
  });

  it("wants the format name", () => {
    expect(refusedMessages(edited((r) => delete r.format))).toEqual([
      'format: is missing; must be "brinefield-scenario": this is not a Brinefield scenario file',
    ]);
    expect(refusedMessages(edited((r) => (r.format = "brinefield-study")))).toEqual([
      'format: "brinefield-study" must be "brinefield-scenario": this is not a Brinefield scenario file',
    ]);
  });

  it("wants a whole version number from 1, and refuses a newer one than it reads", () => {
    expect(SCENARIO_VERSION).toBe(1);
    expect(SCENARIO_MIGRATIONS).toEqual({});
    for (const v of ["1", 1.5, 0, -1, null])
      expect(refusedMessages(edited((r) => (r.version = v)))).toEqual([
        `version: ${JSON.stringify(v)} must be a format version number (this Brinefield reads version 1)`,
      ]);
    expect(refusedMessages(edited((r) => (r.version = 2)))).toEqual([
      "version: 2 is newer than this Brinefield understands (it reads up to version 1); the file was written by a newer Brinefield — update Brinefield rather than risk misreading it",
    ]);
    const r = parseScenario(baseRaw());
    expect(r.ok && r.notes).toEqual([]);
  });

  it("names unknown fields at the top and inside sections", () => {
    expect(refusedIssues(edited((r) => (r.colour = "red")))).toEqual([
      {
        path: "colour",
        value: "red",
        message: 'colour: "red" is not a field of this section; check the spelling (see the format in README.md)',
      },
    ]);
    expect(refusedIssues(edited((r) => (r.ambient.tide = 2)))[0]!.path).toBe("ambient.tide");
  });

  it("shows at most 40 issues, from the schema or from normalising", () => {
    const manyKeys = edited((r) => {
      for (let i = 0; i < 45; i++) r.diffuser[`extra${i}`] = i;
    });
    expect(refusedIssues(manyKeys)).toHaveLength(40);
    const manyNames = edited((r) => {
      r.discharge.constituents = Array.from({ length: 45 }, () => ({
        name: "Salinity",
        concentration: 1,
        unit: "g/kg",
      }));
    });
    expect(refusedIssues(manyNames)).toHaveLength(40);
  });
});

describe("hostile files, read in-process the way every command reads them", () => {
  const text = JSON.stringify(baseRaw(), null, 1);
  const fileMessage = (t: string) => {
    const r = parseScenarioText(t);
    expect(r.ok, t.slice(0, 40)).toBe(false);
    return r.ok ? [] : r.issues.map((i) => i.message);
  };

  it("reads a scenario with a byte-order mark, as text or as bytes", () => {
    expect(parseScenarioText("\ufeff" + text).ok).toBe(true);
    const bytes = decodeInputBytes(Uint8Array.from(Buffer.from("\ufeff" + text, "utf8")));
    expect(bytes.ok && parseScenarioText(bytes.value).ok).toBe(true);
  });

  it("refuses UTF-16 with or without a mark, Latin-1 and binary bytes", () => {
    const utf16le = Buffer.from(text, "utf16le");
    const utf16be = Buffer.from(text, "utf16le").swap16();
    const refusal = (b: Buffer) => {
      const r = decodeInputBytes(Uint8Array.from(b));
      return r.ok ? "" : r.message;
    };
    const UTF16 = "is UTF-16 text; save it as UTF-8 and open it again";
    expect(refusal(Buffer.concat([Buffer.from([0xff, 0xfe]), utf16le]))).toBe(UTF16);
    expect(refusal(Buffer.concat([Buffer.from([0xfe, 0xff]), utf16be]))).toBe(UTF16);
    expect(refusal(utf16le)).toBe(UTF16);
    expect(refusal(Buffer.from(text.replace("Rule test", "Île test"), "latin1"))).toBe(
      "is not UTF-8 text (save it as UTF-8)",
    );
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d]);
    expect(refusal(png)).toBe("is not UTF-8 text (save it as UTF-8)");
  });

  it("refuses deep nesting inside a scenario, duplicate keys by path, and JSON that is no object", () => {
    const deep = text.replace('"name":', `"deep": ${"[".repeat(5000)}${"]".repeat(5000)}, "name":`);
    expect(fileMessage(deep)).toEqual(["(file): is nested more than 64 levels deep; no Brinefield file is"]);
    const dup = text.replace('"depth": 15', '"depth": 15, "depth": 500');
    expect(fileMessage(dup)).toEqual(["(file): ambient.depth: is given twice; each key may appear once"]);
    expect(fileMessage("")).toEqual(["(file): is empty (expected JSON)"]);
    expect(fileMessage(text.slice(0, 100))[0]).toMatch(/^\(file\): is not valid JSON: /);
    const notObject = '(file): "object" must be a JSON object with "format": "brinefield-scenario"';
    expect(fileMessage("[1, 2, 3]")).toEqual([notObject]);
    expect(fileMessage("null")).toEqual([notObject]);
    expect(fileMessage("42")).toEqual(['(file): "number" must be a JSON object with "format": "brinefield-scenario"']);
  });

  it("refuses nonsense fields naming them", () => {
    expect(refusedMessages(edited((r) => (r.diffuser.portCount = 0)))).toEqual([
      "diffuser.portCount: 0 must be a whole number of ports from 1 to 1000",
    ]);
    expect(refusedMessages(edited((r) => (r.mixingZone.radius = -100)))).toEqual([
      'mixingZone.radius: -100 must be a positive mixing-zone radius up to 20000 m (e.g. 12 or "40 ft")',
    ]);
    expect(refusedMessages(edited((r) => (r.ambient.depth = "deep")))[0]).toMatch(
      /^ambient\.depth: "deep" .+; must be a positive water depth up to 1000 m/,
    );
  });
});

describe("reading text and throwing", () => {
  it("reads scenario text, and refuses non-text and bad JSON as the whole file", () => {
    expect(parseScenarioText(JSON.stringify(baseRaw())).ok).toBe(true);
    expect(parseScenarioText(5 as unknown as string)).toEqual({
      ok: false,
      issues: [{ path: "", value: "number", message: '(file): "number" must be text' }],
    });
    const bad = parseScenarioText("{");
    expect(bad.ok).toBe(false);
    if (bad.ok) return;
    expect(bad.issues).toHaveLength(1);
    expect(bad.issues[0]!.path).toBe("");
    expect(bad.issues[0]!.value).toBeUndefined();
    expect(bad.issues[0]!.message).toMatch(/^\(file\): is not valid JSON: /);
  });

  it("scenarioFromRaw returns the scenario or throws every issue at once", () => {
    expect(scenarioFromRaw(baseRaw()).name).toBe("Rule test diffuser");
    const raw = edited((r) => {
      r.diffuser.portAngle = 91;
      r.ambient.depth = -1;
    });
    let thrown: unknown;
    try {
      scenarioFromRaw(raw);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(ScenarioError);
    const err = thrown as ScenarioError;
    expect(err.name).toBe("ScenarioError");
    expect(err.issues).toHaveLength(2);
    expect(err.message).toBe(err.issues.map((i) => i.message).join("\n"));
    expect(err.message.split("\n")).toHaveLength(2);
  });
});

describe("what normalising adds", () => {
  it("fills option defaults and keeps options given", () => {
    expect(accepted(baseRaw()).options).toEqual({
      nearFieldForEdge: "conservative",
      farField: "conservative",
      addSlackWater: true,
    });
    const given = { nearFieldForEdge: "integral", farField: "passive-diffusion", addSlackWater: false };
    expect(accepted(edited((r) => (r.options = given))).options).toEqual(given);
  });

  it("keeps a description, an intake and a time-compliance target only when given", () => {
    const plain = accepted(edited((r) => (r.description = "")));
    expect("description" in plain).toBe(false);
    expect("intake" in plain).toBe(false);
    expect("plant" in plain).toBe(false);
    expect("uncertainty" in plain).toBe(false);
    expect(plain.mixingZone).toEqual({
      radius: 100,
      limits: [{ constituent: "salinity", unit: "g/kg", maxIncrease: 2 }],
    });
    const full = accepted(
      edited((r) => {
        r.description = "Invented bay";
        r.intake = { distance: "1 km", bearing: 45, heightAboveSeabed: 2 };
        r.mixingZone.timeCompliance = { percentOfTime: 95 };
      }),
    );
    expect(full.description).toBe("Invented bay");
    expect(full.intake).toEqual({ distance: 1000, bearing: 45, heightAboveSeabed: 2 });
    expect(full.mixingZone.timeCompliance).toEqual({ percentOfTime: 95 });
    expect(full.format).toBe("brinefield-scenario");
    expect(full.version).toBe(1);
  });

  it("keeps each uncertain input once with its numeric parameters", () => {
    const s = accepted(
      edited(
        (r) =>
          (r.uncertainty = {
            inputs: [
              { path: "ambient.currentSpeed", distribution: "normal", mean: 0.1, sd: 0.02 },
              { path: "ambient.depth", distribution: "triangular", min: 14, mode: 15, max: 16 },
            ],
          }),
      ),
    );
    expect(s.uncertainty).toEqual({
      inputs: [
        { path: "ambient.currentSpeed", distribution: "normal", params: { mean: 0.1, sd: 0.02 } },
        { path: "ambient.depth", distribution: "triangular", params: { min: 14, mode: 15, max: 16 } },
      ],
    });
    const twice = edited(
      (r) =>
        (r.uncertainty = {
          inputs: [
            { path: "ambient.currentSpeed", distribution: "normal", sd: 0.02 },
            { path: "ambient.depth", distribution: "uniform", min: 14, max: 16 },
            { path: "ambient.currentSpeed", distribution: "uniform", min: 0, max: 0.2 },
          ],
        }),
    );
    expect(refusedIssues(twice)).toEqual([
      {
        path: "uncertainty.inputs.2.path",
        value: "ambient.currentSpeed",
        message: 'uncertainty.inputs.2.path: "ambient.currentSpeed" is listed twice; give each uncertain input once',
      },
    ]);
  });

  it("freezes the whole scenario", () => {
    const s = accepted(baseRaw());
    expect(Object.isFrozen(s)).toBe(true);
    expect(Object.isFrozen(s.diffuser.flowSplit)).toBe(true);
    expect(Object.isFrozen(s.ambient.profile[0])).toBe(true);
    expect(Object.isFrozen(s.mixingZone.limits[0])).toBe(true);
  });

  it("lists the ambient fields a case may set", () => {
    expect(AMBIENT_CASE_FIELDS).toEqual(["depth", "salinity", "temperature", "currentSpeed", "currentDirection"]);
  });
});
