/**
 * The study commands as a user meets them: compare, sweep, design and uncertainty, run in-process with
 * a recording CliIO (worker threads start from the TypeScript source through tsx).
 */
import { describe, it, expect, beforeAll } from "vitest";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { csvParse } from "d3-dsv";
import { CliError, type CliIO } from "../../core/cli/command";
import { command as compare } from "../../core/cli/commands/compare";
import { command as sweep } from "../../core/cli/commands/sweep";
import { command as design } from "../../core/cli/commands/design";
import { command as uncertainty } from "../../core/cli/commands/uncertainty";
import {
  OUTSIDE_SCOPE_MEANING,
  PERCENTILE_MEANING,
  REFUSED_MEANING,
  WORST_CASE_MEANING,
} from "../../core/study/uncertainty-words";
import { parseScenario } from "../../core/scenario/parse";
import { runScenario } from "../../core/pipeline";
import { expandCases } from "../../core/cases";
import { fourPortRaw } from "../core/study/fixtures";

let dir = "";

/** Worker threads start from TypeScript source here (tsx in each thread), slow on a busy machine. */
const WORKERS = { timeout: 120_000 };

function fakeIO(cores = 2) {
  const out: string[] = [];
  const err: string[] = [];
  const files = new Map<string, string>();
  const io: CliIO = {
    cwd: dir,
    isTTY: false,
    cores,
    stdout: (t) => void out.push(t),
    stderr: (t) => void err.push(t),
    readFile: (p) => {
      try {
        return readFileSync(resolve(dir, p), "utf8");
      } catch {
        throw new CliError(`${p}: cannot be read (no such file)`);
      }
    },
    writeFile: (p, d) => void files.set(p, typeof d === "string" ? d : new TextDecoder().decode(d)),
  };
  return { io, out: () => out.join(""), err: () => err.join(""), files };
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), "brinefield-study-"));
  const raw = fourPortRaw();
  raw.ambientCases = [
    { name: "spring tide", currentSpeed: 0.3 },
    { name: "neap tide", currentSpeed: 0.05 },
  ];
  writeFileSync(join(dir, "site.json"), JSON.stringify(raw));
  writeFileSync(
    join(dir, "study.json"),
    JSON.stringify({
      format: "brinefield-study",
      version: 1,
      name: "Options",
      base: "site.json",
      variants: [
        { name: "deeper", overrides: { "ambient.depth": "60 ft" } },
        { name: "eight ports", overrides: { "diffuser.portCount": 8 } },
      ],
    }),
  );
});

describe("brinefield uncertainty", () => {
  it("repeats exactly with the same seed for 1 and 2 workers, with the JSON keys", WORKERS, async () => {
    const run = async (workers: string) => {
      const f = fakeIO();
      const args = ["site.json", "--runs", "24", "--seed", "99", "--workers", workers, "--json"];
      const code = await uncertainty.run(args, f.io);
      expect(code, f.err()).toBe(0);
      return JSON.parse(f.out());
    };
    const one = await run("1");
    const two = await run("2");
    const strip = (j: Record<string, unknown>) => ({ ...j, workers: 0, elapsedSeconds: 0 });
    expect(strip(two), "same seed, different worker count: identical results").toEqual(strip(one));
    for (const k of ["p5", "p50", "p95"]) {
      expect(typeof one.worstCase.edgeDilution[k], `worstCase.edgeDilution.${k}`).toBe("number");
    }
    expect(typeof one.worstCase.probabilityOfExceedance, "probabilityOfExceedance").toBe("number");
    expect(
      one.cases.map((c: { name: string }) => c.name),
      "the stated conditions, each ambient case, slack water",
    ).toEqual(["stated", "spring tide", "neap tide", "slack water"]);
    expect(one.usedDefaultSpreads, "no uncertainty block → default spreads").toBe(true);
    expect(one.notes.join(" "), "the output says default spreads were used").toMatch(/default spreads/);
    expect(typeof one.elapsedSeconds, "timing key ends in Seconds").toBe("number");
  });

  it(
    "explains the numbers in words and shows chances as percentages in text (JSON keeps fractions)",
    WORKERS,
    async () => {
      const f = fakeIO();
      expect(await uncertainty.run(["site.json", "--runs", "24", "--seed", "5", "--workers", "1"], f.io), f.err()).toBe(
        0,
      );
      const text = f.out();
      expect(text, "what the percentiles mean").toContain(PERCENTILE_MEANING);
      expect(text, "the per-run worst case").toContain(WORST_CASE_MEANING);
      expect(text, "outside scope").toContain(OUTSIDE_SCOPE_MEANING);
      expect(text, "refused").toContain(REFUSED_MEANING);
      expect(text, "a percentage column").toMatch(/chance not meeting limit/);
      expect(text, "the overall row as a percentage").toMatch(/overall \(per-run worst case\)[^\n]*\d+(\.\d+)? %/);
      expect(text, "spreads with units").toMatch(
        /ambient salinity \(ambient\.salinity\): normal, mean [\d.]+ g\/kg, standard deviation 0\.5 g\/kg/,
      );
      const j = fakeIO();
      await uncertainty.run(["site.json", "--runs", "24", "--seed", "5", "--workers", "1", "--json"], j.io);
      const json = JSON.parse(j.out());
      expect(json.worstCase.probabilityOfExceedance, "a fraction from 0 to 1 in JSON").toBeLessThanOrEqual(1);
      expect(typeof json.clampedByInput, "clamped draws per input").toBe("object");
    },
  );

  it("rejects a bad seed or run count, naming the option", WORKERS, async () => {
    const f = fakeIO();
    await expect(uncertainty.run(["site.json", "--seed", "-3"], f.io), "negative seed").rejects.toThrow(/--seed/);
    await expect(uncertainty.run(["site.json", "--runs", "0"], f.io), "zero runs").rejects.toThrow(/--runs/);
  });
});

