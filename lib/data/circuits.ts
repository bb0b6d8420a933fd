import "server-only";
import type { z } from "zod";
import { getDb, type Circuit } from "@/models";
import type { CircuitDto } from "@/lib/dto/checks";
import type { createCircuitSchema, updateCircuitSchema } from "@/lib/validation/checks";
import { AppError } from "@/lib/errors";
import { recordChange } from "./changes";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";
import { uniqueNameError } from "./unique";
import { bulkCreateWithIds } from "./bulk-create";
import { inTransaction } from "./transaction";

type CreateCircuit = z.infer<typeof createCircuitSchema>;

export const toCircuitDto = (c: Circuit): CircuitDto => ({
  ...plain(c, ["id", "productionId", "name", "phase", "power", "version", "updatedAt"]),
  ratingA: Number(c.ratingA),
});

const circuits = productionCrud<Circuit, CircuitDto, CreateCircuit, z.infer<typeof updateCircuitSchema>>({
  model: () => getDb().Circuit,
  entity: "circuit",
  what: "Circuit",
  toDto: toCircuitDto,
  // Circuit names are often numbers: "9" before "10".
  order: [["name", "ASC"]],
  prepareCreate: (input) => ({ phase: null, power: "dimmed", ...input }),
});

export async function getCircuitsByProduction({ productionId }: { productionId: number }): Promise<CircuitDto[]> {
  const list = await circuits.list({ productionId });
  return list.sort((a, b) => a.name.localeCompare(b.name, undefined, { numeric: true }));
}
export const createCircuit = circuits.create;
export const updateCircuit = circuits.update;
export const deleteCircuit = circuits.remove;

/** A rack's worth of circuits in one transaction: all are created or none (a taken name names its row). */
export async function createCircuits({
  productionId,
  userId,
  inputs,
}: {
  productionId: number;
  userId: number;
  inputs: CreateCircuit[];
}): Promise<CircuitDto[]> {
  const seen = new Map<string, number>();
  inputs.forEach((c, i) => {
    const key = c.name.trim().toLowerCase();
    if (seen.has(key))
      throw new AppError("bad_request", `Row ${i + 1}: circuit "${c.name}" is also on row ${seen.get(key)! + 1}.`, {
        fieldErrors: { [`circuits.${i}.name`]: ["named twice"] },
      });
    seen.set(key, i);
  });
  const { Circuit } = getDb();
  return inTransaction(async (transaction) => {
    const rows = await bulkCreateWithIds(
      Circuit,
      inputs.map((c) => ({ phase: null, power: "dimmed" as const, ...c, productionId })),
      { transaction },
    ).catch(uniqueNameError("circuit"));
    const dtos = rows.map(toCircuitDto);
    for (const d of dtos)
      await recordChange(
        { productionId, userId, entity: "circuit", entityId: d.id, action: "create", after: d },
        transaction,
      );
    return dtos;
  });
}
