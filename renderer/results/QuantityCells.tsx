/** How the results show a quantity (number and unit in the chosen system) and a dilution (number, ×, range). */
import { formatNumber, type QuantityKind, type UnitSystem } from "../../core/units";
import { formatQuantity } from "../inputs/quantity-text";

export function Q({
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

export function D({ value, range }: { value: number | null | undefined; range?: readonly [number, number] | null }) {
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
