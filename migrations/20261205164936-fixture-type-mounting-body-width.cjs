"use strict";
// A fixture type's mounting (under-hung from a pipe, over-hung on a rail or truss top, on a side arm, or
// standing on the floor), how far its lens rises above what it stands on, and its body width: the room
// one unit takes along a pipe, which spaces units placed on the plot. Existing types stay under-hung.
// The enum's values match models/fixture-mountings.ts.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.addColumn("fixture_types", "mounting", {
    type: S.ENUM("under-hung", "over-hung", "side-arm", "floor"),
    allowNull: false,
    defaultValue: "under-hung",
  });
  await qi.addColumn("fixture_types", "lens_rise_m", { type: S.DOUBLE, allowNull: false, defaultValue: 0.35 });
  await qi.addColumn("fixture_types", "body_width_m", { type: S.DOUBLE, allowNull: false, defaultValue: 0.45 });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.removeColumn("fixture_types", "body_width_m");
  await qi.removeColumn("fixture_types", "lens_rise_m");
  await qi.removeColumn("fixture_types", "mounting");
}

module.exports = { up, down };
