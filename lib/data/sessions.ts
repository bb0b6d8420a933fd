import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import type { MembershipDto, UserDto } from "@/lib/dto/people";
import type { Role } from "@/lib/auth/roles";
import { driverQuery } from "./driver";

// The cookie holds a random token; the database holds only its hash, with the user and an expiry.
const hash = (token: string) => createHash("sha256").update(token).digest("hex");

/** Starts a session record for a user; the returned token goes into the sealed cookie. */
export async function createSessionRecord({
  userId,
  ttlSeconds,
}: {
  userId: number;
  ttlSeconds: number;
}): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  await getDb().sequelize.query(
    "INSERT INTO user_sessions (token_hash, user_id, expires_at) VALUES (?, ?, NOW(3) + INTERVAL ? SECOND)",
    {
      replacements: [hash(token), userId, ttlSeconds],
    },
  );
  return token;
}

/** The user a live session token belongs to, or null when it was ended, expired or never existed. */
export async function getSessionUser(token: string): Promise<UserDto | null> {
  const rows = await getDb().sequelize.query<UserDto>(
    "SELECT u.id, u.email, u.name FROM user_sessions s JOIN users u ON u.id = s.user_id WHERE s.token_hash = ? AND s.expires_at > NOW(3)",
    { replacements: [hash(token)], type: QueryTypes.SELECT },
  );
  return rows[0] ?? null;
}

/**
 * The user of a live session token with their membership of one production, in one query: every
 * production request asks both, and this is the per-request cost every read and write pays. The
 * membership is null for an outsider; the whole answer is null when the session is not live.
 */
export async function getSessionMember(
  token: string,
  productionId: number,
): Promise<{ user: UserDto; membership: MembershipDto | null } | null> {
  // A plain driver statement: every production request pays for this read (lib/data/driver.ts).
  const rows = await driverQuery<Array<UserDto & { role: Role | null; isOwner: number | null }>>(
    `SELECT u.id, u.email, u.name, m.role, m.is_owner AS isOwner
       FROM user_sessions s
       JOIN users u ON u.id = s.user_id
       LEFT JOIN memberships m ON m.user_id = u.id AND m.production_id = ?
      WHERE s.token_hash = ? AND s.expires_at > NOW(3)`,
    [productionId, hash(token)],
  );
  const row = rows[0];
  if (!row) return null;
  const user = { id: row.id, email: row.email, name: row.name };
  const membership = row.role ? { userId: row.id, productionId, role: row.role, isOwner: Boolean(row.isOwner) } : null;
  return { user, membership };
}

/** Ends one session (sign-out). */
export async function endSessionRecord(token: string): Promise<void> {
  await getDb().sequelize.query("DELETE FROM user_sessions WHERE token_hash = ?", { replacements: [hash(token)] });
}

/** Ends every session of a user (a password change or reset), optionally keeping the one in use. */
export async function endUserSessions({ userId, keepToken }: { userId: number; keepToken?: string }): Promise<void> {
  await getDb().sequelize.query("DELETE FROM user_sessions WHERE user_id = ? AND token_hash <> ?", {
    replacements: [userId, keepToken ? hash(keepToken) : ""],
  });
}
