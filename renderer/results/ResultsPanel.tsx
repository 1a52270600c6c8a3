/**
 * Results: the verdict with its margin, headline numbers per near-field method side by side, the
 * mixing-zone edge, multiport regime, discharge properties, warnings and the sources of every method.
 */
import { overallOf, scopeReasonsOf, type BrinefieldResult, type Verdict } from "../../core/result/contract";
import type { NearFieldMethodResult } from "../../core/nearfield/types";
import { formatNumber, type UnitSystem } from "../../core/units";
import { D, Q } from "./QuantityCells";
import { ResultFacts, WarningsList } from "./ResultFacts";

const METHOD_TITLES: Record<string, string> = {
  "length-scale": "Length-scale (experiments)",
  integral: "Integral jet model",
};

const ROWS: { label: string; cell: (m: NearFieldMethodResult, s: UnitSystem) => React.ReactNode }[] = [
  { label: "Max rise above port (upper edge)", cell: (m, s) => <Q value={m.maxRiseHeight} kind="length" system={s} /> },
  { label: "Distance to max rise", cell: (m, s) => <Q value={m.maxRiseDistance} kind="length" system={s} /> },
  { label: "Dilution at max rise", cell: (m) => <D value={m.maxRiseDilution} /> },
  { label: "Impact distance", cell: (m, s) => <Q value={m.impactDistance} kind="length" system={s} /> },
  { label: "Impact dilution", cell: (m) => <D value={m.impactDilution} range={m.dilutionRange} /> },
  { label: "End of near field", cell: (m, s) => <Q value={m.nearFieldDistance} kind="length" system={s} /> },
  { label: "Near-field dilution", cell: (m) => <D value={m.nearFieldDilution} /> },
];

/** Class and words of a verdict: outside-scope has its own look, never the colour of a pass. */
const VERDICT_LOOK: Record<Verdict, { cls: string; word: string }> = {
  meets: { cls: "pass", word: "Meets limit" },
  exceeds: { cls: "fail", word: "Exceeds limit" },
  "outside-scope": { cls: "scope", word: "Outside scope" },
};

