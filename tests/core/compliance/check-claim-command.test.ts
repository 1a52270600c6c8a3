/**
 * The `check-claim` command with an in-memory CliIO and a demo scenario from demo-scenarios/. The
 * physics behind it is checked in claim.test.ts; these tests check the command's contract.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { command } from "../../../core/cli/commands/check-claim";
import { CliError, type CliIO } from "../../../core/cli/command";

const demo = fileURLToPath(new URL("../../../demo-scenarios/sandy-shelf.json", import.meta.url));

function fakeIO(): CliIO & { out: string[] } {
  const out: string[] = [];
  return {
    out,
    cwd: "/",
    stdout: (t: string) => void out.push(t),
    stderr: () => undefined,
    readFile: (p: string) => readFileSync(p, "utf8"),
    writeFile: () => undefined,
    isTTY: false,
    cores: 1,
  };
}

describe("brinefield check-claim", () => {
  it("prints JSON with a verdict and exits 0 whatever the verdict", async () => {
    for (const claimed of ["1.5", "100000"]) {
      const io = fakeIO();
      const code = await command.run([demo, "--claimed-dilution", claimed, "--json"], io);
      expect(code, `exit 0 for claim ${claimed}`).toBe(0);
      const parsed = JSON.parse(io.out.join(""));
      expect(["above", "within", "below"], "a known verdict").toContain(parsed.verdict);
      expect(parsed.range[0], "range ordered").toBeLessThanOrEqual(parsed.range[1]);
    }
  });

  it("answers 'above' for an absurdly high claim and 'below' for dilution 1.5, at a given distance", async () => {
    const hi = fakeIO();
    await command.run([demo, "--claimed-dilution", "100000", "--at", "150", "--json"], hi);
    expect(JSON.parse(hi.out.join("")).verdict, "no method reaches 100 000").toBe("above");
    const lo = fakeIO();
    await command.run([demo, "--claimed-dilution", "1.5", "--at", "150", "--json"], lo);
    expect(JSON.parse(lo.out.join("")).verdict, "every method dilutes more than 1.5").toBe("below");
  });

  it("prints readable text with the caution by default", async () => {
    const io = fakeIO();
    await command.run([demo, "--claimed-dilution", "50"], io);
    const text = io.out.join("");
    expect(text, "states the verdict").toMatch(/Claimed dilution 50 at 150 m: (ABOVE|WITHIN|BELOW)/);
    expect(text, "carries the caution").toContain("screening estimate");
  });

  it("rejects a missing or non-positive claimed dilution with a CliError", async () => {
    await expect(command.run([demo], fakeIO()), "required option").rejects.toBeInstanceOf(CliError);
    await expect(command.run([demo, "--claimed-dilution", "-3"], fakeIO()), "must be positive").rejects.toBeInstanceOf(CliError);
  });
});
