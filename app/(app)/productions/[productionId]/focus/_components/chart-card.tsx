"use client";

import { memo } from "react";
import type { Units } from "@/lib/optics";
import type { FocusChart } from "@/lib/focus/chart-model";
import type { Landmark } from "@/lib/focus/landmarks";
import { FocusChartCard } from "@/components/focus/focus-chart-card";

/** A focus chart from the shared chart component, so the screen shows exactly what prints. */
export const ChartCard = memo(function ChartCard({
  chart,
  landmarks,
  units,
}: {
  chart: FocusChart;
  landmarks: Landmark[];
  units: Units;
}) {
  return (
    <div className="fc-screen">
      <FocusChartCard chart={chart} landmarks={landmarks} units={units} />
    </div>
  );
});
