/**
 * Benchmark of a year-long ambient record: 8,760 hourly steps of an invented semidiurnal tide with a
 * spring–neap cycle, run on worker threads (the `run --record` path) with an intake, so every step also
 * reads the spreading-layer series. Worker start-up is included. Target (printed, not asserted): well
 * under a minute on two cores.
 */
import { availableParallelism } from "node:os";
import { parseScenario } from "../../scenario/parse";
import type { Scenario } from "../../scenario/types";
import { recordStepsOnWorkers } from "../workers/run-study";
import { distinctStepIndices } from "../../record/run";

export const RECORD_BENCH_STEPS = 8760;
export const RECORD_BENCH_TARGET_SECONDS = 60;

/**
 * An invented year of hourly tidal currents: a tidal ellipse (major axis toward 40°, 12.42 h period,
 * 14.77 d spring–neap cycle) plus a weak residual, to 1 mm/s and 1°, with a tide of about a metre, so that
 * nearly every step is new water (repeated steps would be computed once and flatter the figure).
 */
export function benchRecordScenario(steps = RECORD_BENCH_STEPS): Scenario {
  const time: number[] = [];
  const currentSpeed: number[] = [];
  const currentDirection: number[] = [];
  const depth: number[] = [];
  for (let i = 0; i < steps; i++) {
    const amp = 0.3 * (1 + 0.4 * Math.cos((2 * Math.PI * i) / (14.77 * 24)));
    const phase = (2 * Math.PI * i) / 12.42;
    const major = amp * Math.sin(phase) + 0.02;
    const minor = 0.25 * amp * Math.cos(phase) + 0.01;
    const az = 40 * (Math.PI / 180);
    const east = major * Math.sin(az) + minor * Math.cos(az);
    const north = major * Math.cos(az) - minor * Math.sin(az);
    time.push(i * 3600);
    currentSpeed.push(Math.round(Math.hypot(east, north) * 1000) / 1000);
    currentDirection.push(Math.round(((Math.atan2(east, north) * 180) / Math.PI + 360) % 360) % 360);
    depth.push(Math.round((15 + 0.9 * Math.cos(phase + 0.4)) * 100) / 100);
  }
  const r = parseScenario({
    format: "brinefield-scenario",
    version: 1,
    name: "Record benchmark: a year of hourly tide",
    discharge: { flow: 0.25, salinity: 65, temperature: 22 },
    ambient: { depth: 15, salinity: 36, temperature: 20, record: { time, currentSpeed, currentDirection, depth } },
    diffuser: {
      layout: "line",
      portCount: 4,
      portDiameter: 0.12,
      portAngle: 60,
      portHeight: 1,
      portSpacing: 5,
      portAzimuth: 130,
    },
    mixingZone: {
      radius: 100,
      limits: [{ constituent: "salinity", maxIncrease: 2 }],
      timeCompliance: { percentOfTime: 95 },
    },
    intake: { distance: 300, bearing: 220, heightAboveSeabed: 3 },
  });
  if (!r.ok) throw new Error(`record benchmark scenario: ${r.issues.map((i) => i.message).join("; ")}`);
  return r.scenario;
}

export async function benchRecord(
  workers = Math.max(1, availableParallelism()),
): Promise<{ recordSteps: number; recordDistinctSteps: number; recordSeconds: number; recordWorkers: number }> {
  const s = benchRecordScenario();
  const distinct = distinctStepIndices(s).length;
  let last = 0;
  const t0 = performance.now();
  const outcomes = await recordStepsOnWorkers(s, workers, (done) => (last = done));
  const recordSeconds = (performance.now() - t0) / 1000;
  if (outcomes.length !== RECORD_BENCH_STEPS || last !== distinct)
    throw new Error(`record benchmark ran ${outcomes.length} of ${RECORD_BENCH_STEPS} steps`);
  return { recordSteps: RECORD_BENCH_STEPS, recordDistinctSteps: distinct, recordSeconds, recordWorkers: workers };
}

export function describeRecordBench(r: Awaited<ReturnType<typeof benchRecord>>): string {
  return `Ambient record, ${r.recordSteps} hourly steps (${r.recordDistinctSteps} distinct) with an intake on ${r.recordWorkers} worker thread(s): ${r.recordSeconds.toFixed(1)} s (target: well under ${RECORD_BENCH_TARGET_SECONDS} s on two cores)`;
}
