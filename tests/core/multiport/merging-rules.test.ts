/**
 * The merging rules of core/multiport/merging.ts, case by case: which point of a path is the top and
 * which the impact, the length-scale fall-backs, the plan geometry of risers, the regime boundaries and
 * the partial-merging interpolation, the scaling of a method's results, and the text the user reads.
 * Geometric merging criterion: jet width = spacing between neighbouring centrelines (Davis, L.R. 1999,
 * Fundamentals of Environmental Discharge Modeling, CRC Press, ch. 4; from memory). Round-jet tracer
 * spread 0.127·s (Fischer et al. 1979 ch. 9; from memory). The partial-merging interpolation and the
 * merged line length are engineering judgement (no source), restated here by hand.
 */
import { describe, expect, it } from "vitest";
import {
  multiportFromNearField,
  neighbourSpacingAtDistance,
  jetWidthsFromNearField,
} from "../../../core/multiport/merging";
import { linePlumeDilutionFromFlux } from "../../../core/multiport/line-plume";
import { DF, F, integralFixture, jetFixture, lengthScaleFixture, scenarioFixture } from "../farfield/fixtures";
import type { NearFieldMethodResult } from "../../../core/nearfield/types";
import type { Scenario } from "../../../core/scenario/types";

type Path = NonNullable<NearFieldMethodResult["path"]>;
const pt = (x: number, z: number, halfWidth: number, dilution = 1, y = 0) => ({ s: 0, x, y, z, halfWidth, dilution });

const line = (spacing: number, n = 10) =>
  scenarioFixture({
    discharge: { flow: 0.1 * n },
    diffuser: { layout: "line", portCount: n, portSpacing: spacing, length: (n - 1) * spacing, flowSplit: [] },
  });

const rosette = (risers: NonNullable<Scenario["diffuser"]["risers"]>, flow = 0.8) =>
  scenarioFixture({
    discharge: { flow },
    diffuser: { layout: "rosette", portCount: risers.count * risers.portsPerRiser, risers, flowSplit: [] },
  });

describe("jetWidthsFromNearField() — from a path", () => {
  const integral = (path: Path) => ({ ...integralFixture(), path });

  it("takes the first highest point as the top and the first point at or below the seabed after it as impact", () => {
    const path: Path = [
      pt(0, 0, 0.1),
      pt(2, -1.5, 0.2), // below the seabed before the top: not the impact
      pt(3, 5, 0.6, 1, 4), // top (first of two at z = 5), plan distance hypot(3, 4) = 5
      pt(6, 5, 0.9),
      pt(8, -1, 1.4), // exactly at the seabed (port height 1 m): the impact
      pt(9, -2, 1.8),
    ];
    const w = jetWidthsFromNearField(integral(path), 1)!;
    expect(w.maxRiseDistance, "hypot(x, y) of the first highest point").toBe(5);
    expect(w.widthAtMaxRise).toBe(1.2);
    expect(w.fallHeight, "5 m + port height 1 m").toBe(6);
    expect(w.impactDistance, "first point with z ≤ −port height after the top").toBe(8);
    expect(w.widthAtImpact).toBe(2.8);
    expect(w.basis).toBe("integral path half-widths");
  });

  it("uses the last point when the path never reaches the seabed, and a two-point path as a path", () => {
    const w = jetWidthsFromNearField(integral([pt(0, 0, 0.1), pt(4, 3, 0.5), pt(7, 0.5, 0.9)]), 1)!;
    expect(w.impactDistance).toBe(7);
    expect(w.widthAtImpact).toBe(1.8);
    const two = jetWidthsFromNearField(integral([pt(0, 0, 0.1), pt(4, 3, 0.5)]), 1)!;
    expect(two.basis, "two points are a path").toBe("integral path half-widths");
    expect(two.widthAtMaxRise).toBe(1);
  });

  it("falls back to the length scales for a one-point path, and gives nothing without a rise height", () => {
    const one = jetWidthsFromNearField({ ...lengthScaleFixture(), path: [pt(0, 0, 0.1)] }, 1)!;
    expect(one.basis).toBe("length-scale length scales with round-jet spreading 0.127 s (Fischer et al. 1979 ch. 9)");
    expect(jetWidthsFromNearField({ ...lengthScaleFixture(), maxRiseHeight: null }, 1)).toBeNull();
    expect(
      jetWidthsFromNearField({ ...lengthScaleFixture(), path: [pt(0, 0, 0.1)], maxRiseHeight: null }, 1),
      "a one-point path is no path",
    ).toBeNull();
  });
});

