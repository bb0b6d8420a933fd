import type { PlotFixtureWire } from "@/lib/plot/slim-fixtures";
import type { FixtureDto } from "./fixture";
import type { FixtureTypeDto } from "./fixture-type";
import type { AreaZoneDto, FocusPointDto, LandmarkDto, PositionDto } from "./plan";
import type { UploadDto } from "./upload";

/** Everything the plot draws. */
export type PlotData = {
  positions: PositionDto[];
  fixtures: FixtureDto[];
  fixtureTypes: FixtureTypeDto[];
  focusPoints: FocusPointDto[];
  areaZones: AreaZoneDto[];
  landmarks: LandmarkDto[];
  underlays: UploadDto[];
};

/** The editor's read: fixtures as short arrays (lib/plot/slim-fixtures), the rest as in PlotData. */
export type PlotWireData = Omit<PlotData, "fixtures"> & { fixtures: PlotFixtureWire[] };
