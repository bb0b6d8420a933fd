// For bench:load: a cue list of `cues` × `channels` in the bench production, straight into MariaDB. The
// first cue sets every channel; each later one moves 20–60 of them (a sparse, tracking show), so
// 600 × 400 gives about 24,000 level rows.
import { createRequire } from "node:module";
import path from "node:path";
import { seededRandom } from "./numbers";

const require = createRequire(path.resolve("package.json"));

export async function seedBenchCues(databaseUrl: string, productionId: number, cues: number, channels: number) {
  const mariadb = require("mariadb");
  const conn = await mariadb.createConnection(databaseUrl);
  const rand = seededRandom(18);
  const now = new Date();
  try {
    const cueRows = Array.from({ length: cues }, (_, i) => [
      productionId,
      i + 1,
      `Cue ${i + 1}`,
      1 + Math.floor(rand() * 8),
      i % 25 === 24 ? 0 : null,
      i % 50 === 0 ? 1 : 0,
      now,
      now,
    ]);
    await conn.batch(
      "INSERT INTO cues (production_id, number, label, up_time, follow, block, version, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, 1, ?, ?)",
      cueRows,
    );
    const ids: number[] = (
      await conn.query("SELECT id FROM cues WHERE production_id = ? ORDER BY number", [productionId])
    ).map((r: { id: number }) => r.id);
    const levels: unknown[][] = [];
    ids.forEach((cueId, i) => {
      const moved = new Set<number>();
      const count = i === 0 ? channels : 20 + Math.floor(rand() * 41);
      while (moved.size < count) moved.add(i === 0 ? moved.size + 1 : 1 + Math.floor(rand() * channels));
      for (const ch of moved) levels.push([cueId, ch, Math.round(rand() * 100), now, now]);
    });
    for (let s = 0; s < levels.length; s += 5000) {
      await conn.batch(
        "INSERT INTO cue_levels (cue_id, channel, level, created_at, updated_at) VALUES (?, ?, ?, ?, ?)",
        levels.slice(s, s + 5000),
      );
    }
    return levels.length;
  } finally {
    await conn.end();
  }
}
