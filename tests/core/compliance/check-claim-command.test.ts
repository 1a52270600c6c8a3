/**
 * The `check-claim` command with an in-memory CliIO and the demo scenarios. The verdict rule is checked
 * against hand values in claim.test.ts; these tests check the command's contract and that its
 * conservative value is the number `run` gives.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { command } from "../../../core/cli/commands/check-claim";
import { CliError, type CliIO } from "../../../core/cli/command";
import { checkClaimOnScenario, casesForOverall } from "../../../core/compliance/claim-run";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";

const demo = fileURLToPath(new URL("../../../demo-scenarios/sandy-shelf.json", import.meta.url));
const cove = fileURLToPath(new URL("../../../demo-scenarios/island-cove.json", import.meta.url));

function fakeIO(files: Record<string, string> = {}): CliIO & { out: string[] } {
  const out: string[] = [];
  return {
    out,
    cwd: "/",
    stdout: (t: string) => void out.push(t),
    stderr: () => undefined,
    readFile: (p: string) => files[p] ?? readFileSync(p, "utf8"),
    writeFile: () => undefined,
    isTTY: false,
    cores: 1,
  };
}

function scenarioOf(raw: unknown) {
  const r = parseScenario(raw);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.scenario;
}

async function json(args: string[], io = fakeIO()) {
  const code = await command.run(args, io);
  return { code, body: JSON.parse(io.out.join("")) };
}

describe("brinefield check-claim", () => {
  it("prints the contract fields and exits 0 whatever the verdict", async () => {
    for (const claimed of ["1.5", "100000", "60"]) {
      const { code, body } = await json([demo, "--claimed-dilution", claimed, "--json"]);
      expect(code, `exit 0 for claim ${claimed}`).toBe(0);
      expect(["supported", "plausible", "not-supported"], "a known verdict").toContain(body.verdict);
      expect(body.format, "format name").toBe("brinefield-claim-check");
      expect(body.version, "version").toBe(1);
      expect(body.caution, "caution").toContain("screening estimate");
      expect(body.ratioToConservative, "ratio").toBeCloseTo(Number(claimed) / body.conservativeDilution, 12);
      for (const c of body.chains) {
        expect(typeof c.dilution, "each chain has a dilution").toBe("number");
        expect(c.assumptions.length, "and its assumptions").toBeGreaterThan(0);
      }
    }
    expect(
      (await json([demo, "--claimed-dilution", "100000", "--json"])).body.verdict,
      "no chain reaches 100 000",
    ).toBe("not-supported");
    expect(
      (await json([demo, "--claimed-dilution", "1.5", "--json"])).body.verdict,
      "every case dilutes more than 1.5",
    ).toBe("supported");
  });

  it("covers the stated conditions, every listed case and slack water (unless turned off)", async () => {
    const { body } = await json([demo, "--claimed-dilution", "60", "--json"]);
    expect(
      body.cases.map((c: { name: string }) => c.name),
      "sandy shelf's cases",
    ).toEqual(["stated", "Flood tide", "Ebb tide", "Late-summer warm water", "slack water"]);
    const raw = JSON.parse(readFileSync(demo, "utf8"));
    raw.options = { addSlackWater: false };
    const off = casesForOverall(scenarioOf(raw)).map((c) => c.name);
    expect(off, "no slack water when turned off").not.toContain("slack water");
  });

  it("equals run's mixingZone.dilution at the radius when the stated conditions govern", () => {
    const raw = JSON.parse(readFileSync(cove, "utf8"));
    // Keep only the summer slack-water case, which dilutes far more than the stated conditions.
    raw.ambientCases = raw.ambientCases.filter((c: { name: string }) => c.name.startsWith("Slack"));
    const s = scenarioOf(raw);
    const outcome = checkClaimOnScenario(s, 50);
    if (!outcome.ok) throw new Error(outcome.message);
    expect(outcome.check.conservativeCase, "the stated conditions govern").toBe("stated");
    expect(outcome.check.conservativeDilution, "run's mixingZone.dilution").toBe(runScenario(s).mixingZone.dilution);
  });

  it("is lower than run's value when a listed case governs (sandy shelf, late-summer case)", async () => {
    const { body } = await json([demo, "--claimed-dilution", "60", "--json"]);
    const s = scenarioOf(JSON.parse(readFileSync(demo, "utf8")));
    expect(body.conservativeCase, "a listed case governs").toBe("Late-summer warm water");
    expect(body.conservativeDilution, "below the stated conditions' edge dilution").toBeLessThan(
      runScenario(s).mixingZone.dilution,
    );
  });

  it("says which chains reproduce a claim that falls between chains", async () => {
    const { body } = await json([demo, "--claimed-dilution", "60", "--json"]);
    expect(body.verdict, "above the conservative value, below some chains").toBe("plausible");
    const yes = body.chains.filter((c: { reproducesClaim: boolean }) => c.reproducesClaim);
    const no = body.chains.filter((c: { reproducesClaim: boolean }) => !c.reproducesClaim);
    expect(yes.length > 0 && no.length > 0, "some chains give 60, some do not").toBe(true);
    for (const c of yes) expect(c.high * 1.001, `${c.method} in ${c.case} reaches 60`).toBeGreaterThanOrEqual(60);
    for (const c of no) expect(c.high, `${c.method} in ${c.case} stays below 60`).toBeLessThan(60);
  });

  it("refuses a claimed dilution below 1 and a distance beyond the computed series, with exit 2", async () => {
    for (const args of [
      ["--claimed-dilution", "0.5"],
      ["--claimed-dilution", "-3"],
      ["--claimed-dilution", "60", "--at", "20000"],
      ["--claimed-dilution", "60", "--at", "1e300"],
      ["--claimed-dilution", "60", "--at", "0"],
    ]) {
      const run = command.run([demo, ...args], fakeIO());
      await expect(run, args.join(" ")).rejects.toBeInstanceOf(CliError);
      await run.catch((e: CliError) => {
        expect(e.exitCode, `${args.join(" ")}: exit 2`).toBe(2);
        expect(e.message, `${args.join(" ")}: names the option`).toMatch(/--(at|claimed-dilution)/);
      });
    }
    await command
      .run([demo, "--claimed-dilution", "60", "--at", "20000"], fakeIO())
      .catch((e: CliError) => expect(e.message, "says where the series ends").toMatch(/ends at 300 m/));
    await expect(command.run([demo], fakeIO()), "required option").rejects.toBeInstanceOf(CliError);
  });

  it("checks at a distance inside the series (no extrapolation, the same code as the edge)", async () => {
    const { body } = await json([demo, "--claimed-dilution", "30", "--at", "300", "--json"]);
    expect(body.distance, "as asked").toBe(300);
    const s = scenarioOf({
      ...JSON.parse(readFileSync(demo, "utf8")),
      ambientCases: [],
      options: { addSlackWater: false },
    });
    const far = runScenario({ ...s, mixingZone: { ...s.mixingZone, radius: 300 } });
    const stated = body.cases.find((c: { name: string }) => c.name === "stated");
    expect(stated.edgeDilution, "the stated case equals run with the radius at 300 m").toBeCloseTo(
      far.mixingZone.dilution,
      9,
    );
  });

  it("prints the verdict word on its first line, a table of chains and the caution", async () => {
    const io = fakeIO();
    await command.run([demo, "--claimed-dilution", "60"], io);
    const text = io.out.join("");
    expect(text.split("\n")[0], "verdict first").toMatch(/^Claim check: plausible\. The claimed dilution 60 at 150 m/);
    expect(text, "chain table").toContain("integral + gravity-current");
    expect(text, "carries the caution").toContain("screening estimate");
  });
});
