/**
 * `brinefield report` with an in-memory CliIO: the files it writes for a scenario agree with
 * `brinefield run --json` for the same file, and a study gives one section per variant plus a
 * comparison table whose numbers are each variant's own results. The 3D image is left out here
 * (--no-3d); tests/browser/report.test.ts covers it.
 */
import { describe, expect, it } from "vitest";
import { csvParse } from "d3-dsv";
import { join } from "node:path";
import { readFileSync } from "node:fs";
import { parseScenario } from "../../../core/scenario/parse";
import { checkClaimOnScenario } from "../../../core/compliance/claim-run";
import { command } from "../../../core/cli/commands/report";
import { CliError } from "../../../core/cli/command";
import { resultCsv, seriesCsv, reportNumber, reportValue } from "../../../core/report";
import { aboutResult, csvWithCaution } from "../../../core/report/csv";
import type { BrinefieldResult } from "../../../core/result/contract";
import { at, DEMO_DIR, memoryIO, ROOT, runJson, tableById, tracedNumbers } from "./helpers";

const demo = join(DEMO_DIR, "sandy-shelf.json");

describe("brinefield report <scenario>", () => {
  it("writes HTML, CSVs and JSON that agree with run --json", async () => {
    const io = memoryIO();
    const code = await command.run(
      [demo, "--no-3d", "--out", "r.html", "--csv", "r.csv", "--series-csv", "s.csv", "--json", "r.json"],
      io,
    );
    expect(code, "exit 0").toBe(0);
    const expected = await runJson(demo);
    const json = JSON.parse(io.files.get(join(ROOT, "r.json")) as string) as BrinefieldResult;
    expect(json, "--json file is run --json's result").toEqual(expected);
    // Written CSV files open with the caution on their first row, then the table.
    // The first row also says what the numbers were computed from: scenario name and inputs hash.
    expect(io.files.get(join(ROOT, "r.csv")), "results CSV").toBe(
      csvWithCaution(resultCsv(expected), undefined, aboutResult(expected)),
    );
    expect(io.files.get(join(ROOT, "s.csv")), "series CSV").toBe(
      csvWithCaution(seriesCsv(expected), undefined, aboutResult(expected)),
    );
    expect((io.files.get(join(ROOT, "r.csv")) as string).startsWith('"Caution:'), "caution first").toBe(true);
    const html = io.files.get(join(ROOT, "r.html")) as string;
    const cells = tracedNumbers(html);
    expect(cells.length, "numbers traced").toBeGreaterThan(40);
    for (const { path, text } of cells) {
      const v = at(expected, path);
      expect(text, `report cell ${path} equals run --json formatted`).toBe(
        typeof v === "number" ? reportValue(path, v) : "—",
      );
    }
    expect(html, "says why there is no 3D view").toContain("No 3D view is included: it was turned off (--no-3d).");
    expect(io.out.join(""), "lists what it wrote").toContain("wrote HTML report: r.html");
  });

  it("names the HTML after the input when --out is not given", async () => {
    const io = memoryIO();
    expect(await command.run([demo, "--no-3d"], io), "exit 0").toBe(0);
    expect([...io.files.keys()], "default name").toEqual([join(ROOT, "sandy-shelf-report.html")]);
  });

  it("refuses a missing file argument, a bad option value and an invalid scenario with CliErrors", async () => {
    await expect(command.run([], memoryIO()), "no file").rejects.toBeInstanceOf(CliError);
    await expect(command.run([demo, "--uncertainty", "many"], memoryIO()), "bad runs").rejects.toThrow(
      /--uncertainty "many" must be a number/,
    );
    await expect(
      command.run([join(ROOT, "tests/cli/fixtures/bad-diameter.json"), "--no-3d"], memoryIO()),
      "invalid scenario",
    ).rejects.toBeInstanceOf(CliError);
  });
});

