"use strict";
// Demo data for the checks: the demo production's electrical code and supply, one circuit for each circuit
// name its fixtures use (10 A dimmer channels for lamps, constant-power circuits for LED units, spread
// over three phases), lift lines on its overhead pipes, and a data line per position. All invented.

/** @param {import('sequelize').QueryInterface} qi */
async function up(qi) {
  const rows = await qi.sequelize.query(
    "SELECT id FROM productions WHERE name = 'Salt and Lantern' ORDER BY id DESC LIMIT 1",
    { type: "SELECT" },
  );
  if (!rows.length) return;
  const productionId = rows[0].id;
  await qi.sequelize.query(
    "UPDATE productions SET electrical_code = 'uk-bs7671', supply_system = '230-400-3ph', derating = NULL WHERE id = ?",
    { replacements: [productionId] },
  );
  const fixtures = await qi.sequelize.query(
    `SELECT f.id, f.circuit, f.position_id, t.dmx_modes, t.family FROM fixtures f JOIN fixture_types t ON t.id = f.fixture_type_id
     WHERE f.production_id = ? ORDER BY f.position_id, f.unit_sort`,
    { replacements: [productionId], type: "SELECT" },
  );
  const now = new Date();
  const circuits = new Map();
  for (const f of fixtures) {
    if (!f.circuit || circuits.has(f.circuit)) continue;
    const modes = typeof f.dmx_modes === "string" ? JSON.parse(f.dmx_modes) : f.dmx_modes;
    const electronic = String(f.family).startsWith("led") || modes.some((m) => m.footprint > 1);
    const n = circuits.size;
    circuits.set(f.circuit, {
      production_id: productionId,
      name: f.circuit,
      rating_a: 10,
      phase: ["L1", "L2", "L3"][Math.floor(n / 6) % 3],
      power: electronic ? "constant" : "dimmed",
      version: 1,
      created_at: now,
      updated_at: now,
    });
  }
  if (circuits.size) await qi.bulkInsert("circuits", [...circuits.values()]);
  await qi.sequelize.query(
    "UPDATE positions SET lift_lines = 3 WHERE production_id = ? AND kind IN ('overhead-pipe', 'flying-electric') AND x2 IS NOT NULL",
    { replacements: [productionId] },
  );
  const positions = await qi.sequelize.query(
    "SELECT id, name FROM positions WHERE production_id = ? ORDER BY sort_order",
    { replacements: [productionId], type: "SELECT" },
  );
  const lines = positions
    .map((p) => ({ p, ids: fixtures.filter((f) => f.position_id === p.id).map((f) => f.id) }))
    .filter((x) => x.ids.length)
    .map(({ p, ids }) => ({
      production_id: productionId,
      name: `${p.name} run`.slice(0, 60),
      universe: null,
      fixture_ids: JSON.stringify(ids),
      version: 1,
      created_at: now,
      updated_at: now,
    }));
  if (lines.length) await qi.bulkInsert("data_lines", lines);
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  const rows = await qi.sequelize.query("SELECT id FROM productions WHERE name = 'Salt and Lantern'", {
    type: "SELECT",
  });
  const ids = rows.map((r) => r.id);
  if (!ids.length) return;
  await qi.bulkDelete("data_lines", { production_id: ids });
  await qi.bulkDelete("circuits", { production_id: ids });
}

module.exports = { up, down };
