/**
 * The one pipeline every caller uses (CLI, app worker, report, studies, Monte Carlo):
 * scenario → properties → port → near field (both methods, side by side) → multiport, spreading layer,
 * mixing-zone edge → compliance → a plain, serialisable `BrinefieldResult`. Each stage is a pure function
 * of the ones before; nothing reaches back.
 */
import type { Scenario } from "./scenario/types";
import { inputsHash } from "./scenario/hash";
import { propertiesFromScenario, type PropertiesStage } from "./properties";
import type { JetSource, NearFieldMethodResult, PathSink } from "./nearfield/types";
import { nearFieldLengthScale } from "./nearfield/lengthScale";
import { nearFieldIntegral } from "./nearfield/integral";
import { jetSourceWarnings } from "./nearfield/sourceChecks";
import { beyondNearField, type BeyondOutput } from "./farfield/stage";
import { risingLengthScale } from "./rising/length-scale";
import { risingIntegral } from "./rising/integral";
import { risingBeyond } from "./rising/stage";
import { blendSignChange } from "./rising/blend";
import { DENSE_SOURCE_CODES, risingScopeReasons } from "./rising/scope";
import { portFlowsAndHydraulics, type PortHydraulics } from "./multiport";
import { viscosityFromST, SHARQAWY_2010_VISCOSITY_SOURCE } from "./correlations/sharqawy-2010-viscosity";
import {
  CAUTION,
  RESULT_FORMAT,
  RESULT_VERSION,
  type BrinefieldResult,
  type CaseResult,
  type PortResult,
} from "./result/contract";
import { complianceWithScope, scopeReasons } from "./compliance/scope";
import { expandCases, overallFromCases, runCases } from "./cases";
import type { ResultWarning } from "./warnings";
import { BRINEFIELD_VERSION } from "./version";
import { runRecordSteps } from "./record/run";
import { withIntakeCases, withRecord } from "./record/result";
import { caseDetail, summaryWithIntake } from "./intake/summary";
import { intakeFromResult } from "./intake/intake";

export interface RunOptions {
  /** Include the integral model's path in the result (default true; Monte Carlo turns it off). */
  readonly includePath?: boolean;
  /** Receives every accepted integration step of the integral model (charts, 3D buffers, CSV). */
  readonly sink?: PathSink;
  /**
   * "full" (default), or "edge" for loops that read only the edge verdict and near-field numbers:
   * `mixingZone.alternatives`, `series` and `footprint` are then left empty and `inputsHash` is "" (same
   * physics, less output).
   */
  readonly detail?: "full" | "edge";
}

/**
 * Port flows, velocity, Froude and Reynolds numbers for every port under the flow split (core/multiport),
 * with the brine's own viscosity; its warnings cover each port's exit velocity.
 */
export function portFromScenario(scenario: Scenario, props: PropertiesStage): PortHydraulics {
  const nu = viscosityFromST(scenario.discharge.salinity, scenario.discharge.temperature) / props.dischargeDensity;
  return portFlowsAndHydraulics({
    scenario,
    dischargeDensity: props.dischargeDensity,
    ambientDensity: props.ambientDensityAtPort,
    kinematicViscosity: nu,
  });
}

/** Builds the jet of the mean port. */
export function jetFromScenario(scenario: Scenario, props: PropertiesStage, port: PortResult): JetSource {
  const d = scenario.diffuser;
  return {
    diameter: d.portDiameter,
    flow: port.flow,
    velocity: port.velocity,
    density: props.dischargeDensity,
    salinity: scenario.discharge.salinity,
    temperature: scenario.discharge.temperature,
    angle: d.portAngle,
    azimuth: d.portAzimuth,
    portHeight: d.portHeight,
    reducedGravity: props.reducedGravity,
    froude: port.froude,
  };
}

function dedupe(ws: readonly ResultWarning[]): ResultWarning[] {
  const seen = new Set<string>();
  const out: ResultWarning[] = [];
  for (const w of ws) {
    const k = `${w.code}|${w.message}`;
    if (!seen.has(k)) {
      seen.add(k);
      out.push(w);
    }
  }
  return out;
}

/** The result of one ambient case: the result contract without `cases` and `overall`. */
export type AmbientCaseResult = Omit<BrinefieldResult, "cases" | "overall">;

/**
 * Runs the whole screening chain for one scenario and every ambient case (core/cases): the stated
 * conditions fill the top level (`mixingZone`, `compliance`, …) as before; `cases` lists each case's
 * verdict and `overall` the verdict over them. A discharge lighter than the sea is computed as a rising
 * plume (core/rising); out-of-range physics comes back as warnings and scope reasons.
 */
