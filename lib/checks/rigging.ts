// Rigging check: the weight on each hanging position against its rated load, the load on each lift line,
// point loads against a distributed rating, and the counterweight a flown electric needs. Pure.
import { liftLineShares, uniformEquivalent, type PointLoad } from "./beams";
import type { CheckAccessory, CheckFixture, Finding } from "./types";

/** Warn from this fraction of the rated load (common practice, no source); flag above 1. */
export const RATED_LOAD_WARNING = 0.8;

export type CheckPosition = {
  id: number;
  name: string;
  kind: string;
  /** Length of a pipe, truss or rail; null for booms, ladders and other point positions. */
  lengthM: number | null;
  ratedLoadKg: number | null;
  /** Lift lines on a flown pipe, equally spaced with one at each end; null when not entered. */
  liftLines: number | null;
  /** A flown electric on a counterweight set. */
  counterweighted: boolean;
};

export type RiggingSettings = { cableKgPerM: number; hardwareKgPerUnit: number };

export type LoadStatus = "ok" | "near" | "over" | "no-rating";
export type PositionLoad = {
  id: number;
  name: string;
  kind: string;
  units: number;
  fixturesKg: number;
  accessoriesKg: number;
  cableKg: number;
  hardwareKg: number;
  totalKg: number;
  ratedLoadKg: number | null;
  fraction: number | null;
  status: LoadStatus;
  /** The uniform load that bends the pipe as much as its units do as point loads (simple span). */
  bendingEquivalentKg: number | null;
  bendingFraction: number | null;
  liftLineKg: number[] | null;
  arborAddKg: number | null;
  notCounted: string[];
};
export type RiggingResult = {
  positions: PositionLoad[];
  totalKg: number;
  notCounted: { id: number; label: string }[];
  findings: Finding[];
};

/** A fixture with where it hangs along its position (metres from the first end), if known. */
export type RiggingFixture = CheckFixture & { alongM: number | null };

export function loadStatus(totalKg: number, ratedKg: number | null): LoadStatus {
  if (ratedKg == null || !(ratedKg > 0)) return "no-rating";
  const f = totalKg / ratedKg;
  if (f > 1) return "over";
  if (f >= RATED_LOAD_WARNING) return "near";
  return "ok";
}

/** One body per multi-cell unit: its weight is counted once, on the first cell. */
function bodies(fixtures: RiggingFixture[]): RiggingFixture[] {
  const seen = new Set<string>();
  return fixtures.filter((f) => {
    if (!f.bodyKey) return true;
    if (seen.has(f.bodyKey)) return false;
    seen.add(f.bodyKey);
    return true;
  });
}

