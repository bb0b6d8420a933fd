import "server-only";
import { getDb, type Accessory } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { AccessoryCreate, AccessoryPatch } from "@/lib/validation/accessory";
import type { AccessoryDto } from "@/lib/dto/accessory";
import { plain } from "./plain";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";

export const toAccessoryDto = (a: Accessory): AccessoryDto =>
  plain(a, [
    "id",
    "productionId",
    "fixtureId",
    "kind",
    "universe",
    "address",
    "footprint",
    "wattage",
    "weightKg",
    "notes",
    "version",
    "updatedAt",
  ]);

export async function getAccessoriesByProduction({ productionId }: { productionId: number }): Promise<AccessoryDto[]> {
  const rows = await getDb().Accessory.findAll({
    where: { productionId },
    order: [
      ["fixtureId", "ASC"],
      ["id", "ASC"],
    ],
  });
  return rows.map(toAccessoryDto);
}

/** ANSI E1.11 (DMX512-A): an accessory's slots, like a fixture's, stay within 1–512 of one universe. */
function checkDmx(a: { address: number | null; footprint: number | null }) {
  if (a.address != null && a.address + (a.footprint ?? 1) - 1 > 512) {
    throw new AppError(
      "bad_request",
      `A ${a.footprint ?? 1}-slot accessory at address ${a.address} runs past slot 512.`,
      { fieldErrors: { address: ["runs past slot 512"] } },
    );
  }
}

export async function createAccessory({
  productionId,
  userId,
  input,
}: {
  productionId: number;
  userId: number;
  input: AccessoryCreate;
}) {
  const { Accessory, Fixture } = getDb();
  checkDmx({ address: input.address ?? null, footprint: input.footprint ?? null });
  return inTransaction(async (transaction) => {
    const fixture = await Fixture.findOne({ where: { productionId, id: input.fixtureId }, transaction });
    if (!fixture)
      throw new AppError("bad_request", "No such fixture in this production.", {
        fieldErrors: { fixtureId: ["no such fixture in this production"] },
      });
    const row = await Accessory.create(
      { universe: null, address: null, footprint: null, notes: null, ...input, productionId },
      { transaction },
    );
    await recordChange(
      { productionId, userId, entity: "accessory", entityId: row.id, action: "create", after: toAccessoryDto(row) },
      transaction,
    );
    return toAccessoryDto(row);
  });
}

export async function updateAccessory({
  productionId,
  accessoryId,
  userId,
  patch,
}: {
  productionId: number;
  accessoryId: number;
  userId: number;
  patch: AccessoryPatch;
}) {
  const { Accessory } = getDb();
  const { version, ...changes } = patch;
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  return inTransaction(async (transaction) => {
    const current = await Accessory.findOne({ where: { productionId, id: accessoryId }, transaction });
    if (!current) throw notFound("Accessory");
    checkDmx({
      address: changes.address !== undefined ? changes.address : current.address,
      footprint: changes.footprint !== undefined ? changes.footprint : current.footprint,
    });
    const { before, after } = await versionedUpdate({
      model: Accessory,
      scope: { productionId },
      id: accessoryId,
      version,
      changes,
      toDto: toAccessoryDto,
      what: "Accessory",
      transaction,
    });
    await recordChange(
      {
        productionId,
        userId,
        entity: "accessory",
        entityId: accessoryId,
        action: "update",
        before: toAccessoryDto(before),
        after: toAccessoryDto(after),
      },
      transaction,
    );
    return toAccessoryDto(after);
  });
}

export async function deleteAccessory({
  productionId,
  accessoryId,
  userId,
}: {
  productionId: number;
  accessoryId: number;
  userId: number;
}) {
  const { Accessory } = getDb();
  await inTransaction(async (transaction) => {
    const row = await Accessory.findOne({ where: { productionId, id: accessoryId }, transaction });
    if (!row) throw notFound("Accessory");
    await row.destroy({ transaction });
    await recordChange(
      {
        productionId,
        userId,
        entity: "accessory",
        entityId: accessoryId,
        action: "delete",
        before: toAccessoryDto(row),
      },
      transaction,
    );
  });
}
