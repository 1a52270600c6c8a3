/**
 * `brinefield bench` (`npm run bench`): speed figures, printed, never asserted in unit tests.
 * Times the same code paths and tolerances that `run`, studies and Monte Carlo use.
 */
import type { CliCommand } from "../command";
import { readArgs } from "../args";
import { benchIntegral, BENCH_JET, BENCH_COLUMN } from "../bench/nearfield";
import { benchStudy, describeStudyBench } from "../bench/study";
import { nearFieldLengthScale } from "../../nearfield/lengthScale";
import { benchRecord, describeRecordBench } from "../bench/record";

function medianMicros(fn: () => void, rounds = 9, perRound = 2000): number {
  for (let i = 0; i < perRound; i++) fn(); // warm-up
  const per: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    for (let i = 0; i < perRound; i++) fn();
    per.push(((performance.now() - t0) * 1000) / perRound);
  }
  per.sort((a, b) => a - b);
  return per[Math.floor(per.length / 2)]!;
}

export const command: CliCommand = {
  name: "bench",
  summary: "Print speed figures: integral solve, length-scale evaluation, Monte Carlo, sweep.",
  help: `Usage: brinefield bench [--json] [--quick]

Times, on this machine:
  - the integral jet model for a typical 60° case (median µs per solve; target ≤ 100 µs), and the
    ratio to mathjs solveODE solving the same equations at the same tolerance (target ≥ 10×);
  - the length-scale method (median µs per evaluation);
  - 10,000 Monte Carlo cases of a 4-port diffuser with both near-field methods on one core (target
    ≤ 2 s) and on all cores (speed-up; target near-linear);
  - a 30 × 30 two-input sweep (target ≤ 1 s);
  - a year-long ambient record, 8,760 hourly steps with an intake, on all cores (target: well under
    a minute on two cores).

Options:
  --json    One JSON object: integralSolveMicros, lengthScaleMicros, referenceRatio,
            monteCarloCasesPerSecond, monteCarloSpeedup, sweepSeconds, recordSeconds, and more.
  --quick   Near-field figures only (skips Monte Carlo, the sweep and the record).
  -h, --help  Show this help.`,
  async run(argv, io) {
    const { values } = readArgs(argv, { json: { type: "boolean" }, quick: { type: "boolean" } }, "bench");
    const nf = benchIntegral();
    const lengthScaleMicros = medianMicros(() => void nearFieldLengthScale(BENCH_JET, BENCH_COLUMN));
    const study = values.quick ? null : await benchStudy();
    const record = values.quick ? null : await benchRecord(Math.max(1, io.cores));
    const out = {
      integralSolveMicros: nf.integralSolveMicros,
      lengthScaleMicros,
      referenceSolveMicros: nf.referenceSolveMicros,
      referenceRatio: nf.referenceRatio,
      ...(study ?? {}),
      ...(record ?? {}),
      cores: io.cores,
    };
    if (values.json) {
      io.stdout(JSON.stringify(out, null, 2) + "\n");
      return 0;
    }
    const lines = [
      `Integral jet model, typical 60° case: ${nf.integralSolveMicros.toFixed(1)} µs per solve (median; target ≤ 100 µs)`,
      `Reference (mathjs solveODE, same equations and tolerance): ${nf.referenceSolveMicros.toFixed(0)} µs → ours is ${nf.referenceRatio.toFixed(1)}× faster (target ≥ 10×)`,
      `Length-scale method: ${lengthScaleMicros.toFixed(2)} µs per evaluation (median)`,
    ];
    if (study) lines.push(describeStudyBench(study, io.cores));
    if (record) lines.push(describeRecordBench(record));
    io.stdout(lines.join("\n") + "\n");
    return 0;
  },
};
