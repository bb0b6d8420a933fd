import "server-only";
import type { Model, ModelStatic, Order, Transaction } from "sequelize";
import { AppError, notFound } from "@/lib/errors";
import { versionedUpdate } from "./versioned";
import { recordChange } from "./changes";
import { uniqueNameError } from "./unique";
import { inTransaction } from "./transaction";

type Ids = { productionId: number; userId: number };

/**
 * The shape every named, production-owned plan object shares (positions, focus points, fixture types,
 * acting areas, landmarks): list in a fixed order, create with a unique name, versioned update, delete —
 * each write in one transaction with its change-log entry. Entity-specific rules hook in where they differ.
 */
export function productionCrud<
  M extends Model & { id: number },
  Dto,
  CreateInput extends object,
  Patch extends { version: number },
>(spec: {
  /** The model, looked up lazily (models are created on first use). */
  model: () => ModelStatic<M>;
  /** Change-log entity name, e.g. "focusPoint". */
  entity: string;
  /** What the user calls it, capitalised: "Focus point". */
  what: string;
  toDto: (row: M) => Dto;
  order: Order;
  /** Values to write for a new row (defaults for nullable columns, derived fields). */
  prepareCreate?: (
    input: CreateInput,
    ctx: { productionId: number; transaction: Transaction },
  ) => Promise<object> | object;
  /** Runs before the row is destroyed; may refuse (throw) or tidy dependants. Returns extra facts for the change log. */
  beforeDelete?: (
    row: M,
    ctx: { productionId: number; userId: number; transaction: Transaction },
  ) => Promise<object | void>;
}) {
  const lower = spec.what.toLowerCase();

  async function list({ productionId }: { productionId: number }): Promise<Dto[]> {
    const rows = await spec.model().findAll({ where: { productionId } as never, order: spec.order });
    return rows.map(spec.toDto);
  }

  async function create({ productionId, userId, input }: Ids & { input: CreateInput }): Promise<Dto> {
    return inTransaction(async (transaction) => {
      const values = spec.prepareCreate ? await spec.prepareCreate(input, { productionId, transaction }) : input;
      const row = await spec
        .model()
        .create({ ...values, productionId } as never, { transaction })
        .catch(uniqueNameError(lower));
      const after = spec.toDto(row);
      await recordChange(
        { productionId, userId, entity: spec.entity, entityId: row.id, action: "create", after: after as object },
        transaction,
      );
      return after;
    });
  }

  async function update({ productionId, id, userId, patch }: Ids & { id: number; patch: Patch }): Promise<Dto> {
    const { version, ...changes } = patch;
    if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
    return inTransaction(async (transaction) => {
      const { before, after } = await versionedUpdate({
        model: spec.model(),
        scope: { productionId },
        id,
        version,
        changes,
        toDto: spec.toDto,
        what: spec.what,
        transaction,
      }).catch(uniqueNameError(lower));
      const afterDto = spec.toDto(after);
      await recordChange(
        {
          productionId,
          userId,
          entity: spec.entity,
          entityId: id,
          action: "update",
          before: spec.toDto(before) as object,
          after: afterDto as object,
        },
        transaction,
      );
      return afterDto;
    });
  }

  async function remove({ productionId, id, userId }: Ids & { id: number }): Promise<void> {
    await inTransaction(async (transaction) => {
      const row = await spec.model().findOne({ where: { productionId, id } as never, transaction });
      if (!row) throw notFound(spec.what);
      const extra = spec.beforeDelete ? await spec.beforeDelete(row, { productionId, userId, transaction }) : undefined;
      await row.destroy({ transaction });
      await recordChange(
        {
          productionId,
          userId,
          entity: spec.entity,
          entityId: id,
          action: "delete",
          before: { ...(spec.toDto(row) as object), ...(extra ?? {}) },
        },
        transaction,
      );
    });
  }

  return { list, create, update, remove };
}
