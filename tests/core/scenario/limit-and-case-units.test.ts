/**
 * A limit's own `unit` and an ambient case's own water are read, never dropped. A limit of 500 µg/L on a
 * constituent held in mg/L is 0.5 mg/L (1 mg = 1000 µg, SI prefixes, BIPM 2019 SI Brochure); reading it as
 * 500 mg/L would be 1000 times too lenient and could turn "exceeds" into "meets". A practical-salinity
 * increase of 2 is 2 × 35.16504/35 g/kg Absolute Salinity (IOC, SCOR & IAPSO 2010, TEOS-10 manual,
 * eq. 2.4.1). An ambient case that sets only its temperature over stratified stated water keeps the stated
 * salinity at every depth (the scenario format's rule that a case changes only the fields it sets).
 */
import { describe, expect, it } from "vitest";
import { accepted, edited, refusedMessages } from "./rule-fixtures";
import { runScenario } from "../../../core/pipeline";

const copper = [{ name: "Copper", concentration: 0.02, unit: "mg/L", background: 0.001 }];

describe("a limit's unit", () => {
  it("applies to a number: 500 with unit µg/L on a mg/L constituent is 0.5 mg/L", () => {
    for (const unit of ["ug/L", "µg/L"]) {
      const s = accepted(
        edited((r) => {
          r.discharge.constituents = copper;
          r.mixingZone.limits = [{ constituent: "Copper", maxConcentration: 500, unit }];
        }),
      );
      expect(s.mixingZone.limits[0], unit).toMatchObject({ constituent: "Copper", unit: "mg/L" });
      expect(s.mixingZone.limits[0]!.maxConcentration, unit).toBeCloseTo(0.5, 12);
    }
  });

  it("applies to the background and to a unitless string, but a value's own unit wins", () => {
    const s = accepted(
      edited((r) => {
        r.discharge.constituents = copper;
        r.mixingZone.limits = [{ constituent: "Copper", maxIncrease: "5", background: 2, unit: "ug/L" }];
      }),
    );
    expect(s.mixingZone.limits[0]!.maxIncrease).toBeCloseTo(0.005, 12);
    expect(s.mixingZone.limits[0]!.background).toBeCloseTo(0.002, 12);
    const own = accepted(
      edited((r) => {
        r.discharge.constituents = copper;
        r.mixingZone.limits = [{ constituent: "Copper", maxConcentration: "0.4 mg/L", unit: "ug/L" }];
      }),
    );
    expect(own.mixingZone.limits[0]!.maxConcentration).toBeCloseTo(0.4, 12);
  });

  it("converts a salinity increase given in psu", () => {
    const s = accepted(
      edited((r) => (r.mixingZone.limits = [{ constituent: "salinity", maxIncrease: 2, unit: "psu" }])),
    );
    expect(s.mixingZone.limits[0]!.maxIncrease).toBeCloseTo((2 * 35.16504) / 35, 12);
  });

  it("is refused, naming the field, when it cannot be converted to the constituent's unit", () => {
    const m = refusedMessages(
      edited((r) => {
        r.discharge.constituents = copper;
        r.mixingZone.limits = [{ constituent: "Copper", maxConcentration: 500, unit: "degC" }];
      }),
    );
    expect(m).toEqual([
      `mixingZone.limits.0.maxConcentration: "500 degC" has a unit that cannot be converted to the constituent's unit (mg/L)`,
    ]);
  });

  it("changes the verdict the way the stricter limit should", () => {
    // 0.02 mg/L of copper in the brine over a 0.001 mg/L background: a 0.5 µg/L limit is far stricter
    // than 0.5 mg/L, so the scenario that meets the latter must exceed the former.
    const verdict = (unit: string) =>
      runScenario(
        accepted(
          edited((r) => {
            r.discharge.constituents = copper;
            r.mixingZone.limits = [{ constituent: "Copper", maxConcentration: 0.5, unit }];
          }),
        ),
      ).compliance.verdict;
    expect(verdict("mg/L"), "0.5 mg/L").toBe("meets");
    expect(verdict("ug/L"), "0.5 µg/L").toBe("exceeds");
  });
});

describe("an ambient case's own water", () => {
  const stratified = [
    { depth: 0, salinity: 36, temperature: 24 },
    { depth: 15, salinity: 38, temperature: 18 },
  ];

  it("refuses a case with a profile beside its own salinity or temperature, as for the stated ambient", () => {
    for (const extra of [{ salinity: 50 }, { temperature: 5 }]) {
      const m = refusedMessages(edited((r) => (r.ambientCases = [{ name: "x", profile: stratified, ...extra }])));
      expect(m, JSON.stringify(extra)).toEqual([
        'ambientCases.0.profile: "(profile and uniform values)" give either a profile or uniform salinity and temperature, not both',
      ]);
    }
  });

  it("keeps the stated salinity at every depth when a case sets only its temperature", () => {
    const s = accepted(
      edited((r) => {
        r.ambient = { depth: 15, profile: stratified };
        r.ambientCases = [{ name: "warm", temperature: 25 }];
      }),
    );
    const c = s.ambientCases[0]!;
    expect(c.profile.map((p) => [p.depth, p.salinity, p.temperature])).toEqual([
      [0, 36, 25],
      [15, 38, 25],
    ]);
    expect(c.uniform).toBe(false);
    expect(c.sets).toEqual(["temperature"]);
  });

  it("keeps the stated temperature at every depth when a case sets only its salinity", () => {
    const s = accepted(
      edited((r) => {
        r.ambient = { depth: 15, profile: stratified };
        r.ambientCases = [{ name: "salty", salinity: 40, depth: 17 }];
      }),
    );
    expect(s.ambientCases[0]!.profile.map((p) => [p.depth, p.salinity, p.temperature])).toEqual([
      [0, 40, 24],
      [15, 40, 18],
      [17, 40, 18],
    ]);
  });
});
