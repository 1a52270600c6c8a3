/** The command line as a user meets it: help, readable text, JSON contract, errors without stack traces. */
import { describe, it, expect } from "vitest";
import { spawnSync } from "node:child_process";
import { join } from "node:path";

const root = join(__dirname, "../..");
const cli = (...args: string[]) =>
  spawnSync(process.execPath, [join(root, "core/cli/launcher.mjs"), ...args], { cwd: root, encoding: "utf8" });

describe("brinefield command line", () => {
  it("explains every command and option with --help", () => {
    const top = cli("--help");
    expect(top.status, "help exits 0").toBe(0);
    expect(top.stdout, "lists run").toMatch(/\brun\b/);
    const run = cli("run", "--help");
    expect(run.stdout, "run help explains --json").toMatch(/--json/);
  });

  it("prints a readable summary under the caution", () => {
    const r = cli("run", "demo-scenarios/island-cove.json");
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout.split("\n").slice(0, 3).join(" "), "caution first").toMatch(/Caution: screening estimate only/);
    for (const label of [
      "Brine density at the port",
      "Port exit velocity",
      "Densimetric Froude number",
      "Impact dilution",
      "Mixing-zone edge",
    ])
      expect(r.stdout, `summary shows ${label}`).toContain(label);
  });

  it("prints the result contract with --json", () => {
    const r = cli("run", "demo-scenarios/sandy-shelf.json", "--json");
    expect(r.status, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.format, "format").toBe("brinefield-result");
    for (const k of ["discharge", "ambient", "reducedGravity"])
      expect(typeof j.densities[k], `densities.${k}`).toBe("number");
    for (const k of ["flow", "velocity", "froude"]) expect(typeof j.port[k], `port.${k}`).toBe("number");
    expect(
      Array.isArray(j.warnings) && j.warnings.every((w: any) => w.code && w.severity && w.message),
      "warnings shape",
    ).toBe(true);
    expect(j.caution, "caution").toMatch(/^Caution/);
    expect(j.nearField.find((m: any) => m.method === "integral").path.length > 5, "integral path present").toBe(true);
  });

  it("rejects a bad scenario with exit code 2, the path and no stack trace", () => {
    const r = cli("run", "tests/cli/fixtures/bad-diameter.json");
    expect(r.status, "exit code").toBe(2);
    expect(r.stderr, "names the field and value").toContain('diffuser.portDiameter: "-0.2 m" must be a port diameter');
    expect(r.stderr, "no stack trace").not.toMatch(/\n\s+at /);
  });

  it("names a missing file and an unknown command plainly", () => {
    const missing = cli("run", "no-such-file.json");
    expect(missing.status, "exit code").toBe(2);
    expect(missing.stderr, "message").toMatch(/no-such-file\.json: cannot be read \(no such file\)/);
    const unknown = cli("frobnicate");
    expect(unknown.status, "exit code").toBe(2);
    expect(unknown.stderr, "message").toMatch(/unknown command "frobnicate"/);
  });

  it("compares the demo study's variants (a regression check on the study format)", () => {
    const r = cli("compare", "demo-scenarios/studies/sandy-shelf-options.json", "--json");
    expect(r.status, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout);
    const variants = new Set(j.rows.map((row: any) => row.variant));
    expect(variants.size, "base and three variants").toBe(4);
  });
});

describe("brinefield validate", () => {
  it("prints the validation table as JSON with at least 8 sourced points", () => {
    const r = cli("validate", "--json");
    expect(r.status, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.format, "format").toBe("brinefield-validation");
    expect(j.version, "version").toBe(1);
    expect(j.points.length, "points").toBeGreaterThanOrEqual(8);
    for (const p of j.points)
      for (const k of ["quantity", "angle", "froude", "published", "model", "ratio", "method", "source", "mark"])
        expect(p[k], `point field ${k}`).toBeDefined();
  });

  it("prints a readable table with the ratio and the band under the caution", () => {
    const r = cli("validate");
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout, "caution first").toMatch(/^Caution/);
    expect(r.stdout, "names a source").toContain("Lai & Lee (2012)");
    expect(r.stdout, "band column").toMatch(/0\.55–1\.00/);
  });
});
