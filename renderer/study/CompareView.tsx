/**
 * The comparison of a study's variants: a margin chart (one bar per variant and ambient case, margin 1
 * marked, the verdict written beside each bar so colour is not the only carrier), the governing case and
 * method chain of each variant, and a table that fits the screen — the key columns shown, the rest chosen
 * on demand.
 */
import { useState } from "react";
import { formatNumber, siToDisplay, type UnitSystem } from "../../core/units";
import { columnsOf, sortRows, type FlatRow } from "../../core/study/compare";
import { logTicks } from "../../core/report/figures";
import { useSize } from "../ui/use-size";
import { isLengthColumn } from "./variants-csv";

const DEFAULT_COLUMNS = [
  "variant",
  "case",
  "verdict",
  "margin",
  "edgeDilution",
  "requiredDilution",
  "governingCase",
  "chain",
];

const COLUMN_LABELS: Readonly<Record<string, string>> = {
  variant: "variant",
  case: "ambient case",
  governingCase: "governing case",
  edgeDilution: "edge dilution (×)",
  requiredDilution: "required dilution (×)",
  margin: "margin (edge ÷ required)",
  verdict: "verdict",
  chain: "method chain to the edge",
  scopeReasons: "why outside scope",
  warnings: "warnings",
  equationOfState: "equation of state",
  notes: "notes",
  error: "rule broken",
};

/** Readable header for a comparison column; lengths carry the display unit. */
export function columnLabel(c: string, lengthUnit: string): string {
  const m = /^(.*?)(MaxRise|ImpactDistance|ImpactDilution)$/.exec(c);
  if (!m) return COLUMN_LABELS[c] ?? c;
  const method = m[1]!.replace(/[A-Z]/g, (x) => `-${x.toLowerCase()}`);
  const what = { MaxRise: `max rise (${lengthUnit})`, ImpactDistance: `impact distance (${lengthUnit})` }[
    m[2] as "MaxRise" | "ImpactDistance"
  ];
  return `${method} ${what ?? "impact dilution (×)"}`;
}

function cellText(v: FlatRow[string] | undefined): string {
  if (typeof v === "number") return formatNumber(v);
  return v === null || v === undefined ? "—" : String(v);
}

const VERDICT_CLASS: Readonly<Record<string, string>> = {
  meets: "pass",
  exceeds: "fail",
  "outside-scope": "scope",
  refused: "refused",
};