describe("brinefield sweep", () => {
  it("tabulates each point with governing case and equation of state; writes CSV", WORKERS, async () => {
    const f = fakeIO();
    const args = ["site.json", "--vary", "ambient.depth=12:30 m:3", "--json", "--csv", "out.csv"];
    args.push("--workers", "2");
    const code = await sweep.run(args, f.io);
    expect(code, f.err()).toBe(0);
    const j = JSON.parse(f.out());
    expect(
      j.points.map((p: Record<string, number>) => p["ambient.depth"]),
      "12, 21, 30 m",
    ).toEqual([12, 21, 30]);
    for (const p of j.points) {
      expect(typeof p.edgeDilution, "edge dilution per point").toBe("number");
      expect(typeof p.equationOfState === "string" && p.equationOfState.length > 0, "equation of state named").toBe(
        true,
      );
      expect(["spring tide", "neap tide", "slack water"], "governing case is one of the cases").toContain(
        p.governingCase,
      );
    }
    const text = f.files.get("out.csv")!;
    expect(text.startsWith('"Caution:'), "the CSV opens with the caution").toBe(true);
    expect(text.split("\n")[0], "the first row names the scenario and its inputs hash").toMatch(
      /,scenario: .+,inputsHash: [0-9a-f]+/,
    );
    const csv = csvParse(text.replace(/^.*\n/, "")); // the table follows the caution row
    expect(csv.length, "one CSV row per point").toBe(3);
    expect(csv.columns.slice(0, 3), "CSV columns: keys with units, as every Brinefield CSV").toEqual([
      "ambient.depth (m)",
      "governingCase",
      "edgeDilution (-)",
    ]);
  });

  it("takes the inputs from a study file's sweep block when no --vary is given", WORKERS, async () => {
    const study = {
      format: "brinefield-study",
      version: 1,
      name: "Current sweep",
      base: "site.json",
      sweep: { vary: [{ path: "ambient.currentSpeed", from: "0 knot", to: "0.5 knot", steps: 2 }] },
    };
    writeFileSync(join(dir, "sweep-study.json"), JSON.stringify(study));
    const f = fakeIO();
    const code = await sweep.run(["sweep-study.json", "--json", "--workers", "1"], f.io);
    expect(code, f.err()).toBe(0);
    const speeds = JSON.parse(f.out()).points.map((p: Record<string, number>) => p["ambient.currentSpeed"]);
    // 0.5 knot = 0.5 × 1852/3600 m/s (international knot, exact).
    expect(speeds, "two points from the study's sweep block, converted to m/s").toEqual([0, (0.5 * 1852) / 3600]);
  });

  it("explains a malformed --vary", WORKERS, async () => {
    const f = fakeIO();
    await expect(sweep.run(["site.json", "--vary", "ambient.depth=5:10"], f.io), "missing steps").rejects.toThrow(
      /from:to:steps/,
    );
  });
});