export function runScenario(scenario: Scenario, options: RunOptions = {}): BrinefieldResult {
  if (scenario.ambient.record) {
    // A record's steps are the cases (core/record); the stated conditions still fill the top level.
    const top = runAmbientCase(scenario, options);
    const recorded = withRecord(scenario, top, runRecordSteps(scenario, recordStepEvaluator));
    const blend = blendSignChange(scenario);
    return blend ? { ...recorded, blend } : recorded;
  }
  const specs = expandCases(scenario);
  const results = runCases(specs, (c, i) =>
    i === 0
      ? runAmbientCase(scenario, options)
      : runAmbientCase(c.scenario, { includePath: false, detail: caseDetail(c.scenario) }),
  );
  const cases: CaseResult[] = specs.map((c, i) => {
    const r = results[i]!;
    return {
      name: c.name,
      kind: c.kind,
      edgeDilution: r.mixingZone.dilution,
      verdict: r.compliance.verdict,
      margin: r.compliance.margin,
      scopeReasons: r.compliance.scopeReasons,
    };
  });
  const blend = blendSignChange(scenario);
  const result: BrinefieldResult = {
    ...results[0]!,
    ...(blend ? { blend } : {}),
    cases,
    overall: overallFromCases(cases),
  };
  return scenario.intake
    ? withIntakeCases(
        scenario,
        result,
        specs.map((c, i) => ({ name: c.name, sample: intakeFromResult(c.scenario, results[i]!) })),
      )
    : result;
}

/** One record step through the pipeline: the study summary with the intake's figures. */
export function recordStepEvaluator(s: Scenario) {
  return summaryWithIntake(s, runAmbientCase(s, { includePath: false, detail: caseDetail(s) }));
}

/**
 * Runs the screening chain for the scenario's stated ambient only (its `ambientCases` are not read): the
 * case runner of every path (`runScenario`, studies, Monte Carlo) calls it once per case.
 */
export function runAmbientCase(scenario: Scenario, options: RunOptions = {}): AmbientCaseResult {
  const props = propertiesFromScenario(scenario);
  // A discharge no denser than the sea at the port rises: the same stages, read for a rising plume (core/rising).
  const rising = !(props.reducedGravity > 0);
  const hydraulics = portFromScenario(scenario, props);
  const port = hydraulics.port;
  const jet = jetFromScenario(scenario, props, port);
  let beyond: BeyondOutput;
  let sourceWarnings: ResultWarning[];
  if (rising) {
    const lengthScale = risingLengthScale(jet, props.column);
    const integral = risingIntegral(jet, props.column, { includePath: true, sink: options.sink });
    const methods = [lengthScale, integral].map(({ risingField, ...nf }) => ({
      nf: { ...nf, risingField },
      field: risingField,
    }));
    beyond = risingBeyond({
      scenario,
      jet,
      column: props.column,
      densities: props.densities,
      port,
      methods,
      detail: options.detail,
    });
    sourceWarnings = jetSourceWarnings(jet, props.column).filter((w) => !DENSE_SOURCE_CODES.has(w.code));
  } else {
    const lengthScale = nearFieldLengthScale(jet, props.column);
    // The path is always computed: the edge may lie inside the jet, where its dilution is read off the path.
    const integral = nearFieldIntegral(jet, props.column, { includePath: true, sink: options.sink });
    const nearField: NearFieldMethodResult[] = [lengthScale, integral];
    beyond = beyondNearField({
      scenario,
      jet,
      column: props.column,
      nearField,
      densities: props.densities,
      port,
      detail: options.detail,
    });
    sourceWarnings = jetSourceWarnings(jet, props.column);
  }
  const warnings = dedupe([
    ...props.warnings,
    ...hydraulics.warnings,
    ...sourceWarnings,
    ...beyond.nearField.flatMap((m) => m.warnings),
    ...beyond.warnings,
  ]);
  const reasons = rising
    ? risingScopeReasons(beyond.nearField, warnings)
    : scopeReasons({
        depth: scenario.ambient.depth,
        portHeight: scenario.diffuser.portHeight,
        nearField: beyond.nearField,
        warnings,
      });
  return {
    format: RESULT_FORMAT,
    version: RESULT_VERSION,
    program: { name: "brinefield", version: BRINEFIELD_VERSION },
    // Edge-only runs (study loops) read a summary, never the hash: computing it cost 7 % of a case.
    inputsHash: options.detail === "edge" ? "" : inputsHash(scenario),
    scenarioName: scenario.name,
    caution: CAUTION,
    conversions: scenario.conversions,
    discharge: {
      flow: scenario.discharge.flow,
      salinity: scenario.discharge.salinity,
      temperature: scenario.discharge.temperature,
      fromPlant: scenario.plant !== undefined,
    },
    densities: props.densities,
    port,
    nearField: options.includePath === false ? beyond.nearField.map(({ path: _path, ...m }) => m) : beyond.nearField,
    multiport: beyond.multiport,
    mixingZone: beyond.mixingZone,
    compliance: complianceWithScope(beyond.compliance, reasons),
    ...(beyond.basin ? { basin: beyond.basin } : {}),
    warnings,
    methods: [
      { stage: "properties", name: props.eos.info.name, source: props.eos.info.source },
      { stage: "port", name: "Seawater viscosity for the Reynolds number", source: SHARQAWY_2010_VISCOSITY_SOURCE },
      ...beyond.nearField.map((m) => ({ stage: "near field", name: m.method, source: m.source })),
      ...beyond.methods,
    ],
  };
}
