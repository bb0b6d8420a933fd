import "server-only";
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import { hashLinkToken, LINK_TOKEN_PATTERN, newLinkToken, RESET_TTL_MINUTES } from "@/lib/auth/tokens";

const normalise = (email: string) => email.trim().toLowerCase();

export const RESET_REFUSALS = {
  invalid: "This password link is not valid. Check that the whole link was copied, or ask for a new one.",
  used: "This password link has already been used. Ask for a new one if you need to.",
  expired: "This password link has expired (they last an hour). Ask for a new one.",
} as const;
export type ResetState = keyof typeof RESET_REFUSALS | "open";

/** A reset link for the account using `email`, or null when no account does (the caller answers the same either way). */
export async function createPasswordReset(
  email: string,
): Promise<{ token: string; expiresAt: Date; userId: number } | null> {
  const user = await getDb().User.findOne({ where: { email: normalise(email) }, attributes: ["id"] });
  if (!user) return null;
  return { ...(await issuePasswordReset(user.id)), userId: user.id };
}

/** A reset link for an account already looked up (a sign-up request for an address that has one offers it). */
export async function issuePasswordReset(userId: number): Promise<{ token: string; expiresAt: Date }> {
  const token = newLinkToken();
  const expiresAt = new Date(Date.now() + RESET_TTL_MINUTES * 60_000);
  await getDb().sequelize.query("INSERT INTO password_resets (token_hash, user_id, expires_at) VALUES (?, ?, ?)", {
    replacements: [hashLinkToken(token), userId, expiresAt],
  });
  return { token, expiresAt };
}

type ResetRow = { userId: number; expiresAt: Date; usedAt: Date | null };
const stateOf = (row: ResetRow | undefined): ResetState =>
  !row ? "invalid" : row.usedAt ? "used" : new Date(row.expiresAt).getTime() <= Date.now() ? "expired" : "open";

/** What a reset link leads to, without using it. */
export async function lookUpPasswordReset(token: string): Promise<ResetState> {
  if (!LINK_TOKEN_PATTERN.test(token)) return "invalid";
  const rows = await getDb().sequelize.query<ResetRow>(
    "SELECT user_id AS userId, expires_at AS expiresAt, used_at AS usedAt FROM password_resets WHERE token_hash = ?",
    { replacements: [hashLinkToken(token)], type: QueryTypes.SELECT },
  );
  return stateOf(rows[0]);
}

/**
 * Uses a reset link once: the new password hash is stored and the link marked used in one transaction
 * (the row locked, so two clicks change the password once). Returns the account's id and e-mail.
 */
export async function consumePasswordReset(a: {
  token: string;
  passwordHash: string;
}): Promise<{ userId: number; email: string }> {
  if (!LINK_TOKEN_PATTERN.test(a.token)) throw new AppError("not_found", RESET_REFUSALS.invalid);
  const { sequelize, User } = getDb();
  return sequelize.transaction(async (transaction) => {
    const rows = await sequelize.query<ResetRow>(
      "SELECT user_id AS userId, expires_at AS expiresAt, used_at AS usedAt FROM password_resets WHERE token_hash = ? FOR UPDATE",
      { replacements: [hashLinkToken(a.token)], type: QueryTypes.SELECT, transaction },
    );
    const state = stateOf(rows[0]);
    if (state !== "open") throw new AppError(state === "invalid" ? "not_found" : "conflict", RESET_REFUSALS[state]);
    const user = await User.findByPk(rows[0].userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw new AppError("not_found", RESET_REFUSALS.invalid);
    user.set({ passwordHash: a.passwordHash, version: user.version + 1 });
    await user.save({ transaction });
    // Every other open link of the account goes too: one reset, one password.
    await sequelize.query("UPDATE password_resets SET used_at = NOW(3) WHERE user_id = ? AND used_at IS NULL", {
      replacements: [user.id],
      transaction,
    });
    return { userId: user.id, email: user.email };
  });
}
