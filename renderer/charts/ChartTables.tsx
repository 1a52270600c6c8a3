/**
 * The numbers behind each chart, as a table (for screen readers, for copying, and for anyone who reads a
 * table better than a curve). Same series as the charts, in the chosen units; long series are thinned to
 * about 60 rows, always keeping the first and last point.
 */
import type { BrinefieldResult } from "../../core/result/contract";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import {
  distanceSeries,
  impactDilutionMarkers,
  riseMarkers,
  salinityIncreaseLimit,
  trajectorySeries,
  type MethodMarker,
  type SideViewProps,
} from "./chart-data";

/** Every n-th item so that at most `max` remain, first and last always kept. */
export function thinned<T>(items: readonly T[], max = 60): T[] {
  if (items.length <= max) return [...items];
  const step = Math.ceil(items.length / (max - 1));
  const out = items.filter((_, i) => i % step === 0);
  if (out[out.length - 1] !== items[items.length - 1]) out.push(items[items.length - 1]!);
  return out;
}

function MarkerRows({
  markers,
  unit,
  valueLabel,
}: {
  markers: readonly MethodMarker[];
  unit: string;
  valueLabel: (m: MethodMarker) => string;
}) {
  if (markers.length === 0) return null;
  return (
    <table>
      <caption>Method points</caption>
      <thead>
        <tr>
          <th className="text" scope="col">
            method
          </th>
          <th className="text" scope="col">
            point
          </th>
          <th scope="col">distance ({unit})</th>
          <th scope="col">value</th>
        </tr>
      </thead>
      <tbody>
        {markers.map((m, i) => (
          <tr key={i}>
            <td className="text">{m.method}</td>
            <td className="text">{m.label}</td>
            <td>{formatNumber(m.distance, 3)}</td>
            <td>{valueLabel(m)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function TrajectoryTable({ result, scenario, unitSystem }: SideViewProps) {
  const unit = siToDisplay(1, "length", unitSystem).unit;
  const points = thinned(trajectorySeries(result, scenario, unitSystem));
  return (
    <div className="chart-table" data-role="trajectory-table">
      <table>
        <caption>Side view: integral-model jet centreline above the seabed</caption>
        <thead>
          <tr>
            <th scope="col">plan distance from port ({unit})</th>
            <th scope="col">centreline height ({unit})</th>
            <th scope="col">lower edge ({unit})</th>
            <th scope="col">upper edge ({unit})</th>
            <th scope="col">dilution (×)</th>
          </tr>
        </thead>
        <tbody>
          {points.map((p, i) => (
            <tr key={i}>
              <td>{formatNumber(p.distance, 3)}</td>
              <td>{formatNumber(p.height, 3)}</td>
              <td>{formatNumber(p.lower, 3)}</td>
              <td>{formatNumber(p.upper, 3)}</td>
              <td>{formatNumber(p.dilution, 3)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <MarkerRows
        markers={riseMarkers(result, scenario, unitSystem)}
        unit={unit}
        valueLabel={(m) => `height ${formatNumber(m.value, 3)} ${unit}`}
      />
    </div>
  );
}

export function DistanceTable({
  result,
  unitSystem,
  quantity,
}: {
  result: BrinefieldResult;
  unitSystem: UnitSystem;
  quantity: "dilution" | "increase";
}) {
  const unit = siToDisplay(1, "length", unitSystem).unit;
  const points = thinned(distanceSeries(result, unitSystem));
  const edge = siToDisplay(result.mixingZone.radius, "length", unitSystem).value;
  const required = result.compliance.requiredDilution;
  const allowed = salinityIncreaseLimit(result);
  const limit =
    quantity === "dilution"
      ? Number.isFinite(required) && required > 0
        ? `required dilution ${formatNumber(required, 3)}×`
        : "no required dilution"
      : allowed !== null
        ? `allowed salinity increase ${formatNumber(allowed, 3)} g/kg`
        : "no salinity limit to draw";
  return (
    <div className="chart-table" data-role={`${quantity}-table`}>
      <table>
        <caption>
          {quantity === "dilution" ? "Centreline dilution" : "Salinity increase"} against distance from the diffuser ·
          mixing-zone edge {formatNumber(edge, 3)} {unit} · {limit}
        </caption>
        <thead>
          <tr>
            <th scope="col">distance ({unit})</th>
            <th scope="col">{quantity === "dilution" ? "dilution (×)" : "salinity increase (g/kg)"}</th>
            <th className="text" scope="col">
              stage
            </th>
          </tr>
        </thead>
        <tbody>
          {points.map((p, i) => (
            <tr key={i}>
              <td>{formatNumber(p.distance, 3)}</td>
              <td>{formatNumber(quantity === "dilution" ? p.dilution : p.increase, 3)}</td>
              <td className="text">{p.stage.replace(/-/g, " ")}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {quantity === "dilution" ? (
        <MarkerRows
          markers={impactDilutionMarkers(result, unitSystem)}
          unit={unit}
          valueLabel={(m) => `dilution ${formatNumber(m.value, 3)}×`}
        />
      ) : null}
    </div>
  );
}
