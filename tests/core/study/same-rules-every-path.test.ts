/**
 * One rule set, one set of cases, one verdict — whichever path builds the scenario. Each broken input is
 * driven through `run` (the file reader), a sweep point, a study variant, a Monte Carlo draw, a design
 * candidate and an ambient case: every path refuses it with the file reader's own message and none ever
 * reports a pass. Then a study of two sites whose ambient cases set their own water: the sites give
 * different rows, and compare, the report and run agree number for number. (Rules and cases are the
 * project's own contract; the physical bounds are common practice, no source.)
 */
import { describe, it, expect } from "vitest";
import { parseScenario } from "../../../core/scenario/parse";
import { runScenario } from "../../../core/pipeline";
import { evaluatePoint } from "../../../core/study/evaluate-point";
import { evaluateScenario } from "../../../core/study/evaluate";
import { studyVariants, compareVariant, flattenRow } from "../../../core/study/compare";
import { parseStudy } from "../../../core/study/study-file";
import { planMonteCarlo, runMonteCarloChunk, samplesForRun, summariseMonteCarlo } from "../../../core/study/montecarlo";
import { candidateOverrides, defaultConstraints, type DesignCandidate } from "../../../core/study/design";
import { judgeDesign } from "../../../core/study/design-rank";
import { sortRows } from "../../../core/study/compare";
import { reportHtml } from "../../../core/report/html";
import { reportNumber } from "../../../core/report/format";
import { fourPortRaw, scenarioFrom } from "./fixtures";

type Raw = Record<string, any>;

/** `run`'s messages for a raw scenario (the file reader refuses it). */
function runMessages(raw: Raw): string[] {
  const r = parseScenario(raw);
  expect(r.ok, "run refuses the broken scenario").toBe(false);
  return r.ok ? [] : r.issues.map((i) => i.message);
}

function withField(path: string, value: unknown, raw: Raw = fourPortRaw()): Raw {
  const copy = structuredClone(raw);
  const parts = path.split(".");
  let node = copy;
  for (const p of parts.slice(0, -1)) node = node[p];
  node[parts.at(-1)!] = value;
  return copy;
}

function studyOf(base: Raw, overrides: Record<string, unknown>) {
  const parsed = parseStudy({
    format: "brinefield-study",
    version: 1,
    name: "t",
    base,
    variants: [{ name: "broken", overrides }],
  });
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
  const v = studyVariants(parsed.study, base, parseScenario);
  if (!v.ok) throw new Error(v.issues.map((i) => i.message).join("; "));
  return v.variants;
}

const BROKEN: { what: string; path: string; value: number }[] = [
  { what: "a depth below the port (port 1 m above the seabed in 0.8 m of water)", path: "ambient.depth", value: 0.8 },
  { what: "a 5 mm port (exit velocity far above 30 m/s)", path: "diffuser.portDiameter", value: 0.005 },
  { what: "a port at the surface", path: "diffuser.portHeight", value: 15 },
  { what: "a current above the field bound", path: "ambient.currentSpeed", value: 7 },
];

