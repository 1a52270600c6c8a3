import type { MenuItemConstructorOptions } from "electron";
import { describe, expect, it } from "vitest";
import type { MenuCommand } from "../../electron/contract";
import { buildMenuTemplate, recentLabel, type MenuActions } from "../../electron/menu";

function build(options: { isMac?: boolean; isDev?: boolean; recent?: string[] } = {}) {
  const sent: [MenuCommand, string | undefined][] = [];
  const actions: MenuActions = {
    send: (command, path) => sent.push([command, path]),
    clearRecent: () => sent.push(["new", "CLEAR"]),
    about: () => undefined,
    quit: () => undefined,
    reload: () => undefined,
    toggleDevTools: () => undefined,
  };
  const template = buildMenuTemplate(
    {
      isMac: options.isMac ?? false,
      isDev: options.isDev ?? false,
      recent: options.recent ?? [],
      appName: "Brinefield",
    },
    actions,
  );
  return { template, sent };
}

function items(menu: MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return menu.flatMap((m) => [m, ...(Array.isArray(m.submenu) ? items(m.submenu) : [])]);
}

function byLabel(menu: MenuItemConstructorOptions[], label: string) {
  const found = items(menu).find((i) => i.label === label);
  if (!found) throw new Error(`no menu item ${label}`);
  return found;
}

const click = (item: MenuItemConstructorOptions) => (item.click as unknown as () => void)();

describe("buildMenuTemplate()", () => {
  it("has the File commands with their accelerators, each sending its MenuCommand", () => {
    const { template, sent } = build();
    const expected: [string, MenuCommand, string][] = [
      ["New", "new", "CmdOrCtrl+N"],
      ["Open…", "open", "CmdOrCtrl+O"],
      ["Save", "save", "CmdOrCtrl+S"],
      ["Save As…", "save-as", "CmdOrCtrl+Shift+S"],
      ["Export Report…", "export-report", "CmdOrCtrl+E"],
      ["Export CSV…", "export-csv", "CmdOrCtrl+Shift+E"],
      ["Print to PDF…", "print-pdf", "CmdOrCtrl+P"],
      ["Reset 3D View", "reset-view", "CmdOrCtrl+0"],
      ["SI Units", "units-si", "CmdOrCtrl+1"],
      ["US Customary Units", "units-us", "CmdOrCtrl+2"],
    ];
    for (const [label, command, accelerator] of expected) {
      const item = byLabel(template, label);
      expect(item.accelerator, `${label} accelerator`).toBe(accelerator);
      click(item);
      expect(sent.at(-1), `${label} sends ${command}`).toEqual([command, undefined]);
    }
    expect(byLabel(template, "Quit").accelerator, "Quit").toBe("CmdOrCtrl+Q");
    expect(byLabel(template, "About Brinefield"), "Help → About").toBeTruthy();
  });

  it("offers Reload and developer tools only in development", () => {
    const labels = (t: MenuItemConstructorOptions[]) => items(t).map((i) => i.label);
    expect(labels(build({ isDev: false }).template), "production").not.toContain("Reload");
    expect(labels(build({ isDev: true }).template), "development").toContain("Reload");
  });

  it("lists recent files, opening the clicked one by path", () => {
    const { template, sent } = build({ recent: ["/data/a & b.json", "/data/c.json"] });
    const recent = byLabel(template, "Open Recent").submenu as MenuItemConstructorOptions[];
    expect(recent[0].label, "label escapes & for Windows").toBe("a && b.json — /data");
    click(recent[1]);
    expect(sent.at(-1), "open-recent with its path").toEqual(["open-recent", "/data/c.json"]);
    const empty = byLabel(build().template, "Open Recent").submenu as MenuItemConstructorOptions[];
    expect(empty[0].enabled, "empty list shows a disabled placeholder").toBe(false);
  });

  it("puts the app menu first on macOS and Quit there instead of File", () => {
    const { template } = build({ isMac: true });
    expect(template[0].label, "app menu").toBe("Brinefield");
    const file = template.find((m) => m.label === "&File")!.submenu as MenuItemConstructorOptions[];
    expect(
      file.some((i) => i.label === "Quit"),
      "no Quit in File",
    ).toBe(false);
  });

  it("recentLabel() shows the name, then the folder", () => {
    expect(recentLabel("/x/y/z.json"), "label").toBe("z.json — /x/y");
  });
});
