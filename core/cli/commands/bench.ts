/**
 * `brinefield bench` (`npm run bench`): speed figures, printed, never asserted in unit tests.
 * Times the same code paths and tolerances that `run`, studies and Monte Carlo use.
 */
import type { CliCommand } from "../command";
import { readArgs } from "../args";
import { ACCURACY_BUDGET, benchIntegral, BENCH_JET, BENCH_COLUMN } from "../bench/nearfield";
import { INTEGRAL_DEFAULT_REL_TOL } from "../../nearfield/integral";
import { benchStudy, describeStudyBench } from "../bench/study";
import { nearFieldLengthScale } from "../../nearfield/length-scale";
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
  - the integral jet model for a typical 60° case (median µs per solve; target ≤ 40 µs), timed in
    alternating batches with a minimal hand-written solver of the same equations (target ≤ 1.3×), and the
    accuracy study behind the integrator's default tolerance;
  - mathjs solveODE on the same equations at equal accuracy (speed ratio; target ≥ 100×);
  - the length-scale method (median µs per evaluation);
  - 10,000 Monte Carlo cases of a 4-port diffuser with both near-field methods on one warm worker
    (target ≥ 5,000 cases/s) and on all cores (speed-up; target ≥ 1.6× on two), the first run on fresh
    workers apart, and a pure-compute control of the speed-up measured in the same window;
  - a 30 × 30 two-input sweep (target ≤ 1 s);
  - a year-long ambient record, 8,760 hourly steps with an intake, on all cores (target: well under
    a minute on two cores);
  - the web build in headless Chromium: input change → new numbers (target ≤ 50 ms) and page load →
    first result (target ≤ 300 ms), medians.

Options:
  --json    One JSON object: integralSolveMicros, lengthScaleMicros, referenceSolveMicros, referenceRatio,
            referenceErrorRatio, minimalSolverMicros, monteCarloCasesPerSecond, monteCarloSpeedup,
            parallelControlSpeedup, sweepSeconds, recordSeconds, typingToNumbersMs, loadToFirstResultMs,
            and more.
  --quick   Near-field figures only (skips Monte Carlo, the sweep, the record and the browser).
  -h, --help  Show this help.`,
  async run(argv, io) {
    const { values } = readArgs(argv, { json: { type: "boolean" }, quick: { type: "boolean" } }, "bench");
    const nf = benchIntegral();
    const lengthScaleMicros = medianMicros(() => void nearFieldLengthScale(BENCH_JET, BENCH_COLUMN));
    const study = values.quick ? null : await benchStudy();
    let browser: { loadToFirstResultMs: number; typingToNumbersMs: number } | null = null;
    let browserNote: string | null = null;
    if (!values.quick) {
      try {
        const { benchBrowser } = await import("../node/headless/bench-browser");
        const b = await benchBrowser();
        browser = { loadToFirstResultMs: b.loadToFirstResultMs, typingToNumbersMs: b.typingToNumbersMs };
      } catch (err) {
        browserNote = err instanceof Error ? err.message : String(err);
      }
    }
    const record = values.quick ? null : await benchRecord(Math.max(1, io.cores));
    const out = {
      integralSolveMicros: nf.integralSolveMicros,
      lengthScaleMicros,
      referenceSolveMicros: nf.referenceSolveMicros,
      referenceRatio: nf.referenceRatio,
      referenceErrorRatio: nf.referenceErrorRatio,
      referenceTolerance: nf.referenceTolerance,
      integralError: nf.integralError,
      referenceError: nf.referenceError,
      minimalSolverMicros: nf.minimalSolverMicros,
      minimalSolverRatio: nf.minimalSolverRatio,
      minimalSolverDifference: nf.minimalSolverDifference,
      integralRelTol: INTEGRAL_DEFAULT_REL_TOL,
      accuracyStudy: nf.accuracyStudy,
      ...(study ?? {}),
      ...(browser ?? {}),
      ...(browserNote ? { browserNotMeasured: browserNote } : {}),
      ...(record ?? {}),
      cores: io.cores,
    };
    if (values.json) {
      io.stdout(JSON.stringify(out, null, 2) + "\n");
      return 0;
    }
    const study1 = nf.accuracyStudy
      .map(
        (r) =>
          `  rtol ${r.relTol.toExponential(0)}: largest relative error ${r.maxRelativeError.toExponential(1)}, ` +
          `${r.evaluations} evaluations${r.relTol === INTEGRAL_DEFAULT_REL_TOL ? "  ← default" : ""}`,
      )
      .join("\n");
    const lines = [
      `Integral jet model, typical 60° case: ${nf.integralSolveMicros.toFixed(1)} µs per solve (median; target ≤ 40 µs)`,
      `Minimal hand-written solver, same equations and steps, alternating batches: ${nf.minimalSolverMicros.toFixed(1)} µs → ` +
        `ours ÷ minimal ×${nf.minimalSolverRatio.toFixed(2)} (target ≤ ×1.3); answers differ by ${nf.minimalSolverDifference.toExponential(1)} relative (limit 1e-4)`,
      `Accuracy study (impact dilution and distance, maximum rise; bench case, cross-current and stratified variants, ` +
        `against rtol 1e-12; budget ${ACCURACY_BUDGET.toExponential(0)}, a third of the 1e-6 the demo regression record allows):`,
      study1,
      `Reference (mathjs solveODE, same equations, tol ${nf.referenceTolerance.toExponential(1)} chosen for equal accuracy: ` +
        `errors ours ${nf.integralError.toExponential(1)}, mathjs ${nf.referenceError.toExponential(1)}, ratio ${nf.referenceErrorRatio.toFixed(2)}): ` +
        `${nf.referenceSolveMicros.toFixed(0)} µs → ours is ${nf.referenceRatio.toFixed(0)}× faster (target ≥ 100×)`,
      `Length-scale method: ${lengthScaleMicros.toFixed(2)} µs per evaluation (median)`,
    ];
    if (study) lines.push(describeStudyBench(study, io.cores));
    if (browser) {
      lines.push(
        `Web build in headless Chromium: input change → new numbers ${browser.typingToNumbersMs.toFixed(0)} ms (median of 8 edits; target ≤ 50 ms); ` +
          `page load → first result ${browser.loadToFirstResultMs.toFixed(0)} ms (median of 5 loads; target ≤ 300 ms)`,
      );
    } else if (browserNote) lines.push(`Web build in headless Chromium: not measured (${browserNote})`);
    if (record) lines.push(describeRecordBench(record));
    io.stdout(lines.join("\n") + "\n");
    return 0;
  },
};
