/** The Design tab's charts: side view, dilution and salinity increase against distance, the record's charts, each also as a table. */
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";
import type { UnitSystem } from "../../core/units";
import { RecordChart, RecordTable } from "../record/RecordPanel";
import { useTabs } from "../ui/Tabs";
import { DistanceTable, TrajectoryTable } from "./ChartTables";
import { DistanceChart } from "./DistanceCharts";
import { TrajectoryChart } from "./TrajectoryChart";
import { CHART_TABS, RECORD_CHART_TABS, type ChartChoice, type ChartTab } from "./use-chart-choice";

interface ChartPanelProps {
  readonly choice: ChartChoice;
  readonly result: BrinefieldResult | null;
  readonly scenario: Scenario | null;
  readonly unitSystem: UnitSystem;
}

function ChartBody({
  shown,
  asTable,
  result,
  scenario,
  unitSystem,
}: {
  shown: ChartTab;
  asTable: boolean;
  result: BrinefieldResult;
  scenario: Scenario;
  unitSystem: UnitSystem;
}) {
  if (shown === "trajectory")
    return asTable ? (
      <TrajectoryTable result={result} scenario={scenario} unitSystem={unitSystem} />
    ) : (
      <TrajectoryChart result={result} scenario={scenario} unitSystem={unitSystem} />
    );
  if (shown === "record" || shown === "duration")
    return asTable ? (
      <RecordTable result={result} />
    ) : (
      <RecordChart result={result} kind={shown === "record" ? "time" : "duration"} />
    );
  return asTable ? (
    <DistanceTable result={result} unitSystem={unitSystem} quantity={shown} />
  ) : (
    <DistanceChart result={result} unitSystem={unitSystem} quantity={shown} />
  );
}

export function ChartPanel({ choice, result, scenario, unitSystem }: ChartPanelProps) {
  const chartTabs = useTabs<ChartTab>(
    "chart",
    choice.hasRecord ? RECORD_CHART_TABS : CHART_TABS,
    choice.shown,
    choice.choose,
  );
  return (
    <div className="chart-panel">
      <div className="chart-tabs">
        <div className="tabs small" {...chartTabs.list} aria-label="Chart">
          <button {...chartTabs.tab("trajectory")}>Side view</button>
          <button {...chartTabs.tab("dilution")}>Dilution vs distance</button>
          <button {...chartTabs.tab("increase")}>Salinity increase vs distance</button>
          {scenario?.ambient.record ? (
            <>
              <button {...chartTabs.tab("record")} data-command="chart-record">
                Record over time
              </button>
              <button {...chartTabs.tab("duration")} data-command="chart-duration">
                Duration curve
              </button>
            </>
          ) : null}
        </div>
        <button
          type="button"
          className="view-as"
          aria-pressed={choice.asTable}
          onClick={choice.toggleTable}
          data-command="chart-as-table"
          title="Show the numbers of the chart as a table"
        >
          Table
        </button>
      </div>
      <div className="chart-body" {...chartTabs.panel}>
        {result && scenario ? (
          <ChartBody
            shown={choice.shown}
            asTable={choice.asTable}
            result={result}
            scenario={scenario}
            unitSystem={unitSystem}
          />
        ) : null}
      </div>
    </div>
  );
}
