"use strict";
// The plot's own tables: acting areas (polygons the coverage study reads), landmarks (named lines
// the focus charts use to word shutter cuts) and uploads (groundplan underlays and other files).

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const id = () => ({ type: S.INTEGER, autoIncrement: true, primaryKey: true });
  const version = () => ({ type: S.INTEGER, allowNull: false, defaultValue: 1 });
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

  await qi.createTable("area_zones", {
    id: id(),
    production_id: production(),
    name: { type: S.STRING(60), allowNull: false },
    polygon: { type: S.JSON, allowNull: false },
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("area_zones", ["production_id", "name"], { unique: true, name: "area_zones_production_name" });

  await qi.createTable("landmarks", {
    id: id(),
    production_id: production(),
    name: { type: S.STRING(60), allowNull: false },
    x1: { type: S.DOUBLE, allowNull: false },
    y1: { type: S.DOUBLE, allowNull: false },
    x2: { type: S.DOUBLE, allowNull: false },
    y2: { type: S.DOUBLE, allowNull: false },
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("landmarks", ["production_id", "name"], { unique: true, name: "landmarks_production_name" });

  await qi.createTable("uploads", {
    id: id(),
    production_id: production(),
    kind: { type: S.ENUM("underlay", "import"), allowNull: false },
    file_name: { type: S.STRING(200), allowNull: false },
    storage_key: { type: S.STRING(200), allowNull: false, unique: true },
    content_type: { type: S.STRING(60), allowNull: false },
    size_bytes: { type: S.INTEGER, allowNull: false },
    width_px: { type: S.INTEGER, allowNull: true },
    height_px: { type: S.INTEGER, allowNull: true },
    metres_per_pixel: { type: S.DOUBLE, allowNull: false, defaultValue: 0.01 },
    offset_x: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    offset_y: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    rotation_deg: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    opacity: { type: S.DOUBLE, allowNull: false, defaultValue: 0.5 },
    locked: { type: S.BOOLEAN, allowNull: false, defaultValue: false },
    uploaded_by: {
      type: S.INTEGER,
      allowNull: true,
      references: { model: "users", key: "id" },
      onDelete: "SET NULL",
      onUpdate: "CASCADE",
    },
    version: version(),
    ...stamps(),
  });
  await qi.addIndex("uploads", ["production_id", "kind"], { name: "uploads_production_kind" });
}

async function down(qi) {
  await qi.dropTable("uploads");
  await qi.dropTable("landmarks");
  await qi.dropTable("area_zones");
}

module.exports = { up, down };
