/** Results beyond the headline tables: rising plume, blend, basin, multiport, port and density facts; warnings. */
import type { BrinefieldResult } from "../../core/result/contract";
import { formatNumber, type UnitSystem } from "../../core/units";
import { Q } from "./QuantityCells";

/** Label, value and note for each fact about the discharge, the ports and the water. */
export function ResultFacts({ result, unitSystem: s }: { result: BrinefieldResult; unitSystem: UnitSystem }) {
  return (
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
  );
}

/** The result's warnings, open when any is serious or there are only a few. */
export function WarningsList({ warnings }: { warnings: BrinefieldResult["warnings"] }) {
  const serious = warnings.filter((w) => w.severity === "serious").length;
  return (
    <details className="warnings" open={serious > 0 || warnings.length <= 4}>
      <summary>
        Warnings ({warnings.length}){serious ? <span className="serious-count"> · {serious} serious</span> : null}
      </summary>
      {warnings.length === 0 ? <p className="muted">None.</p> : null}
      <ul>
        {warnings.map((w, i) => (
          <li key={i} className={`sev-${w.severity}`}>
            <span className="sev">{w.severity}</span> {w.message}
            {w.source ? <span className="src"> — {w.source}</span> : null}
          </li>
        ))}
      </ul>
    </details>
  );
}
