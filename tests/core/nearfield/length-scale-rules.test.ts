/**
 * nearFieldLengthScale() applicability rules and the checks beside it (length-scale-checks.ts): which
 * discharges and angles the published laws cover, how the conservative headline and the near-field carry are
 * built and declared, the current and stratification checks, with every warning's code, severity, parameter,
 * value and message numbers.
 *
 * Published coefficients: Lai & Lee (2012), J. Hydro-environment Research 6:9–28, abstract — rise
 * Z_max/(dF) 0.44 at 15° and 2.08 at 60°, S_t/F = 0.45 and S_i/F = 1.06 over 38°–60°. Roberts, Ferrier &
 * Daviero (1997), J. Hydraulic Eng. 123(8):693–699, 60° — y_t = 2.2 dF, x_i = 2.4 dF, S_i = 1.6 F,
 * x_n = 9.0 dF, S_n = 2.6 F (quoted from secondary sources). Crossflow Froude number thresholds 0.8 and 2:
 * Lai & Lee (2013), Environ. Fluid Mech., abstract. Weak-current threshold U_r·F < 1: Abessi & Roberts
 * (2016), abstract. The 45°/135° split of co-, cross- and counter-flow and the 0.01 kg/m³, 0.1 and 1
 * stratification thresholds are common practice, no source.
 */
import { describe, expect, it, beforeEach } from "vitest";
import { denseJet, uniformColumn, type JetOptions } from "../../helpers/jets";
import {
  denseJetDatasetsAtAngle,
  nearFieldLengthScale,
  publishedRiseHeights,
} from "../../../core/nearfield/length-scale";
import { currentIssues, stratificationIssues } from "../../../core/nearfield/length-scale-checks";
import { LAI_LEE_2012_SOURCE } from "../../../core/correlations/lai-lee-2012-inclined-dense-jet";
import { ROBERTS_1997_SOURCE } from "../../../core/correlations/roberts-1997-inclined-dense-jet";
import type { AmbientColumn, JetSource, NearFieldMethodResult } from "../../../core/nearfield/types";
import { NEAR_FIELD_HEADLINE_FIELDS } from "../../../core/nearfield/types";

const G = 9.80665; // standard gravity, m/s²
const FACTOR = 2.44 / 1.44; // (1 + λ²)/λ², λ = 1.2 (Fischer et al. 1979, ch. 9)
const FLUX_NOTE =
  "Dilutions are centreline (minimum) values; the …FluxAveraged values are × 1.694 = (1 + λ²)/λ² for Gaussian " +
  "velocity and tracer profiles with λ = 1.2 (Fischer et al. 1979), the same basis as the integral model. " +
  "entrainedFlow = Q0 × (flux-averaged impact dilution − 1).";
const NO_RANGE =
  "No dilution range: fewer than two datasets give an impact dilution here and no published scatter is known.";
const LAI = "Lai & Lee (2012)";
const ROB = "Roberts, Ferrier & Daviero (1997)";

const makeJet = (p: JetOptions = {}): JetSource => denseJet({ azimuth: 90, portHeight: 0, F: 30, ...p });
const col = uniformColumn(30);

function expectNotAvailable(r: NearFieldMethodResult, why: string) {
  expect(r.available, "not available").toBe(false);
  expect(r.notAvailableReason, "reason").toBe(why);
  expect(r.source, "source says none").toBe(`none: ${why}`);
  expect(r.bias, "bias says why").toBe(`No length-scale estimate: ${why}`);
  expect(r.variants, "no variants").toEqual([]);
  expect(r.notes, "one note").toEqual([`Not available: ${why}.`]);
  expect(r.method, "method").toBe("length-scale");
  for (const f of NEAR_FIELD_HEADLINE_FIELDS) expect(r[f], `${f} null`).toBeNull();
  expect([r.dilutionRange, r.entrainedFlow, r.fluxAveragingFactor], "no range, flow or factor").toEqual([
    null,
    null,
    null,
  ]);
}

