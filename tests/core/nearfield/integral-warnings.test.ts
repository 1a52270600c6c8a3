/**
 * nearFieldIntegral(): every warning the integral model raises, with its code, severity, parameter, value,
 * stage and the numbers in its message, and the results it gives for inputs it cannot run with.
 * The wording is the contract shown to users; each check says which condition raises it.
 */
import { describe, expect, it } from "vitest";
import { denseJet, uniformColumn } from "../../helpers/jets";
import { nearFieldIntegral, INTEGRAL_BIAS, INTEGRAL_SOURCE } from "../../../core/nearfield/integral";
import { emptyNearFieldHeadline, nullNearFieldResult, NEAR_FIELD_HEADLINE_FIELDS } from "../../../core/nearfield/types";
import type { AmbientColumn, JetSource, NearFieldMethodResult } from "../../../core/nearfield/types";

const jet60 = (over: Partial<JetSource> = {}): JetSource => ({ ...denseJet({ azimuth: 90 }), ...over });
const codes = (r: NearFieldMethodResult) => r.warnings.map((w) => w.code);
const find = (r: NearFieldMethodResult, code: string) => r.warnings.find((w) => w.code === code);
const event = (r: NearFieldMethodResult, kind: string) => r.events!.find((e) => e.kind === kind)!;

describe("inputs the integral model cannot run with", () => {
  function expectInvalid(r: NearFieldMethodResult, message: string, parameter: string, value: number) {
    expect(r.warnings, "one serious warning").toEqual([
      { code: "integral-invalid-input", severity: "serious", message, parameter, value, stage: "integral" },
    ]);
    expect(r.available, "not available").toBe(false);
    expect(r.notAvailableReason, "the reason is the message").toBe(message);
    expect(r.method, "method").toBe("integral");
    expect(r.source, "source stated").toBe(INTEGRAL_SOURCE);
    expect(r.bias, "bias stated").toBe(INTEGRAL_BIAS);
    expect(r.path, "no path").toEqual([]);
    expect(r.events, "no events").toEqual([]);
    for (const f of NEAR_FIELD_HEADLINE_FIELDS) expect(r[f], `${f} null`).toBeNull();
    for (const f of [
      "dilutionRange",
      "entrainedFlow",
      "fluxAveragingFactor",
      "impactDilutionFluxAveraged",
      "nearFieldDilutionFluxAveraged",
    ] as const)
      expect(r[f], `${f} null`).toBeNull();
  }
  const col = uniformColumn(20);

  for (const [k, v] of [
    ["diameter", 0],
    ["diameter", -0.1],
    ["diameter", Number.POSITIVE_INFINITY],
    ["velocity", 0],
    ["velocity", Number.NaN],
    ["velocity", Number.POSITIVE_INFINITY],
  ] as const) {
    it(`refuses port ${k} = ${v}`, () => {
      const r = nearFieldIntegral(jet60({ [k]: v }), col);
      expectInvalid(r, `Port ${k} must be positive and finite (got ${v}).`, k, v);
    });
  }

  it("refuses a non-finite reduced gravity", () => {
    const r = nearFieldIntegral(jet60({ reducedGravity: Number.NaN }), col);
    expectInvalid(r, "Reduced gravity must be finite.", "reducedGravity", Number.NaN);
  });

  it("refuses a port below the seabed or at or above the surface, and accepts one on the bed", () => {
    const msg = (h: number) => `Port height ${h} m must lie between the seabed and the surface (depth 20 m).`;
    expectInvalid(nearFieldIntegral(jet60({ portHeight: -0.1 }), col), msg(-0.1), "portHeight", -0.1);
    expectInvalid(nearFieldIntegral(jet60({ portHeight: 20 }), col), msg(20), "portHeight", 20);
    expectInvalid(nearFieldIntegral(jet60({ portHeight: Number.NaN }), col), msg(Number.NaN), "portHeight", NaN);
    expect(nearFieldIntegral(jet60({ portHeight: 0 }), col).available, "port on the bed").toBe(true);
    expect(nearFieldIntegral(jet60({ portHeight: 19 }), col).available, "1 m below the surface").toBe(true);
  });

  it("refuses an ambient profile without depths or with densities that do not match them", () => {
    const msg = "Ambient profile needs matching depths and densities.";
    const empty: AmbientColumn = { ...col, depths: [], densities: [] };
    expectInvalid(nearFieldIntegral(jet60(), empty), msg, "column", 0);
    const short: AmbientColumn = { ...col, depths: [0, 10, 20], densities: [1025, 1025] };
    expectInvalid(nearFieldIntegral(jet60(), short), msg, "column", 3);
  });

  it("builds the empty result shape every method shares (reason defaults to the bias text)", () => {
    expect(emptyNearFieldHeadline(), "eight headline numbers, all null").toEqual({
      maxRiseHeight: null,
      maxRiseDistance: null,
      returnDistance: null,
      impactDistance: null,
      impactDilution: null,
      nearFieldDistance: null,
      nearFieldDilution: null,
      maxRiseDilution: null,
    });
    const r = nullNearFieldResult("length-scale", "src", "bias text", []);
    expect(r.notAvailableReason, "defaults to the bias").toBe("bias text");
    expect(nullNearFieldResult("integral", "src", "b", [], "why").notAvailableReason, "given reason").toBe("why");
    expect(r.available, "not available").toBe(false);
    expect([r.method, r.source, r.bias], "labels").toEqual(["length-scale", "src", "bias text"]);
  });
});

