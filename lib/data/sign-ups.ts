import "server-only";
import { QueryTypes, UniqueConstraintError } from "sequelize";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import { hashLinkToken, LINK_TOKEN_PATTERN, newLinkToken, SIGN_UP_TTL_HOURS } from "@/lib/auth/tokens";
import { inTransaction } from "./transaction";

// Sign-up links: an account is created only from a link mailed to its address, so every account's
// address is one its owner has shown they read (pending invitations to it may then be joined by id).

const normalise = (email: string) => email.trim().toLowerCase();

export const SIGN_UP_REFUSALS = {
  invalid: "This sign-up link is not valid. Check that the whole link was copied, or start again to get a new one.",
  used: "This sign-up link has already been used. Sign in with the account it created.",
  expired: `This sign-up link has expired (they last ${SIGN_UP_TTL_HOURS} hours). Start again to get a new one.`,
  taken: "An account already uses this address. Sign in, or ask for a new password from the sign-in page.",
} as const;
export type SignUpLinkState = "invalid" | "used" | "expired" | "open";

type LinkRow = { email: string; name: string; expiresAt: Date; usedAt: Date | null };
const stateOf = (row: LinkRow | undefined): SignUpLinkState =>
  !row ? "invalid" : row.usedAt ? "used" : new Date(row.expiresAt).getTime() <= Date.now() ? "expired" : "open";

const SELECT_LINK =
  "SELECT email, name, expires_at AS expiresAt, used_at AS usedAt FROM sign_up_links WHERE token_hash = ?";

/**
 * What a request to sign up with `email` leads to: a new link when no account uses the address, or
 * the existing account's id. One lookup and (for a new address) one insert; the caller does the
 * matching work on the other path so both take about as long.
 */
export async function startSignUp(a: {
  email: string;
  name: string;
}): Promise<{ kind: "new"; token: string; expiresAt: Date } | { kind: "existing"; userId: number }> {
  const email = normalise(a.email);
  const { sequelize, User } = getDb();
  const user = await User.findOne({ where: { email }, attributes: ["id"] });
  if (user) return { kind: "existing", userId: user.id };
  const token = newLinkToken();
  const expiresAt = new Date(Date.now() + SIGN_UP_TTL_HOURS * 3600_000);
  await sequelize.query("INSERT INTO sign_up_links (token_hash, email, name, expires_at) VALUES (?, ?, ?, ?)", {
    replacements: [hashLinkToken(token), email, a.name.trim().slice(0, 120), expiresAt],
  });
  return { kind: "new", token, expiresAt };
}

/** What a sign-up link leads to, without using it (the finishing page shows this first). */
export async function lookUpSignUpLink(
  token: string,
): Promise<{ state: Exclude<SignUpLinkState, "open"> } | { state: "open"; email: string; name: string }> {
  if (!LINK_TOKEN_PATTERN.test(token)) return { state: "invalid" };
  const rows = await getDb().sequelize.query<LinkRow>(SELECT_LINK, {
    replacements: [hashLinkToken(token)],
    type: QueryTypes.SELECT,
  });
  const state = stateOf(rows[0]);
  return state === "open" ? { state, email: rows[0].email, name: rows[0].name } : { state };
}

/**
 * Uses a sign-up link once: creates the account for the link's address with the chosen name and
 * password hash, and closes every open sign-up link of that address, in one transaction with the
 * link's row locked (two clicks make one account). A refused link writes nothing.
 */
export async function finishSignUp(a: {
  token: string;
  name: string;
  passwordHash: string;
}): Promise<{ userId: number; email: string }> {
  if (!LINK_TOKEN_PATTERN.test(a.token)) throw new AppError("not_found", SIGN_UP_REFUSALS.invalid);
  const { sequelize, User } = getDb();
  try {
    return await inTransaction(async (transaction) => {
      const rows = await sequelize.query<LinkRow>(`${SELECT_LINK} FOR UPDATE`, {
        replacements: [hashLinkToken(a.token)],
        type: QueryTypes.SELECT,
        transaction,
      });
      const state = stateOf(rows[0]);
      if (state !== "open") throw new AppError(state === "invalid" ? "not_found" : "conflict", SIGN_UP_REFUSALS[state]);
      const { email } = rows[0];
      // The address may have got an account since the link was sent (an invitation accepted meanwhile).
      if (await User.findOne({ where: { email }, attributes: ["id"], transaction }))
        throw new AppError("conflict", SIGN_UP_REFUSALS.taken);
      const user = await User.create({ email, name: a.name.trim(), passwordHash: a.passwordHash }, { transaction });
      await sequelize.query("UPDATE sign_up_links SET used_at = NOW(3) WHERE email = ? AND used_at IS NULL", {
        replacements: [email],
        transaction,
      });
      return { userId: user.id, email };
    });
  } catch (err) {
    // Two different links of one address finished at the same moment: the second finds the account made.
    if (err instanceof UniqueConstraintError) throw new AppError("conflict", SIGN_UP_REFUSALS.taken);
    throw err;
  }
}
