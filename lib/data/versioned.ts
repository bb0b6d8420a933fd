import "server-only";
import { literal, type Model, type ModelStatic, type Transaction, type WhereOptions } from "sequelize";
import { AppError, notFound } from "@/lib/errors";

/** The 409 of optimistic locking: someone saved first; the current row goes back so the client can show it. */
export function staleVersion(what: string, current: unknown): AppError {
  return new AppError(
    "conflict",
    `Someone else changed this ${what.toLowerCase()} first. Here is the current version.`,
    {
      current,
    },
  );
}

/**
 * Optimistic locking: the write lands only if the row still has the version the client read.
 * Otherwise 409 with the current row, so the client can show the other person's change.
 */
export async function versionedUpdate<M extends Model, Dto>(opts: {
  model: ModelStatic<M>;
  scope: WhereOptions;
  id: number;
  version: number;
  changes: Record<string, unknown>;
  toDto: (row: M) => Dto;
  what: string;
  transaction?: Transaction;
}): Promise<{ before: M; after: M }> {
  const { model, scope, id, version, changes, toDto, what, transaction } = opts;
  const where = { ...(scope as object), id } as WhereOptions;
  // A locking read inside a transaction: it sees the latest committed row (not the transaction's
  // snapshot) and holds it until commit, so the 409's current row and the logged "before" are true.
  const lock = transaction ? { lock: true } : {};
  const before = await model.findOne({ where, transaction, ...lock });
  if (!before) throw notFound(what);
  const [count] = await model.update({ ...changes, version: literal("version + 1") } as never, {
    where: { ...(where as object), version } as WhereOptions,
    transaction,
  });
  if (count === 0) {
    const current = await model.findOne({ where, transaction, ...lock });
    if (!current) throw notFound(what);
    throw staleVersion(what, toDto(current));
  }
  const after = await model.findOne({ where, transaction });
  return { before, after: after! };
}
