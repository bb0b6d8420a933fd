import "server-only";
import { AppError, forbidden } from "@/lib/errors";
import { toId } from "@/lib/http/id";
import { getCurrentMember, getCurrentUser } from "./session";
import { can, canEditAnyField, forbiddenFields, type Entity, type Member, type Permission } from "./policy";

export type CurrentUser = { id: number; name: string; email: string };
export type MemberContext = { user: CurrentUser; member: Member; productionId: number };

export async function requireUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new AppError("unauthorized", "Please sign in.");
  return user;
}

/**
 * The signed-in member of a production, checked against the role table. Outsiders get 404 (the
 * production's existence is not revealed); members without the right get 403.
 */
export async function requireMember(
  rawProductionId: string | number,
  permission: Permission = "production.view",
): Promise<MemberContext> {
  // The order of the answers: not signed in (401) before a malformed id or an outsider (404).
  const productionId = typeof rawProductionId === "number" ? rawProductionId : toId(rawProductionId);
  const found = await getCurrentMember(productionId ?? 0);
  if (!found) throw new AppError("unauthorized", "Please sign in.");
  const { user, membership } = found;
  if (productionId === null || !membership) throw new AppError("not_found", "That production was not found.");
  const member: Member = { role: membership.role, isOwner: membership.isOwner };
  if (!can(member, permission)) throw forbidden();
  return { user, member, productionId };
}

/**
 * A member who may write no field of the entity at all is refused (403) before the body is checked
 * against the schema, naming the fields the body sent (its `version` aside) when it sent any.
 */
export function requireSomeField(member: Member, entity: Entity, body?: unknown): void {
  if (canEditAnyField(member, entity)) return;
  const sent =
    body && typeof body === "object" && !Array.isArray(body) ? Object.keys(body).filter((k) => k !== "version") : [];
  if (sent.length) throw fieldsRefused(sent);
  throw forbidden();
}

function fieldsRefused(fields: string[], message?: string): AppError {
  return new AppError("forbidden", message ?? `Your role cannot change: ${fields.join(", ")}.`, {
    fieldErrors: Object.fromEntries(fields.map((f) => [f, ["not editable by your role"]])),
  });
}

/**
 * Field-level rights: refuses (403) a write that touches any field this member's role may not write,
 * naming each such field in `fieldErrors`. `fields` is the patch itself (its `version` is the lock,
 * not a field) or the list of field names an edit will write; `message` replaces the list of names
 * where one plain sentence says it better.
 */
export function requireFields(
  member: Member,
  entity: Entity,
  fields: object | readonly string[],
  message?: string,
): void {
  const names = Array.isArray(fields) ? [...fields] : Object.keys(fields).filter((k) => k !== "version");
  const denied = forbiddenFields(member, entity, names);
  if (denied.length) throw fieldsRefused(denied, message);
}
