import type { FixtureDto } from "@/lib/dto/fixture";
import type { ProductionDto } from "@/lib/dto/production";
import type { PositionKind } from "@/lib/rig/position-kinds";
import type { ChartExtras } from "@/lib/focus/chart-model";
import type { Landmark } from "@/lib/focus/landmarks";

export type FocusPageData = {
  production: ProductionDto;
  fixtures: FixtureDto[];
  positions: Array<{ id: number; name: string; kind: PositionKind }>;
  points: Array<{ id: number; name: string }>;
  userNames: Record<number, string>;
  /** Lines drawn on the plot; the stage outline's lines are added in the browser. */
  drawnLandmarks: Landmark[];
  extras: Record<number, ChartExtras>;
  /** From the policy module, decided on the server: the screen only hides what the API would refuse. */
  rights: { focus: boolean; designerNotes: boolean; export: boolean };
};
