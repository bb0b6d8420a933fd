// A fixture as the API and the screens see it. Its fields come from the field registry
// (lib/rig/fixture-fields.ts), so a new field reaches the DTO with its registry line.
import type { FixtureFieldValues } from "@/lib/rig/fixture-fields";
import type { FixtureGeometry } from "@/lib/rig/fixture-geometry";

/** The stored row: every registry field plus identity and bookkeeping, dates as ISO strings. */
export type FixtureRecord = FixtureFieldValues & {
  id: number;
  productionId: number;
  focusedAt: string | null;
  focusedBy: number | null;
  version: number;
  updatedAt: string;
};

/** What a fixture's position, type and focus point add: their names, and the beam worked out from all four. */
export type FixtureJoined = {
  positionName: string;
  typeName: string;
  family: string;
  focusPointName: string | null;
  computed: FixtureGeometry;
};

export type FixtureDto = FixtureRecord & FixtureJoined;