describe("which discharges the laws describe", () => {
  const notDense = (jet: JetSource) =>
    `the discharge is not a dense jet (g′ = ${jet.reducedGravity.toPrecision(3)} m/s², ` +
    `F = ${jet.froude.toPrecision(3)}, d = ${jet.diameter} m); the correlations are for negatively buoyant jets`;
  const cases: [string, Partial<JetSource>][] = [
    ["neutral", { reducedGravity: 0 }],
    ["light", { reducedGravity: -0.05 }],
    ["zero F", { froude: 0 }],
    ["negative F", { froude: -5 }],
    ["infinite F", { froude: Infinity }],
    ["zero diameter", { diameter: 0 }],
  ];
  for (const [name, over] of cases) {
    it(`refuses a discharge that is not a dense jet (${name}), with a serious warning`, () => {
      const jet = { ...makeJet(), ...over };
      const r = nearFieldLengthScale(jet, col);
      const why = notDense(jet);
      expectNotAvailable(r, why);
      expect(r.warnings, "one serious warning").toEqual([
        {
          code: "not-a-dense-jet",
          severity: "serious",
          message: `No length-scale estimate: ${why}.`,
          stage: "length-scale",
        },
      ]);
    });
  }

  for (const angle of [0, -10, 90.5]) {
    it(`refuses a port that does not point upward (${angle}°)`, () => {
      const r = nearFieldLengthScale(makeJet({ angle }), col);
      const why = `discharge angle ${angle}° is not upward (0° < θ ≤ 90°)`;
      expectNotAvailable(r, why);
      expect(r.warnings, "one serious warning").toEqual([
        {
          code: "angle-not-upward",
          severity: "serious",
          message: `No length-scale estimate: ${why}.`,
          parameter: "angle",
          value: angle,
          range: [0, 90],
          stage: "length-scale",
        },
      ]);
    });
  }

  for (const [angle, word] of [
    [90, "Steeper"],
    [62.5, "Steeper"],
    [14.9, "Flatter"],
    [1, "Flatter"],
  ] as const) {
    it(`gives no numbers at ${angle}°, outside the 15°–60° the datasets cover (${word.toLowerCase()})`, () => {
      const r = nearFieldLengthScale(makeJet({ angle }), col);
      const a = angle.toFixed(1);
      expectNotAvailable(
        r,
        `no published laboratory dataset held covers a ${a}° port (the cited datasets cover 15°–60°); ` +
          "another angle's numbers are not used in their place",
      );
      expect(r.warnings, "one warning").toEqual([
        {
          code: "angle-outside-studied-range",
          severity: "warning",
          message:
            `No length-scale estimate: discharge angle ${a}° is outside the 15°–60° covered by the published ` +
            `datasets held. ${word} jets behave differently, so no other angle's values are used.`,
          parameter: "angle",
          value: angle,
          range: [15, 60],
          stage: "length-scale",
        },
      ]);
    });
  }

  it("covers 15° and 60° themselves, and 61.5° within the ±2° build tolerance of Roberts et al. (1997)", () => {
    expect(nearFieldLengthScale(makeJet({ angle: 15 }), col).available, "15°").toBe(true);
    expect(nearFieldLengthScale(makeJet({ angle: 60 }), col).available, "60°").toBe(true);
    const r = nearFieldLengthScale(makeJet({ angle: 61.5 }), col);
    expect(r.available, "61.5°").toBe(true);
    expect(r.source, "Roberts alone").toBe(`${ROBERTS_1997_SOURCE} — the only dataset held that covers this angle`);
    expect(r.impactDilution, "S_i = 1.6 F").toBeCloseTo(1.6 * 30, 10);
    expect(r.maxRiseDilution, "Roberts gives none").toBeNull();
    expect(r.notes, "notes").toEqual([
      "Roberts et al. (1997) 60° coefficients used for 61.5° (within the ±2° build tolerance; common practice, no source).",
      NO_RANGE,
      FLUX_NOTE,
    ]);
  });

  it("continues the descent of a raised 61.5° port at the port's own angle, as its note says", () => {
    const jet = makeJet({ angle: 61.5, d: 0.2, F: 30, portHeight: 1.5 });
    const r = nearFieldLengthScale(jet, col);
    // Return distance 2.4 dF (Roberts et al. 1997) plus the straight descent h/tanθ at θ = 61.5°.
    expect(r.impactDistance, "2.4 dF + 1.5/tan 61.5°").toBeCloseTo(
      2.4 * 6 + 1.5 / Math.tan((61.5 * Math.PI) / 180),
      10,
    );
    expect(
      (r.notes ?? []).some((n) => n.startsWith("Impact distance = return distance + portHeight/tan(61.5°)")),
      "the note names 61.5°",
    ).toBe(true);
  });
});

