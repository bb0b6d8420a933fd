"use client";

import { memo } from "react";
import type { Units } from "@/lib/optics";
import type { FocusChart } from "@/lib/focus/chart-model";
import type { Landmark } from "@/lib/focus/landmarks";
import { FocusChartCard } from "@/components/focus/focus-chart-card";
import { NotesButton } from "@/components/notes/notes-button";

/** A focus chart from the shared chart component, so the screen shows exactly what prints. */
export const ChartCard = memo(function ChartCard({
  chart,
  landmarks,
  units,
  productionId,
}: {
  chart: FocusChart;
  landmarks: Landmark[];
  units: Units;
  /** Given on screen: the chart carries its unit's notes button (never printed). */
  productionId?: number;
}) {
  return (
    // The notes button sits over the chart's top right corner: the header keeps clear of it.
    <div className={productionId ? "fc-screen relative [&_.fc-head]:pr-24" : "fc-screen relative"}>
      {productionId ? (
        <NotesButton
          productionId={productionId}
          target={{
            subject: "fixture",
            subjectId: chart.id,
            label: `unit ${chart.unitNumber}, ${chart.positionName}`,
          }}
          defaultKind="focus"
          className="absolute right-2 top-2 z-10"
        />
      ) : null}
      <FocusChartCard chart={chart} landmarks={landmarks} units={units} />
    </div>
  );
});
