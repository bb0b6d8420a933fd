"use strict";
// Notes from rehearsals and performances (on the production, a position, a fixture, a cue or a focus
// point), and the production's "current cue" that a new note picks up.

const SUBJECTS = ["production", "position", "fixture", "cue", "focus_point"];
const KINDS = ["work", "focus", "cue", "paperwork", "general"];
const PRIORITIES = ["low", "normal", "high"];
const STATUSES = ["open", "in_progress", "done", "cannot_do"];
const ORIGINS = ["written", "channel_check", "show_report", "spot"];

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const user = (allowNull) => ({
    type: S.INTEGER,
    allowNull,
    references: { model: "users", key: "id" },
    onDelete: allowNull ? "SET NULL" : "CASCADE",
    onUpdate: "CASCADE",
  });
  const flag = () => ({ type: S.BOOLEAN, allowNull: false, defaultValue: false });
  await qi.createTable("notes", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    production_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "productions", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    subject: { type: S.ENUM(...SUBJECTS), allowNull: false },
    // No foreign key: the subject may be any of four tables; a note outlives a deleted subject.
    subject_id: { type: S.INTEGER, allowNull: true },
    body: { type: S.TEXT, allowNull: false },
    kind: { type: S.ENUM(...KINDS), allowNull: false },
    priority: { type: S.ENUM(...PRIORITIES), allowNull: false, defaultValue: "normal" },
    owner_id: user(true),
    status: { type: S.ENUM(...STATUSES), allowNull: false, defaultValue: "open" },
    needs_access: flag(),
    needs_dark: flag(),
    needs_designer: flag(),
    needs_isolated: flag(),
    due_date: { type: S.DATEONLY, allowNull: true },
    due_session: { type: S.STRING(80), allowNull: true },
    author_id: user(false),
    running_cue_id: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "cues", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    running_cue_number: { type: S.STRING(20), allowNull: true },
    origin: { type: S.ENUM(...ORIGINS), allowNull: false, defaultValue: "written" },
    show_report_id: { type: S.INTEGER, allowNull: true },
    closed_by: user(true),
    closed_at: { type: S.DATE, allowNull: true },
    version: { type: S.INTEGER, allowNull: false, defaultValue: 1 },
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  });
  await qi.addIndex("notes", ["production_id", "status", "kind"], { name: "notes_production_status_kind" });
  await qi.addIndex("notes", ["production_id", "subject", "subject_id"], { name: "notes_production_subject" });

  await qi.addColumn("productions", "current_cue_id", { type: S.INTEGER, allowNull: true });
  await qi.addConstraint("productions", {
    type: "foreign key",
    name: "productions_current_cue_fk",
    fields: ["current_cue_id"],
    references: { table: "cues", field: "id" },
    onDelete: "SET NULL",
    onUpdate: "CASCADE",
  });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.removeConstraint("productions", "productions_current_cue_fk");
  await qi.removeColumn("productions", "current_cue_id");
  await qi.dropTable("notes");
}

module.exports = { up, down };