describe("warnings of a run that does not end on the seabed", () => {
  it("centreline at the surface: serious, with the depth, and the run stops there", () => {
    const r = nearFieldIntegral(jet60(), uniformColumn(3));
    expect(find(r, "jet-reaches-surface"), "serious surface warning").toEqual({
      code: "jet-reaches-surface",
      severity: "serious",
      message:
        "The jet centreline reaches the surface 3.0 m above the seabed; the integral model stops there and its dilutions do not apply.",
      parameter: "depth",
      value: 3,
      stage: "integral",
    });
    expect(codes(r), "surface, then no impact").toEqual(["jet-reaches-surface", "integral-no-impact"]);
    expect(r.events!.filter((e) => e.kind === "surface-contact").length, "edge contact and centreline contact").toBe(2);
    expect(r.impactDilution, "no impact").toBeNull();
  });

  it("upper edge at the surface only: a warning, and the run goes on to the seabed", () => {
    // Rise of the upper edge 8.6 m above a port 1 m above the bed; the centreline peaks 7.6 m above the bed.
    const r = nearFieldIntegral(jet60(), uniformColumn(9));
    expect(find(r, "jet-reaches-surface"), "edge-only surface warning").toEqual({
      code: "jet-reaches-surface",
      severity: "warning",
      message:
        "The upper edge of the jet reaches the water surface; surface interaction is not modelled and the rise and dilutions are approximate.",
      parameter: "depth",
      value: 9,
      stage: "integral",
    });
    expect(codes(r), "only that warning").toEqual(["jet-reaches-surface"]);
    expect(
      r.events!.filter((e) => e.kind === "surface-contact").length,
      "one surface event (the edge's first contact)",
    ).toBe(1);
    expect(r.impactDilution, "impact reached").not.toBeNull();
  });

  it("no warning at all for the same jet in deep water", () => {
    expect(nearFieldIntegral(jet60(), uniformColumn(20)).warnings, "clean run").toEqual([]);
  });

  it("step limit: the number of steps in the message and a step-limit event", () => {
    const r = nearFieldIntegral(jet60(), uniformColumn(20), { maxSteps: 4 });
    expect(find(r, "integral-step-limit"), "step-limit warning").toEqual({
      code: "integral-step-limit",
      severity: "warning",
      message: "The integrator stopped after 4 steps without reaching the seabed.",
      parameter: "maxSteps",
      value: 4,
      stage: "integral",
    });
    expect(codes(r), "step limit, then no impact").toEqual(["integral-step-limit", "integral-no-impact"]);
    const ev = event(r, "step-limit")!;
    expect(ev.s, "the event is where the run stopped, past the port").toBeGreaterThan(0);
    expect(r.notes!.join("\n"), "the stop is in the integration note").toMatch(
      /4 steps, \d+ rejected.*stop: max-steps/,
    );
  });

  it("length limit: the limit in the message (whole metres) and a length-limit event at it", () => {
    const r = nearFieldIntegral(jet60(), uniformColumn(20), { maxLength: 5.4 });
    expect(find(r, "integral-length-limit"), "length-limit warning").toEqual({
      code: "integral-length-limit",
      severity: "warning",
      message: "The jet centreline reached the length limit of 5 m without reaching the seabed.",
      parameter: "maxLength",
      value: 5.4,
      stage: "integral",
    });
    expect(event(r, "length-limit")!.s, "at the limit").toBeCloseTo(5.4, 9);
    expect(codes(r), "length limit, then no impact").toEqual(["integral-length-limit", "integral-no-impact"]);
  });

  it("step underflow: the arc length where the step collapsed, and the port as the highest point reached", () => {
    // Zero tolerances cannot be met by any step: the step size collapses at the port.
    const r = nearFieldIntegral(jet60(), uniformColumn(20), { relTol: 0, absTol: 0 });
    expect(find(r, "integral-step-underflow"), "underflow warning").toEqual({
      code: "integral-step-underflow",
      severity: "warning",
      message:
        "The integrator's step size collapsed at s = 0.000 m (a singular point, e.g. a fountain top); results beyond it are not available.",
      stage: "integral",
    });
    expect(codes(r), "underflow, then no impact").toEqual(["integral-step-underflow", "integral-no-impact"]);
    expect(
      r.events!.map((e) => e.kind),
      "only the maximum rise (at the port)",
    ).toEqual(["max-rise"]);
    expect(r.maxRiseHeight, "upper edge of the port: (d/2)·cos 60°").toBeCloseTo(0.05, 12);
    expect(r.notes!.join("\n"), "stop reason").toMatch(/stop: step-underflow\./);
  });

  it("stalled vertical fountain: momentum exhausted, with the arc length where it stalled", () => {
    const r = nearFieldIntegral(jet60({ angle: 90 }), uniformColumn(50));
    const ev = event(r, "passive-layer")!;
    expect(find(r, "jet-momentum-exhausted"), "passive-layer warning").toEqual({
      code: "jet-momentum-exhausted",
      severity: "warning",
      message: `The jet's velocity relative to the ambient fell below 0.1 % of the exit velocity at s = ${ev.s.toFixed(2)} m; the integral model cannot follow the flow further (passive layer or stalled fountain).`,
      stage: "integral",
    });
    expect(codes(r), "stall, no impact, angle outside the validated 15°–75°").toEqual([
      "jet-momentum-exhausted",
      "integral-no-impact",
      "integral-angle-outside-validation",
    ]);
    expect(ev.z, "stalled near the fountain top").toBeCloseTo(r.maxRiseHeight!, 6);
  });

  it("a neutral discharge moving with the current at its speed has no velocity excess: passive from the first step", () => {
    // Velocity relative to the ambient is what mixes (physics); here it is zero, so the model stops at once.
    const withCurrent = jet60({ angle: 0, azimuth: 30, velocity: 0.3, reducedGravity: 0, froude: Infinity });
    const current = uniformColumn(20, { currentSpeed: 0.3, currentDirection: 30 });
    const r = nearFieldIntegral(withCurrent, current, { maxLength: 100 });
    expect(codes(r), "passive at once").toContain("jet-momentum-exhausted");
    expect(event(r, "passive-layer").s, "after the first step").toBeLessThan(1);
    const across = nearFieldIntegral(withCurrent, { ...current, currentDirection: 120 }, { maxLength: 100 });
    expect(codes(across), "across the current it has an excess and goes on").not.toContain("jet-momentum-exhausted");
  });

  it("trapped rising discharge: the depth of the trap level in the message, and the trap event", () => {
    const col: AmbientColumn = {
      ...uniformColumn(100),
      depths: [0, 100],
      densities: [1015, 1030],
      salinities: [30, 38],
    };
    const light = jet60({ angle: 90, velocity: 1, reducedGravity: -0.02, froude: 1 / Math.sqrt(0.02 * 0.2) });
    const r = nearFieldIntegral(light, col);
    const ev = event(r, "trapped")!;
    expect(find(r, "jet-trapped"), "trap warning").toEqual({
      code: "jet-trapped",
      severity: "warning",
      message: `The jet is trapped by the ambient stratification at ${(99 - ev.z).toFixed(1)} m depth (neutral buoyancy with small vertical velocity); it spreads as a layer there instead of reaching the seabed.`,
      parameter: "column.densities",
      stage: "integral",
    });
    expect(codes(r), "trap, light discharge, no impact, vertical").toEqual([
      "jet-trapped",
      "integral-positively-buoyant",
      "integral-no-impact",
      "integral-angle-outside-validation",
    ]);
    expect(ev.z, "above the port, below the surface").toBeGreaterThan(1);
    expect(ev.z, "above the port, below the surface").toBeLessThan(99);
    const neutral = event(r, "neutral-buoyancy")!;
    expect(neutral.s, "the trap level is crossed before the jet stops").toBeLessThan(ev.s);
  });

  it("an inclined light jet overshoots its trap level and is stopped where its axis is level, at the top", () => {
    const col: AmbientColumn = {
      ...uniformColumn(100),
      depths: [0, 100],
      densities: [1015, 1030],
      salinities: [30, 38],
    };
    const light = jet60({ angle: 45, velocity: 1, reducedGravity: -0.02, froude: 1 / Math.sqrt(0.02 * 0.2) });
    const rows: number[][] = [];
    const r = nearFieldIntegral(light, col, {
      sink: { begin() {}, end() {}, sample: (s, x, y, z) => rows.push([s, z]) },
    });
    const trapped = event(r, "trapped");
    const neutral = r.events!.filter((e) => e.kind === "neutral-buoyancy");
    expect(neutral.length, "one crossing of the trap level on the way up").toBe(1);
    expect(trapped.z - neutral[0].z, "momentum carries it well past the trap level").toBeGreaterThan(1);
    const [a, b] = rows.slice(-2);
    expect(
      Math.abs((b[1] - a[1]) / (b[0] - a[0])),
      "axis nearly level at the stop (sin 45° = 0.71 at the port)",
    ).toBeLessThan(0.15);
    expect(trapped.s, "stopped at the last sample").toBe(b[0]);
  });
});

