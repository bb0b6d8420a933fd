// What the plot canvas is given. A file of its own so the canvas and the hooks it uses can both
// import it without importing each other.
import type { RefObject } from "react";
import type { ProductionDto } from "@/lib/dto/production";
import type { PlotPayload } from "@/hooks/use-plot";
import type { NoteCounts } from "@/lib/notes/counts";
import type { CanvasEvents, CanvasHandle, LayerVisibility, Selection, Tool } from "./canvas-types";

export type PlotCanvasProps = {
  data: PlotPayload;
  production: ProductionDto;
  layers: LayerVisibility;
  selection: Selection;
  tool: Tool;
  canEdit: boolean;
  events: CanvasEvents;
  handleRef: RefObject<CanvasHandle | null>;
  /** Open notes per unit, drawn as badges (components/notes/draw-note-badges.ts). */
  noteCounts?: NoteCounts;
};
