import "server-only";
import { getDb, type Production } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import type { ProductionSettings } from "@/lib/validation/production";
import type { ProductionDto, ProductionListItem, ProductionOverview } from "@/lib/dto/production";
import { iso, plain } from "./plain";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";
import { stageDefaultsFor } from "@/lib/plot/stage-defaults";

const PRODUCTION_KEYS = [
  "id",
  "name",
  "venue",
  "displayUnits",
  "datumName",
  "headHeight",
  "faceHeight",
  "showDeckHeight",
  "backWallY",
  "prosceniumWidth",
  "prosceniumHeight",
  "stageWidth",
  "stageDepth",
  "apronDepth",
  "voltage",
  "derating",
  "numberingRule",
  "version",
  "createdAt",
  "updatedAt",
] as const;

export const toProductionDto = (p: Production): ProductionDto => plain(p, PRODUCTION_KEYS);

export async function getProductionsByUser({ userId }: { userId: number }): Promise<ProductionListItem[]> {
  const { Membership, Production, Fixture } = getDb();
  const memberships = await Membership.findAll({
    where: { userId },
    include: [{ model: Production, as: "production" }],
    order: [["production", "name", "ASC"]],
  });
  const ids = memberships.map((m) => m.productionId);
  const counts = ids.length
    ? ((await Fixture.count({ where: { productionId: ids }, group: ["productionId"] })) as unknown as Array<{
        productionId: number;
        count: number;
      }>)
    : [];
  const byId = new Map(counts.map((c) => [c.productionId, Number(c.count)]));
  return memberships.map((m) => ({
    ...toProductionDto((m as unknown as { production: Production }).production),
    role: m.role,
    isOwner: m.isOwner,
    fixtureCount: byId.get(m.productionId) ?? 0,
    archivedAt: iso((m as unknown as { production: Production }).production.archivedAt),
  }));
}

/** Creates a production; its creator becomes the owner and its designer. */
export async function createProduction({
  userId,
  name,
  venue,
  displayUnits,
}: {
  userId: number;
  name: string;
  venue: string;
  displayUnits: "metric" | "imperial";
}) {
  const { Production, Membership } = getDb();
  return inTransaction(async (transaction) => {
    // An imperial production starts from round feet and inches (the columns' defaults are metric).
    const stage = displayUnits === "imperial" ? stageDefaultsFor("imperial") : {};
    const production = await Production.create({ name, venue, displayUnits, ...stage }, { transaction });
    await Membership.create({ userId, productionId: production.id, role: "designer", isOwner: true }, { transaction });
    await recordChange(
      {
        productionId: production.id,
        userId,
        entity: "production",
        entityId: production.id,
        action: "create",
        after: toProductionDto(production),
      },
      transaction,
    );
    return toProductionDto(production);
  });
}

export async function getProductionById({ productionId }: { productionId: number }): Promise<ProductionDto | null> {
  const row = await getDb().Production.findByPk(productionId);
  return row ? toProductionDto(row) : null;
}

export async function updateProductionSettings({
  productionId,
  version,
  changes,
  userId,
}: {
  productionId: number;
  version: number;
  changes: Partial<ProductionSettings>;
  userId: number;
}): Promise<ProductionDto> {
  if (Object.keys(changes).length === 0)
    throw new AppError("bad_request", "Nothing to change: send at least one setting.");
  const { Production } = getDb();
  return inTransaction(async (transaction) => {
    const { before, after } = await versionedUpdate({
      model: Production,
      scope: {},
      id: productionId,
      version,
      changes,
      toDto: toProductionDto,
      what: "Production",
      transaction,
    });
    await recordChange(
      {
        productionId,
        userId,
        entity: "production",
        entityId: productionId,
        action: "update",
        before: toProductionDto(before),
        after: toProductionDto(after),
      },
      transaction,
    );
    return toProductionDto(after);
  });
}

export async function getProductionOverview({ productionId }: { productionId: number }): Promise<ProductionOverview> {
  const { Position, Fixture, Cue, FocusPoint } = getDb();
  const [positions, fixtures, cues, focusPoints, hung, focused, unpatched, noChannel] = await Promise.all([
    Position.count({ where: { productionId } }),
    Fixture.count({ where: { productionId } }),
    Cue.count({ where: { productionId } }),
    FocusPoint.count({ where: { productionId } }),
    Fixture.count({ where: { productionId, hung: true } }),
    Fixture.count({ where: { productionId, focused: true } }),
    Fixture.count({ where: { productionId, address: null } }),
    Fixture.count({ where: { productionId, channel: null } }),
  ]);
  const warnings: string[] = [];
  if (unpatched) warnings.push(`${unpatched} fixture${unpatched === 1 ? " has" : "s have"} no DMX address yet.`);
  if (noChannel) warnings.push(`${noChannel} fixture${noChannel === 1 ? " has" : "s have"} no channel yet.`);
  return { counts: { positions, fixtures, cues, focusPoints, hung, focused }, warnings };
}

export async function requireProduction(productionId: number): Promise<ProductionDto> {
  const p = await getProductionById({ productionId });
  if (!p) throw notFound("Production");
  return p;
}
