/**
 * Colour bar for dilution (log axis) with tick numbers, plus the key to the lines the 3D view draws —
 * only those it draws for this result, with their distances.
 */
import { dilutionTicks, dilutionToUnit, rampGradientCss, type DilutionDomain } from "./colour-scale";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";

export interface LegendContent {
  readonly domain: DilutionDomain;
  readonly notes: readonly string[];
  readonly drawn: {
    readonly spreadingLayer: boolean;
    readonly mixingZoneRadius: number;
    readonly exceedance: number | null;
  };
  readonly unitSystem: UnitSystem;
}

/** Tick labels far enough apart not to overprint: at least `gap` (share of the bar) between neighbours. */
export function spacedTicks(ticks: readonly number[], position: (t: number) => number, gap = 0.12): number[] {
  const kept: number[] = [];
  for (const t of ticks) {
    const last = kept[kept.length - 1];
    if (last === undefined || position(t) - position(last) >= gap) kept.push(t);
  }
  // The top of the scale is worth more than the tick before it.
  const top = ticks[ticks.length - 1];
  if (top !== undefined && kept[kept.length - 1] !== top && kept.length > 1) {
    if (position(top) - position(kept[kept.length - 2]!) >= gap) kept[kept.length - 1] = top;
  }
  return kept;
}

function distance(value: number, unitSystem: UnitSystem): string {
  const d = siToDisplay(value, "length", unitSystem);
  return `${formatNumber(d.value, 3)} ${d.unit}`;
}

export function DilutionLegend({ content }: { content: LegendContent }) {
  const { domain, notes, drawn, unitSystem } = content;
  const ticks = spacedTicks(dilutionTicks(domain), (t) => dilutionToUnit(t, domain));
  return (
    <div className="dilution-legend" aria-label="Dilution colour scale and key" data-role="view-legend">
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
        {drawn.spreadingLayer ? (
          <span data-key="layer">
            <i className="key-swatch layer" /> spreading layer (top)
          </span>
        ) : null}
        <span data-key="mixing-zone">
          <i className="key-line mz" /> mixing-zone edge, {distance(drawn.mixingZoneRadius, unitSystem)}
        </span>
        {drawn.exceedance !== null ? (
          <span data-key="exceedance">
            <i className="key-line exceed" /> limit exceeded out to {distance(drawn.exceedance, unitSystem)}
          </span>
        ) : null}
      </div>
      {notes.map((n) => (
        <div className="legend-note" key={n}>
          {n}
        </div>
      ))}
    </div>
  );
}