describe("warnings for a discharge that is not a dense jet", () => {
  it("positively buoyant: says impact quantities do not apply", () => {
    const r = nearFieldIntegral(jet60({ reducedGravity: -0.1, froude: 20 }), uniformColumn(20));
    expect(find(r, "integral-positively-buoyant"), "light discharge").toEqual({
      code: "integral-positively-buoyant",
      severity: "warning",
      message:
        "The discharge is lighter than the ambient water at the port; it rises and impact quantities do not apply.",
      parameter: "reducedGravity",
      value: -0.1,
      stage: "integral",
    });
    expect(codes(r), "not also near-neutral").not.toContain("integral-near-neutral");
  });

  it("zero buoyancy: near-neutral with F = ∞", () => {
    const r = nearFieldIntegral(jet60({ reducedGravity: 0, froude: Infinity, angle: 0 }), uniformColumn(20), {
      maxLength: 50,
    });
    expect(find(r, "integral-near-neutral"), "near-neutral").toEqual({
      code: "integral-near-neutral",
      severity: "warning",
      message:
        "Near-neutral buoyancy (g′ = 0.00 m/s², F = ∞): the discharge behaves as a pure jet and may not return to the seabed within the model.",
      parameter: "reducedGravity",
      value: 0,
      stage: "integral",
    });
  });

  it("zero g′ with a finite F given is near-neutral too, with that F in the message", () => {
    const r = nearFieldIntegral(jet60({ reducedGravity: 0 }), uniformColumn(20), { maxLength: 50 });
    expect(find(r, "integral-near-neutral")?.message, "F = 25").toBe(
      "Near-neutral buoyancy (g′ = 0.00 m/s², F = 25): the discharge behaves as a pure jet and may not return to the seabed within the model.",
    );
  });

  it("a neutral discharge rising into lighter water stalls as a fountain: it is not reported as trapped", () => {
    // Entraining lighter water makes it denser than its surroundings from the start: no level where it turns light.
    const col: AmbientColumn = {
      ...uniformColumn(100),
      depths: [0, 100],
      densities: [1015, 1030],
      salinities: [30, 38],
    };
    const r = nearFieldIntegral(jet60({ angle: 90, velocity: 1, reducedGravity: 0, froude: Infinity }), col);
    expect(codes(r), "stalled, not trapped").toContain("jet-momentum-exhausted");
    expect(codes(r), "stalled, not trapped").not.toContain("jet-trapped");
  });

  it("zero g′ in uniform water runs to the length limit like any pure jet (no integration failure)", () => {
    const r = nearFieldIntegral(jet60({ reducedGravity: 0, froude: Infinity, angle: 0 }), uniformColumn(20), {
      maxLength: 50,
    });
    expect(codes(r), "length limit, near-neutral, no impact, angle outside 15°–75°").toEqual([
      "integral-length-limit",
      "integral-near-neutral",
      "integral-no-impact",
      "integral-angle-outside-validation",
    ]);
  });

  it("a discharge at the ambient salinity dilutes exactly like any other: salt is a passive tracer", () => {
    // Conservation of the salinity-excess flux does not feed back on the flow (physics).
    const a = nearFieldIntegral(jet60({ salinity: 35 }), uniformColumn(20));
    const b = nearFieldIntegral(jet60({ salinity: 68 }), uniformColumn(20));
    expect(codes(a), "clean run").toEqual([]);
    expect(Math.abs(a.impactDilution! / b.impactDilution! - 1), "same impact dilution").toBeLessThan(1e-6);
  });

  it("|F| above 1000 counts as near-neutral, F = 1000 does not (common practice, no source)", () => {
    const r = nearFieldIntegral(jet60({ froude: 1001 }), uniformColumn(20));
    expect(find(r, "integral-near-neutral")?.message, "g′ to 3 digits, F whole").toBe(
      `Near-neutral buoyancy (g′ = ${jet60().reducedGravity.toPrecision(3)} m/s², F = 1001): the discharge behaves as a pure jet and may not return to the seabed within the model.`,
    );
    expect(codes(nearFieldIntegral(jet60({ froude: 1000 }), uniformColumn(20))), "F = 1000").not.toContain(
      "integral-near-neutral",
    );
    const lightFast = jet60({ reducedGravity: -1e-7, froude: -2000, angle: 0 });
    const r2 = nearFieldIntegral(lightFast, uniformColumn(20), { maxLength: 20 });
    expect(codes(r2), "F = −2000: near-neutral, not positively buoyant").toContain("integral-near-neutral");
    expect(codes(r2), "one buoyancy warning only").not.toContain("integral-positively-buoyant");
  });
});

