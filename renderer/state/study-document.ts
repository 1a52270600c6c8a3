/**
 * A study as an app document: the scenario being edited is the study's base, and the study part holds
 * its named variants, each a set of overrides written like scenario fields ("ambient.depth": "25 m").
 * Saved as a `brinefield-study` file (core/study/study-file.ts) with the base scenario inline, so
 * `brinefield compare` and `brinefield report` read what the app saves. Variants are edited through the
 * same input sections as the Design tab: an edit is applied to the variant's full scenario and the
 * overrides are what differs from the base.
 */
import { MAX_SCENARIO_TEXT } from "../../core/scenario/parse";
import { parseJsonText } from "../../core/scenario/json-text";
import { parseStudy, STUDY_FORMAT, STUDY_VERSION } from "../../core/study/study-file";
import { withRawOverride } from "../../core/study/overrides";
import { fieldBounds } from "../../core/scenario/bounds";
import {
  fileFromText,
  isPlainObject,
  scenarioName,
  serialiseScenario,
  type DocumentState,
  type ScenarioFile,
} from "./scenario-state";

export interface StudyVariantDoc {
  readonly name: string;
  readonly description?: string;
  /** Dotted scenario path → value as entered (SI number, string with a unit, true/false, list). */
  readonly overrides: Readonly<Record<string, unknown>>;
}

export interface StudyPart {
  readonly name: string;
  readonly description?: string;
  readonly variants: readonly StudyVariantDoc[];
  /** The file's sweep block, kept as read so saving does not drop it. */
  readonly sweep?: unknown;
}

/** The study part of a document, or null for a plain scenario document. */
export function studyOf(doc: DocumentState): StudyPart | null {
  return doc.study ?? null;
}

/** Name in the title bar: the study's name for a study, else the scenario's. */
export function documentName(doc: DocumentState): string {
  return doc.study ? doc.study.name : scenarioName(doc.file);
}

/** A file name from the document name ("harbour-options.brinefield-study.json" for a study). */
export function suggestedDocumentName(doc: DocumentState): string {
  const stem = documentName(doc)
    .replace(/[^A-Za-z0-9 _.-]+/g, "")
    .trim()
    .replace(/\s+/g, "-")
    .toLowerCase();
  return doc.study ? `${stem || "study"}.brinefield-study.json` : `${stem || "scenario"}.brinefield.json`;
}

/** The study file object as saved: format, version, name, the base scenario inline, variants, sweep. */
export function studyFileObject(file: ScenarioFile, study: StudyPart): Record<string, unknown> {
  return {
    format: STUDY_FORMAT,
    version: STUDY_VERSION,
    name: study.name,
    ...(study.description ? { description: study.description } : {}),
    base: file,
    variants: study.variants.map((v) => ({
      name: v.name,
      ...(v.description ? { description: v.description } : {}),
      overrides: { ...v.overrides },
    })),
    ...(study.sweep !== undefined ? { sweep: study.sweep } : {}),
  };
}

/** The document as written to disk: a scenario file, or a study file with the base inline. */
export function serialiseDocument(doc: Pick<DocumentState, "file" | "study">): string {
  return doc.study ? JSON.stringify(studyFileObject(doc.file, doc.study), null, 2) + "\n" : serialiseScenario(doc.file);
}

export type ReadDocument = { ok: true; file: ScenarioFile; study: StudyPart | null } | { ok: false; message: string };

/**
 * Reads the text of a file the user opened, dropped or recovered: a Brinefield scenario, or a Brinefield
 * study whose base scenario is inside the file. Anything else is refused with a message.
 */
