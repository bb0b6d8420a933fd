import "server-only";
import { Op } from "sequelize";
import { getDb } from "@/models";
import type { PatchEntry } from "@/lib/cues/usitt-ascii-patch";

/**
 * The production's patch as the cue files carry it: every fixture with a channel and a DMX address, as
 * channel → universe/address (a unit without a universe is on universe 1), each pair once.
 */
export async function getPatchByProduction({ productionId }: { productionId: number }): Promise<PatchEntry[]> {
  const rows = await getDb().Fixture.findAll({
    attributes: ["channel", "universe", "address"],
    where: { productionId, channel: { [Op.ne]: null }, address: { [Op.ne]: null } },
    raw: true,
  });
  const seen = new Set<string>();
  const entries: PatchEntry[] = [];
  for (const r of rows as Array<{ channel: number; universe: number | null; address: number }>) {
    const e = { channel: r.channel, universe: r.universe ?? 1, address: r.address };
    const key = `${e.channel}:${e.universe}:${e.address}`;
    if (!seen.has(key)) entries.push(e);
    seen.add(key);
  }
  return entries.sort((a, b) => a.channel - b.channel || a.universe - b.universe || a.address - b.address);
}
