import type { StageSettings } from "@/lib/plot/stage-outline";
import type { ColourTransmissionDto, PerformerMarkDto, ScenicPanelDto } from "@/lib/dto/studies";
import type { LightSource } from "@/lib/validation/studies";

export type CueChoice = { id: number; number: number; label: string };

export type StudiesProps = {
  productionId: number;
  canRun: boolean;
  initialStudy: "coverage" | "shadows";
  units: "metric" | "imperial";
  stage: StageSettings;
  heights: { head: number; face: number; deck: number };
  cues: CueChoice[];
  areas: Array<{ id: number; name: string; polygon: Array<{ x: number; y: number }> }>;
  performers: PerformerMarkDto[];
  panels: ScenicPanelDto[];
  colours: ColourTransmissionDto[];
};

export type { LightSource };
