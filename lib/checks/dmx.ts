// DMX data check: footprints against the 512 slots of a universe, overlaps, deliberate shares, unpatched
// units, and each data line's device count. Pure: the API feeds it plain rows.
import type { CheckAccessory, CheckFixture, Finding } from "./types";

/** ANSI E1.11 (DMX512-A): up to 512 data slots after the start code, addresses 1–512. */
export const SLOTS_PER_UNIVERSE = 512;
/** ANSI E1.31 (sACN): universes 1–63999. */
export const MAX_UNIVERSE = 63999;
/** EIA-485: 32 unit loads on one segment (from memory); a typical DMX receiver is one unit load. */
export const UNIT_LOADS_PER_SEGMENT = 32;

export type SlotState = "used" | "shared" | "conflict";
export type Segment = { start: number; end: number; state: SlotState };
export type UniverseMap = { universe: number; slotsUsed: number; segments: Segment[] };
export type SharedStart = { universe: number; address: number; labels: string[]; fixtureIds: number[]; why: string };
export type DataLineInput = { id: number; name: string; universe: number | null; fixtureIds: number[] };
export type DataLineResult = {
  id: number;
  name: string;
  universe: number | null;
  devices: number;
  overLimit: boolean;
  lastDevice: string | null;
};
export type DmxResult = {
  universes: UniverseMap[];
  shared: SharedStart[];
  unpatched: { id: number; label: string }[];
  channelsWithoutFixture: number[];
  dataLines: DataLineResult[];
  findings: Finding[];
};

/** A fixture's or accessory's claim on slots. */
type Device = {
  fixtureId: number;
  label: string;
  universe: number;
  start: number;
  footprint: number;
  shareKey: string;
  why: string;
};
/** Devices at one start that deliberately share it: one interval on the universe. */
type Claim = { universe: number; start: number; end: number; members: Device[] };

/** Does a footprint fit a universe? ANSI E1.11: s ≥ 1 and s + N − 1 ≤ 512 (no straddling). */
export function fitsUniverse(address: number, footprint: number): boolean {
  return (
    Number.isInteger(address) &&
    Number.isInteger(footprint) &&
    footprint >= 1 &&
    address >= 1 &&
    address + footprint - 1 <= SLOTS_PER_UNIVERSE
  );
}

function fixtureDevice(f: CheckFixture): Device | null {
  if (f.universe == null || f.address == null || f.footprint == null) return null;
  // Two conventional units on one dimmer slot are a normal "two-fer"; intelligent units share a start
  // only when they are the same type in the same mode (they then answer the same data).
  const conventional = f.loadKind === "lamp" && f.footprint === 1;
  return {
    fixtureId: f.id,
    label: `unit ${f.label}`,
    universe: f.universe,
    start: f.address,
    footprint: f.footprint,
    shareKey: conventional ? "conventional" : `type:${f.fixtureTypeId}:${f.dmxMode ?? ""}:${f.footprint}`,
    why: conventional ? "conventional units on one dimmer" : `same type (${f.typeName}) in the same mode`,
  };
}

function accessoryDevice(a: CheckAccessory, host: CheckFixture | undefined): Device | null {
  if (a.universe == null || a.address == null || a.footprint == null) return null;
  return {
    fixtureId: a.fixtureId,
    label: `${a.kind} on unit ${host?.label ?? "?"}`,
    universe: a.universe,
    start: a.address,
    footprint: a.footprint,
    shareKey: `accessory:${a.kind.toLowerCase()}:${a.footprint}`,
    why: `${a.kind} units of one kind`,
  };
}

/** Groups devices at the same universe and start with the same share key into one claim. */
function toClaims(devices: Device[]): Claim[] {
  const byKey = new Map<string, Claim>();
  for (const d of devices) {
    const key = `${d.universe}/${d.start}/${d.shareKey}`;
    const claim = byKey.get(key);
    if (claim) claim.members.push(d);
    else byKey.set(key, { universe: d.universe, start: d.start, end: d.start + d.footprint - 1, members: [d] });
  }
  return [...byKey.values()];
}

function names(devices: Device[], max = 6): string {
  const shown = devices.slice(0, max).map((d) => d.label);
  return devices.length > max ? `${shown.join(", ")} and ${devices.length - max} more` : shown.join(", ");
}