export function VerdictBanner({ result }: { result: BrinefieldResult }) {
  const c = result.compliance;
  const o = overallOf(result);
  const look = VERDICT_LOOK[o.verdict];
  const cases = result.cases ?? [];
  const reasons = scopeReasonsOf(result);
  return (
    <div className={`verdict ${look.cls}`} data-role="verdict" data-verdict={o.verdict}>
      <div className="verdict-word">
        {look.word}{" "}
        <span className="verdict-state">
          ({o.verdict}, over{" "}
          {result.record
            ? `a record of ${result.record.steps} steps${result.record.percentOfTime !== null ? `; limit to be met at least ${formatNumber(result.record.percentOfTime, 3)} % of the time` : ""}`
            : `${cases.length || 1} ambient case${cases.length === 1 ? "" : "s"}`}
          )
        </span>
      </div>
      <div className="verdict-detail">
        governing case <b>{o.governingCase}</b>: edge dilution <b>{formatNumber(o.edgeDilution, 3)}×</b>
        {" · "}
        <span title="edge dilution ÷ required dilution; above 1 meets the limit">
          margin <b>{formatNumber(o.margin, 3)}×</b>
        </span>
      </div>
      <div className="verdict-detail">
        stated conditions: <b>{c.verdict}</b>, edge dilution {formatNumber(result.mixingZone.dilution, 3)}× vs required{" "}
        {formatNumber(c.requiredDilution, 3)}×, margin {formatNumber(c.margin, 3)}×
        {c.governingConstituent ? <> · governed by {c.governingConstituent}</> : null}
      </div>
      {o.verdict === "outside-scope" ? (
        <ul className="scope-reasons" data-role="scope-reasons">
          {reasons.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
      ) : null}
      {cases.length > 1 && !result.record ? (
        <table className="verdict-cases" data-role="verdict-cases">
          <tbody>
            {cases.map((k) => (
              <tr key={k.name} className={VERDICT_LOOK[k.verdict].cls}>
                <th scope="row">{k.name}</th>
                <td>{formatNumber(k.edgeDilution, 3)}×</td>
                <td>margin {formatNumber(k.margin, 3)}×</td>
                <td>{k.verdict}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );
}

export function ResultsPanel({ result, unitSystem: s }: { result: BrinefieldResult; unitSystem: UnitSystem }) {
  return (
    <div className="results" data-role="results">
      <VerdictBanner result={result} />
      <HeadlineTable methods={result.nearField} unitSystem={s} />
      <EdgeTable result={result} unitSystem={s} />
      <ComplianceTable result={result} />
      <ResultFacts result={result} unitSystem={s} />
      <WarningsList warnings={result.warnings} />
      <MethodsAndSources result={result} />
    </div>
  );
}

/** Headline numbers of each near-field method, side by side. */
function HeadlineTable({
  methods,
  unitSystem: s,
}: {
  methods: readonly NearFieldMethodResult[];
  unitSystem: UnitSystem;
}) {
  return (
    <table className="numbers" data-role="headline-table">
      <thead>
        <tr>
          <th scope="col">Near field</th>
          {methods.map((m) => (
            <th scope="col" key={m.method} title={m.source}>
              {METHOD_TITLES[m.method] ?? m.method}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {ROWS.map((row) => (
          <tr key={row.label}>
            <th scope="row">{row.label}</th>
            {methods.map((m) => (
              <td key={m.method} data-cell={`${m.method}:${row.label}`}>
                {row.cell(m, s)}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Dilution at the mixing-zone edge (and by the other methods), the required dilution and the footprint. */
function EdgeTable({ result, unitSystem: s }: { result: BrinefieldResult; unitSystem: UnitSystem }) {
  const mz = result.mixingZone;
  return (
    <table className="numbers compact" data-role="edge-table">
      <tbody>
        <tr>
          <th scope="row">
            Dilution at mixing-zone edge (<Q value={mz.radius} kind="length" system={s} />)
          </th>
          <td data-cell="edge-dilution">
            <D value={mz.dilution} />
          </td>
        </tr>
        {mz.alternatives.map((a) => (
          <tr key={a.method} className="alt">
            <th scope="row"> by {a.method}</th>
            <td>
              <D value={a.dilution} />
            </td>
          </tr>
        ))}
        <tr>
          <th scope="row">Required dilution</th>
          <td data-cell="required-dilution">
            <D value={result.compliance.requiredDilution} />
          </td>
        </tr>
        <tr>
          <th scope="row">Layer thickness at edge</th>
          <td>
            <Q value={mz.layerThickness} kind="length" system={s} />
          </td>
        </tr>
        <tr>
          <th scope="row">Limit exceeded out to</th>
          <td>
            <Q value={mz.footprint.furthestExtent} kind="length" system={s} /> ·{" "}
            <Q value={mz.footprint.area} kind="area" system={s} />
          </td>
        </tr>
        <tr>
          <th scope="row">Method to edge</th>
          <td className="text">
            {mz.method} (near field: {mz.nearFieldMethod})
            {mz.edgeInsideNearField ? " — edge lies inside the near field" : ""}
          </td>
        </tr>
      </tbody>
    </table>
  );
}

/** One row per limit (salinity and each constituent) with its verdict word. */
function ComplianceTable({ result }: { result: BrinefieldResult }) {
  if (result.compliance.constituents.length === 0) return null;
  return (
    <table className="numbers compact" data-role="compliance-table">
      <thead>
        <tr>
          <th scope="col">Limit</th>
          <th scope="col">Required</th>
          <th scope="col">At edge</th>
          <th scope="col" title="edge dilution ÷ required dilution; above 1 meets the limit">
            Margin
          </th>
          <th scope="col" />
        </tr>
      </thead>
      <tbody>
        {result.compliance.constituents.map((c) => (
          <tr
            key={c.constituent}
            className={result.compliance.verdict === "outside-scope" ? "scope" : c.pass ? "pass" : "fail"}
          >
            <th scope="row" title={c.limit}>
              <b>{c.constituent}</b>
              <span className="limit-text">{c.limit}</span>
            </th>
            <td>
              <D value={c.requiredDilution} />
            </td>
            <td>
              <D value={c.edgeDilution} />
            </td>
            <td>
              <D value={c.margin} />
            </td>
            <td className="badge">
              {result.compliance.verdict === "outside-scope" ? "outside-scope" : c.pass ? "meets" : "exceeds"}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Every method used with its source and bias, the equation of state, what is not modelled, unit conversions. */
function MethodsAndSources({ result }: { result: BrinefieldResult }) {
  const methods = result.nearField;
  const mz = result.mixingZone;
  return (
    <details className="sources">
      <summary>Methods and sources</summary>
      <ul>
        {result.methods.map((m, i) => (
          <li key={i}>
            <b>{m.stage}:</b> {m.name} — <span className="src">{m.source}</span>
          </li>
        ))}
        {methods.map((m) => (
          <li key={`bias-${m.method}`}>
            <b>{METHOD_TITLES[m.method] ?? m.method} bias:</b> {m.bias}
          </li>
        ))}
        <li>
          <b>Equation of state:</b> {result.densities.equationOfState.name} — {result.densities.equationOfState.source}{" "}
          ({result.densities.equationOfState.reason})
        </li>
        <li>
          <b>Multiport:</b> {result.multiport.source}
        </li>
      </ul>
      {mz.notModelled.length ? (
        <>
          <h4>Not modelled</h4>
          <ul>
            {mz.notModelled.map((n, i) => (
              <li key={i}>{n}</li>
            ))}
          </ul>
        </>
      ) : null}
      {result.conversions.length ? (
        <>
          <h4>Unit conversions applied</h4>
          <ul>
            {result.conversions.map((n, i) => (
              <li key={i}>{n}</li>
            ))}
          </ul>
        </>
      ) : null}
    </details>
  );
}
