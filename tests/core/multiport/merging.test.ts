import { describe, expect, it } from "vitest";
import {
  multiportFromNearField,
  neighbourSpacingAtDistance,
  jetWidthsFromNearField,
} from "../../../core/multiport/merging";
import { linePlumeDilutionFromFlux } from "../../../core/multiport/line-plume";
import { DF, F, integralFixture, jetFixture, lengthScaleFixture, scenarioFixture } from "../farfield/fixtures";
import type { NearFieldMethodResult } from "../../../core/nearfield/types";

const line = (spacing: number, n = 10) =>
  scenarioFixture({
    discharge: { flow: 0.1 * n },
    diffuser: {
      layout: "line",
      portCount: n,
      portSpacing: spacing,
      length: (n - 1) * spacing,
      flowSplit: new Array(n).fill(1 / n),
    },
  });

describe("multiportFromNearField() — merging of neighbouring dense jets (geometric criterion, Davis 1999)", () => {
  const nf = [lengthScaleFixture()];
  const widths = jetWidthsFromNearField(lengthScaleFixture(), 1)!;

  it("keeps jets independent when they are still apart at impact", () => {
    const out = multiportFromNearField({
      scenario: line(widths.widthAtImpact * 1.5),
      jet: jetFixture(),
      nearField: nf,
    });
    expect(out.multiport.regime, "spacing wider than the jet at impact").toBe("independent");
    expect(out.multiport.merged, "not merged").toBe(false);
    expect(out.multiport.dilutionFactor, "no reduction").toBe(1);
    expect(out.multiport.portsUsed, "ten ports").toBe(10);
    expect(out.nearField[0].impactDilution, "unchanged").toBe(1.6 * F);
  });

  it("treats jets touching before maximum rise as a line source with the line-plume dilution", () => {
    const spacing = widths.widthAtMaxRise * 0.5;
    const out = multiportFromNearField({ scenario: line(spacing), jet: jetFixture(), nearField: nf });
    expect(out.multiport.regime, "merged before the top").toBe("merged-line-source");
    expect(out.multiport.merged, "merged").toBe(true);
    // q = Q/(n s); fall height = rise 2.2 dF + port height 1 m (Roberts et al. 1997 rise, from memory).
    const q = 1.0 / (10 * spacing);
    const sLine = linePlumeDilutionFromFlux(q, jetFixture().reducedGravity, 2.2 * DF + 1);
    expect(out.multiport.dilutionFactor, "factor = line plume ÷ single-jet impact dilution").toBeCloseTo(
      Math.min(1, sLine / (1.6 * F)),
      12,
    );
    expect(out.multiport.dilutionFactor, "merging reduces dilution here").toBeLessThan(1);
    expect(out.nearField[0].impactDilution, "impact dilution scaled").toBeCloseTo(
      1.6 * F * out.multiport.dilutionFactor,
      9,
    );
    expect(out.nearField[0].notes?.join(" "), "with a note").toContain("merged-line-source");
    expect(out.multiport.reason, "the reason quotes the numbers").toMatch(
      /jet width [\d.]+ m at max rise vs spacing [\d.]+ m/,
    );
  });

  it("reduces dilution partially when jets merge on the way down, never below the merged limit", () => {
    const spacing = 0.5 * (widths.widthAtMaxRise + widths.widthAtImpact);
    const partial = multiportFromNearField({ scenario: line(spacing), jet: jetFixture(), nearField: nf });
    expect(partial.multiport.regime, "between max rise and impact").toBe("partially-merged");
    const q = 1.0 / (10 * spacing);
    const merged = Math.min(1, linePlumeDilutionFromFlux(q, jetFixture().reducedGravity, 2.2 * DF + 1) / (1.6 * F));
    expect(partial.multiport.dilutionFactor, "at most 1").toBeLessThanOrEqual(1);
    expect(partial.multiport.dilutionFactor, "at least the merged factor").toBeGreaterThanOrEqual(merged);
  });

  it("reports s/(dF) for comparison with published dense multiport results", () => {
    const out = multiportFromNearField({ scenario: line(8), jet: jetFixture(), nearField: nf });
    expect(out.multiport.spacingRatio, "8 m / 4 m").toBeCloseTo(8 / DF, 12);
  });

  it("treats a single port as single-port with factor 1", () => {
    const out = multiportFromNearField({
      scenario: scenarioFixture(),
      jet: jetFixture(),
      nearField: [lengthScaleFixture(), integralFixture()],
    });
    expect(out.multiport.regime, "one port").toBe("single-port");
    expect(out.multiport.dilutionFactor, "no change").toBe(1);
  });

  it("reads jet widths from an integral path where one is given", () => {
    const path: NearFieldMethodResult["path"] = [
      { s: 0, x: 0, y: 0, z: 0, halfWidth: 0.1, dilution: 1 },
      { s: 5, x: 3, y: 0, z: 4, halfWidth: 0.8, dilution: 8 },
      { s: 10, x: 7, y: 0, z: 6, halfWidth: 1.2, dilution: 12 },
      { s: 16, x: 10, y: 0, z: -1, halfWidth: 2.0, dilution: 20 },
    ];
    const w = jetWidthsFromNearField({ ...integralFixture(), path }, 1)!;
    expect(w.widthAtMaxRise, "2 × half-width at the highest point").toBe(2.4);
    expect(w.widthAtImpact, "2 × half-width where z reaches the seabed").toBe(4);
    expect(w.fallHeight, "6 m rise + 1 m port height").toBe(7);
  });
});

