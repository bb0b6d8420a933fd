// Contour lines of a grid at chosen values, by marching squares over the cell centres: each square of four
// neighbouring centres contributes up to two segments where the value crosses the level, placed by linear
// interpolation along the square's sides. Segments, not joined polylines: the canvas strokes them in one path.
import type { GridCells, Point } from "@/lib/optics";

export type Segment = [Point, Point];

export function contourSegments(g: GridCells, level: number, values: ArrayLike<number> = g.values): Segment[] {
  const out: Segment[] = [];
  const { cols, rows, originX: ox, originY: oy, resolution: r } = g;
  const at = (c: number, row: number) => values[row * cols + c];
  const lerp = (a: number, b: number) => (level - a) / (b - a);
  for (let row = 0; row < rows - 1; row++) {
    for (let c = 0; c < cols - 1; c++) {
      const v0 = at(c, row); // bottom-left (downstage, stage right)
      const v1 = at(c + 1, row);
      const v2 = at(c + 1, row + 1);
      const v3 = at(c, row + 1);
      const idx = (v0 >= level ? 1 : 0) | (v1 >= level ? 2 : 0) | (v2 >= level ? 4 : 0) | (v3 >= level ? 8 : 0);
      if (idx === 0 || idx === 15) continue;
      const x = ox + c * r;
      const y = oy + row * r;
      const bottom = { x: x + r * lerp(v0, v1), y };
      const right = { x: x + r, y: y + r * lerp(v1, v2) };
      const top = { x: x + r * lerp(v3, v2), y: y + r };
      const left = { x, y: y + r * lerp(v0, v3) };
      switch (idx) {
        case 1:
        case 14:
          out.push([left, bottom]);
          break;
        case 2:
        case 13:
          out.push([bottom, right]);
          break;
        case 3:
        case 12:
          out.push([left, right]);
          break;
        case 4:
        case 11:
          out.push([right, top]);
          break;
        case 6:
        case 9:
          out.push([bottom, top]);
          break;
        case 7:
        case 8:
          out.push([left, top]);
          break;
        case 5: {
          // Saddle: decided by the square's mean, so the two readings of the same data always agree.
          const high = (v0 + v1 + v2 + v3) / 4 >= level;
          if (high) out.push([left, top], [bottom, right]);
          else out.push([left, bottom], [right, top]);
          break;
        }
        case 10: {
          const high = (v0 + v1 + v2 + v3) / 4 >= level;
          if (high) out.push([left, bottom], [right, top]);
          else out.push([left, top], [bottom, right]);
          break;
        }
      }
    }
  }
  return out;
}