describe("a port at 45°: Lai & Lee (2012) alone, carried to the near-field end", () => {
  const jet = makeJet({ angle: 45, d: 0.2, F: 30 });
  let r: NearFieldMethodResult;
  beforeEach(() => void (r = nearFieldLengthScale(jet, col)));
  it("takes the interpolated rise and the 38°–60° dilutions, and carries S_i with the growth 2.6/1.6", () => {
    expect(r.source, "one dataset").toBe(`${LAI_LEE_2012_SOURCE} — the only dataset held that covers this angle`);
    expect(r.maxRiseHeight, "(0.44 + (30/45)·1.64)·dF").toBeCloseTo((0.44 + (30 / 45) * 1.64) * 6, 10);
    expect(r.impactDilution, "1.06 F").toBeCloseTo(31.8, 10);
    expect(r.maxRiseDilution, "0.45 F").toBeCloseTo(13.5, 10);
    expect(r.nearFieldDilution, "1.06 F × 2.6/1.6").toBeCloseTo(31.8 * (2.6 / 1.6), 10);
    expect(r.nearFieldDistance, "no impact distance to carry").toBeNull();
    expect(r.dilutionRange, "one dataset").toBeNull();
    expect(r.impactDilutionFluxAveraged, "× factor").toBeCloseTo(31.8 * FACTOR, 10);
    expect(r.nearFieldDilutionFluxAveraged, "× factor").toBeCloseTo(31.8 * (2.6 / 1.6) * FACTOR, 10);
    expect(r.entrainedFlow, "Q0 × (flux-averaged S_i − 1)").toBeCloseTo(jet.flow * (31.8 * FACTOR - 1), 12);
    expect(r.warnings, "F = 30 at 45°: clean").toEqual([]);
  });
  it("says what it interpolated and carried, and why there is no range", () => {
    expect(r.notes, "notes in order").toEqual([
      "Lai & Lee (2012) rise interpolated linearly between 15° and 60° (the paper's values at 30°, 38°, 45° and 52° are not held).",
      "nearFieldDilution = impact dilution 31.8 × 1.625, the growth from impact to the end of the near field in Roberts et al. (1997) (S_n/S_i = 2.6/1.6).",
      NO_RANGE,
      FLUX_NOTE,
    ]);
    expect(r.variants, "the dataset's own values, dilution at maximum rise in the note").toEqual([
      {
        source: LAI_LEE_2012_SOURCE,
        maxRiseHeight: r.maxRiseHeight,
        maxRiseDistance: null,
        returnDistance: null,
        impactDistance: null,
        impactDilution: r.impactDilution,
        nearFieldDistance: null,
        nearFieldDilution: null,
        note: "Lai & Lee (2012) rise interpolated linearly between 15° and 60° (the paper's values at 30°, 38°, 45° and 52° are not held). Dilution at maximum rise 13.5.",
      },
    ]);
  });
});

