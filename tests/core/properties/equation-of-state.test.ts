/**
 * equationOfStateFor(): TEOS-10 when every salinity is within 0–42 g/kg (the range stated for most functions
 * in the documentation of the TEOS-10 GSW library), otherwise Sharqawy (2010) + Nayar (2016) for both fluids.
 */
import { describe, expect, it } from "vitest";
import { densitySharqawyNayar, densityTeos10, equationOfStateFor } from "../../../core/properties";

describe("equationOfStateFor()", () => {
  it("picks TEOS-10 at 41.9 g/kg and the brine correlation at 42.1 g/kg", () => {
    expect(equationOfStateFor([41.9, 35], [20, 15]).info.name, "41.9 g/kg").toBe("TEOS-10");
    expect(equationOfStateFor([42.1, 35], [20, 15]).info.name, "42.1 g/kg").toBe("Sharqawy 2010 + Nayar 2016");
    expect(equationOfStateFor([42, 35], [20, 15]).info.name, "42 g/kg is inside").toBe("TEOS-10");
  });

  it("uses one density for both fluids: the chosen EOS evaluates ambient seawater with the same formula as the brine", () => {
    const eos = equationOfStateFor([70, 35], [25, 20]);
    expect(eos.density(35, 20, 10), "ambient via brine correlation").toBe(densitySharqawyNayar(35, 20, 10));
    const teos = equationOfStateFor([40, 35], [25, 20]);
    expect(teos.density(35, 20, 10), "ambient via TEOS-10").toBe(densityTeos10(35, 20, 10));
  });

  it("states the reason in one sentence naming the salinity that decided it", () => {
    const brine = equationOfStateFor([35, 68.5], [20, 25]).info;
    expect(brine.reason, "mentions the out-of-range salinity").toContain("68.5 g/kg");
    expect(brine.reason.trim().split(/\.\s/).length, "one sentence").toBe(1);
    expect(brine.source, "cites both papers").toMatch(/Sharqawy.*Nayar/s);
    const teos = equationOfStateFor([35, 36], [20, 25]).info;
    expect(teos.reason, "TEOS-10 reason").toContain("0–42 g/kg");
    expect(teos.source, "cites the TEOS-10 manual").toContain("TEOS-10");
  });

  it("mentions temperatures outside TEOS-10's range and flags them through validityIssues()", () => {
    const eos = equationOfStateFor([35, 36], [95, 20]);
    expect(eos.info.name, "salinity rule decides").toBe("TEOS-10");
    expect(eos.info.reason, "reason notes the hot water").toContain("95 °C");
    expect(
      eos.validityIssues(36, 95, 0, "discharge").map((w) => w.code),
      "95 °C flagged",
    ).toEqual(["teos10-temperature-out-of-range"]);
  });

  it("flags 130 g/kg through the brine correlation's validityIssues()", () => {
    const eos = equationOfStateFor([130, 35], [25, 20]);
    expect(
      eos.validityIssues(130, 25, 0, "discharge").map((w) => w.code),
      "130 g/kg",
    ).toEqual(["nayar-2016-salinity-out-of-range"]);
  });

  it("falls back to the brine correlation for a non-finite salinity (TEOS-10 cannot vouch for it)", () => {
    expect(equationOfStateFor([Number.NaN], [20]).info.name, "NaN").toBe("Sharqawy 2010 + Nayar 2016");
  });
});
