"use strict";
// Focus charts, remaining fields: an optional focus photo taken on the deck (an upload of its
// own kind, linked from the fixture), the gobo's rotation in degrees, and the barn doors as focused —
// one short note a leaf (top, bottom, left, right as seen from behind the fixture), e.g. "in halfway".

const LEAVES = ["top", "bottom", "left", "right"];

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.changeColumn("uploads", "kind", { type: S.ENUM("underlay", "import", "focus-photo"), allowNull: false });
  await qi.addColumn("fixtures", "focus_photo_upload_id", {
    type: S.INTEGER,
    allowNull: true,
    references: { model: "uploads", key: "id" },
    onDelete: "SET NULL",
    onUpdate: "CASCADE",
  });
  await qi.addColumn("fixtures", "gobo_rotation_deg", { type: S.DOUBLE, allowNull: true });
  for (const leaf of LEAVES)
    await qi.addColumn("fixtures", `barn_door_${leaf}`, { type: S.STRING(60), allowNull: true });
}

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function down(qi, S) {
  for (const leaf of LEAVES) await qi.removeColumn("fixtures", `barn_door_${leaf}`);
  await qi.removeColumn("fixtures", "gobo_rotation_deg");
  await qi.removeColumn("fixtures", "focus_photo_upload_id");
  await qi.bulkDelete("uploads", { kind: "focus-photo" });
  await qi.changeColumn("uploads", "kind", { type: S.ENUM("underlay", "import"), allowNull: false });
}

module.exports = { up, down };
