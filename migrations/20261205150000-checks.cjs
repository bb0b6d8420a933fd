"use strict";
// The checks' own data: circuits (and dimmers) with their rating, phase and whether they dim; data lines
// (an ordered run of units); the production's electrical code, supply system and rigging allowances; and
// the lift lines of a flown pipe.

const CODES = ["none", "us-nec", "uk-bs7671", "iec-60364", "other"];
const SUPPLIES = ["120-208-3ph", "120-240-split", "230-400-3ph", "230-1ph", "100-1ph", "by-hand"];

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const id = () => ({ type: S.INTEGER, autoIncrement: true, primaryKey: true });
  const version = () => ({ type: S.INTEGER, allowNull: false, defaultValue: 1 });
  const stamps = () => ({
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  });
  const production = () => ({
    type: S.INTEGER,
    allowNull: false,
    references: { model: "productions", key: "id" },
    onDelete: "CASCADE",
    onUpdate: "CASCADE",
  });

  await qi.createTable("circuits", {
    id: id(),
    production_id: production(),
    // Same length as a fixture's circuit field, which names it.
    name: { type: S.STRING(20), allowNull: false },
    rating_a: { type: S.DOUBLE, allowNull: false },
    phase: { type: S.STRING(8), allowNull: true },
    power: { type: S.ENUM("dimmed", "non-dim", "constant"), allowNull: false, defaultValue: "dimmed" },
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("circuits", ["production_id", "name"], { unique: true, name: "circuits_production_name" });

  await qi.createTable("data_lines", {
    id: id(),
    production_id: production(),
    name: { type: S.STRING(60), allowNull: false },
    universe: { type: S.INTEGER, allowNull: true },
    // Fixture ids in the order the cable runs; a deleted fixture simply drops out when read.
    fixture_ids: { type: S.JSON, allowNull: false },
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("data_lines", ["production_id", "name"], { unique: true, name: "data_lines_production_name" });

  await qi.addColumn("productions", "electrical_code", {
    type: S.ENUM(...CODES),
    allowNull: false,
    defaultValue: "none",
  });
  await qi.addColumn("productions", "supply_system", {
    type: S.ENUM(...SUPPLIES),
    allowNull: false,
    defaultValue: "by-hand",
  });
  await qi.addColumn("productions", "cable_kg_per_m", { type: S.DOUBLE, allowNull: false, defaultValue: 0.5 });
  await qi.addColumn("productions", "hardware_kg_per_unit", { type: S.DOUBLE, allowNull: false, defaultValue: 1 });
  // The factor now defaults from the code; null means "the code's default" (none for most codes).
  await qi.changeColumn("productions", "derating", { type: S.DOUBLE, allowNull: true, defaultValue: null });
  // The old default paired 230 V with the US 80 % rule; an untouched pair goes back to "not chosen".
  await qi.sequelize.query("UPDATE productions SET derating = NULL WHERE derating = 0.8 AND voltage = 230");

  await qi.addColumn("positions", "lift_lines", { type: S.INTEGER, allowNull: true });
}

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function down(qi, S) {
  await qi.removeColumn("positions", "lift_lines");
  await qi.sequelize.query("UPDATE productions SET derating = 0.8 WHERE derating IS NULL");
  await qi.changeColumn("productions", "derating", { type: S.DOUBLE, allowNull: false, defaultValue: 0.8 });
  for (const c of ["hardware_kg_per_unit", "cable_kg_per_m", "supply_system", "electrical_code"])
    await qi.removeColumn("productions", c);
  await qi.dropTable("data_lines");
  await qi.dropTable("circuits");
}

module.exports = { up, down };
