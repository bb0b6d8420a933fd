"use strict";
// Demo data: an invented production ("Salt and Lantern") in an invented venue (the Quillmere
// Playhouse), with invented people. Fixture-type figures are typical values from memory for
// generic units, not any maker's data; they exist to make the demo look like a real rig.
const bcrypt = require("bcryptjs");

const DEMO_PASSWORD = "lantern-demo-2026";
const PEOPLE = [
  ["maren.oduya@quillmere.test", "Maren Oduya", "designer", true],
  ["teodor.brask@quillmere.test", "Teodor Brask", "electrician", false],
  ["ines.calloway@quillmere.test", "Ines Calloway", "stage_manager", false],
  ["rafe.lindqvist@quillmere.test", "Rafe Lindqvist", "viewer", false],
];

// Typical values from memory (generic units, no brand). cd is the peak at the widest cone; a zoom's cdNarrow
// is its peak at the narrowest (it brightens as it narrows).
const TYPES = [
  {
    name: "Profile 19°",
    family: "profile",
    cone: [19, 19],
    soft: 2,
    cd: 70000,
    w: 750,
    kg: 8,
    modes: [{ name: "dimmer", footprint: 1 }],
    ap: 0.15,
    frame: "7.5 in",
    gobo: "B",
    drop: 0.45,
  },
  {
    name: "Profile 26°",
    family: "profile",
    cone: [26, 26],
    soft: 2,
    cd: 46000,
    w: 750,
    kg: 7.5,
    modes: [{ name: "dimmer", footprint: 1 }],
    ap: 0.13,
    frame: "6.25 in",
    gobo: "B",
    drop: 0.45,
  },
  {
    name: "Profile 36°",
    family: "profile",
    cone: [36, 36],
    soft: 2.5,
    cd: 28000,
    w: 750,
    kg: 7.3,
    modes: [{ name: "dimmer", footprint: 1 }],
    ap: 0.11,
    frame: "6.25 in",
    gobo: "B",
    drop: 0.45,
  },
  {
    name: "Zoom profile 25–50°",
    family: "profile",
    cone: [25, 50],
    soft: 3,
    cd: 22000,
    cdNarrow: 55000,
    w: 750,
    kg: 9.5,
    modes: [{ name: "dimmer", footprint: 1 }],
    ap: 0.12,
    frame: "6.25 in",
    gobo: "B",
    drop: 0.5,
  },
  {
    name: "Fresnel 150 mm",
    family: "fresnel",
    cone: [15, 60],
    soft: 8,
    cd: 30000,
    cdNarrow: 110000,
    w: 1000,
    kg: 6,
    modes: [{ name: "dimmer", footprint: 1 }],
    ap: 0.15,
    frame: "7.5 in",
    gobo: null,
    drop: 0.35,
  },
  {
    name: "LED wash, zoom",
    family: "led-wash",
    cone: [15, 45],
    soft: 10,
    cd: 14000,
    cdNarrow: 50000,
    w: 300,
    kg: 9,
    modes: [
      { name: "standard", footprint: 8 },
      { name: "compact", footprint: 4 },
    ],
    ap: 0.2,
    frame: null,
    gobo: null,
    drop: 0.55,
  },
  {
    name: "LED cyc light",
    family: "cyc",
    cone: [100, 100],
    soft: 30,
    cd: 3500,
    w: 200,
    kg: 8,
    modes: [{ name: "5-slot", footprint: 5 }],
    ap: 0.3,
    frame: null,
    gobo: null,
    drop: 0.4,
  },
];

const AREAS = [
  ["Area 1", -3, 1.5],
  ["Area 2", 0, 1.5],
  ["Area 3", 3, 1.5],
  ["Area 4", -3, 4.0],
  ["Area 5", 0, 4.0],
  ["Area 6", 3, 4.0],
  ["Area 7", -3, 6.5],
  ["Area 8", 0, 6.5],
  ["Area 9", 3, 6.5],
];