describe("a port at 30°: a rise but no dilution (Lai & Lee 2012 state S_t and S_i only for 38°–60°)", () => {
  let r: NearFieldMethodResult;
  beforeEach(() => void (r = nearFieldLengthScale(makeJet({ angle: 30, d: 0.2, F: 30 }), col)));
  it("gives the interpolated rise and nothing that needs a dilution", () => {
    expect(r.available, "available").toBe(true);
    expect(r.maxRiseHeight, "(0.44 + (15/45)·1.64)·dF").toBeCloseTo((0.44 + (15 / 45) * 1.64) * 6, 10);
    for (const f of [
      "impactDilution",
      "nearFieldDilution",
      "maxRiseDilution",
      "impactDilutionFluxAveraged",
      "nearFieldDilutionFluxAveraged",
      "entrainedFlow",
      "dilutionRange",
      "nearFieldDistance",
    ] as const)
      expect(r[f], `${f} null`).toBeNull();
    expect(r.notes, "no carry without an impact dilution").toEqual([
      "Lai & Lee (2012) rise interpolated linearly between 15° and 60° (the paper's values at 30°, 38°, 45° and 52° are not held).",
      "Lai & Lee (2012) state S_t and S_i only for 38°–60°; none given at 30.0°.",
      NO_RANGE,
      FLUX_NOTE,
    ]);
  });
});

describe("a raised port at 60°: two datasets, the less favourable value of each", () => {
  const jet = makeJet({ angle: 60, d: 0.2, F: 30, portHeight: 1.5 });
  let r: NearFieldMethodResult;
  beforeEach(() => void (r = nearFieldLengthScale(jet, col)));
  it("names both datasets and which one each headline came from", () => {
    expect(r.source, "both, with the rule and the origins").toBe(
      `${LAI_LEE_2012_SOURCE}; ${ROBERTS_1997_SOURCE} — headline is the less favourable value of each quantity ` +
        `(${ROB}; ${LAI}; ${LAI} impact dilution with the Roberts et al. (1997) growth)`,
    );
    expect(r.notes, "notes in order").toEqual([
      "nearFieldDilution = impact dilution 31.8 × 1.625, the growth from impact to the end of the near field in Roberts et al. (1997) (S_n/S_i = 2.6/1.6), lower than the measured 78.0.",
      "Headline values are the less favourable of the datasets for each quantity (lower dilution, higher rise, " +
        `longer distance): maxRiseHeight from ${ROB}; returnDistance from ${ROB}; impactDistance from ${ROB}; ` +
        `impactDilution from ${LAI}; nearFieldDistance from ${ROB}; nearFieldDilution from ${LAI} impact dilution ` +
        `with the Roberts et al. (1997) growth; maxRiseDilution from ${LAI}.`,
      "Impact distance = return distance + portHeight/tan(60.0°): the descent below port level is continued as a straight line at the discharge angle (an upper bound on the added distance).",
      FLUX_NOTE,
    ]);
  });
  it("takes the higher rise, the longer distances and the lower dilutions", () => {
    expect(r.maxRiseHeight, "2.2 dF > 2.08 dF").toBeCloseTo(2.2 * 6, 10);
    expect(r.returnDistance, "2.4 dF").toBeCloseTo(2.4 * 6, 10);
    expect(r.impactDistance, "2.4 dF + 1.5/tan 60°").toBeCloseTo(2.4 * 6 + 1.5 / Math.tan(Math.PI / 3), 10);
    expect(r.nearFieldDistance, "9.0 dF").toBeCloseTo(9 * 6, 10);
    expect(r.impactDilution, "1.06 F < 1.6 F").toBeCloseTo(31.8, 10);
    expect(r.nearFieldDilution, "1.06 F × 1.625 < 2.6 F").toBeCloseTo(31.8 * 1.625, 10);
    expect(r.dilutionRange, "[1.06 F, 1.6 F]").toEqual([1.06 * 30, 1.6 * 30]);
  });
  it("keeps each dataset's values, Roberts et al. without a note", () => {
    const rob = r.variants![1];
    expect(rob, "Roberts et al. (1997) variant").toEqual({
      source: ROBERTS_1997_SOURCE,
      maxRiseHeight: 2.2 * 6,
      maxRiseDistance: null,
      returnDistance: 2.4 * 6,
      impactDistance: 2.4 * 6 + 1.5 / Math.tan(Math.PI / 3),
      impactDilution: 1.6 * 30,
      nearFieldDistance: 9 * 6,
      nearFieldDilution: 2.6 * 30,
    });
    expect(r.variants![0].note, "Lai & Lee: dilution at maximum rise").toBe("Dilution at maximum rise 13.5.");
  });
  it("does not extend the descent for a port given below the bed (no negative drop)", () => {
    const low = nearFieldLengthScale(makeJet({ angle: 60, portHeight: -0.5 }), col);
    expect(low.impactDistance, "impact = return").toBe(low.returnDistance);
    expect(
      low.notes!.some((n) => n.startsWith("Impact distance")),
      "no descent note",
    ).toBe(false);
    const onBed = nearFieldLengthScale(makeJet({ angle: 60, portHeight: 0 }), col);
    expect(
      onBed.notes!.some((n) => n.startsWith("Impact distance")),
      "port on the bed: nothing added, no note",
    ).toBe(false);
  });
});

