"use strict";
// A queued message is claimed before it is handed to the mail server: `sending_until` holds the claim, so
// the immediate send, the retry timer and a second app server never send the same message twice. A claim
// left by a server that stopped mid-send runs out and the message is tried again.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.addColumn("outgoing_mail", "sending_until", { type: S.DATE(3), allowNull: true });
}

async function down(qi) {
  await qi.removeColumn("outgoing_mail", "sending_until");
}

module.exports = { up, down };
