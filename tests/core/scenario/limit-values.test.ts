/**
 * Limit values, backgrounds and numeric strings go through the same finite, sign and range checks
 * whether written as numbers or as strings with units; hex and other non-decimal forms are refused.
 * (A screening tool's input hygiene: common practice, no source.)
 */
import { describe, it, expect } from "vitest";
import { parseScenario } from "../../../core/scenario/parse";
import { fourPortRaw } from "../study/fixtures";

function refused(limit: Record<string, unknown>, extra: (raw: Record<string, any>) => void = () => {}): string {
  const raw: Record<string, any> = fourPortRaw();
  raw.mixingZone.limits = [{ constituent: "salinity", ...limit }];
  extra(raw);
  const r = parseScenario(raw);
  expect(r.ok, `${JSON.stringify(limit)} must be refused`).toBe(false);
  return r.ok ? "" : r.issues.map((i) => i.message).join(" | ");
}

describe("limit values written as strings get the checks numbers get", () => {
  it.each([
    [{ maxIncrease: "1e400" }, /^mixingZone\.limits\.0\.maxIncrease: "1e400" must be a finite number/],
    [{ maxIncrease: 1e400 }, /^mixingZone\.limits\.0\.maxIncrease: Infinity must be/],
    [{ maxIncrease: "-2 g/kg" }, /^mixingZone\.limits\.0\.maxIncrease: "-2 g\/kg" must be a positive increase/],
    [{ maxIncrease: -2 }, /^mixingZone\.limits\.0\.maxIncrease: -2 must be a positive increase/],
    [
      { maxIncrease: "0 g/kg" },
      /^mixingZone\.limits\.0\.maxIncrease: "0 g\/kg" must be a positive increase \(a zero increase can never be met\)/,
    ],
    [
      { maxIncrease: 2, background: "-50 g/kg" },
      /^mixingZone\.limits\.0\.background: "-50 g\/kg" must not be negative/,
    ],
    [{ maxIncrease: 2, background: -50 }, /^mixingZone\.limits\.0\.background: -50 must not be negative/],
    [{ maxConcentration: -5 }, /^mixingZone\.limits\.0\.maxConcentration: -5 must be a positive concentration/],
    [
      { maxConcentration: "0 g/kg" },
      /^mixingZone\.limits\.0\.maxConcentration: "0 g\/kg" must be a positive concentration/,
    ],
    [{ maxIncrease: "0x1E" }, /^mixingZone\.limits\.0\.maxIncrease: "0x1E" must be a decimal number/],
  ])("%j is refused, naming the field", (limit, message) => {
    expect(refused(limit)).toMatch(message);
  });

  it("refuses hex in any quantity field and keeps accepting plain decimals and units", () => {
    expect(
      refused({ maxIncrease: 2 }, (r) => (r.diffuser.portHeight = "0x1E")),
      "hex port height",
    ).toMatch(/^diffuser\.portHeight: "0x1E" must be a decimal number/);
    const raw: Record<string, any> = fourPortRaw();
    raw.mixingZone.limits = [{ constituent: "salinity", maxIncrease: "2 g/kg", background: "36 g/kg" }];
    raw.diffuser.portHeight = "1.5 m";
    const r = parseScenario(raw);
    expect(r.ok, r.ok ? "" : r.issues.map((i) => i.message).join("; ")).toBe(true);
  });
});
