"use client";

import { memo } from "react";
import type { Units } from "@/lib/optics";
import type { FocusChart } from "@/lib/focus/chart-model";
import { chartHtml } from "@/lib/focus/chart-html";
import type { Landmark } from "@/lib/focus/landmarks";

/** A focus chart from the shared HTML renderer, so the screen shows exactly what prints. */
export const ChartCard = memo(function ChartCard({ chart, landmarks, units }: { chart: FocusChart; landmarks: Landmark[]; units: Units }) {
  return <div className="fc-screen" dangerouslySetInnerHTML={{ __html: chartHtml(chart, { landmarks, units }) }} />;
});
