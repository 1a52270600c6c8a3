/**
 * Reading the ambient water: a uniform column or a profile (checked, sorted, extended to the surface and
 * the seabed), salinity bases, defaults, an enclosed basin, and ambient cases that set some fields and
 * follow the stated ambient in the rest. Practical salinity to Absolute Salinity: factor 35.16504/35
 * (IOC, SCOR & IAPSO 2010, TEOS-10 manual, eq. 2.4.1). Defaults (no current, flat bed) and the profile
 * extension with the end points' values are the project's conventions (common practice, no source).
 */
import { describe, it, expect } from "vitest";
import { accepted, edited, refusedIssues, refusedMessages, type Raw } from "./rule-fixtures";

const withProfile = (profile: Raw[]) =>
  edited((r) => {
    delete r.ambient.salinity;
    delete r.ambient.temperature;
    r.ambient.profile = profile;
  });

describe("uniform ambient", () => {
  it("becomes two equal points, surface and seabed, with no current or slope by default", () => {
    const s = accepted(
      edited((r) => {
        delete r.ambient.currentSpeed;
        delete r.ambient.currentDirection;
      }),
    );
    expect(s.ambient).toEqual({
      depth: 15,
      profile: [
        { depth: 0, salinity: 36, temperature: 20 },
        { depth: 15, salinity: 36, temperature: 20 },
      ],
      uniform: true,
      currentSpeed: 0,
      currentDirection: 0,
      bedSlope: 0,
      bedSlopeAzimuth: 0,
    });
  });

  it("keeps a stated bed slope (a percentage read as a fraction) and its azimuth", () => {
    const s = accepted(edited((r) => Object.assign(r.ambient, { bedSlope: "5 %", bedSlopeAzimuth: 270 })));
    expect(s.ambient.bedSlope).toBeCloseTo(0.05, 15);
    expect(s.ambient.bedSlopeAzimuth).toBe(270);
  });

  it("converts practical salinity and notes the factor used", () => {
    const s = accepted(edited((r) => (r.ambient.salinity = "35 psu")));
    expect(s.ambient.profile[1]!.salinity).toBeCloseTo(35.16504, 12);
    expect(s.conversions).toContain(
      "ambient.salinity: 35 psu practical salinity → 35.17 g/kg Absolute Salinity (TEOS-10 reference-composition factor 35.16504/35)",
    );
  });

  it("needs a salinity, then a temperature, unless a profile is given", () => {
    const neither = edited((r) => {
      delete r.ambient.salinity;
      delete r.ambient.temperature;
    });
    expect(refusedMessages(neither)).toEqual([
      "ambient.salinity: is missing; expected the ambient salinity (g/kg) or a profile",
    ]);
    expect(refusedMessages(edited((r) => delete r.ambient.temperature))).toEqual([
      "ambient.temperature: is missing; expected the ambient temperature (°C) or a profile",
    ]);
  });
});

