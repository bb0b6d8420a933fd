import type { Role } from "@/lib/auth/roles";
import type { ProductionSettings } from "@/lib/validation/production";

export type ProductionDto = ProductionSettings & { id: number; version: number; createdAt: string; updatedAt: string };
export type ProductionListItem = ProductionDto & {
  role: Role;
  isOwner: boolean;
  fixtureCount: number;
  /** ISO time the owner archived it; null while in use. */
  archivedAt: string | null;
};

export type ProductionOverview = {
  counts: { positions: number; fixtures: number; cues: number; focusPoints: number; hung: number; focused: number };
  warnings: string[];
};