function positionLoad(
  p: CheckPosition,
  units: RiggingFixture[],
  accessoriesOf: Map<number, CheckAccessory[]>,
  s: RiggingSettings,
  findings: Finding[],
): PositionLoad {
  const subject = p.name;
  const counted = units.filter((u) => u.weightKg != null);
  const missing = units.filter((u) => u.weightKg == null);
  const accessories = units.flatMap((u) => accessoriesOf.get(u.id) ?? []);
  const missingAcc = accessories.filter((a) => a.weightKg == null);
  const fixturesKg = counted.reduce((sum, u) => sum + (u.weightKg as number), 0);
  const accessoriesKg = accessories.reduce((sum, a) => sum + (a.weightKg ?? 0), 0);
  const cableKg = p.lengthM != null ? s.cableKgPerM * p.lengthM : 0;
  const hardwareKg = s.hardwareKgPerUnit * units.length;
  const totalKg = fixturesKg + accessoriesKg + cableKg + hardwareKg;
  const status = loadStatus(totalKg, p.ratedLoadKg);
  const fraction = status === "no-rating" ? null : totalKg / (p.ratedLoadKg as number);
  const ids = units.map((u) => u.id);
  const pct = (f: number) => `${Math.round(f * 100)} %`;
  if (status === "over")
    findings.push({
      area: "rigging",
      severity: "error",
      subject,
      message: `${totalKg.toFixed(1)} kg is ${pct(fraction!)} of its rated load of ${p.ratedLoadKg} kg: over the rating.`,
      fixtureIds: ids,
      unitNote: `${p.name} over its rated load`,
    });
  else if (status === "near")
    findings.push({
      area: "rigging",
      severity: "warning",
      subject,
      message: `${totalKg.toFixed(1)} kg is ${pct(fraction!)} of its rated load of ${p.ratedLoadKg} kg: close to the rating.`,
      fixtureIds: ids,
      unitNote: `${p.name} close to its rated load`,
    });
  else if (status === "no-rating" && units.length)
    findings.push({
      area: "rigging",
      severity: "info",
      subject,
      message: `No rated load entered: ${totalKg.toFixed(1)} kg not compared with anything.`,
    });
  const notCounted = [
    ...missing.map((u) => `unit ${u.label}`),
    ...missingAcc.map((a) => `${a.kind} on unit ${units.find((u) => u.id === a.fixtureId)?.label ?? "?"}`),
  ];
  if (notCounted.length)
    findings.push({
      area: "rigging",
      severity: "warning",
      subject,
      message: `No weight entered for ${notCounted.join(", ")}: not counted, the total is incomplete.`,
      fixtureIds: [...missing.map((u) => u.id), ...missingAcc.map((a) => a.fixtureId)],
      unitNote: "no weight: not counted",
    });

  let bendingEquivalentKg: number | null = null;
  let liftLineKg: number[] | null = null;
  if (p.lengthM != null && p.lengthM > 0) {
    // Units of unknown place along the pipe are put at mid-span, where they bend it most.
    const points: PointLoad[] = counted.map((u) => ({
      at: u.alongM ?? p.lengthM! / 2,
      kg:
        (u.weightKg as number) +
        s.hardwareKgPerUnit +
        (accessoriesOf.get(u.id) ?? []).reduce((a, x) => a + (x.weightKg ?? 0), 0),
    }));
    bendingEquivalentKg = uniformEquivalent(p.lengthM, points, cableKg).equivalentKg;
    if (p.ratedLoadKg != null && p.ratedLoadKg > 0 && bendingEquivalentKg > p.ratedLoadKg && status !== "over") {
      findings.push({
        area: "rigging",
        severity: "warning",
        subject,
        message: `Its units bend the pipe as much as ${bendingEquivalentKg.toFixed(1)} kg spread evenly would (heavy units near mid-span count up to twice): more than the rated ${p.ratedLoadKg} kg if that is a distributed-load rating.`,
        fixtureIds: ids,
        unitNote: `${p.name} may be over a distributed-load rating`,
      });
    }
    if (p.liftLines != null && p.liftLines >= 2)
      liftLineKg = liftLineShares(p.liftLines).map((share) => share * totalKg);
  }
  const arborAddKg = p.counterweighted ? totalKg : null;
  if (arborAddKg != null && arborAddKg > 0) {
    findings.push({
      area: "rigging",
      severity: "info",
      subject,
      message: `Counterweight set: add about ${arborAddKg.toFixed(1)} kg to the arbor for this load (set balanced with the bare pipe). Never release an out-of-weight set; load and unload pipe and arbor in the order your venue's procedure says.`,
    });
  }
  return {
    id: p.id,
    name: p.name,
    kind: p.kind,
    units: units.length,
    fixturesKg,
    accessoriesKg,
    cableKg,
    hardwareKg,
    totalKg,
    ratedLoadKg: p.ratedLoadKg,
    fraction,
    status,
    bendingEquivalentKg,
    bendingFraction: bendingEquivalentKg != null && p.ratedLoadKg ? bendingEquivalentKg / p.ratedLoadKg : null,
    liftLineKg,
    arborAddKg,
    notCounted,
  };
}

export function checkRigging(input: {
  positions: CheckPosition[];
  fixtures: RiggingFixture[];
  accessories: CheckAccessory[];
  settings: RiggingSettings;
}): RiggingResult {
  const findings: Finding[] = [];
  const byPosition = new Map<number, RiggingFixture[]>(input.positions.map((p) => [p.id, []]));
  for (const f of bodies(input.fixtures)) byPosition.get(f.positionId)?.push(f);
  const accessoriesOf = new Map<number, CheckAccessory[]>();
  for (const a of input.accessories) accessoriesOf.set(a.fixtureId, [...(accessoriesOf.get(a.fixtureId) ?? []), a]);
  const positions = input.positions.map((p) =>
    positionLoad(p, byPosition.get(p.id)!, accessoriesOf, input.settings, findings),
  );
  const notCounted = bodies(input.fixtures)
    .filter((f) => f.weightKg == null)
    .map((f) => ({ id: f.id, label: f.label }));
  return { positions, totalKg: positions.reduce((s, p) => s + p.totalKg, 0), notCounted, findings };
}
