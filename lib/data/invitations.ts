import "server-only";
import { Op, type Transaction } from "sequelize";
import { getDb } from "@/models";
import type { Invitation } from "@/models/invitation";
import { AppError, notFound } from "@/lib/errors";
import type { Role } from "@/lib/auth/roles";
import { hashLinkToken, INVITATION_TTL_DAYS, LINK_TOKEN_PATTERN, newLinkToken } from "@/lib/auth/tokens";
import { hashPassword } from "@/lib/auth/password";
import { plain } from "./plain";

const KEYS = ["id", "productionId", "email", "role", "expiresAt", "createdAt", "version"] as const;
export type InvitationDto = ReturnType<typeof toDto> & { invitedBy: string | null };
const toDto = (row: Invitation) => plain(row, KEYS);

const normalise = (email: string) => email.trim().toLowerCase();
const expiry = () => new Date(Date.now() + INVITATION_TTL_DAYS * 24 * 3600 * 1000);

/** An invitation and the one copy of its link's token (only its hash is kept). */
export type IssuedInvitation = { invitation: InvitationDto; token: string; productionName: string; refreshed: boolean };

async function productionName(productionId: number, transaction?: Transaction): Promise<string> {
  const p = await getDb().Production.findByPk(productionId, { attributes: ["name"], transaction });
  if (!p) throw notFound("That production");
  return p.name;
}

async function inviterName(userId: number | null, transaction?: Transaction): Promise<string | null> {
  if (!userId) return null;
  return (await getDb().User.findByPk(userId, { attributes: ["name"], transaction }))?.name ?? null;
}

/**
 * Invites an address to a production with a role. An address already on the team is refused with a
 * message; an address with an invitation still open gets that invitation back with a fresh link (and
 * the new role), never a second one.
 */
export async function createInvitation(a: {
  productionId: number;
  userId: number;
  email: string;
  role: Role;
}): Promise<IssuedInvitation> {
  const { sequelize, Invitation, Membership, User } = getDb();
  const email = normalise(a.email);
  return sequelize.transaction(async (transaction) => {
    // The production row is locked so two owners inviting the same address at once make one invitation.
    await sequelize.query("SELECT id FROM productions WHERE id = ? FOR UPDATE", {
      replacements: [a.productionId],
      transaction,
    });
    const user = await User.findOne({ where: { email }, attributes: ["id"], transaction });
    if (user && (await Membership.findOne({ where: { userId: user.id, productionId: a.productionId }, transaction })))
      throw new AppError(
        "conflict",
        `${email} is already on this production's team; change their role in the list instead.`,
        {
          fieldErrors: { email: ["already on the team"] },
        },
      );
    const token = newLinkToken();
    const open = await Invitation.findOne({ where: openWhere(a.productionId, email), transaction });
    let row: Invitation;
    if (open) {
      open.set({
        role: a.role,
        tokenHash: hashLinkToken(token),
        expiresAt: expiry(),
        invitedByUserId: a.userId,
        version: open.version + 1,
      });
      row = await open.save({ transaction });
    } else {
      row = await Invitation.create(
        {
          productionId: a.productionId,
          email,
          role: a.role,
          tokenHash: hashLinkToken(token),
          invitedByUserId: a.userId,
          expiresAt: expiry(),
        },
        { transaction },
      );
    }
    return {
      invitation: { ...toDto(row), invitedBy: await inviterName(a.userId, transaction) },
      token,
      productionName: await productionName(a.productionId, transaction),
      refreshed: Boolean(open),
    };
  });
}

/** The one rule of an open invitation: not used, not withdrawn, not expired (a production's, an address's, or both). */
export const openWhere = (productionId: number | null, email?: string) => ({
  ...(productionId !== null ? { productionId } : {}),
  ...(email ? { email } : {}),
  usedAt: null,
  withdrawnAt: null,
  expiresAt: { [Op.gt]: new Date() },
});

/** Invitations not yet accepted, withdrawn or expired, oldest first. */
export async function getOpenInvitations({ productionId }: { productionId: number }): Promise<InvitationDto[]> {
  const { Invitation, User } = getDb();
  const rows = await Invitation.findAll({ where: openWhere(productionId), order: [["id", "ASC"]] });
  const names = new Map(
    (
      await User.findAll({
        where: { id: rows.map((r) => r.invitedByUserId).filter((id): id is number => id !== null) },
        attributes: ["id", "name"],
      })
    ).map((u) => [u.id, u.name]),
  );
  return rows.map((r) => ({
    ...toDto(r),
    invitedBy: r.invitedByUserId ? (names.get(r.invitedByUserId) ?? null) : null,
  }));
}