describe("the same broken input gets the same message from every path, never a pass", () => {
  const base = scenarioFrom(fourPortRaw());

  for (const b of BROKEN) {
    it(`${b.what}: run, sweep point and study variant`, () => {
      const messages = runMessages(withField(b.path, b.value));
      expect(messages.length, "run names at least one problem").toBeGreaterThan(0);

      const point = evaluatePoint(base, { [b.path]: b.value }, evaluateScenario);
      expect(point.verdict, "sweep point refused").toBe("refused");
      for (const m of messages) expect(point.error, "sweep point carries run's message").toContain(m);

      const variants = studyOf(fourPortRaw(), { [b.path]: b.value });
      const broken = variants.find((v) => v.name === "broken")!;
      expect(broken.refused, "study variant refused with run's messages").toEqual(messages);
      const rows = compareVariant(broken, evaluateScenario);
      expect(
        rows.map((r) => r.verdict),
        "one refused row",
      ).toEqual(["refused"]);
      expect(flattenRow(rows[0]!).error, "the row carries the message").toBe(messages.join("; "));
    });
  }

  it("a Monte Carlo draw of a depth below the port: refused with run's message for the drawn depth", () => {
    const raw = fourPortRaw();
    raw.uncertainty = { inputs: [{ path: "ambient.depth", distribution: "uniform", min: 0.6, max: 0.9 }] };
    const s = scenarioFrom(raw);
    const planned = planMonteCarlo(s, 20, 7);
    if (!planned.ok) throw new Error("plan");
    const chunk = runMonteCarloChunk(s, planned.plan, 0, 20, evaluateScenario);
    const drawn = samplesForRun(planned.plan, 0)[0]!;
    for (const m of runMessages(withField("ambient.depth", drawn)))
      expect(chunk.firstError, "run 0's message").toContain(m);
    const summary = summariseMonteCarlo(planned.plan, [chunk]);
    expect(summary.worstCase.verdicts.refused, "every draw refused").toBe(20);
    expect(summary.worstCase.verdicts.meets, "never a pass").toBe(0);
    // Refused draws are not outcomes of the discharge: with every draw refused there is no probability
    // to give, rather than a certain exceedance or a certain pass.
    expect(summary.worstCase.probabilityOfExceedance, "no computed run, no probability").toBeNaN();
    expect(summary.worstCase.failedRuns, "refused runs counted apart").toBe(20);
  });

  it("a design candidate with a 5 mm port or a port at the surface: refused with run's message", () => {
    const c = defaultConstraints(base);
    for (const [field, value] of [
      ["portDiameter", 0.005],
      ["portHeight", 15],
    ] as const) {
      const candidate: DesignCandidate = {
        portCount: 4,
        portDiameter: 0.12,
        portAngle: 60,
        portSpacing: 5,
        portHeight: 1,
        length: 15,
        exitVelocity: 5,
        [field]: value,
      };
      const p = evaluatePoint(base, candidateOverrides(candidate), evaluateScenario);
      const verdict = judgeDesign(candidate, p, c);
      expect(verdict.ok, `${field} ${value}: never kept`).toBe(false);
      for (const m of runMessages(withField(`diffuser.${field}`, value)))
        expect(verdict.reasons.join(" "), `${field}: run's message`).toContain(m);
    }
  });

  it("an ambient case whose depth is below the port: run refuses it, and a study override of that case gets the same message", () => {
    const raw = fourPortRaw();
    raw.ambientCases = [{ name: "low water", depth: 0.8 }];
    const messages = runMessages(raw);
    expect(messages.join(" "), "names the case's depth").toMatch(
      /^ambientCases\.0\.depth: 0\.8 must leave the port below the surface in ambient case "low water"/,
    );
    const okRaw = fourPortRaw();
    okRaw.ambientCases = [{ name: "low water", depth: 12 }];
    const broken = studyOf(okRaw, { "ambientCases.0.depth": 0.8 }).find((v) => v.name === "broken")!;
    expect(broken.refused, "the same message").toEqual(messages);
  });

  it("override and sort keys are own keys of a fixed table: prototype names and far indices refused quickly, naming the field", () => {
    for (const key of ["constructor", "__proto__", "toString", "hasOwnProperty"]) {
      const p = evaluatePoint(base, { [key]: -100 }, evaluateScenario);
      expect(p.verdict, `${key}: refused`).toBe("refused");
      expect(p.error, `${key}: named`).toMatch(new RegExp(`^${key}: is not a path that can be varied`));
      expect(sortRows([{ variant: "a", margin: 1 }], key), `--sort ${key} is no column`).toBeNull();
    }
    const t0 = Date.now();
    expect(
      () => studyOf(fourPortRaw(), { "mixingZone.limits.99999999.maxIncrease": 1 }),
      "index beyond the array",
    ).toThrow(
      /^variants\.0 \(broken\): mixingZone\.limits\.99999999\.maxIncrease: index 99999999 is beyond mixingZone\.limits, which has 1 entry/,
    );
    expect(Date.now() - t0, "refused without building the array").toBeLessThan(2000);
  });
});

describe("two sites whose ambient cases set their own water", () => {
  // Invented sites. Site A: 15 m, 0.1 m/s, 20 °C. Site B: 30 m, 0.3 m/s, 12 °C. The cases set their own
  // temperature (summer) or current (storm) only; everything else follows each site.
  const base = fourPortRaw();
  base.ambientCases = [
    { name: "summer", temperature: 27 },
    { name: "storm", currentSpeed: 0.6 },
  ];
  const siteB = { "ambient.depth": 30, "ambient.currentSpeed": 0.3, "ambient.temperature": 12 };
  const parsed = parseStudy({
    format: "brinefield-study",
    version: 1,
    name: "two sites",
    base,
    variants: [{ name: "site B", overrides: siteB }],
  });
  if (!parsed.ok) throw new Error("study");
  const v = studyVariants(parsed.study, base, parseScenario);
  if (!v.ok) throw new Error("variants");
  const rows = v.variants.flatMap((x) => compareVariant(x, evaluateScenario));
  const row = (variant: string, c: string) => rows.find((r) => r.variant === variant && r.case === c)!;

  it("gives different rows for different sites, in every case that does not set the changed field", () => {
    for (const c of ["stated", "summer", "storm", "slack water"]) {
      expect(row("site B", c).summary!.edgeDilution, `${c}: site B differs from site A`).not.toBe(
        row("base", c).summary!.edgeDilution,
      );
    }
    const notes = row("site B", "overall").notes ?? [];
    expect(notes.join(" "), "says the summer case keeps its own temperature").toMatch(
      /Case "summer" keeps its own value, set in ambientCases, for ambient\.temperature/,
    );
    expect(notes.join(" "), "and the storm its own current").toMatch(
      /Case "storm" keeps its own value, set in ambientCases, for ambient\.currentSpeed/,
    );
  });

  it("compare, the report and run agree on the same inputs", () => {
    for (const variant of v.variants) {
      const r = runScenario(variant.scenario!);
      for (const k of r.cases) {
        const cr = row(variant.name, k.name);
        expect(cr.summary!.edgeDilution, `${variant.name}/${k.name}: compare's edge dilution is run's`).toBe(
          k.edgeDilution,
        );
        expect(cr.verdict, `${variant.name}/${k.name}: same verdict`).toBe(k.verdict);
      }
      const o = row(variant.name, "overall");
      expect(
        [o.governingCase, o.verdict, o.summary!.margin],
        `${variant.name}: compare's overall row is run's overall`,
      ).toEqual([r.overall.governingCase, r.overall.verdict, r.overall.margin]);
      const html = reportHtml(r, { scenarioFile: null });
      expect(html, `${variant.name}: the report's headline verdict is run's overall`).toContain(
        `data-verdict="${r.overall.verdict}"`,
      );
      expect(html, `${variant.name}: the report names the governing case and its margin`).toContain(
        `${r.overall.governingCase}</strong>, margin <strong data-path="overall.margin">${reportNumber(r.overall.margin)}`,
      );
    }
  });
});
