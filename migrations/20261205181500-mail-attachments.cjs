"use strict";
// Attachments of a queued message (a revision's cue sheet, rig list, add / return list), kept with the
// message so a retry sends the same files. Named to run after the mail queue's own migration
// (20261205170000), which a fresh database needs first.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  // JSON: [{ filename, contentType, base64 }]; LONGTEXT because a workbook can pass TEXT's 64 KB.
  await qi.addColumn("outgoing_mail", "attachments", { type: S.TEXT("long"), allowNull: true });
}

async function down(qi) {
  await qi.removeColumn("outgoing_mail", "attachments");
}

module.exports = { up, down };
