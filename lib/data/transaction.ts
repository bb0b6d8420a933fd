import "server-only";
import type { Transaction } from "sequelize";
import { getDb } from "@/models";
import { isDeadlock } from "@/lib/errors";

/** How many times a transaction InnoDB picked as a deadlock victim is run in all. */
export const DEADLOCK_ATTEMPTS = 4;

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Runs `work` in one managed transaction. Every query inside must pass `{ transaction }` so it runs on
 * this transaction's connection: a query that asks the pool for a second connection while this one
 * is held can wait for a connection that only frees up when it finishes.
 *
 * A deadlock rolls the whole transaction back, so running it again from the start is safe; after a
 * few tries the error goes up (the route answers 503 with Retry-After). `work` must therefore do
 * nothing outside the database that cannot be repeated.
 */
export function inTransaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
  return retryOnDeadlock(() => getDb().sequelize.transaction(work));
}

/** Runs `run` again while it fails as a deadlock victim, at most `attempts` times in all. */
export async function retryOnDeadlock<T>(run: () => Promise<T>, attempts = DEADLOCK_ATTEMPTS): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await run();
    } catch (err) {
      if (!isDeadlock(err) || attempt >= attempts) throw err;
      // A short random pause so the two victims do not collide again in step.
      await pause(10 * attempt + Math.random() * 40);
    }
  }
}
