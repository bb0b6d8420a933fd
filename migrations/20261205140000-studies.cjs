"use strict";
// The studies' own data: performer marks and scenery panels for the shadow study, the production's colour
// list (colour text → transmission) for the coverage study, and the two heights every study plane is
// measured with (face height, and a show deck standing on the stage floor).

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const id = () => ({ type: S.INTEGER, autoIncrement: true, primaryKey: true });
  const version = () => ({ type: S.INTEGER, allowNull: false, defaultValue: 1 });
  const metres = () => ({ type: S.DOUBLE, allowNull: false });
  const stamps = () => ({
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  });
  const production = () => ({
    type: S.INTEGER,
    allowNull: false,
    references: { model: "productions", key: "id" },
    onDelete: "CASCADE",
    onUpdate: "CASCADE",
  });

  await qi.createTable("performer_marks", {
    id: id(),
    production_id: production(),
    name: { type: S.STRING(60), allowNull: false },
    x: metres(),
    y: metres(),
    height: { ...metres(), defaultValue: 1.75 },
    shoulder_width: { ...metres(), defaultValue: 0.5 },
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("performer_marks", ["production_id", "name"], {
    unique: true,
    name: "performer_marks_production_name",
  });

  await qi.createTable("scenic_panels", {
    id: id(),
    production_id: production(),
    name: { type: S.STRING(60), allowNull: false },
    x1: metres(),
    y1: metres(),
    x2: metres(),
    y2: metres(),
    height: metres(),
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("scenic_panels", ["production_id", "name"], {
    unique: true,
    name: "scenic_panels_production_name",
  });

  await qi.createTable("colour_transmissions", {
    id: id(),
    production_id: production(),
    // The colour text exactly as the team types it in the rig; the unique index makes it the row's name.
    name: { type: S.STRING(120), allowNull: false },
    percent: { type: S.DOUBLE, allowNull: false },
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("colour_transmissions", ["production_id", "name"], {
    unique: true,
    name: "colour_transmissions_production_name",
  });

  await qi.addColumn("productions", "face_height", { type: S.DOUBLE, allowNull: false, defaultValue: 1.55 });
  await qi.addColumn("productions", "show_deck_height", { type: S.DOUBLE, allowNull: false, defaultValue: 0 });
}

/** @param {import('sequelize').QueryInterface} qi */
async function down(qi) {
  await qi.removeColumn("productions", "show_deck_height");
  await qi.removeColumn("productions", "face_height");
  await qi.dropTable("colour_transmissions");
  await qi.dropTable("scenic_panels");
  await qi.dropTable("performer_marks");
}

module.exports = { up, down };