describe("ambient profile", () => {
  it("is refused beside uniform values", () => {
    const both = edited((r) => (r.ambient.profile = [{ depth: 0, salinity: 36, temperature: 20 }]));
    expect(refusedMessages(both)).toEqual([
      'ambient.profile: "(profile and uniform values)" give either a profile or uniform salinity and temperature, not both',
    ]);
    const tempOnly = edited((r) => {
      delete r.ambient.salinity;
      r.ambient.profile = [{ depth: 0, salinity: 36, temperature: 20 }];
    });
    expect(refusedMessages(tempOnly)[0]).toMatch(/^ambient\.profile: "\(profile and uniform values\)" give either/);
    const salinityOnly = edited((r) => {
      delete r.ambient.temperature;
      r.ambient.profile = [{ depth: 0, salinity: 36, temperature: 20 }];
    });
    expect(refusedMessages(salinityOnly)[0]).toMatch(/^ambient\.profile: "\(profile and uniform values\)" give either/);
  });

  it("refuses a point below the seabed, naming it as given and the water depth", () => {
    const issues = refusedIssues(
      withProfile([
        { depth: 0, salinity: 36, temperature: 20 },
        { depth: 15.5, salinity: 37, temperature: 18 },
      ]),
    );
    expect(issues).toEqual([
      {
        path: "ambient.profile.1.depth",
        value: 15.5,
        message: "ambient.profile.1.depth: 15.5 is below the seabed (the water is 15 m deep)",
        related: ["ambient.depth"],
      },
    ]);
  });

  it("refuses a first point below the seabed", () => {
    const first = withProfile([
      { depth: 16, salinity: 37, temperature: 18 },
      { depth: 0, salinity: 36, temperature: 20 },
    ]);
    expect(refusedMessages(first)).toEqual([
      "ambient.profile.0.depth: 16 is below the seabed (the water is 15 m deep)",
    ]);
  });

  it("refuses the same depth twice", () => {
    const twice = withProfile([
      { depth: 5, salinity: 36, temperature: 20 },
      { depth: 0, salinity: 36, temperature: 20 },
      { depth: 5, salinity: 37, temperature: 19 },
    ]);
    expect(refusedMessages(twice)).toEqual(["ambient.profile: 5 lists the same depth twice; each depth once"]);
  });

  it("is sorted by depth and extended to the surface and the seabed with the end points' values", () => {
    const s = accepted(
      withProfile([
        { depth: 10, salinity: 37, temperature: 18 },
        { depth: 2, salinity: 36, temperature: 20 },
      ]),
    );
    expect(s.ambient.profile).toEqual([
      { depth: 0, salinity: 36, temperature: 20 },
      { depth: 2, salinity: 36, temperature: 20 },
      { depth: 10, salinity: 37, temperature: 18 },
      { depth: 15, salinity: 37, temperature: 18 },
    ]);
    expect(s.ambient.uniform).toBe(false);
    expect(s.conversions).toEqual([
      "ambient.profile: extended from 2 m up to the surface with the shallowest point's values",
      "ambient.profile: extended from 10 m down to the seabed at 15 m with the deepest point's values",
    ]);
  });

  it("needs no extension from the surface to the seabed, and is uniform only when every point is equal", () => {
    const equal = accepted(
      withProfile([
        { depth: 0, salinity: 36, temperature: 20 },
        { depth: 15, salinity: 36, temperature: 20 },
      ]),
    );
    expect(equal.ambient.profile).toHaveLength(2);
    expect(equal.ambient.uniform).toBe(true);
    expect(equal.conversions).toEqual([]);
    const warmerTop = withProfile([
      { depth: 0, salinity: 36, temperature: 22 },
      { depth: 15, salinity: 36, temperature: 20 },
    ]);
    expect(accepted(warmerTop).ambient.uniform).toBe(false);
    const saltierBottom = withProfile([
      { depth: 0, salinity: 36, temperature: 20 },
      { depth: 15, salinity: 36.5, temperature: 20 },
    ]);
    expect(accepted(saltierBottom).ambient.uniform).toBe(false);
  });

  it("converts each point's practical salinity, naming the point", () => {
    const s = accepted(
      withProfile([
        { depth: 0, salinity: 36, temperature: 20 },
        { depth: 15, salinity: "35 psu", temperature: 20 },
      ]),
    );
    expect(s.ambient.profile[1]!.salinity).toBeCloseTo(35.16504, 12);
    expect(s.conversions[0]).toMatch(/^ambient\.profile\.1\.salinity: 35 psu practical salinity → 35\.17 g\/kg/);
  });
});

describe("ambient record", () => {
  const record = (extra: Raw = {}) => ({
    time: [0, 3600],
    currentSpeed: [0.1, 0.2],
    currentDirection: [90, 270],
    ...extra,
  });

  it("converts salinities by the rule of ambient.salinity, with one note for the column", () => {
    const s = accepted(edited((r) => (r.ambient.record = record({ salinity: ["35 psu", 36] }))));
    expect(s.ambient.record!.salinity![0]).toBeCloseTo(35.16504, 12);
    expect(s.ambient.record!.salinity![1]).toBe(36);
    expect(s.ambient.record!.time).toEqual([0, 3600]);
    expect(s.conversions).toEqual([
      "ambient.record.salinity: 1 value(s) converted to Absolute Salinity (g/kg) by the same rule as ambient.salinity",
    ]);
  });

  it("reads a TDS salinity at the temperature of the deepest stated point when the record has none", () => {
    const direct = (t: number) =>
      accepted(edited((r) => Object.assign(r.discharge, { salinity: "37000 mg/L", temperature: t }))).discharge
        .salinity;
    const raw = withProfile([
      { depth: 0, salinity: 36, temperature: 25 },
      { depth: 15, salinity: 36, temperature: 10 },
    ]);
    raw.ambient.record = record({ salinity: ["37000 mg/L", "37000 mg/L"] });
    expect(accepted(raw).ambient.record!.salinity).toEqual([direct(10), direct(10)]);
    expect(direct(10)).not.toBe(direct(25));
  });

  it("refuses a record whose columns do not match its times", () => {
    const raw = edited((r) => (r.ambient.record = record({ currentDirection: [90] })));
    expect(refusedMessages(raw)).toEqual([
      'ambient.record.currentDirection: "1 values" must list one value per time (2 times)',
    ]);
  });
});

