/**
 * The one pipeline every caller uses (CLI, app worker, report, studies, Monte Carlo). Stage by stage, each
 * a function of the earlier stages' outputs that returns its own part of the result (no stage rewrites
 * another's output):
 *   1. properties      core/properties   densities, ambient column, reduced gravity
 *   2. port hydraulics core/multiport    per-port flows, exit velocity, Froude and Reynolds numbers
 *   3. near field      core/nearfield    both methods side by side (length-scale laws, integral model)
 *   4. multiport       core/multiport    merging of neighbouring jets; the near-field results after merging
 *   5. far field       core/farfield     spreading layer / passive diffusion to the mixing-zone edge
 *   6. compliance      core/compliance   required dilution and verdict per limit, then the scope check
 *   7. footprint       core/farfield     seabed area above the governing limit
 * and assembles a plain, serialisable `BrinefieldResult`. A discharge no denser than the sea at the port
 * runs the same seven stages read for a rising plume (core/rising: its near field, merging, surface or
 * trapped field and footprint). `runScenario` repeats stages 1–7 for every ambient case (core/cases).
 */
import type { Scenario } from "./scenario/types";
import { inputsHash } from "./scenario/hash";
import { propertiesFromScenario } from "./properties";
import type { AmbientColumn, JetSource, NearFieldMethodResult, PathSink } from "./nearfield/types";
import { nearFieldLengthScale } from "./nearfield/length-scale";
import { nearFieldIntegral } from "./nearfield/integral";
import { jetSourceWarnings } from "./nearfield/source-checks";
import { farFieldStage } from "./farfield/stage";
import { footprintStage } from "./farfield/footprint";
import { risingLengthScale } from "./rising/length-scale";
import { risingIntegral } from "./rising/integral";
import { risingFarFieldStage, risingFootprintStage } from "./rising/stage";
import { risingMultiport, RISING_MERGING_SOURCE, type RisingMethod } from "./rising/merging";
import { blendSignChange } from "./rising/blend";
import { DENSE_SOURCE_CODES, risingScopeReasons } from "./rising/scope";
import { multiportFromNearField, MERGING_SOURCE } from "./multiport/merging";
import { complianceFromEdgeDilution, type ComplianceAssessment } from "./compliance/required-dilution";
import { SHARQAWY_2010_VISCOSITY_SOURCE } from "./correlations/sharqawy-2010-viscosity";
import {
  CAUTION,
  RESULT_FORMAT,
  RESULT_VERSION,
  type BrinefieldResult,
  type BasinResult,
  type CaseResult,
  type ComplianceResult,
  type DensitiesResult,
  type MixingZoneResult,
  type MultiportResult,
} from "./result/contract";
import { complianceWithScope, scopeReasons } from "./compliance/scope";
import { expandCases, overallFromCases, runCases } from "./cases";
import type { ResultWarning } from "./warnings";
import { BRINEFIELD_VERSION } from "./version";
import { runRecordSteps } from "./record/run";
import { withIntakeCases, withRecord } from "./record/result";
import { caseDetail, summaryWithIntake } from "./intake/summary";
import { intakeFromResult } from "./intake/intake";
import { portFromScenario, jetFromScenario } from "./multiport/port-stage";

export interface RunOptions {
  /** Include the integral model's path in the result (default true; Monte Carlo turns it off). */
  readonly includePath?: boolean;
  /** Receives every accepted integration step of the integral model (charts, 3D buffers, CSV). */
  readonly sink?: PathSink;
  /**
   * "full" (default), or "edge" for loops that read only the edge verdict and near-field numbers:
   * `mixingZone.alternatives`, `series` and `footprint` are then left empty, `inputsHash` is "", the
   * near-field methods' `notes` are empty (and their variants carry no `note`), and `multiport.reason` is ""
   * (same physics, numbers and warnings; less output).
   */
  readonly detail?: "full" | "edge";
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
  return summaryWithIntake(s, runAmbientCase(s, { detail: caseDetail(s) }));
}

/**
 * Runs the screening chain for the scenario's stated ambient only (its `ambientCases` are not read): the
 * case runner of every path (`runScenario`, studies, Monte Carlo) calls it once per case.
 */
