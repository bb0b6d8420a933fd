"use strict";
// Server-side session records (a sealed cookie alone cannot be ended: sign-out and a password change
// delete the record, and a replayed cookie finds none) and sign-in attempt counters kept in MariaDB, so
// that the limit holds across every app server sharing the database.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.createTable("user_sessions", {
    // SHA-256 of the random token in the sealed cookie: a copy of this table cannot sign anyone in.
    token_hash: { type: S.CHAR(64), allowNull: false, primaryKey: true },
    user_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    created_at: { type: S.DATE(3), allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP(3)") },
    expires_at: { type: S.DATE(3), allowNull: false },
  });
  await qi.addIndex("user_sessions", ["user_id"], { name: "user_sessions_user" });
  await qi.createTable("sign_in_attempts", {
    // "account:<e-mail>" or "address:<ip>"
    limit_key: { type: S.STRING(300), allowNull: false, primaryKey: true },
    failures: { type: S.INTEGER, allowNull: false, defaultValue: 0 },
    window_started_at: { type: S.DATE(3), allowNull: false },
  });
}

async function down(qi) {
  await qi.dropTable("sign_in_attempts");
  await qi.dropTable("user_sessions");
}

module.exports = { up, down };
