import { createRequire } from "node:module";
import { describe, expect, it } from "vitest";

const require = createRequire(import.meta.url);
const config = require("../../electron/builder.config.cjs") as Record<string, unknown> & {
  files: string[];
  linux: { target: string[] };
  win: { target: string[] };
  mac: { target: string[] };
  electronFuses: Record<string, boolean>;
  extraMetadata: { main: string };
};

describe("electron/builder.config.cjs", () => {
  it("is valid against electron-builder's own configuration schema", () => {
    const Ajv = require("ajv") as new (options: object) => {
      compile(schema: object): ((data: unknown) => boolean) & { errors?: unknown };
    };
    const schema = require("app-builder-lib/scheme.json") as object;
    const validate = new Ajv({ allErrors: true, strict: false }).compile(schema);
    const valid = validate(config);
    expect(valid, `schema errors: ${JSON.stringify(validate.errors)}`).toBe(true);
  });

  it("names the product and builds AppImage + deb, NSIS and DMG", () => {
    expect(config.productName, "product name").toBe("Brinefield");
    expect(typeof config.appId === "string" && config.appId.length > 0, "appId set").toBe(true);
    expect(config.linux.target, "linux targets").toEqual(["AppImage", "deb"]);
    expect(config.win.target, "windows target").toEqual(["nsis"]);
    expect(config.mac.target, "mac target").toEqual(["dmg"]);
  });

  it("packs only the bundles and the built renderer, starting from main.cjs like package.json", () => {
    const pkg = require("../../package.json") as { main: string };
    expect(config.extraMetadata.main, "entry").toBe(pkg.main);
    expect(config.files, "bundles included").toEqual(
      expect.arrayContaining(["dist/electron/main.cjs", "dist/electron/preload.cjs", "dist/renderer/**/*"]),
    );
    expect(config.files, "node_modules left out (everything is bundled)").toContain("!node_modules/**/*");
  });

  it("turns off the run-as-Node and inspector fuses", () => {
    expect(config.electronFuses.runAsNode, "ELECTRON_RUN_AS_NODE ignored").toBe(false);
    expect(config.electronFuses.enableNodeCliInspectArguments, "--inspect ignored").toBe(false);
    expect(config.electronFuses.enableNodeOptionsEnvironmentVariable, "NODE_OPTIONS ignored").toBe(false);
  });

  it("turns off the file-protocol privileges (the app is served from brinefield://) and keeps the other fuses", () => {
    expect(config.electronFuses, "fuses").toEqual({
      runAsNode: false,
      enableCookieEncryption: true,
      enableNodeOptionsEnvironmentVariable: false,
      enableNodeCliInspectArguments: false,
      enableEmbeddedAsarIntegrityValidation: true,
      onlyLoadAppFromAsar: true,
      grantFileProtocolExtraPrivileges: false,
    });
  });
});