/** Claims that overlap another claim in the same universe (sweep by start). */
function findConflicts(claims: Claim[]): Map<Claim, Claim[]> {
  const conflicts = new Map<Claim, Claim[]>();
  const add = (a: Claim, b: Claim) => {
    const list = conflicts.get(a);
    if (list) list.push(b);
    else conflicts.set(a, [b]);
  };
  const sorted = [...claims].sort((a, b) => a.universe - b.universe || a.start - b.start);
  let active: Claim[] = [];
  for (const c of sorted) {
    active = active.filter((o) => o.universe === c.universe && o.end >= c.start);
    for (const o of active) {
      add(o, c);
      add(c, o);
    }
    active.push(c);
  }
  return conflicts;
}

function universeMaps(claims: Claim[], conflicts: Map<Claim, Claim[]>): UniverseMap[] {
  const byUniverse = new Map<number, Claim[]>();
  for (const c of claims) byUniverse.set(c.universe, [...(byUniverse.get(c.universe) ?? []), c]);
  return [...byUniverse.entries()]
    .sort(([a], [b]) => a - b)
    .map(([universe, list]) => {
      const state = new Uint8Array(SLOTS_PER_UNIVERSE + 1); // 0 free, 1 used, 2 shared, 3 conflict
      for (const c of list) {
        const s = conflicts.has(c) ? 3 : c.members.length > 1 ? 2 : 1;
        for (let slot = Math.max(1, c.start); slot <= Math.min(SLOTS_PER_UNIVERSE, c.end); slot++)
          state[slot] = Math.max(state[slot], s);
      }
      const segments: Segment[] = [];
      let slotsUsed = 0;
      const label = ["", "used", "shared", "conflict"] as const;
      for (let slot = 1; slot <= SLOTS_PER_UNIVERSE; slot++) {
        if (!state[slot]) continue;
        slotsUsed++;
        const last = segments.at(-1);
        const st = label[state[slot]] as SlotState;
        if (last && last.end === slot - 1 && last.state === st) last.end = slot;
        else segments.push({ start: slot, end: slot, state: st });
      }
      return { universe, slotsUsed, segments };
    });
}

export function checkDataLines(
  lines: DataLineInput[],
  fixtures: Map<number, CheckFixture>,
): { results: DataLineResult[]; findings: Finding[] } {
  const findings: Finding[] = [];
  const results = lines.map((line) => {
    // A multi-cell body is one device on the line, however many cells (rows) it has.
    const seen = new Set<string>();
    const units: CheckFixture[] = [];
    for (const id of line.fixtureIds) {
      const f = fixtures.get(id);
      if (!f) continue;
      const key = f.bodyKey ?? `#${f.id}`;
      if (seen.has(key)) continue;
      seen.add(key);
      units.push(f);
    }
    const subject = `Data line ${line.name}`;
    const last = units.at(-1) ?? null;
    const overLimit = units.length > UNIT_LOADS_PER_SEGMENT;
    if (overLimit) {
      findings.push({
        area: "dmx",
        severity: "error",
        subject,
        unitNote: `data line ${line.name} over ${UNIT_LOADS_PER_SEGMENT} devices`,
        message: `${units.length} devices on one run: EIA-485 allows ${UNIT_LOADS_PER_SEGMENT} unit loads per segment (one device is usually one unit load). Split the run with a DMX splitter or buffer.`,
        fixtureIds: units.map((u) => u.id),
      });
    }
    if (last)
      findings.push({
        area: "dmx",
        severity: "info",
        subject,
        message: `Terminate the last device on the run (unit ${last.label}) with a DMX terminator.`,
        fixtureIds: [last.id],
      });
    else findings.push({ area: "dmx", severity: "info", subject, message: "No units on this run yet." });
    if (line.universe != null) {
      const elsewhere = units.filter((u) => u.universe != null && u.universe !== line.universe);
      if (elsewhere.length)
        findings.push({
          area: "dmx",
          severity: "warning",
          subject,
          message: `The run carries universe ${line.universe} but ${elsewhere.map((u) => `unit ${u.label} (universe ${u.universe})`).join(", ")} ${elsewhere.length === 1 ? "is" : "are"} patched to another universe.`,
          fixtureIds: elsewhere.map((u) => u.id),
          unitNote: `on data line ${line.name} but patched to another universe`,
        });
    }
    return {
      id: line.id,
      name: line.name,
      universe: line.universe,
      devices: units.length,
      overLimit,
      lastDevice: last ? `unit ${last.label}` : null,
    };
  });
  return { results, findings };
}

