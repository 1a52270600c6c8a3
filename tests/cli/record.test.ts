/**
 * The ambient record from the command line: the demo with a record and an intake, a CSV given with
 * --record giving the same numbers as the same record inside the scenario, and Ctrl-C cancelling a long
 * record on worker threads.
 */
import { describe, it, expect } from "vitest";
import { spawn, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

const root = join(__dirname, "../..");
const launcher = join(root, "core/cli/launcher.mjs");
const cli = (...args: string[]) =>
  spawnSync(process.execPath, [launcher, ...args], { cwd: root, encoding: "utf8", maxBuffer: 256 * 1024 * 1024 });
const DEMO = "demo-scenarios/tern-point.json";

describe("run with an ambient record", () => {
  it("the demo gives the record and intake objects, and a CSV of the same record gives the same numbers", () => {
    const inScenario = cli("run", DEMO, "--json", "--no-path");
    expect(inScenario.status, inScenario.stderr).toBe(0);
    const a = JSON.parse(inScenario.stdout);
    for (const k of ["steps", "meetsPercent", "edgeDilution", "worstStep", "longestExceedanceHours"])
      expect(a.record, `record.${k}`).toHaveProperty(k);
    for (const k of ["min", "p5", "p50", "p95"])
      expect(typeof a.record.edgeDilution[k], `record.edgeDilution.${k}`).toBe("number");
    for (const k of ["distance", "dilution", "salinityIncrease", "inDenseLayer", "method", "recirculation"])
      expect(a.intake, `intake.${k}`).toHaveProperty(k);
    for (const k of ["feedSalinity", "brineSalinity", "brineFlow"])
      expect(typeof a.intake.recirculation[k], `intake.recirculation.${k}`).toBe("number");
    expect(a.caution, "the caution says each step is quasi-steady").toMatch(/quasi-steady/);
    expect(
      a.methods.some((m: { stage: string }) => m.stage === "record"),
      "methods name the record",
    ).toBe(true);

    // The same record as CSV, times in hours from the start, units in the header.
    const raw = JSON.parse(readFileSync(join(root, DEMO), "utf8"));
    const rec = raw.ambient.record;
    const t0 = Date.parse(rec.time[0]);
    const lines = ["time (h),currentSpeed (m/s),currentDirection (deg)"];
    rec.time.forEach((t: string, i: number) =>
      lines.push(`${(Date.parse(t) - t0) / 3600000},${rec.currentSpeed[i]},${rec.currentDirection[i]}`),
    );
    const dir = mkdtempSync(join(tmpdir(), "brinefield-record-"));
    const csv = join(dir, "tide.csv");
    writeFileSync(csv, lines.join("\n") + "\n");
    delete raw.ambient.record;
    const bare = join(dir, "no-record.json");
    writeFileSync(bare, JSON.stringify(raw));
    const fromCsv = cli("run", bare, "--record", csv, "--json", "--no-path");
    expect(fromCsv.status, fromCsv.stderr).toBe(0);
    const b = JSON.parse(fromCsv.stdout);
    const { start: _s1, ...ra } = a.record;
    const { start: _s2, ...rb } = b.record;
    expect(rb).toEqual(ra);
    expect(b.intake).toEqual(a.intake);
    expect(b.overall).toEqual(a.overall);
  }, 300_000);

  it("names the problem in a bad record CSV", () => {
    const dir = mkdtempSync(join(tmpdir(), "brinefield-record-"));
    const csv = join(dir, "bad.csv");
    writeFileSync(csv, "time (h),currentSpeed (m/s),currentDirection (deg)\n0,0.1,90\n1,7,90\n");
    const r = cli("run", DEMO, "--record", csv);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/ambient\.record\.currentSpeed\.1/);
  }, 120_000);

  it("Ctrl-C cancels a long record on worker threads", async () => {
    const dir = mkdtempSync(join(tmpdir(), "brinefield-record-"));
    const csv = join(dir, "year.csv");
    const lines = ["time (h),currentSpeed (m/s),currentDirection (deg)"];
    // Three years of hourly steps: on the 2-core VM one year takes about 9 s on two workers, so the run is
    // far from its end when the first progress line (asked for with BRINEFIELD_PROGRESS) says it started.
    for (let i = 0; i < 3 * 8760; i++)
      lines.push(
        `${i},${(0.3 * Math.abs(Math.sin((2 * Math.PI * i) / 12.42)) + 0.001 * (i % 7)).toFixed(4)},${(i * 7) % 360}`,
      );
    writeFileSync(csv, lines.join("\n") + "\n");
    const child = spawn(process.execPath, [launcher, "run", DEMO, "--record", csv, "--json", "--workers", "2"], {
      cwd: root,
      env: { ...process.env, BRINEFIELD_PROGRESS: "lines" },
    });
    let stderr = "";
    child.stderr.on("data", (d) => {
      stderr += String(d);
      if (/Record steps: 0 %/.test(stderr) && child.exitCode === null && !child.killed) child.kill("SIGINT");
    });
    const code = await new Promise<number | null>((resolve) => child.on("exit", (c) => resolve(c)));
    expect(code, stderr).toBe(130);
    expect(stderr).toMatch(/Cancelled/);
    expect(stderr, "cancelled long before the end").not.toMatch(/100 %/);
  }, 120_000);
});