async function openInvitation(productionId: number, id: number, transaction: Transaction): Promise<Invitation> {
  const row = await getDb().Invitation.findOne({
    where: { ...openWhere(productionId), id },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!row)
    throw new AppError("not_found", "That invitation is no longer open (it was accepted, withdrawn or has expired).");
  return row;
}

/** A new link for an open invitation (the old link stops working) and a new expiry. */
export async function resendInvitation(a: {
  productionId: number;
  id: number;
  userId: number;
}): Promise<IssuedInvitation> {
  const { sequelize } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await openInvitation(a.productionId, a.id, transaction);
    const token = newLinkToken();
    row.set({
      tokenHash: hashLinkToken(token),
      expiresAt: expiry(),
      invitedByUserId: a.userId,
      version: row.version + 1,
    });
    await row.save({ transaction });
    return {
      invitation: { ...toDto(row), invitedBy: await inviterName(a.userId, transaction) },
      token,
      productionName: await productionName(a.productionId, transaction),
      refreshed: true,
    };
  });
}

/** Withdraws an open invitation: its link then opens the "withdrawn" page. */
export async function withdrawInvitation(a: { productionId: number; id: number }): Promise<void> {
  await getDb().sequelize.transaction(async (transaction) => {
    const row = await openInvitation(a.productionId, a.id, transaction);
    row.set({ withdrawnAt: new Date(), version: row.version + 1 });
    await row.save({ transaction });
  });
}

export type InvitationLook =
  | { state: "invalid" | "used" | "withdrawn" | "expired" }
  | { state: "open"; email: string; role: Role; productionId: number; productionName: string; accountExists: boolean };

/** What a link leads to, without using it: the accept page shows this before anyone signs anything. */
export async function lookUpInvitation(token: string): Promise<InvitationLook> {
  if (!LINK_TOKEN_PATTERN.test(token)) return { state: "invalid" };
  const { Invitation, User } = getDb();
  const row = await Invitation.findOne({ where: { tokenHash: hashLinkToken(token) } });
  const state = stateOf(row);
  if (state !== "open" || !row) return { state: state === "open" ? "invalid" : state };
  return {
    state,
    email: row.email,
    role: row.role,
    productionId: row.productionId,
    productionName: await productionName(row.productionId),
    accountExists: Boolean(await User.findOne({ where: { email: row.email }, attributes: ["id"] })),
  };
}

export function stateOf(row: Invitation | null): "invalid" | "used" | "withdrawn" | "expired" | "open" {
  if (!row) return "invalid";
  if (row.usedAt) return "used";
  if (row.withdrawnAt) return "withdrawn";
  if (row.expiresAt.getTime() <= Date.now()) return "expired";
  return "open";
}

export const LINK_REFUSALS: Record<"invalid" | "used" | "withdrawn" | "expired", string> = {
  invalid:
    "This invitation link is not valid. Check that the whole link was copied, or ask the production's owner for a new one.",
  used: "This invitation link has already been used. Sign in with the account that accepted it.",
  withdrawn: "This invitation was withdrawn by the production's owner.",
  expired: "This invitation link has expired. Ask the production's owner to send a new one.",
};

export type Accepted = { userId: number; productionId: number; role: Role; createdAccount: boolean };

/**
 * Uses an invitation once: either the signed-in user joins, or a new account is made for the invited
 * address (name and password given). The invitation row is locked for the whole step, so two clicks on
 * the same link make one member; a link that is used, withdrawn, expired or unknown changes nothing.
 */
export async function acceptInvitation(a: {
  token: string;
  signedInUserId: number | null;
  newAccount?: { name: string; password: string };
}): Promise<Accepted> {
  if (!LINK_TOKEN_PATTERN.test(a.token)) throw new AppError("not_found", LINK_REFUSALS.invalid);
  const passwordHash = a.newAccount && !a.signedInUserId ? await hashPassword(a.newAccount.password) : null;
  const { sequelize, Invitation, Membership, User } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await Invitation.findOne({
      where: { tokenHash: hashLinkToken(a.token) },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const state = stateOf(row);
    if (state !== "open" || !row)
      throw new AppError(
        state === "invalid" ? "not_found" : "conflict",
        LINK_REFUSALS[state === "open" ? "invalid" : state],
      );
    let userId = a.signedInUserId;
    let createdAccount = false;
    if (!userId) {
      if (await User.findOne({ where: { email: row.email }, attributes: ["id"], transaction }))
        throw new AppError(
          "conflict",
          `An account already uses ${row.email}. Sign in with it, then open this link again.`,
        );
      if (!a.newAccount || !passwordHash)
        throw new AppError("bad_request", "Choose your name and a password to create your account.", {
          fieldErrors: { name: ["required"], password: ["required"] },
        });
      const user = await User.create(
        { email: row.email, name: a.newAccount.name.trim(), passwordHash },
        { transaction },
      );
      userId = user.id;
      createdAccount = true;
    }
    const existing = await Membership.findOne({ where: { userId, productionId: row.productionId }, transaction });
    if (existing)
      throw new AppError("conflict", "You are already on this production's team; the invitation was not needed.");
    await Membership.create(
      { userId, productionId: row.productionId, role: row.role, isOwner: false },
      { transaction },
    );
    row.set({ usedAt: new Date(), usedByUserId: userId, version: row.version + 1 });
    await row.save({ transaction });
    return { userId, productionId: row.productionId, role: row.role, createdAccount };
  });
}
