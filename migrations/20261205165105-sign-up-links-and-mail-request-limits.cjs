"use strict";
// Sign-up by e-mailed link (an account is made only once its address has answered), and counters for the
// requests that send mail (sign-up and password reset) per address and per client, kept in MariaDB so
// the limits hold across every app server sharing the database.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.createTable("sign_up_links", {
    // SHA-256 of the random token in the link: a copy of this table opens no door.
    token_hash: { type: S.CHAR(64), allowNull: false, primaryKey: true },
    email: { type: S.STRING(254), allowNull: false },
    // The name typed on the request form, offered again on the finishing form.
    name: { type: S.STRING(120), allowNull: false },
    expires_at: { type: S.DATE(3), allowNull: false },
    used_at: { type: S.DATE(3), allowNull: true },
    created_at: { type: S.DATE(3), allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP(3)") },
  });
  await qi.addIndex("sign_up_links", ["email"], { name: "sign_up_links_email" });
  await qi.createTable("mail_request_counts", {
    // "<action>:email:<address>" or "<action>:client:<ip>", action being sign-up or reset
    limit_key: { type: S.STRING(300), allowNull: false, primaryKey: true },
    requests: { type: S.INTEGER, allowNull: false, defaultValue: 0 },
    window_started_at: { type: S.DATE(3), allowNull: false },
  });
}

async function down(qi) {
  await qi.dropTable("mail_request_counts");
  await qi.dropTable("sign_up_links");
}

module.exports = { up, down };