export function CompareView({
  rows,
  unitSystem,
  stale,
}: {
  rows: readonly FlatRow[];
  unitSystem: UnitSystem;
  stale: boolean;
}) {
  const lengthUnit = siToDisplay(1, "length", unitSystem).unit;
  const all = columnsOf(rows);
  const [shown, setShown] = useState<ReadonlySet<string>>(() => new Set(DEFAULT_COLUMNS));
  const [sort, setSort] = useState<string | null>(null);
  const columns = all.filter((c) => shown.has(c));
  const sorted = sort ? (sortRows(rows, sort) ?? rows) : rows;
  const overall = rows.filter((r) => r.case === "overall");

  return (
    <div className="compare-view" data-stale={stale}>
      {stale ? (
        <p className="study-note stale-note" role="status">
          The variants or the base scenario changed since this comparison; press Compare again.
        </p>
      ) : null}
      <h4>Governing case per variant</h4>
      <GoverningList overall={overall} />
      <MarginChart rows={rows} />
      <ColumnChoices all={all} shown={shown} setShown={setShown} lengthUnit={lengthUnit} />
      <div className="study-table-wrap">
        <table data-role="study-variants-table">
          <caption className="visually-hidden">
            Each variant under each ambient case; the overall row gives the variant's verdict over every case.
          </caption>
          <thead>
            <tr>
              {columns.map((c) => (
                <th
                  key={c}
                  scope="col"
                  className={typeof rows[0]![c] === "number" ? "" : "text"}
                  aria-sort={sort === c ? "ascending" : sort === `-${c}` ? "descending" : "none"}
                >
                  <button
                    type="button"
                    className="sort-button"
                    title="Sort by this column"
                    onClick={() => setSort(sort === c ? `-${c}` : c)}
                  >
                    {columnLabel(c, lengthUnit)}
                    {sort === c ? " ▲" : sort === `-${c}` ? " ▼" : ""}
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {sorted.map((r, i) => (
              <tr key={i} className={r.case === "overall" ? "worst" : ""}>
                {columns.map((c) => {
                  const raw = r[c];
                  const v =
                    typeof raw === "number" && isLengthColumn(c) ? siToDisplay(raw, "length", unitSystem).value : raw;
                  const cls = c === "verdict" ? (VERDICT_CLASS[String(v)] ?? "") : typeof v === "number" ? "" : "text";
                  return (
                    <td
                      key={c}
                      className={cls}
                      title={
                        c === "chain" || c === "error" || c === "notes" || c === "scopeReasons"
                          ? String(v ?? "")
                          : undefined
                      }
                    >
                      {cellText(v)}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="study-note">
        Margin is the dilution at the mixing-zone edge divided by the required dilution: 1 or more meets the limit. The
        overall row is the variant's verdict over every ambient case (meets, exceeds, outside-scope; refused when the
        variant breaks a scenario rule), governed by the case that decides it. Lengths in {lengthUnit}; the CSV keeps
        SI.
      </p>
    </div>
  );
}

/** Each variant's overall verdict, margin, governing case and the method chain to the edge. */
function GoverningList({ overall }: { overall: readonly FlatRow[] }) {
  return (
    <ul className="compare-governing" data-role="compare-governing">
      {overall.map((r) => (
        <li key={String(r.variant)}>
          <b>{String(r.variant)}</b>:{" "}
          <span className={`gov-verdict ${VERDICT_CLASS[String(r.verdict)] ?? ""}`}>{String(r.verdict)}</span>
          {r.verdict === "refused" ? (
            <> — {String(r.error ?? "breaks a scenario rule")}</>
          ) : (
            <>
              , margin {cellText(r.margin)}; governed by <b>{String(r.governingCase ?? "—")}</b> through the chain{" "}
              <b data-role="governing-chain">{String(r.chain ?? "—")}</b>
            </>
          )}
        </li>
      ))}
    </ul>
  );
}

/** The comparison table's column picker: every column with a checkbox, the key ones ticked at first. */
function ColumnChoices(props: {
  all: readonly string[];
  shown: ReadonlySet<string>;
  setShown: (next: ReadonlySet<string>) => void;
  lengthUnit: string;
}) {
  const { all, shown, setShown, lengthUnit } = props;
  const count = all.filter((c) => shown.has(c)).length;
  return (
    <details className="compare-columns">
      <summary>
        Columns ({count} of {all.length} shown)
      </summary>
      <div className="column-choices">
        {all.map((c) => (
          <label key={c}>
            <input
              type="checkbox"
              checked={shown.has(c)}
              data-column={c}
              onChange={(e) => {
                const next = new Set(shown);
                if (e.target.checked) next.add(c);
                else next.delete(c);
                setShown(next);
              }}
            />
            {columnLabel(c, lengthUnit)}
          </label>
        ))}
      </div>
    </details>
  );
}

const ROW = 17;
const GAP = 8;

/** Margin per variant and ambient case as horizontal bars on a log axis, with margin 1 marked. */
function MarginChart({ rows }: { rows: readonly FlatRow[] }) {
  const [ref, size] = useSize<HTMLDivElement>();
  const variants = [...new Set(rows.map((r) => String(r.variant)))];
  const groups = variants.map((v) => rows.filter((r) => String(r.variant) === v));
  const margins = rows
    .map((r) => r.margin)
    .filter((m): m is number => typeof m === "number" && Number.isFinite(m) && m > 0);
  const width = Math.max(360, size.width);
  const left = Math.min(260, Math.max(150, width * 0.28));
  const right = 150;
  const top = 22;
  const lo = Math.min(0.5, ...margins.map((m) => m / 1.3));
  const hi = Math.max(2, ...margins.map((m) => m * 1.3));
  const pw = Math.max(60, width - left - right);
  const sx = (m: number) => left + (pw * (Math.log(m) - Math.log(lo))) / (Math.log(hi) - Math.log(lo));
  let y = top;
  const placed = groups.map((g) => {
    const start = y;
    y += g.length * ROW + GAP;
    return { rows: g, start };
  });
  const height = y + 30;
  // Ticks at 1, 2, 5 × 10ⁿ, thinned so labels never overprint (at least 44 px apart).
  const ticks: number[] = [];
  for (const t of logTicks(lo, hi)) if (ticks.length === 0 || sx(t) - sx(ticks[ticks.length - 1]!) >= 44) ticks.push(t);
  if (!ticks.includes(1)) ticks.push(1);
  return (
    <div ref={ref} className="compare-chart">
      <svg
        width={width}
        height={height}
        role="img"
        aria-label="Margin per variant and ambient case; margin 1 is the limit"
        data-figure="compare-margins"
      >
        {ticks.map((t) => (
          <g key={t}>
            <line x1={sx(t)} x2={sx(t)} y1={top - 4} y2={y - GAP} stroke="#e2e8f0" />
            <text x={sx(t)} y={y + 6} textAnchor="middle" fontSize={11} fill="#334155">
              {formatNumber(t, 3)}
            </text>
          </g>
        ))}
        <line x1={sx(1)} x2={sx(1)} y1={top - 10} y2={y - GAP} stroke="#b3261e" strokeWidth={2} strokeDasharray="5 3" />
        <text x={sx(1) + 4} y={top - 10} fontSize={11} fill="#b3261e" fontWeight={600}>
          margin 1 = limit just met
        </text>
        {placed.map((g) =>
          g.rows.map((r, k) => {
            const yy = g.start + k * ROW;
            const m = typeof r.margin === "number" && Number.isFinite(r.margin) && r.margin > 0 ? r.margin : null;
            const cls = VERDICT_CLASS[String(r.verdict)] ?? "refused";
            const isOverall = r.case === "overall";
            const label = k === 0 ? `${String(r.variant)} · ${String(r.case)}` : String(r.case);
            return (
              <g key={`${g.start}-${k}`} className={`margin-bar ${cls}${isOverall ? " overall" : ""}`}>
                <text
                  x={left - 6}
                  y={yy + ROW / 2 + 4}
                  textAnchor="end"
                  fontSize={11}
                  fontWeight={isOverall || k === 0 ? 600 : 400}
                  fill="#1f2933"
                >
                  {label.length > 40 ? `${label.slice(0, 39)}…` : label}
                </text>
                {m !== null ? (
                  <rect x={sx(lo)} y={yy + 2} width={Math.max(1, sx(m) - sx(lo))} height={ROW - 5} />
                ) : null}
                <text x={(m !== null ? sx(m) : sx(lo)) + 5} y={yy + ROW / 2 + 4} fontSize={11} fill="#1f2933">
                  {m !== null ? `${formatNumber(m, 3)} · ${String(r.verdict)}` : String(r.verdict)}
                </text>
              </g>
            );
          }),
        )}
        <text x={left + pw / 2} y={y + 22} textAnchor="middle" fontSize={11.5} fill="#1f2933">
          margin = dilution at the mixing-zone edge ÷ required dilution (log scale)
        </text>
      </svg>
    </div>
  );
}