describe("jetWidthsFromNearField() — from length scales (width = 2 × 0.127 × path length)", () => {
  const base = { ...lengthScaleFixture(), maxRiseHeight: 3 };

  it("measures the path to the top as hypot(x_m, z_m) and on to impact as hypot(x_i − x_m, z_m + port height)", () => {
    const w = jetWidthsFromNearField({ ...base, maxRiseDistance: 4, impactDistance: 10, returnDistance: 9 }, 1)!;
    expect(w.maxRiseDistance).toBe(4);
    expect(w.impactDistance, "impact distance before return distance").toBe(10);
    expect(w.widthAtMaxRise).toBeCloseTo(2 * 0.127 * 5, 12); // hypot(4, 3) = 5
    expect(w.widthAtImpact).toBeCloseTo(2 * 0.127 * (5 + Math.hypot(6, 4)), 12);
    expect(w.fallHeight).toBe(4);
  });

  it("uses the return distance when there is no impact distance, and half of it for the top", () => {
    const w = jetWidthsFromNearField({ ...base, maxRiseDistance: null, impactDistance: null, returnDistance: 8 }, 2)!;
    expect(w.impactDistance).toBe(8);
    expect(w.maxRiseDistance, "x_m = x_i / 2").toBe(4);
    expect(w.widthAtImpact).toBeCloseTo(2 * 0.127 * (5 + Math.hypot(4, 5)), 12);
  });

  it("doubles the top distance for impact when only the top is known, and never walks backwards", () => {
    const w = jetWidthsFromNearField({ ...base, maxRiseDistance: 4, impactDistance: null, returnDistance: null }, 1)!;
    expect(w.impactDistance, "x_i = 2·x_m").toBe(8);
    const back = jetWidthsFromNearField({ ...base, maxRiseDistance: 4, impactDistance: 2, returnDistance: null }, 1)!;
    expect(back.widthAtImpact, "an impact short of the top adds only the fall").toBeCloseTo(2 * 0.127 * (5 + 4), 12);
    expect(
      jetWidthsFromNearField({ ...base, maxRiseDistance: null, impactDistance: null, returnDistance: null }, 1),
      "no distance at all",
    ).toBeNull();
  });
});

