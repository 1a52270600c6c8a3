/**
 * Claim check panel: a claimed dilution at a distance, checked by core (`checkClaimOnScenario`) exactly
 * as `brinefield check-claim` and the report do — the same verdict words, numbers, chains, assumptions
 * and range bar. The panel only reads the inputs and displays the check.
 */
import { useState } from "react";
import type { Scenario } from "../../core/scenario/types";
import { checkClaimOnScenario, type ClaimOutcome } from "../../core/compliance/claim-run";
import { claimRangeBarSvg } from "../../core/report/claim-figure";
import { CLAIM_VERDICT_TEXT } from "../../core/report/claim";
import { CAUTION } from "../../core/result/contract";
import { formatNumber, quantityToSI } from "../../core/units";

export function ClaimPanel({ scenario }: { scenario: Scenario | null }) {
  const [claimed, setClaimed] = useState("");
  const [at, setAt] = useState("");
  const [outcome, setOutcome] = useState<{ result: ClaimOutcome; scenario: Scenario } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const check = () => {
    if (!scenario) return;
    const c = Number(claimed.trim());
    if (claimed.trim() === "" || !Number.isFinite(c)) {
      setProblem("Claimed dilution: enter a number of at least 1.");
      return;
    }
    let distance: number | undefined;
    if (at.trim() !== "") {
      const q = quantityToSI(/^[-+.\d eE]+$/.test(at.trim()) ? Number(at.trim()) : at.trim(), "length");
      if (!q.ok) {
        setProblem(`Distance: ${q.message}`);
        return;
      }
      distance = q.value;
    }
    const result = checkClaimOnScenario(scenario, c, distance);
    setProblem(result.ok ? null : `${result.field === "at" ? "Distance" : "Claimed dilution"}: ${result.message}`);
    setOutcome(result.ok ? { result, scenario } : null);
  };

  const shown = outcome?.result.ok ? outcome.result.check : null;
  const stale = outcome !== null && outcome.scenario !== scenario;
  return (
    <details className="claim-panel" data-role="claim-panel" open={shown !== null}>
      <summary>Check a claimed dilution</summary>
      <div className="claim-form">
        <label>
          claimed dilution
          <input
            value={claimed}
            onChange={(e) => setClaimed(e.target.value)}
            placeholder="e.g. 60"
            data-field="claim-dilution"
          />
        </label>
        <label>
          at distance
          <input
            value={at}
            onChange={(e) => setAt(e.target.value)}
            placeholder={scenario ? `${formatNumber(scenario.mixingZone.radius)} m (edge)` : "m"}
            data-field="claim-at"
          />
        </label>
        <button type="button" onClick={check} disabled={!scenario} data-command="check-claim">
          Check
        </button>
      </div>
      {problem ? (
        <p className="claim-error" role="alert">
          {problem}
        </p>
      ) : null}
      {shown ? (
        <div className={stale ? "stale" : undefined} data-claim-verdict={shown.verdict}>
          {stale ? <p className="muted">The scenario changed since this check; press Check again.</p> : null}
          <p className={`claim-verdict claim-${shown.verdict}`}>
            <b>{CLAIM_VERDICT_TEXT[shown.verdict]}.</b>
          </p>
          <p>{shown.summary}</p>
          <p>
            Conservative value <b>{formatNumber(shown.conservativeDilution, 3)}×</b> (case “{shown.conservativeCase}”) ·
            claim ÷ conservative <b>{formatNumber(shown.ratioToConservative, 3)}</b>
          </p>
          <div className="claim-figure" dangerouslySetInnerHTML={{ __html: claimRangeBarSvg(shown) }} />
          <table className="claim-chains">
            <thead>
              <tr>
                <th>case</th>
                <th>chain</th>
                <th>dilution</th>
                <th>scatter</th>
                <th>gives the claim</th>
              </tr>
            </thead>
            <tbody>
              {shown.chains.map((c) => (
                <tr key={`${c.case}|${c.method}`}>
                  <td>{c.case}</td>
                  <td>{c.method}</td>
                  <td className="num">{formatNumber(c.dilution, 3)}</td>
                  <td className="num">
                    {formatNumber(c.low, 3)}–{formatNumber(c.high, 3)}
                  </td>
                  <td>{c.reproducesClaim ? (c.onlyWithinScatter ? "within scatter" : "yes") : "no"}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {shown.assumptionsNeeded.length ? (
            <>
              <h4>What the claim rests on</h4>
              <ul>
                {shown.assumptionsNeeded.map((a) => (
                  <li key={a}>{a}</li>
                ))}
              </ul>
            </>
          ) : null}
          <p className="muted">{CAUTION}</p>
        </div>
      ) : null}
    </details>
  );
}
