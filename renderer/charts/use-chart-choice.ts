/**
 * Which chart the Design tab shows, and whether as a table. Held by the window, so the choice survives a
 * switch to the Study tab; the record's tabs leave with the record (a removed record shows the side view).
 */
import { useState } from "react";

export const CHART_TABS = ["trajectory", "dilution", "increase"] as const;
export type ChartTab = (typeof CHART_TABS)[number] | "record" | "duration";
export const RECORD_CHART_TABS: readonly ChartTab[] = [...CHART_TABS, "record", "duration"];

export interface ChartChoice {
  /** The chart shown: the one chosen, unless it was a record chart and the record is gone. */
  readonly shown: ChartTab;
  readonly hasRecord: boolean;
  readonly choose: (chart: ChartTab) => void;
  readonly asTable: boolean;
  readonly toggleTable: () => void;
}

export function useChartChoice(hasRecord: boolean): ChartChoice {
  const [chart, setChart] = useState<ChartTab>("trajectory");
  const [asTable, setAsTable] = useState(false);
  const shown: ChartTab = !hasRecord && (chart === "record" || chart === "duration") ? "trajectory" : chart;
  return { shown, hasRecord, choose: setChart, asTable, toggleTable: () => setAsTable((t) => !t) };
}