describe("neighbourSpacingAtDistance() — geometry of straight and rosette diffusers", () => {
  it("projects port spacing normal to the jets on a straight diffuser", () => {
    const s = scenarioFixture({
      diffuser: { layout: "line", portCount: 4, portSpacing: 6, diffuserAzimuth: 0, portAzimuth: 90 },
    });
    expect(neighbourSpacingAtDistance(s, 10), "jets perpendicular to the axis").toBeCloseTo(6, 12);
    const oblique = { ...s, diffuser: { ...s.diffuser, portAzimuth: 30 } };
    expect(neighbourSpacingAtDistance(oblique, 10), "6·sin 30°").toBeCloseTo(3, 12);
  });

  it("uses the chord 2r·sin(Δφ/2) between jets of one riser and the riser spacing between risers", () => {
    const s = scenarioFixture({
      diffuser: {
        layout: "rosette",
        portCount: 8,
        risers: { count: 2, portsPerRiser: 4, spacing: 30, portAzimuths: [0, 90, 180, 270] },
      },
    });
    expect(neighbourSpacingAtDistance(s, 5), "2·5·sin 45°").toBeCloseTo(10 * Math.SQRT1_2, 12);
    expect(neighbourSpacingAtDistance(s, 50), "riser spacing governs far out").toBe(30);
  });
});

describe("multiportFromNearField() — consistency after scaling and sensitivity to the jet-width definition", () => {
  const widths = jetWidthsFromNearField(lengthScaleFixture(), 1)!;
  const k = 2.44 / 1.44; // flux-averaged ÷ centreline, (1 + λ²)/λ², λ = 1.2 (Fischer et al. 1979)
  const withRange = (nf: NearFieldMethodResult): NearFieldMethodResult => ({
    ...nf,
    dilutionRange: [nf.impactDilution! * 0.8, nf.impactDilution! * 1.5],
    fluxAveragingFactor: k,
    impactDilutionFluxAveraged: nf.impactDilution! * k,
    entrainedFlow: jetFixture().flow * (nf.impactDilution! * k - 1),
  });
  const path: NearFieldMethodResult["path"] = [
    { s: 0, x: 0, y: 0, z: 0, halfWidth: 0.1, dilution: 1 },
    { s: 5, x: 3, y: 0, z: 4, halfWidth: 0.8, dilution: 12 },
    { s: 10, x: 7, y: 0, z: 6, halfWidth: 1.2, dilution: 18 },
    { s: 16, x: 10, y: 0, z: -1, halfWidth: 2.0, dilution: 21.2 },
  ];

  it("keeps low ≤ value ≤ high and impact ≤ near-field end for every spacing, with and without a path", () => {
    for (let spacing = 0.2; spacing < 40; spacing *= 1.3) {
      const nf = [
        withRange(lengthScaleFixture()),
        withRange({ ...integralFixture(), path, nearFieldDilution: 21.2 * 1.625 }),
      ];
      const out = multiportFromNearField({ scenario: line(spacing), jet: jetFixture(), nearField: nf });
      for (const m of out.nearField) {
        const [lo, hi] = m.dilutionRange!;
        const at = `${m.method}, spacing ${spacing.toFixed(2)} m (${out.multiport.regime})`;
        expect(lo, `low ≤ impact: ${at}`).toBeLessThanOrEqual(m.impactDilution! * (1 + 1e-12));
        expect(m.impactDilution!, `impact ≤ high: ${at}`).toBeLessThanOrEqual(hi * (1 + 1e-12));
        if (m.nearFieldDilution !== null)
          expect(m.nearFieldDilution, `impact ≤ near-field end: ${at}`).toBeGreaterThanOrEqual(m.impactDilution!);
        expect(m.impactDilutionFluxAveraged, `flux-averaged = centreline × factor: ${at}`).toBeCloseTo(
          m.impactDilution! * k,
          9,
        );
        expect(m.entrainedFlow, `entrained flow on the flux-averaged basis: ${at}`).toBeCloseTo(
          jetFixture().flow * (m.impactDilution! * k - 1),
          9,
        );
      }
    }
  });

  it("reports the decision with jet widths ÷√2, as used and ×√2, and says when the regime changes", () => {
    // Spacing just above the width at impact: independent as used, merging once widths grow by √2.
    const out = multiportFromNearField({
      scenario: line(widths.widthAtImpact * 1.1),
      jet: jetFixture(),
      nearField: [lengthScaleFixture()],
    });
    const s = out.multiport.mergingSensitivity!;
    expect(
      s.map((x) => x.widthFactor),
      "three definitions",
    ).toEqual([Math.SQRT1_2, 1, Math.SQRT2]);
    expect(s[1].regime, "as used").toBe(out.multiport.regime);
    expect(s[1].regime, "independent as used").toBe("independent");
    expect(s[2].regime, "wider jets merge").not.toBe("independent");
    expect(s[2].dilutionFactor, "and lose dilution").toBeLessThan(1);
    expect(out.multiport.reason, "the reason states the sensitivity").toMatch(
      /Sensitivity to the jet-width definition: length-scale with widths ×1\.41 → /,
    );
  });
});
