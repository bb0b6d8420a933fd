// A bitmap of one expensive canvas layer (every pool, every symbol), drawn once per change and reused.
// Filling 1,500 translucent pools costs ~100 ms of rasterising on a laptop-class CPU, far beyond a 16.7 ms
// frame; copying a bitmap costs well under 1 ms. So while the plan is panned or zoomed the snapshot is
// moved and scaled as a picture, and drawn afresh when the view comes to rest or what it shows changes.
// A margin around the viewport keeps a short pan from showing empty edges.
import type { View } from "@/lib/plot/view";
import type { Ctx, Size } from "./draw-stage";

export type SnapshotDraw = (ctx: Ctx, v: View, size: Size) => void;

/** How much of the viewport's size is drawn beyond each edge. */
const MARGIN = 0.2;

export class LayerSnapshot {
  /**
   * @param resolution bitmap pixels per screen pixel: below 1 for soft, costly content (the pools'
   *   translucent washes at 0.5 cost about a quarter as much to rasterise and look the same).
   */
  constructor(private readonly resolution = 1) {}

  private canvas: HTMLCanvasElement | null = null;
  private at: View | null = null; // the view it was drawn at, in its own (margin-shifted) pixels
  private stamp: readonly unknown[] = [];
  private size: Size = { width: 0, height: 0 };
  private margin = { x: 0, y: 0 };
  private ratio = 1;
  /** Milliseconds the last fresh drawing took, rasterising included. */
  lastFreshMs = 0;

  /**
   * Draws the layer at view `v`. `stamp` lists what the layer shows apart from the view (data, palette,
   * visibility), compared item by item: when one changes the bitmap is redrawn. While `moving`, a bitmap of the same stamp is
   * reused at any view; at rest it is redrawn whenever the view differs from the one it was drawn at.
   */
  draw(
    ctx: Ctx,
    v: View,
    size: Size,
    stamp: readonly unknown[],
    paint: SnapshotDraw,
    moving: boolean,
  ): "reused" | "fresh" {
    const t0 = performance.now();
    const ratio = (typeof window === "undefined" ? 1 : window.devicePixelRatio || 1) * this.resolution;
    const sameSize = size.width === this.size.width && size.height === this.size.height && ratio === this.ratio;
    const usable =
      this.canvas &&
      this.at &&
      sameSize &&
      stamp.length === this.stamp.length &&
      stamp.every((x, i) => x === this.stamp[i]);
    const fresh = !usable || (!moving && !this.sameView(v));
    if (fresh) this.render(v, size, stamp, paint, ratio);
    const at = this.at!;
    const k = v.scale / at.scale;
    const c = this.canvas!;
    // Copying a freshly drawn bitmap is where the browser rasterises it, so the time includes that.
    ctx.drawImage(c, v.ox - k * at.ox, v.oy - k * at.oy, (k * c.width) / ratio, (k * c.height) / ratio);
    if (fresh) this.lastFreshMs = performance.now() - t0;
    return fresh ? "fresh" : "reused";
  }

  /** Forget the bitmap (e.g. when the canvas unmounts). */
  clear() {
    this.canvas = null;
    this.at = null;
    this.stamp = [];
  }

  private sameView(v: View) {
    const at = this.at!;
    return (
      Math.abs(v.scale - at.scale) < 1e-9 &&
      Math.abs(v.ox + this.margin.x - at.ox) < 0.01 &&
      Math.abs(v.oy + this.margin.y - at.oy) < 0.01
    );
  }

  private render(v: View, size: Size, stamp: readonly unknown[], paint: SnapshotDraw, ratio: number) {
    const mx = Math.round(size.width * MARGIN);
    const my = Math.round(size.height * MARGIN);
    const w = size.width + 2 * mx;
    const h = size.height + 2 * my;
    const c = this.canvas ?? document.createElement("canvas");
    if (c.width !== Math.ceil(w * ratio) || c.height !== Math.ceil(h * ratio)) {
      c.width = Math.ceil(w * ratio);
      c.height = Math.ceil(h * ratio);
    }
    const g = c.getContext("2d")!;
    g.setTransform(ratio, 0, 0, ratio, 0, 0);
    g.clearRect(0, 0, w, h);
    const at: View = { scale: v.scale, ox: v.ox + mx, oy: v.oy + my };
    paint(g, at, { width: w, height: h });
    this.canvas = c;
    this.at = at;
    this.stamp = stamp;
    this.size = size;
    this.margin = { x: mx, y: my };
    this.ratio = ratio;
  }
}