// Colours are plain words of our own (users type whatever their shop uses; a shop pulls stock by that text).
// name, kind, x1, y1, x2, y2, trim, rated load (kg), units: [typeName, count, purpose, colour, gobo]
const POSITIONS = [
  [
    "FOH Bridge 2",
    "foh-bridge",
    -6,
    -12,
    6,
    -12,
    8.5,
    400,
    [
      ["Profile 19°", 10, "front light", "½ CTO", null],
      ["Profile 19°", 4, "specials", "N/C", "leaf breakup"],
    ],
  ],
  ["FOH Bridge 1", "foh-bridge", -5, -7, 5, -7, 7.5, 400, [["Profile 26°", 14, "front light", "¼ CTB", null]]],
  ["Box Boom SL", "box-boom", 7.5, -4, null, null, 6, 150, [["Profile 36°", 4, "box-boom wash", "pale amber", null]]],
  ["Box Boom SR", "box-boom", -7.5, -4, null, null, 6, 150, [["Profile 36°", 4, "box-boom wash", "pale blue", null]]],
  [
    "1st Electric",
    "overhead-pipe",
    -7,
    1.0,
    7,
    1.0,
    7,
    250,
    [
      ["Fresnel 150 mm", 8, "top light", "straw + light frost", null],
      ["LED wash, zoom", 8, "colour wash", "N/C", null],
      ["Zoom profile 25–50°", 4, "texture", "N/C", "breakup"],
    ],
  ],
  [
    "2nd Electric",
    "overhead-pipe",
    -7,
    3.5,
    7,
    3.5,
    7.5,
    250,
    [
      ["Fresnel 150 mm", 8, "top light", "straw + light frost", null],
      ["LED wash, zoom", 6, "colour wash", "N/C", null],
      ["Profile 26°", 2, "specials", "full CTB + light frost", null],
    ],
  ],
  [
    "3rd Electric",
    "overhead-pipe",
    -7,
    6.0,
    7,
    6.0,
    7.5,
    250,
    [
      ["Fresnel 150 mm", 8, "back light", "deep indigo", null],
      ["LED wash, zoom", 6, "colour wash", "N/C", null],
      ["Profile 26°", 2, "specials", "½ CTO", null],
    ],
  ],
  ["4th Electric", "flying-electric", -7, 8.5, 7, 8.5, 7, 300, [["LED cyc light", 10, "cyc wash", "N/C", null]]],
  ["Boom SL 1", "boom", 6.5, 2, null, null, 4.5, 60, [["Profile 36°", 5, "side light", "pale lavender", null]]],
  ["Boom SR 1", "boom", -6.5, 2, null, null, 4.5, 60, [["Profile 36°", 5, "side light", "pale lavender", null]]],
  ["Boom SL 2", "boom", 6.5, 5, null, null, 4, 60, [["Profile 36°", 4, "side light", "pale lavender", null]]],
  ["Boom SR 2", "boom", -6.5, 5, null, null, 4, 60, [["Profile 36°", 4, "side light", "pale lavender", null]]],
];

// Shutter cuts in plan (label, two points), by position and purpose: the front light kept off the lip, the
// upstage specials cut short of the cyc, the texture kept behind the setting line.
const CUTS = {
  "FOH Bridge 2/front light": [{ label: "bottom", a: { x: -7, y: -1.45 }, b: { x: 7, y: -1.45 } }],
  "FOH Bridge 1/front light": [{ label: "bottom", a: { x: -7, y: -1.45 }, b: { x: 7, y: -1.45 } }],
  "3rd Electric/specials": [{ label: "top", a: { x: -4, y: 8.2 }, b: { x: 4, y: 8.2 } }],
  "1st Electric/texture": [{ label: "top", a: { x: -6, y: 0.3 }, b: { x: 6, y: 0.3 } }],
};

const pad = (s) => s.replace(/\d+/g, (d) => d.padStart(6, "0"));
const round = (n, k = 3) => Math.round(n * 10 ** k) / 10 ** k;

