// What every part of the side panel is given. A file of its own so the side panel and its parts
// (fixture, position, underlay, draft) can all import it without importing each other.
import type { PlotPayload } from "@/hooks/use-plot";
import type { ProductionDto } from "@/lib/dto/production";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { Selection, Tool } from "./canvas-types";
import type { Commands } from "./use-commands";
import type { Draft } from "./use-plot-events";

export type PanelProps = {
  data: PlotPayload;
  production: ProductionDto;
  canEdit: boolean;
  selection: Selection;
  setSelection: (s: Selection) => void;
  preview: PlotFixture | null;
  draft: Draft;
  setDraft: (d: Draft) => void;
  cmd: Commands;
  setTool: (t: Tool) => void;
  tool: Tool;
};