export function documentFromText(text: string): ReadDocument {
  const json = parseJsonText(text, MAX_SCENARIO_TEXT);
  if (json.ok && isPlainObject(json.value) && json.value["format"] === STUDY_FORMAT) {
    const parsed = parseStudy(json.value);
    if (!parsed.ok) {
      const list = parsed.issues
        .slice(0, 5)
        .map((i) => i.message)
        .join("; ");
      return {
        ok: false,
        message: `The file is a Brinefield study ("${STUDY_FORMAT}") with ${parsed.issues.length} problem(s): ${list}`,
      };
    }
    const s = parsed.study;
    if (typeof s.base === "string") {
      return {
        ok: false,
        message:
          `The study names its base scenario by file ("${s.base.slice(0, 80)}"); the app opens studies whose base ` +
          "scenario is inside the file. Open the base scenario and add the variants in the Study tab, or run " +
          "`brinefield compare` on this study.",
      };
    }
    return {
      ok: true,
      file: s.base as ScenarioFile,
      study: {
        name: s.name,
        ...(s.description ? { description: s.description } : {}),
        variants: (s.variants ?? []).map((v) => ({
          name: v.name,
          ...(v.description ? { description: v.description } : {}),
          overrides: v.overrides,
        })),
        ...(s.sweep !== undefined ? { sweep: s.sweep } : {}),
      },
    };
  }
  const read = fileFromText(text);
  if (!read.ok) return { ok: false, message: read.message.replace(/\.$/, ` or "${STUDY_FORMAT}".`) };
  return { ok: true, file: read.file, study: null };
}

/** The variant's full raw scenario: the base with its overrides applied, or why it cannot be built. */
export function variantScenario(
  base: ScenarioFile,
  variant: StudyVariantDoc,
): { ok: true; file: ScenarioFile } | { ok: false; message: string } {
  let raw: unknown = base;
  try {
    for (const [path, value] of Object.entries(variant.overrides)) raw = withRawOverride(raw, path, value);
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
  return { ok: true, file: raw as ScenarioFile };
}

/**
 * The overrides that turn `base` into `edited`: one entry per changed value, by dotted path. Objects are
 * compared key by key, lists of equal length element by element; a list that changes length is one entry.
 * A value removed from a section cannot be written as an override: that is returned as a problem.
 */
export function overridesBetween(
  base: unknown,
  edited: unknown,
): { ok: true; overrides: Record<string, unknown> } | { ok: false; message: string } {
  const out: Record<string, unknown> = {};
  let problem: string | null = null;
  const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
  const walk = (a: unknown, b: unknown, path: string[]) => {
    if (problem || same(a, b)) return;
    const depth = path.length;
    if (isPlainObject(b) && (isPlainObject(a) || a === undefined)) {
      const from = isPlainObject(a) ? a : {};
      for (const key of Object.keys(from)) {
        if (!(key in b)) {
          problem = `this change removes ${[...path, key].join(".")}, which a variant cannot do; open the variant as a scenario to make it`;
          return;
        }
      }
      for (const key of Object.keys(b)) walk(from[key], b[key], [...path, key]);
      return;
    }
    if (Array.isArray(a) && Array.isArray(b) && a.length === b.length && depth >= 1) {
      b.forEach((item, i) => walk(a[i], item, [...path, String(i)]));
      return;
    }
    if (depth < 2) {
      problem = `this change replaces the whole "${path.join(".") || "scenario"}" section, which a variant cannot do; open the variant as a scenario to make it`;
      return;
    }
    out[path.join(".")] = b;
  };
  walk(base, edited, []);
  return problem ? { ok: false, message: problem } : { ok: true, overrides: out };
}

/** Words for an override path: "water depth" for ambient.depth; other paths read as words from their keys. */
export function pathWords(path: string): string {
  const b = fieldBounds(path);
  if (b) return b.what;
  return path
    .split(".")
    .map((p) => (/^\d+$/.test(p) ? `#${Number(p) + 1}` : p.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase()))
    .join(" › ");
}

/** A new study around the document's scenario, with one variant that changes nothing yet. */
export function newStudyPart(file: ScenarioFile): StudyPart {
  return { name: `${scenarioName(file)} — options`, variants: [{ name: "variant 1", overrides: {} }] };
}

/** A name not yet used by any variant (and never "base"). */
export function freshVariantName(study: StudyPart, stem = "variant"): string {
  const used = new Set(study.variants.map((v) => v.name));
  for (let i = study.variants.length + 1; ; i++) if (!used.has(`${stem} ${i}`)) return `${stem} ${i}`;
}

/** Replaces variant i (a new study part; the old one is not changed). */
export function withVariant(study: StudyPart, i: number, variant: StudyVariantDoc): StudyPart {
  return { ...study, variants: study.variants.map((v, k) => (k === i ? variant : v)) };
}
