"use strict";
// Parts of a cue: groups of channels that fade with their own up, down and delay times. The channels
// of a part are kept as a JSON array of channel numbers. A part has no version of its own: parts are
// only ever written together with their cue, under the cue's version (one PATCH replaces them all).

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.createTable("cue_parts", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    cue_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "cues", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    part: { type: S.TINYINT, allowNull: false },
    label: { type: S.STRING(60), allowNull: false, defaultValue: "" },
    up_time: { type: S.DOUBLE, allowNull: false, defaultValue: 5 },
    down_time: { type: S.DOUBLE, allowNull: true },
    delay: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    channels: { type: S.JSON, allowNull: false },
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  });
  await qi.addIndex("cue_parts", ["cue_id", "part"], { unique: true, name: "cue_parts_cue_part" });
}

async function down(qi) {
  await qi.dropTable("cue_parts");
}

module.exports = { up, down };
