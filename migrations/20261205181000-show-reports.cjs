"use strict";
// The stage manager's report after each performance, with its lamp-out and fault log.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const stamps = () => ({
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  });
  await qi.createTable("show_reports", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    production_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "productions", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    performance: { type: S.STRING(80), allowNull: false },
    performed_on: { type: S.DATEONLY, allowNull: false },
    summary: { type: S.TEXT, allowNull: false },
    author_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    version: { type: S.INTEGER, allowNull: false, defaultValue: 1 },
    ...stamps(),
  });
  await qi.addIndex("show_reports", ["production_id", "performed_on"], { name: "show_reports_production_date" });
  await qi.createTable("show_report_faults", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    show_report_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "show_reports", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    fixture_id: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "fixtures", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    kind: { type: S.ENUM("lamp_out", "fault"), allowNull: false },
    description: { type: S.STRING(300), allowNull: false },
    ...stamps(),
  });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.dropTable("show_report_faults");
  await qi.dropTable("show_reports");
}

module.exports = { up, down };
