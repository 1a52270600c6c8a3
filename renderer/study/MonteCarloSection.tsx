/** Study tab, Monte Carlo: edge dilution percentiles and the probability of not meeting the limit. */
import { workIssue } from "../../core/study/budget";
import { expandCases } from "../../core/cases";
import { useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import { formatNumber } from "../../core/units";
import { planMonteCarlo, splitRuns } from "../../core/study/montecarlo";
import {
  histogram,
  mergeMonteCarloChunks,
  summariseMonteCarlo,
  type MonteCarloSummary,
} from "../../core/study/montecarlo-summary";
import { MonteCarloHistogram } from "./charts";
import {
  MARGIN_MEANING,
  UNCERTAINTY_EXPLANATIONS,
  clampedSentences,
  headlineSentence,
  percentText,
  verdictCountsSentence,
} from "../../core/study/uncertainty-words";
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
        <button type="button" disabled={busy || !scenario} onClick={() => void run()} data-command="study-monte-carlo">
          Run
        </button>
      </div>
      <p className="study-note">The same seed gives the same results on any machine and any number of workers.</p>
      {problem ? <div className="study-error">{problem}</div> : null}
      {out && w ? (
        <div className="mc-result">
          <p data-role="study-exceedance" className="mc-headline">
            <b>{headlineSentence(w, w.requiredDilution.p50)}</b> {verdictCountsSentence(w, out.summary.runs)}
          </p>
          <MonteCarloHistogram bins={out.bins} worst={w} />
          <MonteCarloTable summary={out.summary} />
          <details className="mc-explain" open data-role="monte-carlo-explanations">
            <summary>What these numbers mean</summary>
            <ul>
              {[...UNCERTAINTY_EXPLANATIONS, MARGIN_MEANING].map((e) => (
                <li key={e}>{e}</li>
              ))}
            </ul>
          </details>
          <details className="mc-explain">
            <summary>Uncertain inputs (spreads in SI units)</summary>
            <ul>
              {out.summary.notes.map((n, i) => (
                <li key={i}>{n}</li>
              ))}
            </ul>
          </details>
          {clampedSentences(out.summary).length > 0 ? (
            <div className="mc-clamped" data-role="monte-carlo-clamped">
              <b>Clamped inputs</b> — a drawn value outside a field&apos;s physical bounds is set to the nearest bound:
              <ul>
                {clampedSentences(out.summary).map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            </div>
          ) : null}
          {out.summary.firstError ? <p className="study-note">First refused draw: {out.summary.firstError}</p> : null}
        </div>
      ) : null}
    </section>
  );
}

/** Edge dilution percentiles, margin, chance of not meeting the limit and verdict counts per ambient case. */
function MonteCarloTable({ summary }: { summary: MonteCarloSummary }) {
  const w = summary.worstCase;
  return (
    <table data-role="monte-carlo-table">
      <caption className="visually-hidden">Dilution at the mixing-zone edge per ambient case (×)</caption>
      <thead>
        <tr>
          {[
            "ambient case",
            "edge dilution P5 (×)",
            "P50 (×)",
            "P95 (×)",
            "margin P5",
            "chance not meeting limit",
            "meets",
            "exceeds",
            "outside scope",
            "refused",
          ].map((h) => (
            <th key={h} className={h === "ambient case" ? "text" : ""} scope="col">
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {[...summary.cases, w].map((c) => (
          <tr key={c.name} className={c === w ? "worst" : ""}>
            <td className="text">{c === w ? "overall (per-run worst case)" : c.name}</td>
            <td>{formatNumber(c.edgeDilution.p5)}</td>
            <td>{formatNumber(c.edgeDilution.p50)}</td>
            <td>{formatNumber(c.edgeDilution.p95)}</td>
            <td>{formatNumber(c.margin.p5)}</td>
            <td>{percentText(c.probabilityOfExceedance)}</td>
            <td>{c.verdicts.meets}</td>
            <td>{c.verdicts.exceeds}</td>
            <td>{c.verdicts["outside-scope"]}</td>
            <td>{c.verdicts.refused}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