/** The whole DMX check. `cueChannels` are the control channels the cues use. */
export function checkDmx(input: {
  fixtures: CheckFixture[];
  accessories: CheckAccessory[];
  dataLines: DataLineInput[];
  cueChannels: number[];
}): DmxResult {
  const findings: Finding[] = [];
  const byId = new Map(input.fixtures.map((f) => [f.id, f]));
  const devices: Device[] = [];
  const unpatched: { id: number; label: string }[] = [];

  const admit = (d: Device | null) => {
    if (!d) return;
    const subject = d.label.charAt(0).toUpperCase() + d.label.slice(1);
    if (!Number.isInteger(d.universe) || d.universe < 1 || d.universe > MAX_UNIVERSE) {
      findings.push({
        area: "dmx",
        severity: "error",
        subject,
        message: `Universe ${d.universe} is outside 1–${MAX_UNIVERSE}.`,
        unitNote: `universe ${d.universe} out of range`,
        fixtureIds: [d.fixtureId],
      });
      return;
    }
    if (!fitsUniverse(d.start, d.footprint)) {
      const end = d.start + d.footprint - 1;
      findings.push({
        area: "dmx",
        severity: "error",
        subject,
        unitNote: `DMX ${d.universe}/${d.start} runs past slot ${SLOTS_PER_UNIVERSE}`,
        message: `Address ${d.start} with a footprint of ${d.footprint} slots runs to slot ${end}: a universe has slots 1–${SLOTS_PER_UNIVERSE}, and a unit may not straddle two.`,
        fixtureIds: [d.fixtureId],
      });
    }
    devices.push(d);
  };

  for (const f of input.fixtures) {
    if (f.universe == null || f.address == null) unpatched.push({ id: f.id, label: f.label });
    else if (f.footprint == null)
      findings.push({
        area: "dmx",
        severity: "warning",
        subject: `Unit ${f.label}`,
        message: "Patched, but its footprint is not known (no DMX mode chosen): not counted on the universe map.",
        unitNote: "DMX footprint not known",
        fixtureIds: [f.id],
      });
    admit(fixtureDevice(f));
  }
  for (const a of input.accessories) admit(accessoryDevice(a, byId.get(a.fixtureId)));

  const claims = toClaims(devices);
  const conflicts = findConflicts(claims);
  for (const [claim, others] of conflicts) {
    const all = others.flatMap((o) => o.members);
    findings.push({
      area: "dmx",
      severity: "error",
      subject: `Universe ${claim.universe}, address ${claim.start}`,
      message: `${names(claim.members)} (slots ${claim.start}–${claim.end}) overlap${claim.members.length === 1 ? "s" : ""} ${names(all)}.`,
      fixtureIds: [...new Set(claim.members.map((m) => m.fixtureId))],
      unitNote: `DMX overlap at ${claim.universe}/${claim.start}`,
    });
  }
  const shared = claims
    .filter((c) => c.members.length > 1)
    .map((c) => ({
      universe: c.universe,
      address: c.start,
      labels: c.members.map((m) => m.label),
      fixtureIds: c.members.map((m) => m.fixtureId),
      why: c.members[0].why,
    }));
  if (unpatched.length)
    findings.push({
      area: "dmx",
      severity: "info",
      subject: "Unpatched",
      message: `${unpatched.length} unit${unpatched.length === 1 ? " has" : "s have"} no universe and address.`,
      fixtureIds: unpatched.map((u) => u.id),
      unitNote: "unpatched: no universe and address",
    });

  const channels = new Set(input.fixtures.map((f) => f.channel).filter((c): c is number => c != null));
  const channelsWithoutFixture = [...new Set(input.cueChannels)].filter((c) => !channels.has(c)).sort((a, b) => a - b);
  if (channelsWithoutFixture.length)
    findings.push({
      area: "dmx",
      severity: "warning",
      subject: "Channels",
      message: `The cues use channel${channelsWithoutFixture.length === 1 ? "" : "s"} ${channelsWithoutFixture.slice(0, 20).join(", ")}${channelsWithoutFixture.length > 20 ? " …" : ""} with no fixture.`,
    });

  const lines = checkDataLines(input.dataLines, byId);
  return {
    universes: universeMaps(claims, conflicts),
    shared,
    unpatched,
    channelsWithoutFixture,
    dataLines: lines.results,
    findings: [...findings, ...lines.findings],
  };
}
