/** Study tab, Monte Carlo: edge dilution percentiles and the probability of not meeting the limit. */
import { workIssue } from "../../core/study/budget";
import { expandCases } from "../../core/study/cases";
import { useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import { formatNumber } from "../../core/units";
import {
  histogram,
  mergeMonteCarloChunks,
  planMonteCarlo,
  splitRuns,
  summariseMonteCarlo,
  type MonteCarloSummary,
} from "../../core/study/montecarlo";
import { MonteCarloHistogram } from "./charts";
import type { RunJob } from "./sections";

type Histogram = { x0: number; x1: number; count: number }[];

interface MonteCarloProps {
  readonly scenario: Scenario | null;
  readonly busy: boolean;
  readonly runJob: RunJob;
  readonly poolSize: number;
}

export function MonteCarloSection({ scenario, busy, runJob, poolSize }: MonteCarloProps) {
  const [runs, setRuns] = useState("1000");
  const [seed, setSeed] = useState("1");
  const [problem, setProblem] = useState<string | null>(null);
  const [out, setOut] = useState<{ summary: MonteCarloSummary; bins: Histogram } | null>(null);

  const run = async () => {
    if (!scenario) return;
    const n = Number(runs);
    const s = Number(seed);
    const planned = planMonteCarlo(scenario, n, s);
    if (!planned.ok) {
      setProblem(planned.issues.map((i) => `${i.path}: ${i.message}`).join("\n"));
      return;
    }
    const caseCount = expandCases(scenario).length;
    const tooMuch = workIssue(`${n} runs × ${caseCount} ambient cases`, n * caseCount, scenario);
    if (tooMuch) {
      setProblem(tooMuch);
      return;
    }
    setProblem(null);
    const plan = planned.plan;
    const chunks = splitRuns(n, poolSize * 4);
    const r = await runJob(
      "Monte Carlo",
      n,
      chunks.map((c) => ({ kind: "monte-carlo" as const, scenario, plan, start: c.start, end: c.end })),
      (replies) => replies.flatMap((x) => (x.kind === "monte-carlo" ? [x.chunk] : [])),
    );
    if (!r) return;
    const merged = mergeMonteCarloChunks(plan, r);
    setOut({ summary: summariseMonteCarlo(plan, r), bins: histogram(merged.worstEdgeDilution, 30) });
  };

  const w = out?.summary.worstCase;
  return (
    <section>
      <h3>Monte Carlo</h3>
      <div className="study-form">
        <label>
          runs
          <input className="narrow" value={runs} onChange={(e) => setRuns(e.target.value)} />
        </label>
        <label>
          seed
          <input className="narrow" value={seed} onChange={(e) => setSeed(e.target.value)} />
        </label>
        <button
          type="button"
          disabled={busy || !scenario}
          onClick={() => void run()}
          data-command="study-monte-carlo"
        >
          Run
        </button>
      </div>
      <p className="study-note">
        The same seed gives the same results on any machine and any number of workers.
      </p>
      {problem ? <div className="study-error">{problem}</div> : null}
      {out && w ? (
        <>
          {out.summary.notes.map((n, i) => (
            <p key={i} className="study-note">
              {n}
            </p>
          ))}
          <p data-role="study-exceedance">
            Worst case, dilution at the mixing-zone edge: P5 {formatNumber(w.edgeDilution.p5)}×, P50{" "}
            {formatNumber(w.edgeDilution.p50)}×, P95 {formatNumber(w.edgeDilution.p95)}×;
            probability of not meeting the limit {formatNumber(100 * w.probabilityOfExceedance, 3)} %.
          </p>
          <MonteCarloHistogram
            bins={out.bins}
            p5={w.edgeDilution.p5}
            p50={w.edgeDilution.p50}
            p95={w.edgeDilution.p95}
            required={null}
          />
          <table>
            <thead>
              <tr>
                {["case", "edge dilution P5", "P50", "P95", "P(not meeting limit)", "meets", "exceeds", "outside-scope", "refused"].map((h) => (
                  <th key={h} className={h === "case" ? "text" : ""}>
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {[...out.summary.cases, w].map((c) => (
                <tr key={c.name} className={c === w ? "worst" : ""}>
                  <td className="text">{c.name}</td>
                  <td>{formatNumber(c.edgeDilution.p5)}×</td>
                  <td>{formatNumber(c.edgeDilution.p50)}×</td>
                  <td>{formatNumber(c.edgeDilution.p95)}×</td>
                  <td>{formatNumber(100 * c.probabilityOfExceedance, 3)} %</td>
                  <td>{c.verdicts.meets}</td>
                  <td>{c.verdicts.exceeds}</td>
                  <td>{c.verdicts["outside-scope"]}</td>
                  <td>{c.verdicts.refused}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      ) : null}
    </section>
  );
}
