"use strict";

// An archived production leaves its members' list until someone restores it; nothing of it is removed.
/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(qi, S) {
    await qi.addColumn("productions", "archived_at", { type: S.DATE, allowNull: true, defaultValue: null });
  },
  async down(qi) {
    await qi.removeColumn("productions", "archived_at");
  },
};
