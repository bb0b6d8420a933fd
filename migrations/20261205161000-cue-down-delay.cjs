"use strict";
// A cue's down fade may wait on its own (a USITT ASCII file's `DOWN time delay`): kept as such rather than
// merged into the cue's one delay and applied to the up fade. NULL: the down fade waits as long as the up fade.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.addColumn("cues", "down_delay", { type: S.DOUBLE, allowNull: true });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.removeColumn("cues", "down_delay");
}

module.exports = { up, down };