describe("very low F: dilutions floored at 1, and a measured near-field value below the carry kept", () => {
  const jet = makeJet({ angle: 60, d: 0.2, F: 0.5 });
  let r: NearFieldMethodResult;
  beforeEach(() => void (r = nearFieldLengthScale(jet, col)));
  it("never reports a dilution below 1 (undiluted brine)", () => {
    expect(r.impactDilution, "1.06·0.5 → 1").toBe(1);
    expect(r.maxRiseDilution, "0.45·0.5 → 1").toBe(1);
    expect(r.dilutionRange, "both datasets floored").toEqual([1, 1]);
    expect(r.entrainedFlow, "Q0 × (factor − 1)").toBeCloseTo(jet.flow * (FACTOR - 1), 14);
  });
  it("keeps Roberts' 2.6 F = 1.3 where the carried 1 × 1.625 would be higher", () => {
    expect(r.nearFieldDilution, "measured, lower").toBeCloseTo(1.3, 12);
    expect(
      r.notes!.some((n) => n.startsWith("nearFieldDilution =")),
      "no carry note",
    ).toBe(false);
    expect(r.notes![0], "origins").toContain(`nearFieldDilution from ${ROB}; maxRiseDilution from ${LAI}.`);
    expect(r.notes![0], "a tie keeps the first dataset listed (Lai & Lee)").toContain(`impactDilution from ${LAI};`);
    expect(
      r.warnings.map((w) => w.code),
      "both datasets' Froude checks",
    ).toEqual(["lai-lee-2012-froude-below-range", "roberts-1997-froude-below-asymptotic"]);
  });
});

describe("published rise heights for the surface check", () => {
  const jet = makeJet({ d: 0.2, F: 25 });
  it("gives every dataset's rise at the port's angle, clamped to 15°–60°", () => {
    expect(publishedRiseHeights({ ...jet, angle: 60 }), "60°: both").toEqual([
      { source: LAI_LEE_2012_SOURCE, height: 2.08 * 5 },
      { source: ROBERTS_1997_SOURCE, height: 2.2 * 5 },
    ]);
    expect(
      publishedRiseHeights({ ...jet, angle: 90 }).map((x) => x.height),
      "90°: the 60° values, a lower bound",
    ).toEqual([2.08 * 5, 2.2 * 5]);
    expect(publishedRiseHeights({ ...jet, angle: 10 }), "10°: the 15° value").toEqual([
      { source: LAI_LEE_2012_SOURCE, height: 0.44 * 5 },
    ]);
    expect(publishedRiseHeights({ ...jet, angle: 45 }).length, "45°: Lai & Lee only").toBe(1);
  });
  it("gives none for a downward, over-vertical or non-dense discharge", () => {
    expect(publishedRiseHeights({ ...jet, angle: 0 }), "0°").toEqual([]);
    expect(publishedRiseHeights({ ...jet, angle: 91 }), "91°").toEqual([]);
    expect(publishedRiseHeights({ ...jet, reducedGravity: -0.1 }), "light").toEqual([]);
  });
  it("clamps the angle used and lists the datasets there", () => {
    expect(denseJetDatasetsAtAngle(75).angleUsed, "75° → 60°").toBe(60);
    expect(denseJetDatasetsAtAngle(75).entries.length, "both at 60°").toBe(2);
    expect(denseJetDatasetsAtAngle(5).angleUsed, "5° → 15°").toBe(15);
    expect(denseJetDatasetsAtAngle(5).entries.length, "Lai & Lee only").toBe(1);
    expect(denseJetDatasetsAtAngle(30).angleUsed, "inside: unchanged").toBe(30);
  });
});