async function up(qi) {
  const now = new Date();
  const stamp = { created_at: now, updated_at: now };
  const hash = await bcrypt.hash(DEMO_PASSWORD, 11);

  await qi.bulkInsert(
    "users",
    PEOPLE.map(([email, name]) => ({ email, name, password_hash: hash, version: 1, ...stamp })),
  );
  const users = await qi.sequelize.query("SELECT id, email FROM users", { type: "SELECT" });
  const userId = (email) => users.find((u) => u.email === email).id;

  await qi.bulkInsert("productions", [
    {
      name: "Salt and Lantern",
      venue: "Quillmere Playhouse",
      display_units: "metric",
      datum_name: "setting line",
      head_height: 1.7,
      back_wall_y: 9.5,
      proscenium_width: 10,
      proscenium_height: 6.5,
      stage_width: 17,
      stage_depth: 9,
      apron_depth: 1.5,
      voltage: 230,
      derating: 0.8,
      numbering_rule: "from-stage-left",
      version: 1,
      ...stamp,
    },
  ]);
  const [{ id: productionId }] = await qi.sequelize.query(
    "SELECT id FROM productions WHERE name = 'Salt and Lantern' ORDER BY id DESC LIMIT 1",
    { type: "SELECT" },
  );

  await qi.bulkInsert(
    "memberships",
    PEOPLE.map(([email, , role, owner]) => ({
      user_id: userId(email),
      production_id: productionId,
      role,
      is_owner: owner,
      version: 1,
      ...stamp,
    })),
  );

  await qi.bulkInsert(
    "fixture_types",
    TYPES.map((t) => ({
      production_id: productionId,
      name: t.name,
      family: t.family,
      cone_min_deg: t.cone[0],
      cone_max_deg: t.cone[1],
      default_softness_deg: t.soft,
      peak_candela: t.cd,
      peak_candela_narrow: t.cdNarrow ?? null,
      wattage: t.w,
      weight_kg: t.kg,
      dmx_modes: JSON.stringify(t.modes),
      lens_aperture_m: t.ap,
      frame_size: t.frame,
      gobo_size: t.gobo,
      lens_drop_m: t.drop,
      cells: 1,
      version: 1,
      ...stamp,
    })),
  );
  const types = await qi.sequelize.query(`SELECT id, name FROM fixture_types WHERE production_id = ${productionId}`, {
    type: "SELECT",
  });
  const typeByName = new Map(types.map((t) => [t.name, t.id]));

  await qi.bulkInsert(
    "focus_points",
    AREAS.map(([name, x, y]) => ({ production_id: productionId, name, x, y, version: 1, ...stamp })),
  );
  const points = await qi.sequelize.query(
    `SELECT id, name, x, y FROM focus_points WHERE production_id = ${productionId}`,
    { type: "SELECT" },
  );

  await qi.bulkInsert(
    "positions",
    POSITIONS.map(([name, kind, x1, y1, x2, y2, trim, load], i) => ({
      production_id: productionId,
      name,
      kind,
      x1,
      y1,
      x2,
      y2,
      trim_height: trim,
      rated_load_kg: load,
      sort_order: i,
      version: 1,
      ...stamp,
    })),
  );
  const positions = await qi.sequelize.query(`SELECT id, name FROM positions WHERE production_id = ${productionId}`, {
    type: "SELECT",
  });
  const positionId = new Map(positions.map((p) => [p.name, p.id]));

  const fixtures = [];
  let channel = 1;
  let address = 1;
  let universe = 1;
  let circuit = 1;
  for (const [positionIndex, [name, kind, x1, y1, x2, y2, , , groups]] of POSITIONS.entries()) {
    const units = groups.flatMap(([typeName, count, purpose, colour, gobo]) =>
      Array.from({ length: count }, () => ({ typeName, purpose, colour, gobo })),
    );
    units.forEach((u, i) => {
      const t = TYPES.find((tt) => tt.name === u.typeName);
      const vertical = x2 === null;
      // Overhead units run from stage left (positive x) to stage right, the production's numbering rule.
      const x = vertical ? x1 : round(x2 - ((x2 - x1) * (i + 0.5)) / units.length, 2);
      const y = y1;
      const lensHeight = vertical ? round(0.6 + i * 0.9, 2) : null;
      const footprint = t.modes[0].footprint;
      if (address + footprint - 1 > 512) {
        universe += 1;
        address = 1;
      }
      // Aim: area lights at the nearest focus point; cyc lights straight upstage at the cyc.
      const nearest = points.reduce((best, p) =>
        Math.hypot(p.x - x, p.y - (y + (y < 0 ? 6 : 0))) < Math.hypot(best.x - x, best.y - (y + (y < 0 ? 6 : 0)))
          ? p
          : best,
      );
      const isCyc = t.family === "cyc";
      const isSide = vertical && kind === "boom";
      fixtures.push({
        production_id: productionId,
        position_id: positionId.get(name),
        fixture_type_id: typeByName.get(u.typeName),
        focus_point_id: isCyc || isSide ? null : nearest.id,
        unit_number: String(i + 1),
        unit_sort: pad(String(i + 1)),
        channel: channel++,
        universe,
        address,
        // Dimmers as a rack would number them (each position starts a new block of 24), not circuit + 1.
        dmx_mode: t.modes[0].name,
        footprint,
        circuit: String(100 + circuit++),
        dimmer: footprint === 1 ? String(1 + positionIndex * 24 + i) : null,
        colour: u.colour,
        gobo: u.gobo,
        purpose: u.purpose,
        x,
        y,
        lens_height: lensHeight,
        focus_x: isCyc ? x : isSide ? round(-x * 0.4, 2) : null,
        focus_y: isCyc ? 9.3 : isSide ? y : null,
        aim: isSide || (!isCyc && y < 0) ? "head" : "deck",
        cone_deg: t.cone[0] === t.cone[1] ? null : round(t.cone[0] + (t.cone[1] - t.cone[0]) * 0.4, 1),
        softness_deg: null,
        shutter_cuts: CUTS[`${name}/${u.purpose}`] ? JSON.stringify(CUTS[`${name}/${u.purpose}`]) : null,
        iris_percent: null,
        notes: null,
        focus_notes: null,
        hung: i % 3 !== 0,
        focused: i % 5 === 0,
        version: 1,
        ...stamp,
      });
      address += footprint;
    });
  }
  await qi.bulkInsert("fixtures", fixtures);

  // 30 cues: a preset, scenes with sparse moves (tracking), a few follows, a blackout.
  const labels = [
    "House to half",
    "Preset",
    "Dawn on the harbour",
    "Fishermen enter",
    "Lantern lit",
    "Market morning",
    "Storm builds",
    "Storm peak",
    "Lightning",
    "Calm after",
  ];
  const cues = [];
  for (let i = 0; i < 30; i++) {
    const n = i < 2 ? i + 0.5 : i - 1;
    cues.push({
      production_id: productionId,
      number: n,
      label: labels[i % labels.length] + (i >= labels.length ? ` (${Math.floor(i / labels.length) + 1})` : ""),
      page: String(2 + i * 3),
      up_time: [5, 3, 8, 2.5, 10][i % 5],
      down_time: i % 4 === 0 ? 7 : null,
      delay: 0,
      follow: i === 8 || i === 17 ? 2 : null,
      link: null,
      block: i === 1,
      call_note: i === 2 ? "Standby on the foghorn" : null,
      version: 1,
      ...stamp,
    });
  }
  await qi.bulkInsert("cues", cues);
  const cueRows = await qi.sequelize.query(
    `SELECT id FROM cues WHERE production_id = ${productionId} ORDER BY number`,
    { type: "SELECT" },
  );
  const levels = [];
  cueRows.forEach((cue, i) => {
    // Deterministic sparse moves: each cue touches a handful of channels.
    for (let k = 0; k < 6 + (i % 5); k++) {
      const ch = 1 + ((i * 17 + k * 23) % (channel - 1));
      levels.push({
        cue_id: cue.id,
        channel: ch,
        level: i === cueRows.length - 1 ? 0 : ((i * 13 + k * 29) % 11) * 10,
        ...stamp,
      });
    }
  });
  const seen = new Set();
  await qi.bulkInsert(
    "cue_levels",
    levels.filter((l) => {
      const key = `${l.cue_id}:${l.channel}`;
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    }),
  );
  // Cue 7 (Lightning) flashes three of its channels in a part of their own: snap up, slower fade out.
  const lightning = cueRows[8];
  const flash = [...new Set(levels.filter((l) => l.cue_id === lightning.id).map((l) => l.channel))].slice(0, 3);
  await qi.bulkInsert("cue_parts", [
    {
      cue_id: lightning.id,
      part: 2,
      label: "flash",
      up_time: 0,
      down_time: 1.5,
      delay: 0.5,
      channels: JSON.stringify(flash),
      ...stamp,
    },
  ]);
}

async function down(qi) {
  // Fixtures first: their type reference is RESTRICT, so a type in use cannot vanish under them.
  await qi.sequelize.query(
    "DELETE f FROM fixtures f JOIN productions p ON p.id = f.production_id WHERE p.name = 'Salt and Lantern'",
  );
  await qi.bulkDelete("productions", { name: "Salt and Lantern" });
  await qi.bulkDelete("users", { email: PEOPLE.map((p) => p[0]) });
}

module.exports = { up, down };
