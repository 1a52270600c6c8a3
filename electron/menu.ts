/**
 * The application menu as a pure template builder (tests/electron/menu.test.ts). Clicking an item
 * either sends a `MenuCommand` to the renderer over IPC_MENU or runs a main-side action (quit, about,
 * reload in development).
 */
import { basename, dirname } from "node:path";
import type { MenuItemConstructorOptions } from "electron";
import type { MenuCommand } from "./contract";

export interface MenuActions {
  /** Send a command to the renderer (`path` only for "open-recent"). */
  send(command: MenuCommand, path?: string): void;
  clearRecent(): void;
  about(): void;
  quit(): void;
  reload(): void;
  toggleDevTools(): void;
}

export interface MenuOptions {
  readonly isMac: boolean;
  /** Development build (not packaged): adds Reload and developer tools. */
  readonly isDev: boolean;
  readonly recent: readonly string[];
  readonly appName: string;
}

/** "scenario.json — /home/me/outfalls" style label; ampersands doubled so Windows shows them. */
export function recentLabel(path: string): string {
  return `${basename(path)} — ${dirname(path)}`.replace(/&/g, "&&");
}

export function buildMenuTemplate(options: MenuOptions, actions: MenuActions): MenuItemConstructorOptions[] {
  const command = (label: string, cmd: MenuCommand, accelerator?: string): MenuItemConstructorOptions => ({
    label,
    accelerator,
    click: () => actions.send(cmd),
  });

  const recentItems: MenuItemConstructorOptions[] =
    options.recent.length === 0
      ? [{ label: "No recent files", enabled: false }]
      : [
          ...options.recent.map((path): MenuItemConstructorOptions => ({
            label: recentLabel(path),
            click: () => actions.send("open-recent", path),
          })),
          { type: "separator" },
          { label: "Clear Recent Files", click: () => actions.clearRecent() },
        ];

  const fileMenu: MenuItemConstructorOptions = {
    label: "&File",
    submenu: [
      command("New", "new", "CmdOrCtrl+N"),
      command("Open…", "open", "CmdOrCtrl+O"),
      { label: "Open Recent", submenu: recentItems },
      { type: "separator" },
      command("Save", "save", "CmdOrCtrl+S"),
      command("Save As…", "save-as", "CmdOrCtrl+Shift+S"),
      { type: "separator" },
      command("Export Report…", "export-report", "CmdOrCtrl+E"),
      command("Export CSV…", "export-csv", "CmdOrCtrl+Shift+E"),
      command("Print to PDF…", "print-pdf", "CmdOrCtrl+P"),
      ...(options.isMac
        ? []
        : ([
            { type: "separator" },
            { label: "Quit", accelerator: "CmdOrCtrl+Q", click: () => actions.quit() },
          ] satisfies MenuItemConstructorOptions[])),
    ],
  };

  const editMenu: MenuItemConstructorOptions = {
    label: "&Edit",
    submenu: [
      { role: "undo" },
      { role: "redo" },
      { type: "separator" },
      { role: "cut" },
      { role: "copy" },
      { role: "paste" },
      { role: "selectAll" },
    ],
  };

  const viewMenu: MenuItemConstructorOptions = {
    label: "&View",
    submenu: [
      command("Start Page", "start-view", "CmdOrCtrl+Shift+H"),
      command("Reset 3D View", "reset-view", "CmdOrCtrl+0"),
      { type: "separator" },
      command("SI Units", "units-si", "CmdOrCtrl+1"),
      command("US Customary Units", "units-us", "CmdOrCtrl+2"),
      ...(options.isDev
        ? ([
            { type: "separator" },
            { label: "Reload", accelerator: "CmdOrCtrl+R", click: () => actions.reload() },
            {
              label: "Toggle Developer Tools",
              accelerator: "CmdOrCtrl+Shift+I",
              click: () => actions.toggleDevTools(),
            },
          ] satisfies MenuItemConstructorOptions[])
        : []),
    ],
  };

  const helpMenu: MenuItemConstructorOptions = {
    label: "&Help",
    role: "help",
    submenu: [{ label: `About ${options.appName}`, click: () => actions.about() }],
  };

  const macAppMenu: MenuItemConstructorOptions = {
    label: options.appName,
    submenu: [
      { label: `About ${options.appName}`, click: () => actions.about() },
      { type: "separator" },
      { role: "hide" },
      { role: "hideOthers" },
      { role: "unhide" },
      { type: "separator" },
      { label: `Quit ${options.appName}`, accelerator: "CmdOrCtrl+Q", click: () => actions.quit() },
    ],
  };

  return [...(options.isMac ? [macAppMenu] : []), fileMenu, editMenu, viewMenu, helpMenu];
}
