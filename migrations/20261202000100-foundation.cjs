"use strict";
// Users, productions, memberships, the rig (positions, fixture types, fixtures, focus points),
// cues with their levels, and the change log. Every editable row carries `version` for
// optimistic locking.

/** @param {import('sequelize').QueryInterface} qi @param {typeof import('sequelize')} S */
async function up(qi, S) {
  const id = { type: S.INTEGER, autoIncrement: true, primaryKey: true };
  const version = { type: S.INTEGER, allowNull: false, defaultValue: 1 };
  const stamps = {
    created_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
    updated_at: { type: S.DATE, allowNull: false, defaultValue: S.literal("CURRENT_TIMESTAMP") },
  };
  const ref = (table, onDelete = "CASCADE", allowNull = false) => ({
    type: S.INTEGER,
    allowNull,
    references: { model: table, key: "id" },
    onDelete,
    onUpdate: "CASCADE",
  });
  const metres = (allowNull = true, defaultValue) => ({
    type: S.DOUBLE,
    allowNull,
    ...(defaultValue !== undefined ? { defaultValue } : {}),
  });

  await qi.createTable("users", {
    id,
    email: { type: S.STRING(254), allowNull: false, unique: true },
    name: { type: S.STRING(120), allowNull: false },
    password_hash: { type: S.STRING(100), allowNull: false },
    version,
    ...stamps,
  });

  await qi.createTable("productions", {
    id,
    name: { type: S.STRING(160), allowNull: false },
    venue: { type: S.STRING(160), allowNull: false, defaultValue: "" },
    display_units: { type: S.ENUM("metric", "imperial"), allowNull: false, defaultValue: "metric" },
    datum_name: { type: S.STRING(60), allowNull: false, defaultValue: "setting line" },
    head_height: metres(false, 1.7),
    back_wall_y: metres(false, 10),
    proscenium_width: metres(false, 10),
    proscenium_height: metres(false, 6),
    stage_width: metres(false, 16),
    stage_depth: metres(false, 10),
    apron_depth: metres(false, 1.5),
    voltage: { type: S.INTEGER, allowNull: false, defaultValue: 230 },
    derating: { type: S.DOUBLE, allowNull: false, defaultValue: 0.8 },
    numbering_rule: {
      type: S.ENUM("from-stage-left", "from-stage-right"),
      allowNull: false,
      defaultValue: "from-stage-left",
    },
    version,
    ...stamps,
  });

  await qi.createTable("memberships", {
    id,
    user_id: ref("users"),
    production_id: ref("productions"),
    role: { type: S.ENUM("designer", "electrician", "stage_manager", "viewer"), allowNull: false },
    is_owner: { type: S.BOOLEAN, allowNull: false, defaultValue: false },
    version,
    ...stamps,
  });
  await qi.addIndex("memberships", ["user_id", "production_id"], { unique: true, name: "memberships_user_production" });
  await qi.addIndex("memberships", ["production_id"], { name: "memberships_production" });

  await qi.createTable("positions", {
    id,
    production_id: ref("productions"),
    name: { type: S.STRING(80), allowNull: false },
    kind: {
      type: S.ENUM(
        "overhead-pipe",
        "truss",
        "boom",
        "ladder",
        "box-boom",
        "foh-bridge",
        "foh-rail",
        "pipe-end",
        "floor",
        "flying-electric",
      ),
      allowNull: false,
    },
    x1: metres(false),
    y1: metres(false),
    x2: metres(),
    y2: metres(),
    trim_height: metres(false),
    rated_load_kg: { type: S.DOUBLE, allowNull: true },
    sort_order: { type: S.INTEGER, allowNull: false, defaultValue: 0 },
    version,
    ...stamps,
  });
  await qi.addIndex("positions", ["production_id", "name"], { unique: true, name: "positions_production_name" });

  await qi.createTable("fixture_types", {
    id,
    production_id: ref("productions"),
    name: { type: S.STRING(80), allowNull: false },
    family: { type: S.STRING(24), allowNull: false },
    cone_min_deg: { type: S.DOUBLE, allowNull: false },
    cone_max_deg: { type: S.DOUBLE, allowNull: false },
    default_softness_deg: { type: S.DOUBLE, allowNull: false, defaultValue: 2 },
    peak_candela: { type: S.DOUBLE, allowNull: false },
    wattage: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    weight_kg: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    dmx_modes: { type: S.JSON, allowNull: false },
    lens_aperture_m: metres(false, 0.15),
    frame_size: { type: S.STRING(40), allowNull: true },
    gobo_size: { type: S.STRING(20), allowNull: true },
    lens_drop_m: metres(false, 0.4),
    cells: { type: S.INTEGER, allowNull: false, defaultValue: 1 },
    version,
    ...stamps,
  });
  await qi.addIndex("fixture_types", ["production_id", "name"], {
    unique: true,
    name: "fixture_types_production_name",
  });

  await qi.createTable("focus_points", {
    id,
    production_id: ref("productions"),
    name: { type: S.STRING(60), allowNull: false },
    x: metres(false),
    y: metres(false),
    version,
    ...stamps,
  });
  await qi.addIndex("focus_points", ["production_id", "name"], { unique: true, name: "focus_points_production_name" });

  await qi.createTable("fixtures", {
    id,
    production_id: ref("productions"),
    position_id: ref("positions"),
    fixture_type_id: ref("fixture_types", "RESTRICT"),
    focus_point_id: ref("focus_points", "SET NULL", true),
    unit_number: { type: S.STRING(12), allowNull: false },
    // Natural-order key for unit numbers (7, 7A, 8, 12A): digits zero-padded, computed in the data layer.
    unit_sort: { type: S.STRING(40), allowNull: false },
    body_key: { type: S.STRING(40), allowNull: true },
    cell: { type: S.INTEGER, allowNull: true },
    channel: { type: S.INTEGER, allowNull: true },
    universe: { type: S.INTEGER, allowNull: true },
    address: { type: S.INTEGER, allowNull: true },
    dmx_mode: { type: S.STRING(40), allowNull: true },
    footprint: { type: S.INTEGER, allowNull: true },
    circuit: { type: S.STRING(20), allowNull: true },
    dimmer: { type: S.STRING(20), allowNull: true },
    colour: { type: S.STRING(60), allowNull: true },
    gobo: { type: S.STRING(60), allowNull: true },
    purpose: { type: S.STRING(120), allowNull: true },
    x: metres(false),
    y: metres(false),
    lens_height: metres(),
    focus_x: metres(),
    focus_y: metres(),
    aim: { type: S.ENUM("deck", "head"), allowNull: false, defaultValue: "deck" },
    cone_deg: { type: S.DOUBLE, allowNull: true },
    softness_deg: { type: S.DOUBLE, allowNull: true },
    shutter_cuts: { type: S.JSON, allowNull: true },
    iris_percent: { type: S.DOUBLE, allowNull: true },
    notes: { type: S.TEXT, allowNull: true },
    focus_notes: { type: S.TEXT, allowNull: true },
    hung: { type: S.BOOLEAN, allowNull: false, defaultValue: false },
    focused: { type: S.BOOLEAN, allowNull: false, defaultValue: false },
    focused_at: { type: S.DATE, allowNull: true },
    focused_by: ref("users", "SET NULL", true),
    version,
    ...stamps,
  });
  await qi.addIndex("fixtures", ["production_id", "position_id", "unit_number"], {
    unique: true,
    name: "fixtures_position_unit",
  });
  await qi.addIndex("fixtures", ["position_id"], { name: "fixtures_position" });
  await qi.addIndex("fixtures", ["fixture_type_id"], { name: "fixtures_type" });
  await qi.addIndex("fixtures", ["focus_point_id"], { name: "fixtures_focus_point" });
  await qi.addIndex("fixtures", ["production_id", "channel"], { name: "fixtures_production_channel" });

  await qi.createTable("cues", {
    id,
    production_id: ref("productions"),
    number: { type: S.DECIMAL(10, 3), allowNull: false },
    label: { type: S.STRING(160), allowNull: false, defaultValue: "" },
    page: { type: S.STRING(20), allowNull: true },
    up_time: { type: S.DOUBLE, allowNull: false, defaultValue: 5 },
    down_time: { type: S.DOUBLE, allowNull: true },
    delay: { type: S.DOUBLE, allowNull: false, defaultValue: 0 },
    follow: { type: S.DOUBLE, allowNull: true },
    link: { type: S.DECIMAL(10, 3), allowNull: true },
    block: { type: S.BOOLEAN, allowNull: false, defaultValue: false },
    call_note: { type: S.TEXT, allowNull: true },
    version,
    ...stamps,
  });
  await qi.addIndex("cues", ["production_id", "number"], { unique: true, name: "cues_production_number" });

  await qi.createTable("cue_levels", {
    id,
    cue_id: ref("cues"),
    channel: { type: S.INTEGER, allowNull: false },
    level: { type: S.DOUBLE, allowNull: false },
    ...stamps,
  });
  await qi.addIndex("cue_levels", ["cue_id", "channel"], { unique: true, name: "cue_levels_cue_channel" });

  await qi.createTable("change_entries", {
    id,
    production_id: ref("productions"),
    user_id: ref("users", "SET NULL", true),
    entity: { type: S.STRING(40), allowNull: false },
    entity_id: { type: S.INTEGER, allowNull: true },
    action: { type: S.ENUM("create", "update", "delete"), allowNull: false },
    before: { type: S.JSON, allowNull: true },
    after: { type: S.JSON, allowNull: true },
    created_at: stamps.created_at,
  });
  await qi.addIndex("change_entries", ["production_id", "created_at"], { name: "change_entries_production_time" });
}

async function down(qi) {
  for (const t of [
    "change_entries",
    "cue_levels",
    "cues",
    "fixtures",
    "focus_points",
    "fixture_types",
    "positions",
    "memberships",
    "productions",
    "users",
  ]) {
    await qi.dropTable(t);
  }
}

module.exports = { up, down };