describe("enclosed basin", () => {
  it("takes a flushing time (with a unit) or an exchange flow beside the volume", () => {
    const flushed = accepted(edited((r) => (r.ambient.basin = { volume: 2e8, flushingTime: "10 days" })));
    expect(flushed.ambient.basin).toEqual({ volume: 2e8, flushingTime: 864000 });
    const exchanged = accepted(edited((r) => (r.ambient.basin = { volume: 2e8, exchangeFlow: 50 })));
    expect(exchanged.ambient.basin).toEqual({ volume: 2e8, exchangeFlow: 50 });
  });

  it("wants exactly one of the two", () => {
    const msg =
      'ambient.basin: "(basin)" must give exactly one of flushingTime (s, e.g. "10 days") or exchangeFlow (m³/s) beside the volume';
    expect(refusedMessages(edited((r) => (r.ambient.basin = { volume: 2e8 })))).toEqual([msg]);
    const both = edited((r) => (r.ambient.basin = { volume: 2e8, flushingTime: 86400, exchangeFlow: 50 }));
    expect(refusedMessages(both)).toEqual([msg]);
  });
});

describe("ambient cases", () => {
  const withCases = (cases: Raw[], edit: (r: Raw) => void = () => {}) =>
    edited((r) => {
      r.ambientCases = cases;
      edit(r);
    });

  it("follow the stated ambient except in the fields they set", () => {
    const s = accepted(withCases([{ name: "still" }]));
    const c = s.ambientCases[0]!;
    expect(c).toEqual({ ...s.ambient, name: "still", weight: 1, sets: [] });
  });

  it("a deeper case extends the stated profile to its seabed; a shallower one keeps it", () => {
    const s = accepted(
      withCases([
        { name: "high tide", depth: 17, weight: 3 },
        { name: "low tide", depth: 14 },
      ]),
    );
    expect(s.ambientCases[0]).toMatchObject({ depth: 17, weight: 3, sets: ["depth"], uniform: true });
    expect(s.ambientCases[0]!.profile).toEqual([
      { depth: 0, salinity: 36, temperature: 20 },
      { depth: 15, salinity: 36, temperature: 20 },
      { depth: 17, salinity: 36, temperature: 20 },
    ]);
    expect(s.ambientCases[1]!.depth).toBe(14);
    expect(s.ambientCases[1]!.profile).toEqual(s.ambient.profile);
  });

  it("a case giving only a temperature keeps the stated salinity, and the reverse", () => {
    const s = accepted(
      withCases([
        { name: "warm", temperature: 25 },
        { name: "fresh", salinity: "30 psu" },
      ]),
    );
    const [warm, fresh] = s.ambientCases;
    expect(warm!.sets).toEqual(["temperature"]);
    expect(warm!.profile).toEqual([
      { depth: 0, salinity: 36, temperature: 25 },
      { depth: 15, salinity: 36, temperature: 25 },
    ]);
    expect(fresh!.sets).toEqual(["salinity"]);
    expect(fresh!.profile[0]!.temperature).toBe(20);
    expect(fresh!.profile[0]!.salinity).toBeCloseTo((30 * 35.16504) / 35, 12);
    expect(s.conversions).toContain(
      "ambientCases.1.salinity: 30 psu practical salinity → 30.14 g/kg Absolute Salinity (TEOS-10 reference-composition factor 35.16504/35)",
    );
  });

  it("a case with a profile sets salinity and temperature; its currents are its own", () => {
    const s = accepted(
      withCases([
        {
          name: "layered",
          depth: 16,
          currentSpeed: 0.3,
          currentDirection: 180,
          profile: [
            { depth: 0, salinity: 35, temperature: 24 },
            { depth: 16, salinity: 37, temperature: 16 },
          ],
        },
      ]),
    );
    const c = s.ambientCases[0]!;
    expect(c.sets).toEqual(["depth", "salinity", "temperature", "currentSpeed", "currentDirection"]);
    expect(c).toMatchObject({ depth: 16, uniform: false, currentSpeed: 0.3, currentDirection: 180 });
    expect(c.profile).toHaveLength(2);
  });

  it("a case's profile is checked against the case's own depth, naming the case", () => {
    const below = withCases([
      {
        name: "shallow",
        depth: 12,
        profile: [
          { depth: 0, salinity: 35, temperature: 24 },
          { depth: 13, salinity: 37, temperature: 16 },
        ],
      },
    ]);
    expect(refusedIssues(below)).toEqual([
      {
        path: "ambientCases.0.profile.1.depth",
        value: 13,
        message: "ambientCases.0.profile.1.depth: 13 is below the seabed (the water is 12 m deep)",
        related: ["ambientCases.0.depth"],
      },
    ]);
  });

  it("are not read when the stated ambient is refused", () => {
    const raw = withCases(
      [{ name: "bad", depth: 2, profile: [{ depth: 5, salinity: 35, temperature: 24 }] }],
      (r) => delete r.ambient.salinity,
    );
    expect(refusedMessages(raw)).toEqual([
      "ambient.salinity: is missing; expected the ambient salinity (g/kg) or a profile",
    ]);
  });
});
