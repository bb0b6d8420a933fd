"use strict";
// What a fixture type is electrically: a lamp load (fine on a dimmer) or a switch-mode one (an electronic
// supply: LED units, moving lights, discharge lamps). NULL: not said, and the checks go by the type's family.
// The DMX footprint is no evidence either way (a single-slot LED unit is still switch-mode).

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.addColumn("fixture_types", "load_kind", { type: S.ENUM("lamp", "switch-mode"), allowNull: true });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.removeColumn("fixture_types", "load_kind");
}

module.exports = { up, down };