describe("current check: crossflow Froude number F_c = (u_a/U)·F (Lai & Lee 2013)", () => {
  const jet = makeJet({ U: 4, F: 25, azimuth: 90 });
  const run = (speed: number, direction: number, j: JetSource = jet) => {
    const notes: string[] = [];
    const w = currentIssues(j, uniformColumn(30, { currentSpeed: speed, currentDirection: direction }), notes);
    return { w, notes };
  };
  it("says nothing in still water", () => {
    expect(run(0, 0), "no note, no warning").toEqual({ w: [], notes: [] });
  });
  it("names the regime and the current's direction relative to the jet (45°/135° split)", () => {
    const note = (sense: string, off: number) =>
      `Crossflow Froude number F_c = (u_a/U)·F = (0.080/4.00)·25.0 = 0.50: jet-dominated regime of Lai & Lee ` +
      `(2013); current ${sense} (${off}° from the jet azimuth).`;
    expect(run(0.08, 134).notes, "44° off").toEqual([note("co-flowing", 44)]);
    expect(run(0.08, 135).notes, "45° off").toEqual([note("across the jet", 45)]);
    expect(run(0.08, 225).notes, "135° off").toEqual([note("across the jet", 135)]);
    expect(run(0.08, 226).notes, "136° off").toEqual([note("counter-flowing", 136)]);
    expect(run(0.08, -30).notes, "−30° is 240°: 120° off").toEqual([note("across the jet", 120)]);
    expect(run(0.08, 10, { ...jet, azimuth: 350 }).notes, "across north: 20° off").toEqual([note("co-flowing", 20)]);
  });
  it("gives the weak-current caveat below F_c = 1 and only the strong-current warning from 0.8", () => {
    const weak = run(0.08, 90).w;
    expect(
      weak.map((x) => [x.code, x.severity, x.value]),
      "weak only",
    ).toEqual([["weak-current-lower-dilution", "warning", 0.5]]);
    const strong = run(0.144, 90).w;
    expect(
      strong.map((x) => x.code),
      "0.9: strong only",
    ).toEqual(["current-bends-jet"]);
    expect(strong[0].message, "direction carried into the warning").toContain(
      "The current is co-flowing (0° from the jet azimuth).",
    );
    expect(
      run(0.4, 90).w.map((x) => x.code),
      "F_c = 2.5",
    ).toEqual(["current-dominates-jet"]);
  });
});

