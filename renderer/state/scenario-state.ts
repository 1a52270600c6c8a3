/**
 * Document state of the app: the raw scenario file object exactly as it will be saved (plain JSON data,
 * quantities as SI numbers or strings with units), plus where it lives and whether it has unsaved edits.
 * The document changes only through `updateScenario`, which returns a new state and never mutates.
 */

import { MAX_SCENARIO_TEXT } from "../../core/scenario/parse";
import { parseJsonText } from "../../core/scenario/json-text";
import { SCENARIO_FORMAT } from "../../core/scenario/schema";

/** The raw scenario file: plain, serialisable JSON. Parsing and validation belong to core. */
export type ScenarioFile = { readonly [key: string]: unknown };

export interface DocumentState {
  readonly file: ScenarioFile;
  /** Host path (Electron) or file name (web) the document was opened from or saved to. */
  readonly path: string | null;
  readonly dirty: boolean;
  /** Increases on every edit; lets autosave and the engine tell edits apart cheaply. */
  readonly revision: number;
  /**
   * For a study document: its name and variants (renderer/state/study-document.ts); `file` is then the
   * study's base scenario. Absent or null for a scenario document.
   */
  readonly study?: import("./study-document").StudyPart | null;
}

/**
 * A patch is a partial scenario file merged deeply into the document: objects merge key by key, arrays
 * and scalars replace, and `undefined` removes the key.
 */
export type ScenarioPatch = { readonly [key: string]: unknown };

export function isPlainObject(value: unknown): value is { readonly [key: string]: unknown } {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

export function mergePatch(target: unknown, patch: ScenarioPatch): { [key: string]: unknown } {
  const base: { [key: string]: unknown } = isPlainObject(target) ? { ...target } : {};
  for (const [key, value] of Object.entries(patch)) {
    if (value === undefined) {
      delete base[key];
    } else if (isPlainObject(value)) {
      base[key] = mergePatch(base[key], value);
    } else {
      base[key] = value;
    }
  }
  return base;
}

export function documentFromFile(file: ScenarioFile, path: string | null = null): DocumentState {
  return { file, path, dirty: false, revision: 0 };
}

/** The single way the document changes: a deep-merged patch, marking the document dirty. */
export function updateScenario(state: DocumentState, patch: ScenarioPatch): DocumentState {
  return { ...state, file: mergePatch(state.file, patch), dirty: true, revision: state.revision + 1 };
}

/** Splits "diffuser.risers.portAzimuths.0" into keys, numeric parts becoming array indices. */
export function pathKeys(path: string): (string | number)[] {
  return path
    .split(".")
    .filter((part) => part !== "")
    .map((part) => (/^\d+$/.test(part) ? Number(part) : part));
}

export function getAtPath(file: unknown, path: string): unknown {
  let node: unknown = file;
  for (const key of pathKeys(path)) {
    if (typeof key === "number") {
      if (!Array.isArray(node)) return undefined;
      node = node[key];
    } else {
      if (!isPlainObject(node)) return undefined;
      node = node[key];
    }
  }
  return node;
}

/**
 * Builds the patch that sets one path. Array elements are set by copying the array found in `file`
 * (a patch replaces arrays whole), so the result can go straight to `updateScenario`.
 */
export function patchAtPath(file: unknown, path: string, value: unknown): ScenarioPatch {
  const keys = pathKeys(path);
  const build = (node: unknown, index: number): unknown => {
    if (index === keys.length) return value;
    const key = keys[index];
    if (typeof key === "number") {
      const array = Array.isArray(node) ? [...node] : [];
      const child = build(array[key], index + 1);
      if (child === undefined) array.splice(key, 1);
      else array[key] = child;
      return array;
    }
    // Inside an array the whole element is rebuilt, so merge the old object here.
    const child = build(isPlainObject(node) ? node[key] : undefined, index + 1);
    const withinArray = index > 0 && typeof keys[index - 1] === "number";
    if (withinArray) {
      const copy: { [k: string]: unknown } = isPlainObject(node) ? { ...node } : {};
      if (child === undefined) delete copy[key];
      else copy[key] = child;
      return copy;
    }
    return { [key]: child };
  };
  const patch = build(file, 0);
  return isPlainObject(patch) ? patch : {};
}

/** Scenario name shown in the title bar and used for file names. */
export function scenarioName(file: ScenarioFile): string {
  const name = file["name"];
  return typeof name === "string" && name.trim() !== "" ? name.trim() : "Untitled scenario";
}

/** A file name safe on every platform, from the scenario name. */
export function suggestedFileName(file: ScenarioFile, extension = "brinefield.json"): string {
  const stem = scenarioName(file)
    .replace(/[^A-Za-z0-9 _.-]+/g, "")
    .trim()
    .replace(/\s+/g, "-")
    .toLowerCase();
  return `${stem || "scenario"}.${extension}`;
}

/**
 * Reads the text of a file the user opened or dropped. Only a JSON object marked as a Brinefield scenario
 * becomes a document (its fields may still be wrong: the inputs show those errors); anything else — a
 * picture, a study or result file, any other JSON — is refused with a message, so it never replaces the
 * open document.
 */
export function fileFromText(text: string): { ok: true; file: ScenarioFile } | { ok: false; message: string } {
  // The same checks as every other reader: size, nesting depth, JSON syntax, duplicate keys (core).
  const json = parseJsonText(text, MAX_SCENARIO_TEXT);
  if (!json.ok) return { ok: false, message: `The file ${json.message}.` };
  const parsed = json.value;
  if (!isPlainObject(parsed)) return { ok: false, message: "The file is JSON but not a scenario object." };
  const format = parsed["format"];
  if (format !== SCENARIO_FORMAT) {
    const what = typeof format === "string" ? `its format is "${format.slice(0, 60)}"` : 'it has no "format" field';
    return { ok: false, message: `The file is not a Brinefield scenario: ${what}, not "${SCENARIO_FORMAT}".` };
  }
  return { ok: true, file: parsed };
}

/** Serialises the document as saved on disk: two-space JSON with a final newline. */
export function serialiseScenario(file: ScenarioFile): string {
  return JSON.stringify(file, null, 2) + "\n";
}

/**
 * A new blank scenario: a single 60° port in uniform water, for the user to fill in. The numbers are a
 * modest plant (0.1 m³/s of brine through a 0.2 m port, about 3 m/s) whose jet stays well below the
 * surface in 15 m of water, so the first screen shows an ordinary case.
 */
export function blankScenario(): ScenarioFile {
  return {
    format: "brinefield-scenario",
    version: 1,
    name: "New scenario",
    description: "",
    discharge: { flow: 0.1, salinity: 70, temperature: 25, constituents: [] },
    ambient: {
      depth: 15,
      salinity: 38,
      temperature: 22,
      currentSpeed: 0,
      currentDirection: 0,
      bedSlope: 0,
      bedSlopeAzimuth: 0,
    },
    diffuser: {
      layout: "single",
      portCount: 1,
      portDiameter: 0.2,
      portAngle: 60,
      portHeight: 1,
      portSpacing: 5,
      portAzimuth: 90,
      diffuserAzimuth: 0,
    },
    mixingZone: { radius: 100, limits: [{ constituent: "salinity", maxIncrease: 2, unit: "g/kg" }] },
    options: { nearFieldForEdge: "conservative", farField: "conservative" },
  };
}
