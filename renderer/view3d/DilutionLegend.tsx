/** Colour bar for dilution (log axis) with tick numbers, plus the key to the lines drawn in the 3D view. */
import { dilutionTicks, dilutionToUnit, rampGradientCss, type DilutionDomain } from "./colourScale";
import { formatNumber } from "../../core/units";

export function DilutionLegend({ domain, notes }: { domain: DilutionDomain; notes: readonly string[] }) {
  const ticks = dilutionTicks(domain);
  return (
    <div className="dilution-legend" aria-label="Dilution colour scale">
      <div className="legend-title">Centreline dilution (×, log scale)</div>
      <div className="legend-bar" style={{ background: rampGradientCss() }} />
      <div className="legend-ticks">
        {ticks.map((t) => (
          <span key={t} style={{ left: `${dilutionToUnit(t, domain) * 100}%` }}>
            {formatNumber(t)}
          </span>
        ))}
      </div>
      <div className="legend-key">
        <span><i className="key-swatch layer" /> spreading layer (top)</span>
        <span><i className="key-line mz" /> mixing-zone edge</span>
        <span><i className="key-line exceed" /> limit exceeded within</span>
        <span><i className="key-line current" /> current</span>
      </div>
      {notes.map((n) => (
        <div className="legend-note" key={n}>{n}</div>
      ))}
    </div>
  );
}
