/** Keyboard shortcuts and the host's menu commands, both mapped to the File commands and the view's actions. */
import { useEffect } from "react";
import type { UnitSystem } from "../../core/units";
import * as host from "../platform/host";
import type { FileCommands } from "../state/use-file-commands";

/** What the menu reaches beyond the File commands. */
export interface ShortcutActions {
  readonly step: (direction: "undo" | "redo") => void;
  readonly showStart: (show: boolean) => void;
  readonly resetView: () => void;
  readonly setUnitSystem: (units: UnitSystem) => void;
}

export function useShortcuts(commands: FileCommands, actions: ShortcutActions): void {
  const { step, showStart, resetView, setUnitSystem } = actions;
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey) return;
      const key = e.key.toLowerCase();
      if (key === "z" && !e.shiftKey) step("undo");
      else if ((key === "z" && e.shiftKey) || key === "y") step("redo");
      // In the desktop app the File menu's accelerators send these as menu commands; handling the keys
      // here as well would open two dialogs for one key press.
      else if (host.isDesktop() && (key === "n" || key === "o" || key === "s")) return;
      else if (key === "n") commands.newScenario();
      else if (key === "o") commands.open();
      else if (key === "s" && e.shiftKey) commands.saveAs();
      else if (key === "s") commands.save();
      else if (key === "p" && !host.isDesktop()) commands.print();
      else return;
      e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    const unsubscribe = host.onMenuCommand((command, path) => {
      switch (command) {
        case "open-recent":
          return path ? commands.openRecent(path) : undefined;
        case "new":
          return commands.newScenario();
        case "open":
          return commands.open();
        case "save":
          return commands.save();
        case "save-as":
          return commands.saveAs();
        case "export-report":
          return commands.exportReport();
        case "export-csv":
          return commands.exportCsv();
        case "print-pdf":
          return commands.print();
        case "start-view":
          return showStart(true);
        case "reset-view":
          return resetView();
        case "units-si":
          return setUnitSystem("si");
        case "units-us":
          return setUnitSystem("us");
      }
    });
    return () => {
      window.removeEventListener("keydown", onKey);
      unsubscribe();
    };
  }, [commands, step, showStart, resetView, setUnitSystem]);
}