export function runAmbientCase(scenario: Scenario, options: RunOptions = {}): AmbientCaseResult {
  // 1. Properties. A discharge no denser than the sea at the port rises: the same stages, read for a rising
  // plume (core/rising).
  const props = propertiesFromScenario(scenario);
  const rising = !(props.reducedGravity > 0);
  // 2. Port hydraulics, and the jet of the mean port.
  const hydraulics = portFromScenario(scenario, props);
  const port = hydraulics.port;
  const jet = jetFromScenario(scenario, props, port);
  const common = { scenario, jet, column: props.column, densities: props.densities, detail: options.detail };
  // 3. Near field; 4–7. multiport, far field, compliance, footprint.
  let after: AfterNearField;
  let sourceWarnings: ResultWarning[];
  if (rising) {
    const nearField = risingNearFieldStage({ jet, column: props.column, sink: options.sink });
    sourceWarnings = nearField.warnings;
    after = risingStagesAfterNearField({ ...common, methods: nearField.methods });
  } else {
    const nearField = nearFieldStage({ jet, column: props.column, sink: options.sink, detail: options.detail });
    sourceWarnings = nearField.warnings;
    after = stagesAfterNearField({ ...common, nearField: nearField.methods });
  }
  const warnings = dedupe([
    ...props.warnings,
    ...hydraulics.warnings,
    ...sourceWarnings,
    ...after.nearField.flatMap((m) => m.warnings),
    ...after.warnings,
  ]);
  // 6. (continued) The scope check, over every stage's warnings.
  const reasons = rising
    ? risingScopeReasons(after.nearField, warnings)
    : scopeReasons({
        depth: scenario.ambient.depth,
        portHeight: scenario.diffuser.portHeight,
        nearField: after.nearField,
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
    nearField: options.includePath === false ? after.nearField.map(({ path: _path, ...m }) => m) : after.nearField,
    multiport: after.multiport,
    mixingZone: after.mixingZone,
    compliance: complianceWithScope(after.compliance, reasons),
    ...(after.basin ? { basin: after.basin } : {}),
    warnings,
    methods: [
      { stage: "properties", name: props.eos.info.name, source: props.eos.info.source },
      { stage: "port", name: "Seawater viscosity for the Reynolds number", source: SHARQAWY_2010_VISCOSITY_SOURCE },
      ...after.nearField.map((m) => ({ stage: "near field", name: m.method, source: m.source })),
      ...after.methods,
    ],
  };
}

/**
 * Stage 3: both near-field methods side by side, and the port-level checks of the jet. In "edge" detail the
 * methods build no notes (nothing in a study loop reads them).
 */
export function nearFieldStage(input: {
  jet: JetSource;
  column: AmbientColumn;
  sink?: PathSink;
  detail?: "full" | "edge";
}): {
  methods: NearFieldMethodResult[];
  warnings: ResultWarning[];
} {
  const text = input.detail !== "edge";
  const lengthScale = nearFieldLengthScale(input.jet, input.column, { text });
  // The path is always computed: the edge may lie inside the jet, where its dilution is read off the path.
  const integral = nearFieldIntegral(input.jet, input.column, { includePath: true, sink: input.sink, text });
  return { methods: [lengthScale, integral], warnings: jetSourceWarnings(input.jet, input.column) };
}

/** Stage 3 for a rising plume: both methods with the field each reaches, and the jet checks that apply. */
export function risingNearFieldStage(input: { jet: JetSource; column: AmbientColumn; sink?: PathSink }): {
  methods: RisingMethod[];
  warnings: ResultWarning[];
} {
  const lengthScale = risingLengthScale(input.jet, input.column);
  const integral = risingIntegral(input.jet, input.column, { includePath: true, sink: input.sink });
  const methods = [lengthScale, integral].map(({ risingField, ...nf }) => ({
    nf: { ...nf, risingField },
    field: risingField,
  }));
  const warnings = jetSourceWarnings(input.jet, input.column).filter((w) => !DENSE_SOURCE_CODES.has(w.code));
  return { methods, warnings };
}

/** What stages 4–7 add to the result. */
export interface AfterNearField {
  readonly multiport: MultiportResult;
  /** The multiport stage's near-field results (after merging; each carries a note when changed). */
  readonly nearField: NearFieldMethodResult[];
  readonly mixingZone: MixingZoneResult;
  readonly compliance: ComplianceResult;
  readonly warnings: ResultWarning[];
  readonly methods: { stage: string; name: string; source: string }[];
  /** Present only with `ambient.basin`: the background build-up used in the compliance. */
  readonly basin?: BasinResult;
}

export interface AfterNearFieldInput {
  readonly scenario: Scenario;
  readonly jet: JetSource;
  readonly column: AmbientColumn;
  readonly densities: DensitiesResult;
  /** The near-field stage's results, as computed (before merging). */
  readonly nearField: readonly NearFieldMethodResult[];
  readonly detail?: "full" | "edge";
}

/**
 * Stages 4–7 in order: multiport (merging), far field to the edge, compliance at the edge, footprint.
 * Exported so tests can start from hand-built near-field results; `runAmbientCase` is its one production caller.
 */
export function stagesAfterNearField(input: AfterNearFieldInput): AfterNearField {
  const { scenario, detail } = input;
  // 4. Multiport: merging of neighbouring jets; its own `nearField` is the near-field results after merging.
  const multiport = multiportFromNearField({
    scenario,
    jet: input.jet,
    nearField: input.nearField,
    text: detail !== "edge",
  });
  // 5. Far field: from the near-field end (after merging) to the mixing-zone edge.
  const farField = farFieldStage({
    scenario,
    column: input.column,
    densities: input.densities,
    nearField: multiport.nearField,
    detail,
  });
  // 6. Compliance at the edge dilution, against the seabed background.
  const assessment = complianceFromEdgeDilution(
    scenario,
    farField.mixingZone.dilution,
    farField.seabed.salinity,
    farField.seabed.temperature,
  );
  // 7. Footprint of the governing limit along the governing chain.
  const footprint = footprintStage({
    governing: farField.governing,
    requiredDilution: assessment.compliance.requiredDilution,
    detail,
  });
  return assembleAfterNearField({
    multiport: multiport.multiport,
    multiportSource: MERGING_SOURCE,
    multiportName: "jet merging and line-plume limit",
    nearField: multiport.nearField,
    farField,
    assessment,
    footprint,
    warnings: [...multiport.warnings, ...farField.warnings, ...assessment.warnings, ...footprint.warnings],
  });
}

/** Stages 4–7 for a rising plume: merging of neighbouring plumes, the surface or trapped field, compliance, footprint. */
export function risingStagesAfterNearField(
  input: Omit<AfterNearFieldInput, "nearField"> & { readonly methods: readonly RisingMethod[] },
): AfterNearField {
  const { scenario, detail } = input;
  // 4. Multiport: merging of neighbouring plumes below the field height.
  const multiport = risingMultiport(scenario, input.jet, input.methods);
  // 5. Far field: the field carried to the edge by passive diffusion.
  const farField = risingFarFieldStage({
    scenario,
    jet: input.jet,
    column: input.column,
    methods: multiport.methods,
    detail,
  });
  // 6. Compliance at the edge dilution, against the background at the field's level.
  const assessment = complianceFromEdgeDilution(
    scenario,
    farField.mixingZone.dilution,
    farField.background.salinity,
    farField.background.temperature,
  );
  // 7. Footprint of the governing limit along the series.
  const footprint = risingFootprintStage({
    series: farField.mixingZone.series,
    requiredDilution: assessment.compliance.requiredDilution,
    detail,
  });
  return assembleAfterNearField({
    multiport: multiport.multiport,
    multiportSource: RISING_MERGING_SOURCE,
    multiportName: "rising-plume merging and line-plume limit",
    nearField: multiport.methods.map((m) => m.nf),
    farField,
    assessment,
    footprint,
    warnings: [...farField.warnings, ...assessment.warnings, ...footprint.warnings],
  });
}

/** Puts the outputs of stages 4–7 side by side (no stage's output is changed). */
function assembleAfterNearField(parts: {
  multiport: MultiportResult;
  multiportName: string;
  multiportSource: string;
  nearField: NearFieldMethodResult[];
  farField: {
    mixingZone: Omit<MixingZoneResult, "constituents" | "footprint">;
    methods: { stage: string; name: string; source: string }[];
  };
  assessment: ComplianceAssessment;
  footprint: { footprint: MixingZoneResult["footprint"] };
  warnings: ResultWarning[];
}): AfterNearField {
  const { assessment } = parts;
  return {
    multiport: parts.multiport,
    nearField: parts.nearField,
    mixingZone: {
      ...parts.farField.mixingZone,
      constituents: assessment.constituents,
      footprint: parts.footprint.footprint,
    },
    compliance: assessment.compliance,
    warnings: parts.warnings,
    methods: [
      { stage: "multiport", name: parts.multiportName, source: parts.multiportSource },
      ...parts.farField.methods,
      {
        stage: "compliance",
        name: "required dilution",
        source: "S_req = (C_d − C_b)/(C_limit − C_b), from the definition of dilution",
      },
      ...(assessment.basin
        ? [{ stage: "background", name: assessment.basin.method, source: assessment.basin.source }]
        : []),
    ],
    ...(assessment.basin ? { basin: assessment.basin } : {}),
  };
}