describe("a run without impact reports no impact-derived number", () => {
  it("nulls every impact and near-field quantity, the range and the entrained flow", () => {
    const r = nearFieldIntegral(jet60({ angle: 90 }), uniformColumn(50));
    for (const f of [
      "impactDistance",
      "impactDilution",
      "nearFieldDistance",
      "nearFieldDilution",
      "impactDilutionFluxAveraged",
      "nearFieldDilutionFluxAveraged",
      "entrainedFlow",
      "dilutionRange",
      "returnDistance",
    ] as const)
      expect(r[f], `${f} null`).toBeNull();
    expect(r.maxRiseHeight!, "the rise is still given").toBeGreaterThan(0);
    expect(r.fluxAveragingFactor, "the factor is still stated").toBeCloseTo(2.44 / 1.44, 14);
  });

  it("accepts a one-point ambient profile (uniform water)", () => {
    const one: AmbientColumn = {
      ...uniformColumn(20),
      depths: [0],
      densities: [1025],
      salinities: [35],
      temperatures: [20],
    };
    const r = nearFieldIntegral(jet60(), one);
    expect(r.available, "runs").toBe(true);
    expect(r.impactDilution, "same as the two-point uniform column").toBe(
      nearFieldIntegral(jet60(), uniformColumn(20)).impactDilution,
    );
  });
});

