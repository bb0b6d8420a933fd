"use strict";
// Demo data for the studies, so a new user opens them on something to look at: acting areas covering the
// stage (a 3 × 3 grid, each round one of the demo's focus points, from the setting line to the upstage
// electric), four performer marks and two scenery pieces for the shadow study. All invented.
//
// Where things sit is chosen so no other demo feature is crowded: area corners fall between the pipes and
// the focus points (a corner is picked before a unit on the plot), the marks stand clear of the middle of
// the stage (x 0–2, y 3–4) where the tests place and drag marks of their own, and the scenery stands in
// front of the cyc (back wall at y 9.5).

const NAME = "Salt and Lantern";

// Stage left is +x, upstage is +y (metres from the setting line).
const COLUMNS = [
  ["right", -4.5, -1.5],
  ["centre", -1.5, 1.5],
  ["left", 1.5, 4.5],
];
const ROWS = [
  ["Down", 0, 2.75],
  ["Mid", 2.75, 5.25],
  ["Up", 5.25, 8],
];

// name, x, y, height, shoulder width
const PERFORMERS = [
  ["Harbour master", -2.6, 1.8, 1.82, 0.52],
  ["Net mender", 3.0, 2.2, 1.68, 0.46],
  ["Lamp child", -1.2, 5.6, 1.3, 0.36],
  ["Fog singer", 3.2, 6.4, 1.75, 0.5],
];

// name, x1, y1, x2, y2, height
const PANELS = [
  ["Sea wall flat", -4.6, 7.7, -2.3, 8.1, 2.4],
  ["Net rack", 3.1, 7.4, 4.7, 6.9, 1.8],
];

/** @param {import('sequelize').QueryInterface} qi */
async function up(qi) {
  const rows = await qi.sequelize.query(`SELECT id FROM productions WHERE name = '${NAME}' ORDER BY id DESC LIMIT 1`, {
    type: "SELECT",
  });
  if (!rows.length) return;
  const productionId = rows[0].id;
  const now = new Date();
  const stamp = { version: 1, created_at: now, updated_at: now };
  const areas = ROWS.flatMap(([row, y1, y2]) =>
    COLUMNS.map(([column, x1, x2]) => ({
      production_id: productionId,
      name: `${row} ${column}`,
      polygon: JSON.stringify([
        { x: x1, y: y1 },
        { x: x2, y: y1 },
        { x: x2, y: y2 },
        { x: x1, y: y2 },
      ]),
      ...stamp,
    })),
  );
  await qi.bulkInsert("area_zones", areas);
  await qi.bulkInsert(
    "performer_marks",
    PERFORMERS.map(([name, x, y, height, shoulderWidth]) => ({
      production_id: productionId,
      name,
      x,
      y,
      height,
      shoulder_width: shoulderWidth,
      ...stamp,
    })),
  );
  await qi.bulkInsert(
    "scenic_panels",
    PANELS.map(([name, x1, y1, x2, y2, height]) => ({
      production_id: productionId,
      name,
      x1,
      y1,
      x2,
      y2,
      height,
      ...stamp,
    })),
  );
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  const rows = await qi.sequelize.query(`SELECT id FROM productions WHERE name = '${NAME}'`, { type: "SELECT" });
  const ids = rows.map((r) => r.id);
  if (!ids.length) return;
  await qi.bulkDelete("scenic_panels", { production_id: ids, name: PANELS.map((p) => p[0]) });
  await qi.bulkDelete("performer_marks", { production_id: ids, name: PERFORMERS.map((p) => p[0]) });
  const areaNames = ROWS.flatMap(([row]) => COLUMNS.map(([column]) => `${row} ${column}`));
  await qi.bulkDelete("area_zones", { production_id: ids, name: areaNames });
}

module.exports = { up, down };
