// Benchmark for the coverage and shadow studies (issue: studies). Run with `npm run bench:studies`;
// figures go to docs/benchmarks.md under "Studies".
//
// What is timed, in this process, for a synthetic show (1,500 units, 400 lit, 16 m × 12 m at 0.1 m):
// - route: the coverage route's work after its database reads: computeCoverage (beams from the rig, the
//   culled grid, the area table) and the JSON reply, as the handler returns it. The reads (five small
//   queries) are not in this figure;
// - baseline: the same grid uncached (exact profile at every point, no per-beam table) and unculled
//   (every beam at every cell), in the same run;
// - draw: the browser's CPU work for a frame of the heat map (pixels from the grid and three contour
//   levels); the canvas's own raster is in the e2e test's data-draw-ms, not here;
// - shadows: 10 performers × 400 lit units, with the deck outlines (the server) and numbers only;
// - face: the face-light grid against the deck grid's time (goal within 1.5×).
import os from "node:os";
import { performance } from "node:perf_hooks";
import { coverageGrid, type LitBeam } from "../lib/optics";
import { beamLux } from "../lib/optics/illuminance";
import { prepareBeam } from "../lib/optics/illuminance";
import { computeCoverage } from "../lib/studies/coverage";
import { contourSegments } from "../lib/studies/contours";
import { heatPixels } from "../lib/studies/heat-colours";
import { studyLights, type StudyFixture } from "../lib/studies/lights";
import { shadowStudy } from "../lib/studies/shadows";
import type { CoverageRequest } from "../lib/validation/studies";
import { seededRandom, summarise } from "./support/numbers";

const BOUNDS = { minX: -8, maxX: 8, minY: 0, maxY: 12 };
const FAMILIES = ["profile", "profile", "fresnel", "par", "led-wash", "wash", "cyc"];

function show(n: number, seed = 16): StudyFixture[] {
  const r = seededRandom(seed);
  const out: StudyFixture[] = [];
  for (let k = 0; k < n; k++) {
    const kind = r();
    const at =
      kind < 0.6
        ? { x: -9 + 18 * r(), y: 1 + 10 * r(), z: 6 + 3 * r() }
        : kind < 0.85
          ? { x: -10 + 20 * r(), y: -12 + 5 * r(), z: 7 + 4 * r() }
          : { x: r() < 0.5 ? -9.5 : 9.5, y: 1 + 10 * r(), z: 0.5 + 4 * r() };
    const cone = 10 + 40 * r();
    out.push({
      id: k + 1,
      unitNumber: String(k + 1),
      positionName: "Pos",
      channel: k + 1,
      colour: r() < 0.5 ? "pale lavender" : "N/C",
      x: at.x,
      y: at.y,
      lensHeight: at.z,
      trimHeight: at.z,
      focus: { x: -7 + 14 * r(), y: 0.5 + 11 * r() },
      aim: r() < 0.5 ? "head" : "deck",
      coneDeg: cone,
      softnessDeg: cone * 0.3 * r(),
      type: {
        family: FAMILIES[k % FAMILIES.length],
        coneMaxDeg: cone,
        defaultSoftnessDeg: 3,
        lensDropM: 0.3,
        lensApertureM: 0.1 + 0.1 * r(),
        peakCandela: 5_000 + 80_000 * r(),
      },
    });
  }
  return out;
}

/** Every fourth unit lit, up to 400, at levels from 20 to 100. */
function levelsFor(n: number): Map<number, number> {
  const r = seededRandom(7);
  const m = new Map<number, number>();
  for (let ch = 1; ch <= n && m.size < 400; ch += Math.max(1, Math.floor(n / 400))) m.set(ch, 20 + 80 * r());
  return m;
}