describe("brinefield report --claimed-dilution N --at D", () => {
  it("adds a claim section with the same verdict and numbers as check-claim, and a range bar", async () => {
    const io = memoryIO();
    expect(
      await command.run([demo, "--no-3d", "--out", "c.html", "--claimed-dilution", "60", "--at", "150"], io),
      "exit 0",
    ).toBe(0);
    const html = io.files.get(join(ROOT, "c.html")) as string;
    const section = html.slice(
      html.indexOf('<section id="claim"'),
      html.indexOf("</section>", html.indexOf('<section id="claim"')),
    );
    const parsed = parseScenario(JSON.parse(readFileSync(demo, "utf8")));
    if (!parsed.ok) throw new Error("demo must parse");
    const outcome = checkClaimOnScenario(parsed.scenario, 60, 150);
    if (!outcome.ok) throw new Error(outcome.message);
    expect(section, "verdict word").toContain(`data-claim-verdict="${outcome.check.verdict}"`);
    expect(section, "conservative value").toContain(
      `data-claim="conservativeDilution">${reportNumber(outcome.check.conservativeDilution)}<`,
    );
    expect(section, "range bar figure").toContain('data-figure="claim-range-bar"');
    expect((section.match(/<circle /g) ?? []).length, "one dot per chain").toBe(outcome.check.chains.length);
    for (const c of outcome.check.chains) expect(section, `chain ${c.method}`).toContain(c.method);
  });

  it("says no claim was checked when none was given, and refuses what check-claim refuses", async () => {
    const io = memoryIO();
    await command.run([demo, "--no-3d", "--out", "n.html"], io);
    expect(io.files.get(join(ROOT, "n.html")) as string, "a note in the claim section").toContain(
      "No claimed dilution was checked",
    );
    for (const args of [
      ["--claimed-dilution", "0.5"],
      ["--claimed-dilution", "60", "--at", "20000"],
      ["--at", "100"],
    ]) {
      const run = command.run([demo, "--no-3d", ...args], memoryIO());
      await expect(run, args.join(" ")).rejects.toBeInstanceOf(CliError);
      await run.catch((e: CliError) => expect(e.exitCode, `${args.join(" ")}: exit 2`).toBe(2));
    }
  });
});

describe("brinefield report <study>", () => {
  const study = {
    format: "brinefield-study",
    version: 1,
    name: "Port count and depth options",
    base: "demo-scenarios/sandy-shelf.json",
    variants: [
      { name: "12 ports", overrides: { "diffuser.portCount": 12 } },
      { name: "deeper site", description: "Moved offshore.", overrides: { "ambient.depth": "20 m" } },
    ],
  };

  async function runStudy() {
    const io = memoryIO();
    io.files.set(join(ROOT, "options.study.json"), JSON.stringify(study));
    const code = await command.run(
      ["options.study.json", "--no-3d", "--out", "study.html", "--json", "study.json", "--csv", "study.csv"],
      io,
    );
    return { io, code };
  }

  it("gives one section per variant and a comparison table with each variant's own numbers", async () => {
    const { io, code } = await runStudy();
    expect(code, "exit 0").toBe(0);
    const html = io.files.get(join(ROOT, "study.html")) as string;
    const results = JSON.parse(io.files.get(join(ROOT, "study.json")) as string) as {
      variant: string;
      result: BrinefieldResult;
    }[];
    expect(
      results.map((r) => r.variant),
      "base first, then the variants",
    ).toEqual(["base", "12 ports", "deeper site"]);
    expect(new Set(results.map((r) => r.result.inputsHash)).size, "three different input hashes").toBe(3);
    results.forEach((_, i) => {
      expect(html, `variant ${i} section`).toContain(`<section class="variant page-break" id="variant-${i}">`);
      expect(html, `variant ${i} summary`).toContain(`<section id="v${i}-summary">`);
    });
    const comparison = tableById(html, "comparison-table");
    expect(comparison, "comparison table").not.toBeNull();
    const cells = tracedNumbers(comparison!);
    expect(cells.length, "comparison numbers traced").toBeGreaterThanOrEqual(3 * 4);
    for (const { path, text } of cells) {
      const m = /^variants\.(\d+)\.(.+)$/.exec(path)!;
      const v = at(results[Number(m[1])]!.result, m[2]!);
      expect(text, `comparison ${path}`).toBe(typeof v === "number" ? reportNumber(v) : "—");
    }
    expect(comparison, "overrides shown").toContain("diffuser.portCount = 12");
    expect(html, "the study file is in the appendix").toContain("Appendix: the study file as read");
  });

  it("runs each variant the same as the scenario it describes", async () => {
    const { io } = await runStudy();
    const results = JSON.parse(io.files.get(join(ROOT, "study.json")) as string) as {
      variant: string;
      result: BrinefieldResult;
    }[];
    expect(results[0]!.result, "the base is the base scenario's run --json").toEqual(await runJson(demo));
    expect(results[1]!.result.port.count, "12 ports applied").toBe(12);
    const rows = csvParse((io.files.get(join(ROOT, "study.csv")) as string).replace(/^.*\n/, "")); // past the caution row
    expect(new Set(rows.map((r) => r.variant)), "CSV rows per variant").toEqual(
      new Set(["base", "12 ports", "deeper site"]),
    );
  });
});
