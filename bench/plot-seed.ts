// Seeds a benchmark production straight into MariaDB: N fixtures on 40 positions (30 overhead pipes
// or bridges, 10 booms), a few types, nine focus points; the demo designer is its owner.
import { createRequire } from "node:module";
import path from "node:path";
import { DEMO_USERS } from "../tests/support/demo";

const require = createRequire(path.resolve("package.json"));

export async function seedBenchProduction(databaseUrl: string, fixtures: number): Promise<number> {
  const mariadb = require("mariadb");
  const conn = await mariadb.createConnection(databaseUrl);
  try {
    const now = new Date();
    const [{ id: userId }] = await conn.query("SELECT id FROM users WHERE email = ?", [DEMO_USERS.designer]);
    const prod = await conn.query(
      "INSERT INTO productions (name, venue, display_units, datum_name, head_height, back_wall_y, proscenium_width, proscenium_height, stage_width, stage_depth, apron_depth, voltage, derating, numbering_rule, version, created_at, updated_at) VALUES (?, 'Bench hall', 'metric', 'setting line', 1.7, 16, 16, 9, 26, 15, 2, 230, 0.8, 'from-stage-left', 1, ?, ?)",
      [`Bench ${fixtures} (${now.toISOString()})`, now, now],
    );
    const productionId = Number(prod.insertId);
    await conn.query(
      "INSERT INTO memberships (user_id, production_id, role, is_owner, version, created_at, updated_at) VALUES (?, ?, 'designer', 1, 1, ?, ?)",
      [userId, productionId, now, now],
    );
    const types: Array<[string, string, number, number]> = [
      ["Profile 26°", "profile", 26, 26],
      ["Fresnel", "fresnel", 15, 60],
      ["LED wash", "led-wash", 15, 45],
      ["Profile 36°", "profile", 36, 36],
    ];
    const typeIds: number[] = [];
    for (const [name, family, lo, hi] of types) {
      const r = await conn.query(
        'INSERT INTO fixture_types (production_id, name, family, cone_min_deg, cone_max_deg, default_softness_deg, peak_candela, wattage, weight_kg, dmx_modes, lens_aperture_m, lens_drop_m, cells, version, created_at, updated_at) VALUES (?, ?, ?, ?, ?, 3, 30000, 750, 8, \'[{"name":"dimmer","footprint":1}]\', 0.15, 0.45, 1, 1, ?, ?)',
        [productionId, name, family, lo, hi, now, now],
      );
      typeIds.push(Number(r.insertId));
    }
    const pointIds: number[] = [];
    for (let i = 0; i < 9; i++) {
      const r = await conn.query(
        "INSERT INTO focus_points (production_id, name, x, y, version, created_at, updated_at) VALUES (?, ?, ?, ?, 1, ?, ?)",
        [productionId, `Area ${i + 1}`, -5 + (i % 3) * 5, 2 + Math.floor(i / 3) * 4, now, now],
      );
      pointIds.push(Number(r.insertId));
    }
    const positions: Array<{ id: number; x1: number; y1: number; x2: number | null }> = [];
    for (let i = 0; i < 40; i++) {
      const line = i < 30;
      const y = line ? -14 + i * 1 : 1 + ((i - 30) % 5) * 3;
      const x1 = line ? -12 : i - 30 < 5 ? -12 : 12;
      const r = await conn.query(
        "INSERT INTO positions (production_id, name, kind, x1, y1, x2, y2, trim_height, rated_load_kg, sort_order, version, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, 500, ?, 1, ?, ?)",
        [
          productionId,
          line ? `Pipe ${i + 1}` : `Boom ${i - 29}`,
          line ? (y < 0 ? "foh-bridge" : "overhead-pipe") : "boom",
          x1,
          y,
          line ? 12 : null,
          line ? y : null,
          line ? 8 : 5,
          i,
          now,
          now,
        ],
      );
      positions.push({ id: Number(r.insertId), x1, y1: y, x2: line ? 12 : null });
    }
    const rows: unknown[][] = [];
    for (let k = 0; k < fixtures; k++) {
      const pos = positions[k % 40];
      const n = Math.ceil(fixtures / 40);
      const i = Math.floor(k / 40);
      const x = pos.x2 === null ? pos.x1 : -12 + (24 * (i + 0.5)) / n;
      const own = k % 3 === 0;
      rows.push([
        productionId,
        pos.id,
        typeIds[k % typeIds.length],
        own ? null : pointIds[k % 9],
        String(i + 1),
        String(i + 1).padStart(6, "0"),
        k + 1,
        x,
        pos.y1,
        pos.x2 === null ? 0.5 + (i % 6) * 0.7 : null,
        own ? x * 0.5 : null,
        own ? 5 + (k % 7) : null,
        "deck",
        now,
        now,
      ]);
    }
    for (let s = 0; s < rows.length; s += 500) {
      await conn.batch(
        "INSERT INTO fixtures (production_id, position_id, fixture_type_id, focus_point_id, unit_number, unit_sort, channel, x, y, lens_height, focus_x, focus_y, aim, version, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 1, ?, ?)",
        rows.slice(s, s + 500),
      );
    }
    return productionId;
  } finally {
    await conn.end();
  }
}
