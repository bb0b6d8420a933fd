"use client";

import { Shape } from "react-konva";
import type { Ctx } from "./draw-stage";

/**
 * One Konva shape that draws a whole kind of thing (every pool, every symbol) in one pass. It does not
 * listen for events: picking is done with plan geometry, so Konva keeps no hit canvas for it.
 */
export function PlanShape({ draw, name }: { draw: (ctx: Ctx) => void; name?: string }) {
  return (
    <Shape
      name={name}
      listening={false}
      perfectDrawEnabled={false}
      shadowForStrokeEnabled={false}
      sceneFunc={(context) => draw((context as unknown as { _context: CanvasRenderingContext2D })._context)}
    />
  );
}
