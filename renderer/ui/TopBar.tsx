/** The window's top bar: the File commands, the document's title and state, the view tabs and the units. */
import type { UnitSystem } from "../../core/units";
import type { DocumentState } from "../state/scenario-state";
import type { FileCommands } from "../state/use-file-commands";
import type { useTabs } from "./Tabs";

type MainTabs = ReturnType<typeof useTabs<"design" | "study">>;

interface FileCommandsProps {
  readonly commands: FileCommands;
  readonly onStart: () => void;
  readonly step: (direction: "undo" | "redo") => void;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
  /** No current results to export (none yet, or the inputs have errors). */
  readonly exportsDisabled: boolean;
}

function FileCommandBar({ commands, onStart, step, canUndo, canRedo, exportsDisabled }: FileCommandsProps) {
  return (
    <nav className="file-commands" aria-label="File">
      <button type="button" onClick={onStart} data-command="start">
        Start
      </button>
      <button type="button" onClick={commands.newScenario} title="Ctrl+N">
        New
      </button>
      <button type="button" onClick={commands.open} title="Ctrl+O" data-command="open">
        Open…
      </button>
      <button type="button" onClick={commands.save} title="Ctrl+S" data-command="save">
        Save
      </button>
      <button type="button" onClick={commands.saveAs} title="Ctrl+Shift+S">
        Save as…
      </button>
      <button
        type="button"
        onClick={() => step("undo")}
        disabled={!canUndo}
        title="Undo (Ctrl+Z)"
        aria-label="Undo"
        data-command="undo"
      >
        ↶
      </button>
      <button
        type="button"
        onClick={() => step("redo")}
        disabled={!canRedo}
        title="Redo (Ctrl+Shift+Z)"
        aria-label="Redo"
        data-command="redo"
      >
        ↷
      </button>
      <button type="button" onClick={commands.exportReport} disabled={exportsDisabled} data-command="export-report">
        Export report
      </button>
      <button type="button" onClick={commands.exportCsv} disabled={exportsDisabled} data-command="export-csv">
        Export CSV
      </button>
      <button
        type="button"
        onClick={commands.print}
        disabled={exportsDisabled}
        data-command="print-pdf"
        title="Print the report, or save it as PDF (Ctrl+P)"
      >
        Print / PDF…
      </button>
    </nav>
  );
}

function DocumentTitle({ doc, title }: { doc: DocumentState; title: string }) {
  return (
    <div className="doc-title" title={doc.path ?? "not saved yet"}>
      {doc.dirty ? (
        <span className="dirty-dot" role="img" aria-label="unsaved changes" title="unsaved changes">
          ●
        </span>
      ) : null}
      {doc.study ? (
        <span className="doc-kind" data-role="doc-kind">
          Study
        </span>
      ) : null}
      {title}
      {doc.path ? <span className="doc-path">{doc.path.replace(/^.*[\\/]/, "")}</span> : null}
    </div>
  );
}

function UnitsSwitch({ unitSystem, onUnits }: { unitSystem: UnitSystem; onUnits: (units: UnitSystem) => void }) {
  return (
    <div className="segmented units" role="radiogroup" aria-label="Units">
      <button
        type="button"
        role="radio"
        aria-checked={unitSystem === "si"}
        onClick={() => onUnits("si")}
        data-units="si"
      >
        SI
      </button>
      <button
        type="button"
        role="radio"
        aria-checked={unitSystem === "us"}
        onClick={() => onUnits("us")}
        data-units="us"
      >
        US
      </button>
    </div>
  );
}

interface TopBarProps extends FileCommandsProps {
  readonly doc: DocumentState;
  readonly title: string;
  readonly mainTabs: MainTabs;
  readonly unitSystem: UnitSystem;
  readonly onUnits: (units: UnitSystem) => void;
}

export function TopBar({ doc, title, mainTabs, unitSystem, onUnits, ...fileCommands }: TopBarProps) {
  return (
    <header className="topbar">
      <div className="brand" aria-hidden="true">
        Brinefield
      </div>
      <FileCommandBar {...fileCommands} />
      <DocumentTitle doc={doc} title={title} />
      <div className="tabs" {...mainTabs.list} aria-label="View">
        <button {...mainTabs.tab("design")} data-command="design">
          Design
        </button>
        <button {...mainTabs.tab("study")} data-command="study">
          Study
        </button>
      </div>
      <UnitsSwitch unitSystem={unitSystem} onUnits={onUnits} />
    </header>
  );
}