describe("neighbourSpacingAtDistance() — riser and line geometry", () => {
  it("takes the smallest gap between port azimuths, across north as well", () => {
    const chord = (r: number, deg: number) => 2 * r * Math.sin((deg * Math.PI) / 180 / 2);
    const one = (portAzimuths: number[]) =>
      neighbourSpacingAtDistance(
        rosette({ count: 1, portsPerRiser: portAzimuths.length, spacing: 0, portAzimuths }),
        10,
      );
    expect(one([350, 10, 180]), "20° across north").toBeCloseTo(chord(10, 20), 12);
    expect(one([0, 90, 100, 200]), "10° between 90° and 100°").toBeCloseTo(chord(10, 10), 12);
    expect(one([-90, 90]), "−90° is 270°: 180° apart").toBeCloseTo(20, 12);
    expect(one([30, 390]), "the same azimuth twice: no gap").toBeCloseTo(0, 12);
  });

  it("uses the riser spacing between single-port risers, and infinity for one port", () => {
    expect(
      neighbourSpacingAtDistance(rosette({ count: 3, portsPerRiser: 1, spacing: 25, portAzimuths: [0] }), 10),
    ).toBe(25);
    expect(
      neighbourSpacingAtDistance(rosette({ count: 1, portsPerRiser: 1, spacing: 25, portAzimuths: [0] }), 10),
    ).toBe(Infinity);
    expect(
      neighbourSpacingAtDistance(rosette({ count: 1, portsPerRiser: 2, spacing: 25, portAzimuths: [0, 180] }), 3),
      "one riser: the chord only",
    ).toBeCloseTo(6, 12);
  });

  it("projects a line's port spacing with sin(diffuser azimuth − port azimuth), and ignores risers on a line", () => {
    const s = scenarioFixture({
      diffuser: {
        layout: "line",
        portCount: 4,
        portSpacing: 6,
        diffuserAzimuth: 45,
        portAzimuth: 15,
        risers: { count: 2, portsPerRiser: 2, spacing: 99, portAzimuths: [0, 180] },
      },
    });
    expect(neighbourSpacingAtDistance(s, 10), "6·sin 30°").toBeCloseTo(3, 12);
  });
});

