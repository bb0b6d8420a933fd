import "server-only";
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";

// Requests that make Throwline send a mail (sign-up, password reset) are limited per e-mail address, so
// nobody can flood someone's inbox, and per client address, so nobody can spray many inboxes. Every
// request counts, whether or not an account uses the address (the limit reveals nothing). Common
// practice, no source: a person who asks again because a mail is slow still gets through; a client
// address gets more because a whole crew may share one venue network. Counted in MariaDB so every app
// server sees the same counts.
export const MAIL_REQUEST_LIMITS = {
  email: { requests: 3, windowSeconds: 15 * 60 },
  client: { requests: 20, windowSeconds: 15 * 60 },
} as const;

export type MailRequestAction = "sign-up" | "reset";
type Scope = keyof typeof MAIL_REQUEST_LIMITS;

const WORDS: Record<MailRequestAction, string> = { "sign-up": "sign-up", reset: "password-reset" };
const keyOf = (action: MailRequestAction, scope: Scope, value: string) =>
  `${action}:${scope}:${value.trim().toLowerCase()}`.slice(0, 300);

async function count(key: string, windowSeconds: number): Promise<void> {
  // MariaDB applies the assignments in order: `requests` reads the old window start, as does the second line.
  await getDb().sequelize.query(
    `INSERT INTO mail_request_counts (limit_key, requests, window_started_at) VALUES (?, 1, NOW(3))
     ON DUPLICATE KEY UPDATE
       requests = IF(window_started_at <= NOW(3) - INTERVAL ? SECOND, 1, requests + 1),
       window_started_at = IF(window_started_at <= NOW(3) - INTERVAL ? SECOND, NOW(3), window_started_at)`,
    { replacements: [key, windowSeconds, windowSeconds] },
  );
}

/**
 * Counts one request against the e-mail address and the client address, then refuses it (429 with the
 * wait in seconds) when either is over its limit for the current window. A refused request sends nothing.
 */
export async function countMailRequest(a: { action: MailRequestAction; email: string; client: string }): Promise<void> {
  const keys = { email: keyOf(a.action, "email", a.email), client: keyOf(a.action, "client", a.client) };
  for (const scope of ["email", "client"] as const) await count(keys[scope], MAIL_REQUEST_LIMITS[scope].windowSeconds);
  const rows = await getDb().sequelize.query<{ limit_key: string; requests: number; seconds_left: number }>(
    `SELECT limit_key, requests,
            CEIL(TIMESTAMPDIFF(MICROSECOND, NOW(3), window_started_at + INTERVAL (CASE WHEN limit_key = ? THEN ? ELSE ? END) SECOND) / 1e6) AS seconds_left
       FROM mail_request_counts WHERE limit_key IN (?, ?)`,
    {
      replacements: [
        keys.email,
        MAIL_REQUEST_LIMITS.email.windowSeconds,
        MAIL_REQUEST_LIMITS.client.windowSeconds,
        keys.email,
        keys.client,
      ],
      type: QueryTypes.SELECT,
    },
  );
  let refused: { scope: Scope; wait: number } | null = null;
  for (const r of rows) {
    const scope: Scope = r.limit_key === keys.email ? "email" : "client";
    const wait = Math.max(1, Number(r.seconds_left));
    if (r.requests > MAIL_REQUEST_LIMITS[scope].requests && (!refused || wait > refused.wait))
      refused = { scope, wait };
  }
  if (!refused) return;
  const where = refused.scope === "email" ? "for this e-mail address" : "from your network";
  throw new AppError(
    "too_many_requests",
    `Too many ${WORDS[a.action]} requests ${where}. Try again in ${refused.wait} s.`,
    { retryAfterSeconds: refused.wait },
  );
}
