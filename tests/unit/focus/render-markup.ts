// The focus chart components rendered to static HTML, as the server's PDF renders them, for tests to read.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { FocusChartCard } from "@/components/focus/focus-chart-card";
import { PoolDiagram } from "@/components/focus/pool-diagram";
import { PoolPlan } from "@/components/focus/pool-plan";
import type { FocusChart } from "@/lib/focus/chart-model";
import type { DiagramInput } from "@/lib/focus/diagram";
import type { Landmark } from "@/lib/focus/landmarks";
import type { Units } from "@/lib/optics";

export const chartMarkup = (chart: FocusChart, o: { landmarks: Landmark[]; units: Units }) =>
  renderToStaticMarkup(createElement(FocusChartCard, { chart, ...o }));

export const diagramMarkup = (input: DiagramInput) => renderToStaticMarkup(createElement(PoolDiagram, input));

export const planMarkup = (o: Parameters<typeof PoolPlan>[0]) => renderToStaticMarkup(createElement(PoolPlan, o));
