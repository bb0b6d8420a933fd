"use strict";
// Invitations to join a production, password-reset links, and the outgoing mail queue. Links carry a
// random token; the tables hold only its SHA-256, so a copy of the database opens no door.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const stamps = {
    created_at: { type: S.DATE(3), allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP(3)") },
    updated_at: { type: S.DATE(3), allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP(3)") },
  };
  await qi.createTable("invitations", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    production_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "productions", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    email: { type: S.STRING(254), allowNull: false },
    role: { type: S.ENUM("designer", "electrician", "stage_manager", "viewer"), allowNull: false },
    token_hash: { type: S.CHAR(64), allowNull: false, unique: true },
    invited_by_user_id: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "users", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    expires_at: { type: S.DATE(3), allowNull: false },
    used_at: { type: S.DATE(3), allowNull: true },
    used_by_user_id: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "users", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    withdrawn_at: { type: S.DATE(3), allowNull: true },
    version: { type: S.INTEGER, allowNull: false, defaultValue: 1 },
    ...stamps,
  });
  await qi.addIndex("invitations", ["production_id", "email"], { name: "invitations_production_email" });

  await qi.createTable("password_resets", {
    token_hash: { type: S.CHAR(64), allowNull: false, primaryKey: true },
    user_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    expires_at: { type: S.DATE(3), allowNull: false },
    used_at: { type: S.DATE(3), allowNull: true },
    created_at: { type: S.DATE(3), allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP(3)") },
  });
  await qi.addIndex("password_resets", ["user_id"], { name: "password_resets_user" });

  await qi.createTable("outgoing_mail", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    // The production it concerns (null for account mail such as a password reset): the outbox page lists a production's own.
    production_id: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "productions", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    to_address: { type: S.STRING(254), allowNull: false },
    subject: { type: S.STRING(300), allowNull: false },
    body_text: { type: S.TEXT, allowNull: false },
    status: { type: S.ENUM("queued", "sent"), allowNull: false, defaultValue: "queued" },
    attempts: { type: S.INTEGER, allowNull: false, defaultValue: 0 },
    last_error: { type: S.STRING(500), allowNull: true },
    next_attempt_at: { type: S.DATE(3), allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP(3)") },
    sent_at: { type: S.DATE(3), allowNull: true },
    ...stamps,
  });
  await qi.addIndex("outgoing_mail", ["status", "next_attempt_at"], { name: "outgoing_mail_due" });
}

async function down(qi) {
  await qi.dropTable("outgoing_mail");
  await qi.dropTable("password_resets");
  await qi.dropTable("invitations");
}

module.exports = { up, down };