describe("brinefield design", () => {
  it("returns a short list whose every design re-checks as passing with runScenario", WORKERS, async () => {
    const f = fakeIO();
    const code = await design.run(
      [
        ...["site.json", "--max-ports", "5", "--diameter-steps", "2", "--angles", "45,60"],
        ...["--max-length", "30 m", "--json", "--workers", "2"],
      ],
      f.io,
    );
    expect(code, f.err()).toBe(0);
    const j = JSON.parse(f.out());
    expect(j.slackWaterAdded, "slack water added and said so").toBe(true);
    expect(j.designs.length, "a list, not one answer").toBeGreaterThan(1);
    expect(j.rankingRule, "the ranking rule is stated").toMatch(/fewest ports/);
    expect(j.caution, "caution in the JSON").toContain("screening estimate");
    expect(j.nearestMiss, "no nearest miss when designs pass").toBeNull();
    const siteRaw = JSON.parse(readFileSync(join(dir, "site.json"), "utf8"));
    for (const d of j.designs) {
      for (const k of ["portCount", "portDiameter", "portAngle", "exitVelocity", "worstMargin"]) {
        expect(typeof d[k], `design field ${k}`).toBe("number");
      }
      // The diffuser block pasted into the scenario as it is reads and passes in every case.
      const parsed = parseScenario({ ...siteRaw, diffuser: d.diffuser });
      if (!parsed.ok)
        throw new Error(`design #${d.rank} block refused: ${parsed.issues.map((i) => i.message).join("; ")}`);
      for (const c of expandCases(parsed.scenario)) {
        const r = runScenario(c.scenario, { includePath: false });
        expect(r.compliance.pass, `design #${d.rank} passes in ${c.name}`).toBe(true);
        expect(d.length, `design #${d.rank} within 30 m`).toBeLessThanOrEqual(30);
      }
    }
  });

  it(
    "answers 'no design' with exit 0, says so on its first line after the caution and gives the nearest miss",
    WORKERS,
    async () => {
      const strict = {
        ...JSON.parse(readFileSync(join(dir, "site.json"), "utf8")),
        mixingZone: { radius: 5, limits: [{ constituent: "salinity", maxIncrease: 0.05 }] },
      };
      writeFileSync(join(dir, "strict.json"), JSON.stringify(strict));
      const f = fakeIO();
      const code = await design.run(
        ["strict.json", "--max-ports", "3", "--diameter-steps", "2", "--angles", "60", "--workers", "1"],
        f.io,
      );
      expect(code, "an answer, not an error").toBe(0);
      const body = f
        .out()
        .split("\n")
        .filter((l) => l.trim() !== "");
      const afterCaution = body[body.findIndex((l, i) => i > 0 && /^─+$/.test(l)) + 1];
      expect(body[0], "the caution opens the output").toMatch(/^─+$/);
      expect(afterCaution, "first line after the caution says so").toMatch(/^No design meets every limit/);
      expect(f.out(), "nearest miss shown").toContain("Nearest miss");
      expect(f.out(), "caution").toContain("screening estimate");
      const g = fakeIO();
      expect(
        await design.run(
          ["strict.json", "--max-ports", "3", "--diameter-steps", "2", "--angles", "60", "--json", "--workers", "1"],
          g.io,
        ),
        "JSON: exit 0",
      ).toBe(0);
      const j = JSON.parse(g.out());
      expect(j.designs, "empty list").toEqual([]);
      expect(j.nearestMiss.toClose.length, "what would close it").toBeGreaterThan(0);
      expect(j.nearestMiss.requiredMargin, "the required margin").toBe(1);
    },
  );

  it("refuses a search over the candidate cap with exit 2, naming the fields", async () => {
    const big = {
      ...JSON.parse(readFileSync(join(dir, "site.json"), "utf8")),
      design: {
        portCounts: Array.from({ length: 200 }, (_, i) => i + 1),
        diameterSteps: 50,
        portAngles: [10, 20, 30, 40, 50, 60, 70, 80],
        spacingSteps: 20,
        minPortDiameter: 0.005,
        maxPortDiameter: 3,
        minExitVelocity: 0.1,
        maxExitVelocity: 30,
        maxLength: 5000,
      },
    };
    writeFileSync(join(dir, "big.json"), JSON.stringify(big));
    const run = design.run(["big.json", "--workers", "1"], fakeIO().io);
    await expect(run, "over the cap").rejects.toThrow(
      /design\.diameterSteps.*design\.spacingSteps.*design\.portAngles/,
    );
    await run.catch((e: CliError) => expect(e.exitCode, "exit 2").toBe(2));
  });
});

describe("brinefield compare", () => {
  it("resolves the base path relative to the study, sorts and exports CSV", WORKERS, async () => {
    const f = fakeIO();
    const code = await compare.run(["study.json", "--json", "--sort=-margin", "--csv", "rows.csv"], f.io);
    expect(code, f.err()).toBe(0);
    const j = JSON.parse(f.out());
    expect(new Set(j.rows.map((r: { variant: string }) => r.variant)), "base and both variants").toEqual(
      new Set(["base", "deeper", "eight ports"]),
    );
    expect(j.caution, "the caution in the JSON").toMatch(/^Caution: screening estimate only/);
    expect(j.rows.length, "3 variants × (stated + 2 cases + slack water + overall)").toBe(15);
    const margins = j.rows.map((r: { margin: number }) => r.margin);
    expect(
      [...margins].sort((a, b) => b - a),
      "sorted by descending margin",
    ).toEqual(margins);
    expect(csvParse(f.files.get("rows.csv")!.replace(/^.*\n/, "")).length, "CSV rows after the caution row").toBe(15);
  });

  it("names the path of a bad study", WORKERS, async () => {
    const bad = {
      format: "brinefield-study",
      version: 1,
      name: "x",
      base: "site.json",
      variants: [{ name: "v" }],
    };
    writeFileSync(join(dir, "bad-study.json"), JSON.stringify(bad));
    const f = fakeIO();
    await expect(compare.run(["bad-study.json"], f.io), "missing overrides").rejects.toThrow(/variants\.0\.overrides/);
  });
});
