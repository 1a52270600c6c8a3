/**
 * Results: the verdict with its margin, headline numbers per near-field method side by side, the
 * mixing-zone edge, multiport regime, discharge properties, warnings and the sources of every method.
 */
import type { BrinefieldResult, Verdict } from "../../core/result/contract";
import type { NearFieldMethodResult } from "../../core/nearfield/types";
import { formatNumber, type QuantityKind, type UnitSystem } from "../../core/units";
import { formatQuantity } from "../inputs/quantityText";

const METHOD_TITLES: Record<string, string> = {
  "length-scale": "Length-scale (experiments)",
  integral: "Integral jet model",
};

function Q({
  value,
  kind,
  system,
  digits = 3,
}: {
  value: number | null | undefined;
  kind: QuantityKind;
  system: UnitSystem;
  digits?: number;
}) {
  const q = formatQuantity(value, kind, system, digits);
  return (
    <span className="q">
      <span className="num">{q.text}</span>
      {q.text !== "—" && q.unit ? <span className="u">{q.unit}</span> : null}
    </span>
  );
}

function D({ value, range }: { value: number | null | undefined; range?: readonly [number, number] | null }) {
  if (value === null || value === undefined || !Number.isFinite(value))
    return (
      <span className="q">
        <span className="num">—</span>
      </span>
    );
  return (
    <span className="q">
      <span className="num">{formatNumber(value, 3)}</span>
      <span className="u">×</span>
      {range ? (
        <span className="range">
          ({formatNumber(range[0], 2)}–{formatNumber(range[1], 2)})
        </span>
      ) : null}
    </span>
  );
}

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
  const o = result.overall ?? {
    verdict: c.verdict,
    governingCase: "stated",
    margin: c.margin,
    edgeDilution: result.mixingZone.dilution,
  };
  const look = VERDICT_LOOK[o.verdict];
  const cases = result.cases ?? [];
  const reasons = [
    ...new Set(cases.flatMap((k) => k.scopeReasons.map((r) => (k.name === "stated" ? r : `${k.name}: ${r}`)))),
  ];
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
  const methods = result.nearField;
  const mz = result.mixingZone;
  const serious = result.warnings.filter((w) => w.severity === "serious").length;
  return (
    <div className="results" data-role="results">
      <VerdictBanner result={result} />

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

      {result.compliance.constituents.length > 0 ? (
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
      ) : null}

      <div className="facts">
        {result.nearField.map((m) =>
          m.risingField && m.risingField.kind !== "none" ? (
            <div key={`rising-${m.method}`} data-role="rising-field">
              <span>Rising plume ({m.method})</span>
              <b>{m.risingField.kind === "trapped" ? "trapped below the surface" : "reaches the surface"}</b>
              <em>
                field at <Q value={m.risingField.height} kind="length" system={s} /> above the port, dilution{" "}
                {formatNumber(m.risingField.dilution, 3)}
              </em>
            </div>
          ) : null,
        )}
        {result.blend ? (
          <div data-role="blend">
            <span>Blend</span>
            <b>{result.blend.buoyancy === "rises" ? "rises" : "sinks"}</b>
            <em>{result.blend.note}</em>
          </div>
        ) : null}
        {result.basin ? (
          <div data-role="basin">
            <span>Basin build-up (box model)</span>
            <b>+{formatNumber(result.basin.backgroundIncrease, 3)} g/kg</b>
            <em>
              95 % within {formatNumber(result.basin.timeTo95Percent / 86400, 3)} days; {result.basin.limits}
            </em>
          </div>
        ) : null}
        <div>
          <span>Multiport regime</span>
          <b data-role="regime">{result.multiport.regime.replace(/-/g, " ")}</b>
          <em>{result.multiport.reason}</em>
        </div>
        <div>
          <span>Ports used</span>
          <b>{result.multiport.portsUsed}</b>
          {result.multiport.spacingRatio !== null ? (
            <em>s/(dF) = {formatNumber(result.multiport.spacingRatio, 3)}</em>
          ) : null}
        </div>
        <div>
          <span>Port exit velocity</span>
          <b>
            <Q value={result.port.velocity} kind="speed" system={s} />
          </b>
        </div>
        <div>
          <span>Densimetric Froude number</span>
          <b>{formatNumber(result.port.froude, 3)}</b>
        </div>
        <div>
          <span>Flow per port</span>
          <b>
            <Q value={result.port.flow} kind="flow" system={s} digits={3} />
          </b>
        </div>
        <div>
          <span>Discharge / ambient density</span>
          <b>
            <Q value={result.densities.discharge} kind="density" system={s} digits={6} /> /{" "}
            <Q value={result.densities.ambient} kind="density" system={s} digits={6} />
          </b>
        </div>
        <div>
          <span>Reduced gravity g′</span>
          <b>
            <Q value={result.densities.reducedGravity} kind="acceleration" system={s} />
          </b>
        </div>
        <div>
          <span>Brine</span>
          <b>
            <Q value={result.discharge.flow} kind="flow" system={s} /> ·{" "}
            <Q value={result.discharge.salinity} kind="salinity" system={s} /> ·{" "}
            <Q value={result.discharge.temperature} kind="temperature" system={s} />
          </b>
        </div>
      </div>

      <details className="warnings" open={serious > 0 || result.warnings.length <= 4}>
        <summary>
          Warnings ({result.warnings.length})
          {serious ? <span className="serious-count"> · {serious} serious</span> : null}
        </summary>
        {result.warnings.length === 0 ? <p className="muted">None.</p> : null}
        <ul>
          {result.warnings.map((w, i) => (
            <li key={i} className={`sev-${w.severity}`}>
              <span className="sev">{w.severity}</span> {w.message}
              {w.source ? <span className="src"> — {w.source}</span> : null}
            </li>
          ))}
        </ul>
      </details>

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
            <b>Equation of state:</b> {result.densities.equationOfState.name} —{" "}
            {result.densities.equationOfState.source} ({result.densities.equationOfState.reason})
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
    </div>
  );
}
