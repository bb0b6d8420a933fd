"use strict";
// Show reports the stage manager can keep editing until they are sent: when a report was sent (null for a
// draft) and by whom, and the lighting items a draft holds until sending turns them into notes. Reports
// filed before this were sent as they were filed. Named after the show-report tables' own migration so a
// fresh database creates those first.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.addColumn("show_reports", "sent_at", { type: S.DATE, allowNull: true });
  await qi.addColumn("show_reports", "sent_by", {
    type: S.INTEGER,
    allowNull: true,
    references: { model: "users", key: "id" },
    onDelete: "SET NULL",
    onUpdate: "CASCADE",
  });
  await qi.sequelize.query("UPDATE show_reports SET sent_at = created_at, sent_by = author_id");
  await qi.createTable("show_report_items", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    show_report_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "show_reports", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    sort_order: { type: S.INTEGER, allowNull: false, defaultValue: 0 },
    body: { type: S.TEXT, allowNull: false },
    kind: { type: S.ENUM("work", "focus", "cue", "paperwork", "general"), allowNull: false },
    subject: { type: S.ENUM("production", "position", "fixture", "cue", "focus_point"), allowNull: false },
    subject_id: { type: S.INTEGER, allowNull: true },
    priority: { type: S.ENUM("low", "normal", "high"), allowNull: true },
    owner_id: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "users", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  });
  await qi.addIndex("show_report_items", ["show_report_id", "sort_order"], { name: "show_report_items_report" });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.dropTable("show_report_items");
  await qi.removeColumn("show_reports", "sent_by");
  await qi.removeColumn("show_reports", "sent_at");
}

module.exports = { up, down };
