import "server-only";
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";

// How many failed sign-ins are allowed per window. Common practice, no source: a handful per account stops
// password guessing while a person who mistypes can still get in; an address gets more, since a whole crew
// may share one venue network. Counted in MariaDB so every app server sees the same counts.
export const SIGN_IN_LIMITS = {
  account: { failures: 5, windowSeconds: 15 * 60 },
  address: { failures: 50, windowSeconds: 15 * 60 },
} as const;

type Kind = keyof typeof SIGN_IN_LIMITS;
const keyOf = (kind: Kind, value: string) => `${kind}:${value.trim().toLowerCase()}`.slice(0, 300);

/** Refuses (429, with the wait) a sign-in while the account or the address is over its limit. */
export async function assertSignInAllowed(keys: { account: string; address: string }): Promise<void> {
  const { sequelize } = getDb();
  const rows = await sequelize.query<{ limit_key: string; failures: number; seconds_left: number }>(
    `SELECT limit_key, failures,
            CEIL(TIMESTAMPDIFF(MICROSECOND, NOW(3), window_started_at + INTERVAL (CASE WHEN limit_key LIKE 'account:%' THEN ? ELSE ? END) SECOND) / 1e6) AS seconds_left
       FROM sign_in_attempts WHERE limit_key IN (?, ?)`,
    {
      replacements: [
        SIGN_IN_LIMITS.account.windowSeconds,
        SIGN_IN_LIMITS.address.windowSeconds,
        keyOf("account", keys.account),
        keyOf("address", keys.address),
      ],
      type: QueryTypes.SELECT,
    },
  );
  let wait = 0;
  for (const r of rows) {
    const kind: Kind = r.limit_key.startsWith("account:") ? "account" : "address";
    if (Number(r.seconds_left) > 0 && r.failures >= SIGN_IN_LIMITS[kind].failures)
      wait = Math.max(wait, Number(r.seconds_left));
  }
  if (wait > 0) {
    throw new AppError("too_many_requests", `Too many sign-in attempts. Try again in ${wait} s.`, {
      retryAfterSeconds: wait,
    });
  }
}

/** Counts a failed sign-in against both keys; a window that has run out starts again at 1. */
export async function recordSignInFailure(keys: { account: string; address: string }): Promise<void> {
  const { sequelize } = getDb();
  for (const kind of ["account", "address"] as const) {
    const window = SIGN_IN_LIMITS[kind].windowSeconds;
    // MariaDB applies the assignments in order: `failures` reads the old window start, as does the second line.
    await sequelize.query(
      `INSERT INTO sign_in_attempts (limit_key, failures, window_started_at) VALUES (?, 1, NOW(3))
       ON DUPLICATE KEY UPDATE
         failures = IF(window_started_at <= NOW(3) - INTERVAL ? SECOND, 1, failures + 1),
         window_started_at = IF(window_started_at <= NOW(3) - INTERVAL ? SECOND, NOW(3), window_started_at)`,
      { replacements: [keyOf(kind, keys[kind]), window, window] },
    );
  }
}

/** A successful sign-in clears the account's count (not the address's: others share it). */
export async function clearAccountFailures(account: string): Promise<void> {
  await getDb().sequelize.query("DELETE FROM sign_in_attempts WHERE limit_key = ?", {
    replacements: [keyOf("account", account)],
  });
}