/** Wall time and this process's CPU time (the CPU figure moves less when other work shares the machine). */
function time(fn: () => unknown, runs: number): ReturnType<typeof summarise> & { cpu: number } {
  fn(); // warm the JIT once
  const samples: number[] = [];
  const cpu: number[] = [];
  for (let k = 0; k < runs; k++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    samples.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { ...summarise(samples), cpu: summarise(cpu).median };
}

const AREAS = Array.from({ length: 12 }, (_, k) => {
  const cx = -6 + 4 * (k % 4);
  const cy = 2 + 4 * Math.floor(k / 4);
  return {
    id: k + 1,
    name: `Area ${k + 1}`,
    polygon: [
      { x: cx - 1.8, y: cy - 1.8 },
      { x: cx + 1.8, y: cy - 1.8 },
      { x: cx + 1.8, y: cy + 1.8 },
      { x: cx - 1.8, y: cy + 1.8 },
    ],
  };
});

/** The grid the slow way: exact profile at every point (no table), every beam at every cell (no culling). */
function baselineGrid(beams: LitBeam[]): number {
  const prepared = beams.map(prepareBeam);
  let sum = 0;
  for (let y = BOUNDS.minY + 0.05; y < BOUNDS.maxY; y += 0.1) {
    for (let x = BOUNDS.minX + 0.05; x < BOUNDS.maxX; x += 0.1) {
      let e = 0;
      for (const b of prepared) e += beamLux(b, x, y, 0);
      sum += e;
    }
  }
  return sum;
}

function coverageAt(n: number) {
  const fixtures = show(n);
  const levels = levelsFor(n);
  const colours = new Map([["pale lavender", 60]]);
  const scene = {
    fixtures,
    levels,
    colours,
    areas: AREAS,
    headHeight: 1.7,
    faceHeight: 1.55,
    deckHeight: 0,
    bounds: BOUNDS,
  };
  const req = (measure: CoverageRequest["measure"]): CoverageRequest => ({
    source: { kind: "full" },
    measure,
    resolution: 0.1,
    minUniformity: 0.5,
    meanRatio: 2,
  });
  const route = time(() => JSON.stringify(computeCoverage(req({ kind: "deck" }), scene)), 7);
  const { beams, lights } = studyLights(fixtures, levels, { headHeight: 1.7, deckHeight: 0, colours });
  const deck = time(
    () => coverageGrid({ bounds: BOUNDS, resolution: 0.1, deckHeight: 0, measure: { kind: "deck" }, beams }),
    7,
  );
  const face = time(
    () =>
      coverageGrid({
        bounds: BOUNDS,
        resolution: 0.1,
        deckHeight: 0,
        measure: { kind: "face", height: 1.55, facingDeg: -90 },
        beams,
      }),
    7,
  );
  const baseline = time(() => baselineGrid(beams), 2);
  const g = coverageGrid({ bounds: BOUNDS, resolution: 0.1, deckHeight: 0, measure: { kind: "deck" }, beams });
  const draw = time(() => {
    heatPixels(g.values, g.cols, g.rows, g.max, "light");
    for (const level of [100, 300, 500]) contourSegments(g, level);
  }, 7);
  const performers = Array.from({ length: 10 }, (_, k) => ({
    id: k + 1,
    name: `P${k + 1}`,
    x: -6 + 1.3 * k,
    y: 2 + (k % 4) * 2,
    height: 1.75,
    shoulderWidth: 0.5,
  }));
  const shadowScene = { lights, performers, panels: [], backWallY: 12, deckHeight: 0 };
  const shadowsNumbers = time(() => shadowStudy({ ...shadowScene, outlines: false }), 7);
  // While dragging, only the dragged performer is recomputed, with coarse outlines.
  const shadowsLive = time(
    () => shadowStudy({ ...shadowScene, performers: performers.slice(0, 1), outlines: { sides: 12, lensSamples: 8 } }),
    5,
  );
  const shadowsServer = time(() => shadowStudy(shadowScene), 5);
  return {
    n,
    lit: beams.length,
    cells: g.cols * g.rows,
    evaluations: g.evaluations,
    route,
    deck,
    face,
    baseline,
    draw,
    shadowsNumbers,
    shadowsLive,
    shadowsServer,
  };
}

const ms = (v: number) => `${v.toFixed(1)} ms`;
console.log(
  `studies benchmark — ${new Date().toISOString()} — load ${os
    .loadavg()
    .map((l) => l.toFixed(1))
    .join(" ")} — ${os.cpus().length} cores`,
);
for (const n of [100, 1500, 5000]) {
  const r = coverageAt(n);
  console.log(`\n${r.n} units, ${r.lit} lit, ${r.cells} cells (${r.evaluations} point evaluations after culling)`);
  console.log(
    `  route work (grid + areas + JSON): median ${ms(r.route.median)}, p95 ${ms(r.route.p95)} (CPU ${ms(r.route.cpu)})   goal < 300 ms`,
  );
  console.log(
    `  deck grid ${ms(r.deck.median)}; uncached, unculled ${ms(r.baseline.median)} → ${(r.baseline.median / r.deck.median).toFixed(1)}× faster`,
  );
  console.log(
    `  face grid ${ms(r.face.median)} = ${(r.face.median / r.deck.median).toFixed(2)}× the deck grid (CPU ${(r.face.cpu / r.deck.cpu).toFixed(2)}×)   goal ≤ 1.5×`,
  );
  console.log(`  draw CPU (heat pixels + 3 contour levels) median ${ms(r.draw.median)}   goal < 200 ms`);
  console.log(
    `  shadows 10 performers × ${r.lit}: numbers ${ms(r.shadowsNumbers.median)} (CPU ${ms(r.shadowsNumbers.cpu)}; goal < 50 ms); live drag (1 performer, coarse outlines) ${ms(r.shadowsLive.median)}; server with outlines ${ms(r.shadowsServer.median)} (CPU ${ms(r.shadowsServer.cpu)}, best ${ms(r.shadowsServer.best)})`,
  );
}
console.log(
  `\nload after: ${os
    .loadavg()
    .map((l) => l.toFixed(1))
    .join(" ")}`,
);
