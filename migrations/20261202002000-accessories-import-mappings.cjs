"use strict";
// Accessories hung on a fixture (scroller, gobo rotator, iris, barn doors …) with their own DMX
// address, footprint, wattage and weight; and the column mapping each production last used to import
// a rig file, so the next file from the same source maps itself.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const stamps = () => ({
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  });
  const ref = (table) => ({
    type: S.INTEGER,
    allowNull: false,
    references: { model: table, key: "id" },
    onDelete: "CASCADE",
    onUpdate: "CASCADE",
  });
  await qi.createTable("accessories", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    production_id: ref("productions"),
    fixture_id: ref("fixtures"),
    kind: { type: S.STRING(40), allowNull: false },
    universe: { type: S.INTEGER, allowNull: true },
    address: { type: S.INTEGER, allowNull: true },
    footprint: { type: S.INTEGER, allowNull: true },
    wattage: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    weight_kg: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    notes: { type: S.STRING(400), allowNull: true },
    version: { type: S.INTEGER, allowNull: false, defaultValue: 1 },
    ...stamps(),
  });
  await qi.addIndex("accessories", ["production_id"], { name: "accessories_production" });
  await qi.addIndex("accessories", ["fixture_id"], { name: "accessories_fixture" });

  await qi.createTable("import_mappings", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    production_id: ref("productions"),
    // { "<normalised header>": "<field key or ignore>" }
    columns: { type: S.JSON, allowNull: false },
    length_unit: { type: S.ENUM("m", "ft"), allowNull: false, defaultValue: "m" },
    version: { type: S.INTEGER, allowNull: false, defaultValue: 1 },
    ...stamps(),
  });
  await qi.addIndex("import_mappings", ["production_id"], { unique: true, name: "import_mappings_production" });
}

async function down(qi) {
  await qi.dropTable("import_mappings");
  await qi.dropTable("accessories");
}

module.exports = { up, down };