describe("stratification check across the rise", () => {
  const jet = makeJet({ U: 4, F: 25, portHeight: 1 }); // g′ = 16/(625·0.2) = 0.128 m/s²
  const column = (densities: number[], depths = [0, 30]): AmbientColumn => ({
    ...uniformColumn(30),
    depths,
    densities,
  });
  /** Δρ across the rise ÷ the jet's density excess at maximum rise, ρ0·g′/g ÷ (0.45·F) (derived). */
  function ratio(c: AmbientColumn, rise: number) {
    const at = (d: number) => c.densities[0] + ((c.densities[1] - c.densities[0]) * d) / 30;
    const portDepth = 29;
    const strat = at(portDepth) - at(Math.max(0, portDepth - rise));
    return { strat, ratio: (strat * 0.45 * 25) / ((jet.reducedGravity * at(portDepth)) / G) };
  }
  const info = (span: number) => ({
    code: "ambient-stratified",
    severity: "info",
    message:
      `The water column is stratified (density varies by ${span.toFixed(2)} kg/m³ over the depth); the ` +
      "length-scale correlations are for unstratified water.",
    parameter: "ambient.densities",
    value: span,
    stage: "length-scale",
  });
  const strong = (strat: number, q: number) => ({
    code: "stratification-affects-jet",
    severity: q >= 1 ? "serious" : "warning",
    message:
      `Across the jet's rise the ambient density changes by ${strat.toFixed(3)} kg/m³, ${(100 * q).toFixed(0)} % ` +
      "of the jet's density excess at maximum rise (Δρ0/S_t with S_t = 0.45·F, Lai & Lee 2012); the unstratified " +
      `correlations ${q >= 1 ? "do not apply (the jet may be trapped)" : "are doubtful"}.`,
    parameter: "ambient.densities",
    value: q,
    range: [0, 0.1],
    stage: "length-scale",
  });

  it("ignores a column that varies by no more than 0.01 kg/m³, or has too few or mismatched points", () => {
    expect(stratificationIssues(jet, column([1025, 1025.009]), 10), "0.009 kg/m³").toEqual([]);
    expect(stratificationIssues(jet, column([1025], [0]), 10), "one point").toEqual([]);
    expect(stratificationIssues(jet, column([1020, 1025], [0, 15, 30]), 10), "mismatched").toEqual([]);
  });
  it("notes a weak stratification (ratio below 0.1) as information only", () => {
    const c = column([1024.5, 1025]);
    const q = ratio(c, 2);
    expect(q.ratio, "small").toBeLessThan(0.1);
    const w = stratificationIssues(jet, c, 2);
    expect(w, "info only").toEqual([info(w[0].value!)]);
    expect(w[0].value, "span").toBeCloseTo(0.5, 10);
  });
  it("warns for a ratio between 0.1 and 1, and calls it serious from 1", () => {
    const c = column([1020, 1025]);
    const mid = ratio(c, 1);
    expect(mid.ratio, "0.1 ≤ q < 1").toBeGreaterThan(0.1);
    expect(mid.ratio, "0.1 ≤ q < 1").toBeLessThan(1);
    const wm = stratificationIssues(jet, c, 1);
    expect(wm[1], "warning").toEqual(strong(mid.strat, wm[1].value!));
    expect(wm[1].value, "ratio").toBeCloseTo(mid.ratio, 10);
    const big = ratio(c, 10);
    expect(big.ratio, "q ≥ 1").toBeGreaterThan(1);
    const wb = stratificationIssues(jet, c, 10);
    expect(wb, "info, then serious").toEqual([info(wb[0].value!), strong(big.strat, wb[1].value!)]);
    expect(wb[1].value, "ratio").toBeCloseTo(big.ratio, 10);
  });
  it("stops the rise at the surface and gives no warning for an unstable (top-heavy) column", () => {
    const c = column([1020, 1025]);
    const toSurface = stratificationIssues(jet, c, 100);
    expect(toSurface[1].value, "Δρ from the port to the surface").toBeCloseTo(ratio(c, 29).ratio, 10);
    const unstable = stratificationIssues(jet, column([1025, 1020]), 10);
    expect(
      unstable.map((w) => w.code),
      "info only",
    ).toEqual(["ambient-stratified"]);
  });
  it("reaches nearFieldLengthScale with the larger published rise (2.2 dF at 60°)", () => {
    const c = column([1020, 1025]);
    const r = nearFieldLengthScale(jet, c);
    const w = r.warnings.find((x) => x.code === "stratification-affects-jet")!;
    expect(w.value, "ratio over 2.2·0.2·25 = 11 m").toBeCloseTo(ratio(c, 11).ratio, 10);
  });
});
