"use strict";
// A zoom or spot/flood type gets brighter as it narrows: its peak intensity at the narrowest cone, beside
// peak_candela (now the peak at the widest cone). NULL: one figure only, and the peak stays as stored.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.addColumn("fixture_types", "peak_candela_narrow", { type: S.DOUBLE, allowNull: true });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.removeColumn("fixture_types", "peak_candela_narrow");
}

module.exports = { up, down };
