/** What every input needs: the document, the unit system, issues by path and a way to perform actions. */
import { createContext, useContext } from "react";
import type { UnitSystem } from "../../core/units";
import type { Scenario } from "../../core/scenario/types";
import type { Action } from "../state/actions";
import type { ScenarioFile } from "../state/scenario-state";

export interface Editor {
  readonly file: ScenarioFile;
  readonly unitSystem: UnitSystem;
  readonly issues: ReadonlyMap<string, readonly string[]>;
  /** Core's reading of the document (defaults filled in), or null while the document has errors. */
  readonly normalised: Scenario | null;
  perform<I>(action: Action<I>, input: I): void;
}

export const EditorContext = createContext<Editor | null>(null);

export function useEditor(): Editor {
  const editor = useContext(EditorContext);
  if (!editor) throw new Error("useEditor outside EditorContext");
  return editor;
}

/** Issues at `path` and below it (e.g. "ambient.profile" also collects "ambient.profile.2.depth"). */
export function issuesUnder(issues: ReadonlyMap<string, readonly string[]>, path: string, exact = false): string[] {
  const out: string[] = [];
  for (const [p, messages] of issues) {
    if (p === path || (!exact && p.startsWith(path + "."))) out.push(...messages);
  }
  return out;
}