describe("notes of a run", () => {
  it("says when the port does not point upward (no return point), for 0° and below only", () => {
    const text = "The port does not point upward, so the centreline never rises above port level (no return point).";
    expect(nearFieldIntegral(jet60({ angle: 0 }), uniformColumn(20)).notes, "0°").toContain(text);
    expect(nearFieldIntegral(jet60({ angle: -20 }), uniformColumn(20)).notes, "−20°").toContain(text);
    expect(nearFieldIntegral(jet60({ angle: 5 }), uniformColumn(20)).notes, "5°").not.toContain(text);
  });

  it("says when the maximum rise is the highest sample rather than a located turning point", () => {
    const text = "No turning point of the upper edge was located; the maximum rise is the highest sampled upper edge.";
    expect(nearFieldIntegral(jet60(), uniformColumn(3)).notes, "stopped at the surface").toContain(text);
    expect(nearFieldIntegral(jet60(), uniformColumn(20)).notes, "turning point located").not.toContain(text);
  });

  it("reports the integration: method, steps, rejections, evaluations and why it stopped", () => {
    const r = nearFieldIntegral(jet60(), uniformColumn(20));
    const line = r.notes!.find((n) => n.startsWith("Integration:"));
    expect(line, "integration note").toMatch(
      /^Integration: Dormand–Prince 5\(4\), \d+ steps, \d+ rejected, \d+ evaluations, stop: event\.$/,
    );
    expect(
      r.notes!.some((n) => n.startsWith("End of the near field: impact dilution × 1.625")),
      "growth note",
    ).toBe(true);
    const noImpact = nearFieldIntegral(jet60(), uniformColumn(3));
    expect(
      noImpact.notes!.some((n) => n.startsWith("End of the near field")),
      "no growth note without an impact",
    ).toBe(false);
  });
});
