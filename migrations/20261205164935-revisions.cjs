"use strict";
// Issued revisions of a production's paperwork: a letter or label, what it was issued for, a note, and a
// snapshot of the paperwork data (fixtures, positions, types, cues with levels) as it stood, so any two
// can be compared later however the rig has moved on. Also each member's choice to get (or not) the
// revision e-mail, and the rental shop's address that receives the add / return list.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  await qi.createTable("revisions", {
    id: { type: S.INTEGER, autoIncrement: true, primaryKey: true },
    production_id: {
      type: S.INTEGER,
      allowNull: false,
      references: { model: "productions", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    // Issue order within the production (1, 2, 3 …): "the previous revision" is the one just before.
    sequence: { type: S.INTEGER, allowNull: false },
    label: { type: S.STRING(40), allowNull: false },
    issued_for: { type: S.ENUM("bid", "hang", "focus", "tech", "archive"), allowNull: false },
    note: { type: S.TEXT, allowNull: true },
    issued_by_user_id: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "users", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    // A large rig's snapshot runs to a few megabytes: LONGTEXT holding JSON, parsed by the data layer.
    snapshot: { type: S.TEXT("long"), allowNull: false },
    // The counts of what changed since the previous revision, kept so the list needs no snapshot.
    summary: { type: S.TEXT, allowNull: false },
    created_at: { type: S.DATE(3), allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP(3)") },
  });
  await qi.addIndex("revisions", ["production_id", "sequence"], {
    name: "revisions_production_sequence",
    unique: true,
  });
  await qi.addIndex("revisions", ["production_id", "label"], { name: "revisions_production_label", unique: true });

  await qi.addColumn("memberships", "revision_mail", { type: S.BOOLEAN, allowNull: false, defaultValue: true });
  await qi.addColumn("productions", "shop_email", { type: S.STRING(254), allowNull: true });
}

async function down(qi) {
  await qi.removeColumn("productions", "shop_email");
  await qi.removeColumn("memberships", "revision_mail");
  await qi.dropTable("revisions");
}

module.exports = { up, down };