describe("multiportFromNearField() — regimes, scaling and the words reported", () => {
  const ls = lengthScaleFixture();
  const widths = jetWidthsFromNearField(ls, 1)!;

  it("calls jets exactly as wide as the spacing at impact independent, and exactly as wide at the top merged", () => {
    expect(
      multiportFromNearField({ scenario: line(widths.widthAtImpact), jet: jetFixture(), nearField: [ls] }).multiport
        .regime,
    ).toBe("independent");
    expect(
      multiportFromNearField({ scenario: line(widths.widthAtMaxRise), jet: jetFixture(), nearField: [ls] }).multiport
        .regime,
    ).toBe("merged-line-source");
  });

  it("interpolates a partial merge by the share of the descent after merging: 1 − a·(1 − merged factor)", () => {
    const spacing = 0.3 * widths.widthAtMaxRise + 0.7 * widths.widthAtImpact;
    const out = multiportFromNearField({ scenario: line(spacing), jet: jetFixture(), nearField: [ls] });
    const rTop = widths.widthAtMaxRise / spacing;
    const rImp = widths.widthAtImpact / spacing;
    const a = (rImp - 1) / (rImp - rTop);
    const merged = Math.min(
      1,
      linePlumeDilutionFromFlux(1 / (10 * spacing), jetFixture().reducedGravity, 2.2 * DF + 1) / (1.6 * F),
    );
    expect(merged, "the case needs a real reduction").toBeLessThan(0.99);
    expect(out.multiport.regime).toBe("partially-merged");
    expect(out.multiport.dilutionFactor).toBeCloseTo(1 - a * (1 - merged), 12);
    expect(out.perMethod[0]!.lineDilution).toBeCloseTo(merged * 1.6 * F, 9);
    expect(out.perMethod[0]!.spacingAtMaxRise).toBeCloseTo(spacing, 12);
    expect(out.perMethod[0]!.spacingAtImpact).toBeCloseTo(spacing, 12);
  });

  it("spreads a rosette's merged flow over risers × spacing, or a ring at the top radius for one riser", () => {
    const jet = jetFixture();
    const several = multiportFromNearField({
      scenario: rosette({ count: 4, portsPerRiser: 4, spacing: 0.5, portAzimuths: [0, 90, 180, 270] }),
      jet,
      nearField: [ls],
    });
    expect(several.perMethod[0]!.lineDilution).toBeCloseTo(
      linePlumeDilutionFromFlux(0.8 / (4 * 0.5), jet.reducedGravity, 2.2 * DF + 1),
      9,
    );
    expect(several.multiport.spacingRatio, "riser spacing ÷ dF").toBeCloseTo(0.5 / DF, 12);
    const ring = multiportFromNearField({
      scenario: rosette({
        count: 1,
        portsPerRiser: 12,
        spacing: 0,
        portAzimuths: [0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330],
      }),
      jet,
      nearField: [ls],
    });
    const xm = 0.5 * 2.4 * DF; // no max-rise distance in the fixture: half the impact distance
    expect(ring.perMethod[0]!.lineDilution).toBeCloseTo(
      linePlumeDilutionFromFlux(0.8 / (2 * Math.PI * xm), jet.reducedGravity, 2.2 * DF + 1),
      9,
    );
  });

  it("scales only after the top of a path, holding the dilution where the jets merge, and leaves the rest alone", () => {
    const path: Path = [pt(0, 0, 0.1, 1), pt(3, 4, 0.8, 12), pt(7, 6, 1.2, 18), pt(9, 2, 1.6, 19), pt(10, -1, 2.0, 60)];
    const k = 2.44 / 1.44;
    const nf: NearFieldMethodResult = {
      ...integralFixture(),
      path,
      impactDilution: 60,
      nearFieldDilution: 90,
      dilutionRange: [50, 80],
      fluxAveragingFactor: k,
      impactDilutionFluxAveraged: 60 * k,
      entrainedFlow: 1,
      notes: ["earlier note"],
    };
    const w = jetWidthsFromNearField(nf, 1)!;
    const out = multiportFromNearField({ scenario: line(w.widthAtMaxRise * 0.5), jet: jetFixture(), nearField: [nf] });
    const f = out.multiport.dilutionFactor;
    expect(out.multiport.regime).toBe("merged-line-source");
    expect(f).toBeLessThan(18 / 60);
    const m = out.nearField[0]!;
    expect(m.path!.slice(0, 3), "up to the top: the same points").toEqual(path.slice(0, 3));
    expect(m.path![3]!.dilution, "held at the dilution where the jets merge").toBe(Math.max(18, 19 * f));
    expect(m.path![4]!.dilution).toBeCloseTo(Math.max(18, 60 * f), 12);
    expect(m.path![4]!.halfWidth, "only the dilution changes").toBe(2.0);
    expect(m.impactDilution).toBeCloseTo(Math.max(18, 60 * f), 12);
    expect(m.nearFieldDilution).toBeCloseTo(Math.max(18, 90 * f), 12);
    expect(m.dilutionRange![0]).toBeCloseTo(Math.max(18, 50 * f), 12);
    expect(m.dilutionRange![1]).toBeCloseTo(Math.max(18, 80 * f), 12);
    expect(m.impactDilutionFluxAveraged).toBeCloseTo(m.impactDilution! * k, 12);
    expect(m.entrainedFlow, "from the scaled flux-averaged dilution").toBeCloseTo(
      jetFixture().flow * (m.impactDilution! * k - 1),
      12,
    );
    expect(m.notes![0]).toBe("earlier note");
    expect(m.notes![1]).toMatch(
      /^Multiport merged-line-source: dilutions after maximum rise multiplied by 0\.\d{3} \(line-plume dilution [\d.]+ vs single-jet impact dilution 60\.0\)\.$/,
    );
    expect(nf.path![4]!.dilution, "the input is not changed").toBe(60);
  });

  it("scales the entrained flow by the factor when there is no flux-averaging factor, and keeps a missing one missing", () => {
    const spacing = widths.widthAtMaxRise * 0.5;
    const out = (entrainedFlow: number | null) =>
      multiportFromNearField({ scenario: line(spacing), jet: jetFixture(), nearField: [{ ...ls, entrainedFlow }] });
    const a = out(2);
    expect(a.nearField[0]!.entrainedFlow).toBeCloseTo(2 * a.multiport.dilutionFactor, 12);
    expect(a.nearField[0]!.impactDilutionFluxAveraged).toBeNull();
    expect(out(null).nearField[0]!.entrainedFlow).toBeNull();
    expect(a.nearField[0]!.notes, "a first note").toHaveLength(1);
  });

  it("returns an independent method's result unchanged (the same object)", () => {
    const out = multiportFromNearField({
      scenario: line(widths.widthAtImpact * 2),
      jet: jetFixture(),
      nearField: [ls],
    });
    expect(out.nearField[0]).toBe(ls);
    expect(out.multiport.reason).toContain("The decision is the same with jet widths ÷√2 or ×√2");
  });

  it("takes the lowest factor and the most merged regime over the methods", () => {
    const spacing = 0.5 * (widths.widthAtMaxRise + widths.widthAtImpact);
    const wide: NearFieldMethodResult = {
      ...integralFixture(),
      maxRiseHeight: 0.5,
      impactDistance: 1,
      returnDistance: 1,
    };
    const out = multiportFromNearField({ scenario: line(spacing), jet: jetFixture(), nearField: [wide, ls] });
    expect(out.perMethod.map((m) => m.regime)).toEqual(["independent", "partially-merged"]);
    expect(out.multiport.regime).toBe("partially-merged");
    expect(out.multiport.dilutionFactor).toBe(out.perMethod[1]!.factor);
    expect(out.multiport.merged).toBe(false);
    expect(out.multiport.reason).toMatch(
      /^integral: jet width [\d.]+ m at max rise vs spacing [\d.]+ m, [\d.]+ m at impact vs [\d.]+ m → independent, factor 1\.000; length-scale: /,
    );
    const both = multiportFromNearField({
      scenario: line(widths.widthAtMaxRise * 0.5),
      jet: jetFixture(),
      nearField: [wide, ls],
    });
    expect(both.multiport.regime).toBe("merged-line-source");
    expect(both.multiport.merged).toBe(true);
  });

  it("says so when no method gives jet widths, and treats one port as single-port", () => {
    const none = multiportFromNearField({
      scenario: line(2),
      jet: jetFixture(),
      nearField: [
        { ...ls, impactDilution: null },
        { ...integralFixture(), maxRiseHeight: null },
      ],
    });
    expect(none.multiport.regime).toBe("unknown");
    expect(none.multiport.dilutionFactor).toBe(1);
    expect(none.perMethod.map((m) => m.regime)).toEqual(["unknown", "unknown"]);
    expect(none.perMethod[0]!.lineDilution).toBeNull();
    expect(none.multiport.reason).toMatch(/^Merging not assessed\. s\/\(dF\) = 0\.50 reported for comparison only/);
    expect(none.warnings.map((w) => [w.code, w.severity, w.stage, w.message])).toEqual([
      [
        "multiport-merging-unknown",
        "warning",
        "multiport",
        "No near-field method gave jet widths; merging was not assessed.",
      ],
    ]);
    expect(none.multiport.mergingSensitivity).toEqual([]);
    const single = multiportFromNearField({ scenario: scenarioFixture(), jet: jetFixture(), nearField: [ls] });
    expect(single.multiport).toMatchObject({ regime: "single-port", merged: false, portsUsed: 1, dilutionFactor: 1 });
    expect(single.multiport.reason).toBe("One port: no neighbouring jets.");
    expect(single.perMethod).toEqual([]);
    expect(single.warnings).toEqual([]);
    expect(single.nearField).toEqual([ls]);
  });

  it("lists only the width definitions that change the regime, with their factors", () => {
    const out = multiportFromNearField({
      scenario: line(widths.widthAtImpact * 1.1),
      jet: jetFixture(),
      nearField: [ls],
    });
    const wider = out.multiport.mergingSensitivity![2]!;
    expect(out.multiport.reason).toContain(
      ` Sensitivity to the jet-width definition: length-scale with widths ×1.41 → ${wider.regime} (factor ${wider.dilutionFactor.toFixed(3)}). s/(dF)`,
    );
    expect(out.multiport.reason, "the narrower definition does not change the regime").not.toContain("×0.71");
  });
});
